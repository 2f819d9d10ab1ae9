import "server-only";
import { and, eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { customers, dutyCycles } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { buildDutyCycle, type TBuilderInput } from "@/lib/duty-cycles/builder";
import { summariseDutyCycle } from "@/lib/duty-cycles/summarise";
import { ZUpdateDutyCycle } from "@/features/duty-cycles/schemas/duty-cycle";
import { DutyCycleError, parseInput } from "@/features/duty-cycles/server/errors";
import { checkCustomerAndMachine, loadDutyCycleFor } from "@/features/duty-cycles/server/authorize";
import { storeBuiltTurns } from "@/features/duty-cycles/server/store-built-turns";
import { toDutyCycleRow } from "@/features/duty-cycles/server/duty-cycle-dto";

/** Renames or reassigns a duty cycle; a builder cycle may also be rebuilt from new inputs. */
export async function updateDutyCycle({
  db,
  actor,
  id,
  input,
}: {
  db: Db;
  actor: TActor;
  id: string;
  input: unknown;
}) {
  const cycle = await loadDutyCycleFor(db, actor, id, "duty-cycle:write");
  const body = parseInput(ZUpdateDutyCycle, input);
  if (body.version !== cycle.version)
    throw new DutyCycleError(
      409,
      "conflict",
      "Someone else changed this duty cycle since you opened it. Reload and try again.",
    );
  if (body.customerId || body.machineId)
    await checkCustomerAndMachine(db, actor, body.customerId ?? cycle.customerId, body.machineId);
  if (body.builder && cycle.source !== "builder")
    throw new DutyCycleError(
      400,
      "invalid_input",
      "Only a duty cycle made in the builder can be rebuilt.",
      {
        builder: ["Only builder duty cycles can be rebuilt."],
      },
    );
  const built = body.builder ? buildDutyCycle(body.builder as TBuilderInput) : undefined;
  const row = await db.transaction(async (tx) => {
    const [updated] = await tx
      .update(dutyCycles)
      .set({
        ...(body.name ? { name: body.name } : {}),
        ...(body.customerId ? { customerId: body.customerId } : {}),
        ...(body.machineId !== undefined ? { machineId: body.machineId } : {}),
        ...(built
          ? {
              builderInput: body.builder,
              straight: built.straight,
              summary: {
                ...summariseDutyCycle({
                  turns: built.turns,
                  straight: built.straight,
                  operatingHours: null,
                  speedSeconds: built.speedSeconds,
                }),
                notes: built.notes,
              },
            }
          : {}),
        version: cycle.version + 1,
        updatedAt: new Date(),
      })
      .where(and(eq(dutyCycles.id, id), eq(dutyCycles.version, cycle.version)))
      .returning();
    if (!updated)
      throw new DutyCycleError(
        409,
        "conflict",
        "Someone else changed this duty cycle just now. Reload and try again.",
      );
    if (built) await storeBuiltTurns(tx, id, built.turns);
    return updated;
  });
  const [customer] = await db
    .select({ name: customers.name })
    .from(customers)
    .where(eq(customers.id, row.customerId));
  return toDutyCycleRow(row, customer?.name ?? "");
}
