import Link from "next/link";
import { notFound, redirect } from "next/navigation";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { getDb } from "@/db/client";
import { getActor } from "@/features/auth/server/get-actor";
import { MachineDetail } from "@/features/machines/components/machine-detail";
import { listCustomerChoices } from "@/features/customers/server/list-customer-choices";
import { prefetchMachine } from "@/features/machines/server/prefetch-machines";
import { isUuid } from "@/features/platform/server/found";
import { EstimatesTable } from "@/features/estimates/components/estimates-table";
import { StudiesTable } from "@/features/options/components/studies-table";
import { can } from "@/lib/authz/policy";
import { Card } from "@/lib/ui/card";
import { makeQueryClient } from "@/lib/query/query-client";

export const metadata = { title: "Machine" };

export default async function MachinePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const qc = makeQueryClient();
  if (!isUuid(id) || !(await prefetchMachine(qc, actor, id))) notFound();
  const customers = await listCustomerChoices({ db: getDb(), actor });
  const canRun = can(actor, "estimate:run");
  return (
    <HydrationBoundary state={dehydrate(qc)}>
      <Link
        href={`/machines/${id}/tread`}
        className="mb-4 inline-flex h-11 items-center rounded-md border border-ink-300 bg-white px-4 font-medium text-ink-800 hover:bg-ink-100"
      >
        Tread readings and calibration
      </Link>
      <MachineDetail
        id={id}
        customers={customers}
        system={actor.unitSystem}
        canWrite={can(actor, "machine:write")}
        canRun={canRun}
      >
        {can(actor, "estimate:read") ? (
          <Card title="Estimates for this machine">
            <EstimatesTable
              currency={actor.currency}
              canRun={canRun}
              machineId={id}
              pageSize={10}
            />
          </Card>
        ) : null}
        {can(actor, "estimate:read") ? (
          <>
            <Card title="Other setups compared">
              <StudiesTable kind="comparison" currency={actor.currency} machineId={id} />
            </Card>
            <Card title="Settings swept">
              <StudiesTable kind="sweep" currency={actor.currency} machineId={id} />
            </Card>
          </>
        ) : null}
      </MachineDetail>
    </HydrationBoundary>
  );
}
