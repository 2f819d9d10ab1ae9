import "server-only";
import { eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { dealerships } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import type { TActionState } from "@/features/auth/server/action-state";
import type { TDealershipCurrency } from "@/features/auth/schemas/dealership-currency";

const ADMIN_ONLY: TActionState = {
  ok: false,
  code: "forbidden",
  message: "Only a dealer admin can change the dealership's currency.",
};

/**
 * Dealer admin: sets the currency the active dealership prices and shows amounts in. Stored
 * amounts are not converted: they were entered in the dealership's own currency.
 */
export async function setDealershipCurrency(
  db: DbOrTx,
  actor: TActor,
  input: TDealershipCurrency,
): Promise<TActionState> {
  if (!can(actor, "staff:manage")) return ADMIN_ONLY;
  await db
    .update(dealerships)
    .set({ currency: input.currency })
    .where(eq(dealerships.id, actor.dealershipId));
  return { ok: true, message: `Amounts are now shown in ${input.currency}.` };
}
