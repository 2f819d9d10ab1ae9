import "server-only";
import type { QueryClient } from "@tanstack/react-query";
import { getDb } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { listParams, type TListState } from "@/lib/query/list-state";
import { found } from "@/features/platform";
import { ZEstimateListQuery } from "@/features/estimates/schemas/estimate-list-query";
import { estimateKeys } from "@/features/estimates/api/estimates";
import { listEstimates } from "@/features/estimates/server/list-estimates";
import { getEstimate } from "@/features/estimates/server/get-estimate";

// Fill the page's query cache on the server with exactly what the client hooks would fetch (same
// keys), so the first paint has the data and the client does not fetch it again.

export const prefetchEstimateList = async (qc: QueryClient, actor: TActor, state: TListState) =>
  qc.setQueryData(
    estimateKeys.list(state),
    await listEstimates({
      db: getDb(),
      actor,
      query: ZEstimateListQuery.parse({ ...listParams(state), q: state.q || undefined }),
    }),
  );

/** False when the record is not there for this actor (the page shows a 404). */
export const prefetchEstimate = async (qc: QueryClient, actor: TActor, id: string) =>
  found(async () =>
    qc.setQueryData(estimateKeys.detail(id), await getEstimate({ db: getDb(), actor, id })),
  );
