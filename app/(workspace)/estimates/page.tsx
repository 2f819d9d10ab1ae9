import Link from "next/link";
import { redirect } from "next/navigation";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { getActor } from "@/features/auth/server/get-actor";
import { EstimatesTable } from "@/features/estimates/components/estimates-table";
import { prefetchEstimateList } from "@/features/estimates/server/prefetch-estimates";
import { can } from "@/lib/authz/policy";
import { makeQueryClient } from "@/lib/query/query-client";
import { DEFAULT_ESTIMATE_LIST } from "@/features/estimates/api/estimates";

export const metadata = { title: "Estimates" };

export default async function EstimatesPage() {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const qc = makeQueryClient();
  await prefetchEstimateList(qc, actor, DEFAULT_ESTIMATE_LIST);
  const canRun = can(actor, "estimate:run");
  return (
    <div className="flex flex-col gap-4">
      <header className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-bold text-ink-900">Estimates</h1>
        {canRun ? (
          <Link
            href="/estimates/new"
            className="inline-flex h-11 items-center rounded-md bg-furrow-600 px-4 font-medium text-white hover:bg-furrow-700"
          >
            Run an estimate
          </Link>
        ) : null}
      </header>
      <HydrationBoundary state={dehydrate(qc)}>
        <EstimatesTable currency={actor.currency} canRun={canRun} />
      </HydrationBoundary>
    </div>
  );
}
