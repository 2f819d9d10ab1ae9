import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, estimates } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TEstimateDto } from "@/features/estimates/schemas/estimate";
import { assertAccess } from "@/features/platform";
import { toEstimateDto } from "@/features/estimates/server/estimate-dto";

export async function loadEstimate(
  db: DbOrTx,
  actor: TActor,
  id: string,
  action: "read" | "write",
) {
  const [row] = await db
    .select({ estimate: estimates, customerName: customers.name })
    .from(estimates)
    .leftJoin(customers, eq(customers.id, estimates.customerId))
    .where(and(eq(estimates.id, id), eq(estimates.dealershipId, actor.dealershipId)));
  assertAccess(actor, action, row?.estimate, "estimate");
  return row!;
}

export async function getEstimate({
  db,
  actor,
  id,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
}): Promise<TEstimateDto> {
  const row = await loadEstimate(db, actor, id, "read");
  return toEstimateDto(row.estimate, row.customerName);
}
