import Link from "next/link";
import { redirect } from "next/navigation";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { getActor } from "@/features/auth/server/get-actor";
import { CustomersTable } from "@/features/customers/components/customers-table";
import { prefetchCustomerList } from "@/features/customers/server/prefetch-customers";
import { can, isStaff } from "@/lib/authz/policy";
import { makeQueryClient } from "@/lib/query/query-client";
import { DEFAULT_CUSTOMER_LIST } from "@/features/customers/api/customers";

export const metadata = { title: "Customers" };

export default async function CustomersPage() {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  if (!isStaff(actor)) redirect(`/customers/${actor.customerId}`);
  const qc = makeQueryClient();
  await prefetchCustomerList(qc, actor, DEFAULT_CUSTOMER_LIST);
  const canWrite = can(actor, "customer:write");
  return (
    <div className="flex flex-col gap-4">
      <header className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-bold text-ink-900">Customers</h1>
        {canWrite ? (
          <Link
            href="/customers/new"
            className="inline-flex h-11 items-center rounded-md bg-furrow-600 px-4 font-medium text-white hover:bg-furrow-700"
          >
            Add a customer
          </Link>
        ) : null}
      </header>
      <HydrationBoundary state={dehydrate(qc)}>
        <CustomersTable canWrite={canWrite} />
      </HydrationBoundary>
    </div>
  );
}
