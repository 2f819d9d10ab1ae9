import { notFound, redirect } from "next/navigation";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { getDb } from "@/db/client";
import { getActor } from "@/features/auth/server/get-actor";
import { dutyCycleKeys } from "@/features/duty-cycles/api/duty-cycles";
import { DutyCycleDetail } from "@/features/duty-cycles/components/duty-cycle-detail";
import { DutyCycleError } from "@/features/duty-cycles/server/errors";
import { getDutyCycle } from "@/features/duty-cycles/server/get-duty-cycle";
import { can } from "@/lib/authz/policy";
import { makeQueryClient } from "@/lib/query/query-client";

export const metadata = { title: "Duty cycle" };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export default async function DutyCyclePage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const { id } = await params;
  if (!UUID.test(id)) notFound();
  const qc = makeQueryClient();
  try {
    const detail = await getDutyCycle({ db: getDb(), actor, id });
    qc.setQueryData(dutyCycleKeys.detail(id), detail);
  } catch (e) {
    if (e instanceof DutyCycleError && e.status === 404) notFound();
    throw e;
  }
  return (
    <HydrationBoundary state={dehydrate(qc)}>
      <DutyCycleDetail id={id} canWrite={can(actor, "duty-cycle:write")} />
    </HydrationBoundary>
  );
}
