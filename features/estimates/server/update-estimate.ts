import "server-only";
import { eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { estimates } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ZEstimatePatch, type TEstimateDto } from "@/features/estimates/schemas/estimate";
import { parseOrThrow } from "@/features/platform";
import { loadEstimate } from "@/features/estimates/server/get-estimate";
import { toEstimateDto } from "@/features/estimates/server/estimate-dto";

/** Renames a stored estimate; its inputs and result stay as they were run. */
export async function updateEstimate({
  db,
  actor,
  id,
  input,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
  input: unknown;
}): Promise<TEstimateDto> {
  const current = await loadEstimate(db, actor, id, "write");
  const patch = parseOrThrow(ZEstimatePatch, input);
  const [row] = await db
    .update(estimates)
    .set({ title: patch.title })
    .where(eq(estimates.id, id))
    .returning();
  if (!row) throw new Error("update returned no estimate");
  return toEstimateDto(row, current.customerName);
}
