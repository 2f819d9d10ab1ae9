import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { machines, type TMachine } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import { forbidden, notFound } from "@/features/calibration/server/errors";

/**
 * The actor's machine, for reading or for changing its readings. A machine the actor may not
 * see (another dealership's, another customer's) is "not found" so nothing leaks.
 */
export async function loadMachine(
  db: DbOrTx,
  actor: TActor,
  id: string,
  action: "read" | "write",
): Promise<{ machine: TMachine }> {
  const [machine] = await db
    .select()
    .from(machines)
    .where(and(eq(machines.id, id), eq(machines.dealershipId, actor.dealershipId)));
  if (!machine || !can(actor, "machine:read", machine)) throw notFound("machine");
  if (action === "write" && !can(actor, "machine:write", machine))
    throw forbidden("tread readings");
  return { machine };
}
