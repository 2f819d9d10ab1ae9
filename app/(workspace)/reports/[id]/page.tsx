import { notFound, redirect } from "next/navigation";
import { getDb } from "@/db/client";
import { getActor } from "@/features/auth/server/get-actor";
import { reportTitleFor } from "@/features/reports/server/report-page-access";
import { ReportWorkbench } from "@/features/reports/components/report-workbench";
import { ReportView } from "@/features/reports/components/report-view";
import { ReportThread } from "@/features/reports/components/report-thread";
import { isUuid } from "@/features/platform";
import { can, isStaff } from "@/lib/authz/policy";

export const metadata = { title: "Report" };

export default async function ReportPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const title = isUuid(id) ? await reportTitleFor(getDb(), actor, id) : null;
  if (title === null) notFound();
  const staff = isStaff(actor);
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-2xl font-bold text-ink-900">{title}</h1>
      {staff && can(actor, "report:share") ? <ReportWorkbench reportId={id} /> : null}
      <ReportLatest id={id} staff={staff} system={actor.unitSystem} />
      <ReportThread reportId={id} asCustomer={!staff} />
    </div>
  );
}

function ReportLatest({
  id,
  staff,
  system,
}: {
  id: string;
  staff: boolean;
  system: "metric" | "imperial";
}) {
  return (
    <section aria-label="Current version" className="flex flex-col gap-2">
      {staff ? (
        <h2 className="text-lg font-medium text-ink-900">
          Current version as the customer sees it
        </h2>
      ) : null}
      <ReportView reportId={id} version="latest" system={system} />
    </section>
  );
}
