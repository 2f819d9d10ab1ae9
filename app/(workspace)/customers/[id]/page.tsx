import { notFound, redirect } from "next/navigation";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { getActor } from "@/features/auth/server/get-actor";
import { CustomerDetail } from "@/features/workspace/components/customer-detail";
import { isUuid, prefetch } from "@/features/workspace/server/prefetch";
import { can } from "@/lib/authz/policy";
import { makeQueryClient } from "@/lib/query/query-client";

export const metadata = { title: "Customer" };

export default async function CustomerPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const qc = makeQueryClient();
  if (!isUuid(id) || !(await prefetch.customer(qc, actor, id))) notFound();
  return (
    <HydrationBoundary state={dehydrate(qc)}>
      <CustomerDetail
        id={id}
        canWrite={can(actor, "customer:write")}
        canReadEstimates={can(actor, "estimate:read")}
      />
    </HydrationBoundary>
  );
}
