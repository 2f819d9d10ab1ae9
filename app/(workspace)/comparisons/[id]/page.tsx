import { notFound, redirect } from "next/navigation";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { getActor } from "@/features/auth/server/get-actor";
import { ComparisonView } from "@/features/options/components/comparison-view";
import { prefetchComparison } from "@/features/options/server/prefetch-studies";
import { isUuid } from "@/features/platform/server/found";
import { can } from "@/lib/authz/policy";
import { makeQueryClient } from "@/lib/query/query-client";

export const metadata = { title: "Comparison" };

export default async function ComparisonPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const qc = makeQueryClient();
  if (!isUuid(id) || !(await prefetchComparison(qc, actor, id))) notFound();
  return (
    <HydrationBoundary state={dehydrate(qc)}>
      <ComparisonView
        id={id}
        system={actor.unitSystem}
        currency={actor.currency}
        canRun={can(actor, "estimate:run")}
        canShare={can(actor, "report:share")}
      />
    </HydrationBoundary>
  );
}
