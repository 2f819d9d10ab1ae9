import { notFound, redirect } from "next/navigation";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { getActor } from "@/features/auth/server/get-actor";
import { SweepView } from "@/features/options/components/sweep-view";
import { prefetchSweep } from "@/features/options/server/prefetch-studies";
import { isUuid } from "@/features/platform/server/found";
import { can } from "@/lib/authz/policy";
import { makeQueryClient } from "@/lib/query/query-client";

export const metadata = { title: "Sweep" };

export default async function SweepPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const qc = makeQueryClient();
  if (!isUuid(id) || !(await prefetchSweep(qc, actor, id))) notFound();
  return (
    <HydrationBoundary state={dehydrate(qc)}>
      <SweepView
        id={id}
        system={actor.unitSystem}
        currency={actor.currency}
        canRun={can(actor, "estimate:run")}
      />
    </HydrationBoundary>
  );
}
