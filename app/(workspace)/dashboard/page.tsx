import Link from "next/link";
import { redirect } from "next/navigation";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { getDb } from "@/db/client";
import { getActor } from "@/features/auth/server/get-actor";
import { listState } from "@/lib/query/list-state";
import { EstimatesTable } from "@/features/estimates/components/estimates-table";
import { formatDate } from "@/lib/format/format";
import { getDashboard } from "@/features/search/server/get-dashboard";
import { prefetchEstimateList } from "@/features/estimates/server/prefetch-estimates";
import { can, isStaff } from "@/lib/authz/policy";
import { CustomerPortal } from "@/features/reports/components/customer-portal";
import { getCustomerName } from "@/features/reports/server/get-customer-name";
import { DashboardTread } from "@/features/calibration/components/dashboard-tread";
import { getTreadAlerts } from "@/features/calibration/server/get-tread-alerts";
import { getTyrePlan } from "@/features/calibration/server/get-tyre-plan";
import { makeQueryClient } from "@/lib/query/query-client";
import { Card } from "@/lib/ui/card";
import { EmptyState } from "@/lib/ui/empty-state";
import { DEFAULT_ESTIMATE_LIST } from "@/features/estimates/api/estimates";

export const metadata = { title: "Dashboard" };

const RECENT = listState({ ...DEFAULT_ESTIMATE_LIST, pageSize: 10 });

export default async function DashboardPage({
  searchParams,
}: {
  searchParams: Promise<{ alertHours?: string }>;
}) {
  const { alertHours } = await searchParams;
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  if (!isStaff(actor)) {
    const customer = await getCustomerName(getDb(), actor);
    return <CustomerPortal customerName={customer} />;
  }
  const qc = makeQueryClient();
  const [summary, , alerts, plan] = await Promise.all([
    getDashboard({ db: getDb(), actor }),
    prefetchEstimateList(qc, actor, RECENT),
    getTreadAlerts({ db: getDb(), actor, withinHours: alertHours }),
    getTyrePlan({ db: getDb(), actor, query: { months: 3 } }),
  ]);
  const canRun = can(actor, "estimate:run");
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-bold text-ink-900">Dashboard</h1>
        {canRun ? (
          <div className="flex flex-wrap gap-2">
            <Link
              href="/estimates/new"
              className="inline-flex h-11 items-center rounded-md bg-furrow-600 px-4 font-medium text-white hover:bg-furrow-700"
            >
              Run an estimate
            </Link>
            <Link
              href="/customers/new"
              className="inline-flex h-11 items-center rounded-md border border-ink-300 bg-white px-4 font-medium text-ink-800 hover:bg-ink-100"
            >
              Add a customer
            </Link>
          </div>
        ) : null}
      </header>
      <dl className="grid gap-3 sm:grid-cols-3">
        {(
          [
            ["Customers", summary.counts.customers, "/customers"],
            ["Machines", summary.counts.machines, "/machines"],
            ["Estimates", summary.counts.estimates, "/estimates"],
          ] as const
        ).map(([label, n, href]) => (
          <div key={label} className="rounded-lg border border-ink-200 bg-white p-4">
            <dt className="text-sm text-ink-600">{label}</dt>
            <dd className="text-3xl font-bold text-ink-900">
              <Link href={href} className="hover:text-furrow-700">
                {n}
              </Link>
            </dd>
          </div>
        ))}
      </dl>
      <DashboardTread alerts={alerts} dueSoon={plan.dueSoon} />
      <Card title="Recent estimates">
        <HydrationBoundary state={dehydrate(qc)}>
          <EstimatesTable currency={actor.currency} canRun={canRun} pageSize={10} />
        </HydrationBoundary>
      </Card>
      <Card title="Customers lately worked on">
        {summary.recentCustomers.length === 0 ? (
          <EmptyState title="No customers yet">Add a customer to start quoting.</EmptyState>
        ) : (
          <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
            {summary.recentCustomers.map((c) => (
              <li key={c.id} className="rounded-md border border-ink-200 p-3">
                <Link
                  href={`/customers/${c.id}`}
                  className="font-medium text-furrow-700 hover:underline"
                >
                  {c.name}
                </Link>
                <p className="text-sm text-ink-600">
                  {c.kind} · updated {formatDate(c.updatedAt)}
                </p>
              </li>
            ))}
          </ul>
        )}
      </Card>
    </div>
  );
}
