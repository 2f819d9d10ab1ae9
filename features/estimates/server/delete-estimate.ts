import "server-only";
import { eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { estimates } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ApiError } from "@/features/platform";
import { loadEstimate } from "@/features/estimates/server/get-estimate";

/** Deletes one stored estimate; nothing else refers to it. */
export async function deleteEstimate({
  db,
  actor,
  id,
  confirm,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
  confirm: boolean;
}): Promise<{ deleted: true; impact: Record<string, number> }> {
  const { estimate } = await loadEstimate(db, actor, id, "write");
  if (!confirm)
    throw new ApiError(
      409,
      "confirm_required",
      `Deleting estimate "${estimate.title}" cannot be undone. Repeat the request with ?confirm=true to go ahead.`,
      undefined,
      { impact: { estimates: 1 } },
    );
  await db.delete(estimates).where(eq(estimates.id, id));
  return { deleted: true, impact: { estimates: 1 } };
}
