import "server-only";
import type { DbOrTx } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import type { TEstimateResult } from "@/lib/scrub";
import { loadEstimate } from "@/features/estimates/server/get-estimate";
import { csvFileName, estimateTurnsCsv } from "@/features/estimates/lib/estimate-csv";

/** The per-turn CSV of a stored estimate, with the file name to offer. */
export async function exportEstimateCsv({
  db,
  actor,
  id,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
}): Promise<{ fileName: string; csv: string }> {
  const { estimate } = await loadEstimate(db, actor, id, "read");
  return {
    fileName: csvFileName(estimate.title),
    csv: estimateTurnsCsv(estimate.result as TEstimateResult, actor.currency),
  };
}
