import "server-only";
import { z } from "zod";
import type { DbOrTx } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import { addDays, dueBy, monthlyOrders } from "@/lib/calibration";
import { forbidden, parseOrThrow } from "@/features/calibration/server/errors";
import { loadFleet } from "@/features/calibration/server/load-fleet";
import { dealershipCurrency } from "@/features/calibration/server/dealership-currency";
import type { TTyrePlanDto } from "@/features/calibration/schemas/calibration";

export const ZTyrePlanQuery = z.object({
  customerId: z.uuid("Not a customer id.").optional(),
  /** Planning horizon in months (order table and timeline). */
  months: z.coerce.number().int().min(1).max(36).default(12),
  today: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/)
    .optional(),
});

/** Days ahead for the "due soon" list on the dashboard and the plan. */
export const DUE_SOON_DAYS = 90;

/**
 * The tyre plan for the dealership, one customer, or (for a customer account) its own
 * machines: due dates per position, tyres to order per month with cost, and what is due soon.
 */
export async function getTyrePlan({
  db,
  actor,
  query = {},
}: {
  db: DbOrTx;
  actor: TActor;
  query?: unknown;
}): Promise<TTyrePlanDto> {
  if (!can(actor, "machine:read")) throw forbidden("the tyre plan");
  const q = parseOrThrow(ZTyrePlanQuery, query);
  const today = q.today ?? new Date().toISOString().slice(0, 10);
  const until = addDays(today, Math.round(q.months * 30.44));
  const [{ fleet }, currency] = await Promise.all([
    loadFleet(db, actor, { customerId: q.customerId }),
    dealershipCurrency(db, actor.dealershipId),
  ]);
  const items = fleet
    .flatMap((m) => m.plan)
    .sort(
      (a, b) =>
        (a.dueOn ?? "9999").localeCompare(b.dueOn ?? "9999") ||
        a.machineName.localeCompare(b.machineName),
    );
  return {
    currency,
    today,
    until,
    items,
    orders: monthlyOrders(items, today, until),
    dueSoon: dueBy(items, addDays(today, DUE_SOON_DAYS)),
    machines: fleet.map((m) => ({
      machineId: m.machineId,
      machineName: m.machineName,
      customerName: m.customerName,
      calibrated: m.calibrated,
      hoursPerWeek: m.hoursPerWeek,
    })),
  };
}
