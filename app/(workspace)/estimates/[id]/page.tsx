import { notFound, redirect } from "next/navigation";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { getActor } from "@/features/auth/server/get-actor";
import { EstimateResult } from "@/features/estimates/components/estimate-result";
import { prefetchEstimate } from "@/features/estimates/server/prefetch-estimates";
import { isUuid } from "@/features/platform/server/found";
import { can } from "@/lib/authz/policy";
import { CreateReportButton } from "@/features/reports/components/create-report-button";
import { makeQueryClient } from "@/lib/query/query-client";

export const metadata = { title: "Estimate" };

export default async function EstimatePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const qc = makeQueryClient();
  if (!isUuid(id) || !(await prefetchEstimate(qc, actor, id))) notFound();
  return (
    <HydrationBoundary state={dehydrate(qc)}>
      {can(actor, "report:share") ? (
        <div className="mb-4 flex justify-end">
          <CreateReportButton estimateId={id} />
        </div>
      ) : null}
      <EstimateResult
        id={id}
        system={actor.unitSystem}
        currency={actor.currency}
        canWrite={can(actor, "estimate:write")}
      />
    </HydrationBoundary>
  );
}
