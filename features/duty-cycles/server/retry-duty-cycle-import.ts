import "server-only";
import { eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { customers, dutyCycles } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { DutyCycleError } from "@/features/duty-cycles/server/errors";
import { loadDutyCycleFor } from "@/features/duty-cycles/server/authorize";
import { enqueueImport } from "@/features/duty-cycles/server/import-queue";
import { toDutyCycleRow } from "@/features/duty-cycles/server/duty-cycle-dto";

/** Queues a failed import again (after a fix on the server side, or a passing fault). */
export async function retryDutyCycleImport({
  db,
  actor,
  id,
  enqueue = enqueueImport,
}: {
  db: Db;
  actor: TActor;
  id: string;
  enqueue?: (dutyCycleId: string) => Promise<string>;
}) {
  const cycle = await loadDutyCycleFor(db, actor, id, "duty-cycle:write");
  if (cycle.source === "builder" || !cycle.uploadId)
    throw new DutyCycleError(
      400,
      "not_an_import",
      "Only an uploaded duty cycle can be processed again.",
    );
  if (cycle.status !== "failed")
    throw new DutyCycleError(
      409,
      "not_failed",
      `This duty cycle is ${cycle.status}; only a failed import can be retried.`,
    );
  const [row] = await db
    .update(dutyCycles)
    .set({ status: "pending", progress: 0, failureReason: null, updatedAt: new Date() })
    .where(eq(dutyCycles.id, id))
    .returning();
  const jobId = await enqueue(id);
  await db.update(dutyCycles).set({ jobId }).where(eq(dutyCycles.id, id));
  const [customer] = await db
    .select({ name: customers.name })
    .from(customers)
    .where(eq(customers.id, cycle.customerId));
  return toDutyCycleRow(row!, customer?.name ?? "");
}
