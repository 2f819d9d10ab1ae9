import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, dutyCycles, machines, type TDutyCycle } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can, type TAction } from "@/lib/authz/policy";
import {
  DutyCycleError,
  forbiddenError,
  notFoundError,
} from "@/features/duty-cycles/server/errors";

/**
 * Loads a duty cycle of the actor's dealership that the actor may `action`. Another
 * dealership's cycle, or one a customer account may not see, is "not found" so nothing leaks.
 */
export async function loadDutyCycleFor(
  db: DbOrTx,
  actor: TActor,
  id: string,
  action: TAction,
): Promise<TDutyCycle> {
  const [row] = await db
    .select()
    .from(dutyCycles)
    .where(and(eq(dutyCycles.id, id), eq(dutyCycles.dealershipId, actor.dealershipId)));
  if (!row || !can(actor, "duty-cycle:read", row)) throw notFoundError("duty cycle");
  if (!can(actor, action, row)) throw forbiddenError("duty cycles");
  return row;
}

export function requireDutyCycleWrite(actor: TActor) {
  if (!can(actor, "duty-cycle:write")) throw forbiddenError("duty cycles");
}

/** The customer (and machine) named in a body must be the actor's dealership's. */
export async function checkCustomerAndMachine(
  db: DbOrTx,
  actor: TActor,
  customerId: string,
  machineId: string | null | undefined,
) {
  const [customer] = await db
    .select({ id: customers.id })
    .from(customers)
    .where(and(eq(customers.id, customerId), eq(customers.dealershipId, actor.dealershipId)));
  if (
    !customer ||
    !can(actor, "duty-cycle:write", { dealershipId: actor.dealershipId, customerId })
  )
    throw new DutyCycleError(
      400,
      "invalid_input",
      "Please fix the input. customerId: no such customer in your dealership.",
      {
        customerId: ["No such customer in your dealership."],
      },
    );
  if (machineId) {
    const [machine] = await db
      .select({ id: machines.id })
      .from(machines)
      .where(and(eq(machines.id, machineId), eq(machines.dealershipId, actor.dealershipId)));
    if (!machine)
      throw new DutyCycleError(
        400,
        "invalid_input",
        "Please fix the input. machineId: no such machine in your dealership.",
        {
          machineId: ["No such machine in your dealership."],
        },
      );
  }
}
