import "server-only";
import { and, eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { customers, dutyCycles, dutyCycleUploads } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { buildDutyCycle, type TBuilderInput } from "@/lib/duty-cycles/builder";
import { summariseDutyCycle } from "@/lib/duty-cycles/summarise";
import { ZCreateDutyCycle } from "@/features/duty-cycles/schemas/duty-cycle";
import { DutyCycleError, parseInput } from "@/features/duty-cycles/server/errors";
import {
  checkCustomerAndMachine,
  requireDutyCycleWrite,
} from "@/features/duty-cycles/server/authorize";
import { storeBuiltTurns } from "@/features/duty-cycles/server/store-built-turns";
import { enqueueImport } from "@/features/duty-cycles/server/import-queue";
import { toDutyCycleRow } from "@/features/duty-cycles/server/duty-cycle-dto";

/**
 * Creates a duty cycle from an uploaded file (queued for the worker) or from the builder
 * (stored ready at once). Both end as the same stored turns and straight travel.
 */
export async function createDutyCycle({
  db,
  actor,
  input,
  enqueue = enqueueImport,
}: {
  db: Db;
  actor: TActor;
  input: unknown;
  enqueue?: (dutyCycleId: string) => Promise<string>;
}) {
  requireDutyCycleWrite(actor);
  const body = parseInput(ZCreateDutyCycle, input);
  await checkCustomerAndMachine(db, actor, body.customerId, body.machineId);
  const [customer] = await db
    .select({ name: customers.name })
    .from(customers)
    .where(eq(customers.id, body.customerId));

  if (body.source === "builder") {
    let built;
    try {
      built = buildDutyCycle(body.builder as TBuilderInput);
    } catch (e) {
      throw new DutyCycleError(400, "invalid_input", (e as Error).message, {
        builder: [(e as Error).message],
      });
    }
    const summary = summariseDutyCycle({
      turns: built.turns,
      straight: built.straight,
      operatingHours: null,
      speedSeconds: built.speedSeconds,
    });
    const row = await db.transaction(async (tx) => {
      const [created] = await tx
        .insert(dutyCycles)
        .values({
          dealershipId: actor.dealershipId,
          customerId: body.customerId,
          machineId: body.machineId ?? null,
          name: body.name,
          source: "builder",
          status: "ready",
          progress: 1,
          summary: { ...summary, notes: built.notes },
          straight: built.straight,
          builderInput: body.builder,
          createdById: actor.userId,
          processedAt: new Date(),
        })
        .returning();
      await storeBuiltTurns(tx, created!.id, built.turns);
      return created!;
    });
    return toDutyCycleRow(row, customer!.name);
  }

  const [upload] = await db
    .select({ id: dutyCycleUploads.id })
    .from(dutyCycleUploads)
    .where(
      and(
        eq(dutyCycleUploads.id, body.uploadId),
        eq(dutyCycleUploads.dealershipId, actor.dealershipId),
      ),
    );
  if (!upload)
    throw new DutyCycleError(
      400,
      "invalid_input",
      "Please fix the input. uploadId: no such upload in your dealership.",
      {
        uploadId: ["No such upload in your dealership; upload the file again."],
      },
    );
  const [row] = await db
    .insert(dutyCycles)
    .values({
      dealershipId: actor.dealershipId,
      customerId: body.customerId,
      machineId: body.machineId ?? null,
      name: body.name,
      source: body.mapping.kind,
      status: "pending",
      uploadId: upload.id,
      mapping: body.mapping,
      createdById: actor.userId,
    })
    .returning();
  try {
    const jobId = await enqueue(row!.id);
    await db.update(dutyCycles).set({ jobId }).where(eq(dutyCycles.id, row!.id));
    return toDutyCycleRow(row!, customer!.name);
  } catch (e) {
    // Never leave a cycle waiting for a job that does not exist: mark it failed, retry re-queues.
    const [failed] = await db
      .update(dutyCycles)
      .set({
        status: "failed",
        failureReason: `The import could not be queued (${(e as Error).message}). Retry in a moment.`,
      })
      .where(eq(dutyCycles.id, row!.id))
      .returning();
    return toDutyCycleRow(failed!, customer!.name);
  }
}
