import "server-only";
import { rm } from "node:fs/promises";
import { and, eq, ne, sql } from "drizzle-orm";
import type { Db } from "@/db/client";
import { dutyCycles, dutyCycleUploads, estimates } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { DutyCycleError } from "@/features/duty-cycles/server/errors";
import { loadDutyCycleFor } from "@/features/duty-cycles/server/authorize";
import { uploadPath } from "@/features/duty-cycles/server/upload-storage";

/**
 * Deletes a duty cycle with its turns and bad rows, and its uploaded file when nothing else
 * uses it. Refused while estimates still use the cycle (they would be left pointing at nothing),
 * and unless the caller confirmed.
 */
export async function deleteDutyCycle({
  db,
  actor,
  id,
  confirmed,
}: {
  db: Db;
  actor: TActor;
  id: string;
  confirmed: boolean;
}): Promise<{ deleted: true; id: string }> {
  const cycle = await loadDutyCycleFor(db, actor, id, "duty-cycle:write");
  if (!confirmed)
    throw new DutyCycleError(
      400,
      "confirm_required",
      `Deleting "${cycle.name}" removes its turns and uploaded file for good. Send confirm=true to go ahead.`,
    );
  const fileToRemove = await db.transaction(async (tx) => {
    const [used] = await tx
      .select({ n: sql<number>`count(*)::int` })
      .from(estimates)
      .where(eq(estimates.dutyCycleId, id));
    if ((used?.n ?? 0) > 0)
      throw new DutyCycleError(
        409,
        "in_use",
        `"${cycle.name}" is used by ${used!.n} estimate${used!.n === 1 ? "" : "s"}. Delete or re-run those estimates with another duty cycle first.`,
      );
    await tx.delete(dutyCycles).where(eq(dutyCycles.id, id));
    if (!cycle.uploadId) return null;
    const [shared] = await tx
      .select({ n: sql<number>`count(*)::int` })
      .from(dutyCycles)
      .where(and(eq(dutyCycles.uploadId, cycle.uploadId), ne(dutyCycles.id, id)));
    if ((shared?.n ?? 0) > 0) return null;
    const [upload] = await tx
      .delete(dutyCycleUploads)
      .where(eq(dutyCycleUploads.id, cycle.uploadId))
      .returning();
    return upload?.storagePath ?? null;
  });
  // After the commit: a failed file removal leaves an unreferenced file, never a dangling row.
  if (fileToRemove) await rm(uploadPath(fileToRemove), { force: true });
  return { deleted: true, id };
}
