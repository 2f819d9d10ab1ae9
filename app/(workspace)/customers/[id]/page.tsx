import { notFound, redirect } from "next/navigation";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { getActor } from "@/features/auth/server/get-actor";
import { CustomerDetail } from "@/features/customers/components/customer-detail";
import { prefetchCustomer } from "@/features/customers/server/prefetch-customers";
import { isUuid } from "@/features/platform/server/found";
import { MachinesTable } from "@/features/machines/components/machines-table";
import { EstimatesTable } from "@/features/estimates/components/estimates-table";
import { StudiesTable } from "@/features/options/components/studies-table";
import { Card } from "@/lib/ui/card";
import { can } from "@/lib/authz/policy";
import { makeQueryClient } from "@/lib/query/query-client";

export const metadata = { title: "Customer" };

export default async function CustomerPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const qc = makeQueryClient();
  if (!isUuid(id) || !(await prefetchCustomer(qc, actor, id))) notFound();
  const canWrite = can(actor, "customer:write");
  return (
    <HydrationBoundary state={dehydrate(qc)}>
      <CustomerDetail id={id} canWrite={canWrite}>
        <Card title="Machines">
          <MachinesTable canWrite={canWrite} customerId={id} />
        </Card>
        {/* Estimates are the dealer's drafts: a customer account reads shared reports. */}
        {can(actor, "estimate:read") ? (
          <Card title="Estimates">
            <EstimatesTable
              currency={actor.currency}
              canRun={canWrite}
              customerId={id}
              pageSize={10}
            />
          </Card>
        ) : null}
        {/* Comparisons and sweeps are working material too; customers see them in reports. */}
        {can(actor, "estimate:read") ? (
          <>
            <Card title="Other setups compared">
              <StudiesTable kind="comparison" currency={actor.currency} customerId={id} />
            </Card>
            <Card title="Settings swept">
              <StudiesTable kind="sweep" currency={actor.currency} customerId={id} />
            </Card>
          </>
        ) : null}
      </CustomerDetail>
    </HydrationBoundary>
  );
}
