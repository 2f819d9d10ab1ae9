import Link from "next/link";
import { notFound, redirect } from "next/navigation";
import { getDb } from "@/db/client";
import { getActor } from "@/features/auth/server/get-actor";
import { reportTitleFor } from "@/features/reports/server/report-page-access";
import { ReportView } from "@/features/reports/components/report-view";
import { isUuid } from "@/features/platform";

export const metadata = { title: "Report version" };

export default async function ReportVersionPage({
  params,
}: {
  params: Promise<{ id: string; version: string }>;
}) {
  const { id, version } = await params;
  const n = Number(version);
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  if (!isUuid(id) || !Number.isInteger(n) || n < 1) notFound();
  const title = await reportTitleFor(getDb(), actor, id);
  if (title === null) notFound();
  return (
    <div className="flex flex-col gap-4">
      <Link href={`/reports/${id}`} className="text-sm text-furrow-700 underline">
        ← {title}
      </Link>
      <ReportView reportId={id} version={n} system={actor.unitSystem} />
    </div>
  );
}
