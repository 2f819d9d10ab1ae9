"use server";

import { eq } from "drizzle-orm";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { getDb } from "@/db/client";
import { users } from "@/db/schema";
import { can } from "@/lib/authz/policy";
import { getActor } from "@/features/auth/server/get-actor";
import { signOut } from "@/features/auth/server/auth-config";
import { hasMembership } from "@/features/auth/server/load-actor";
import {
  invalidInput,
  NOT_ALLOWED,
  SIGNED_OUT,
  type TActionState,
} from "@/features/auth/server/action-state";
import { ZDealershipCurrency } from "@/features/auth/schemas/dealership-currency";
import { setDealershipCurrency } from "@/features/auth/server/set-dealership-currency";

/** Ends the session (public: signing out is harmless for anyone). */
export async function signOutAction(): Promise<void> {
  await signOut({ redirectTo: "/sign-in" });
}

const ZSwitch = z.object({ dealershipId: z.string().uuid("Choose a dealership.") });

/** Makes another of the user's dealerships the active one. */
export async function switchDealershipAction(
  _prev: TActionState | undefined,
  formData: FormData,
): Promise<TActionState> {
  const actor = await getActor();
  if (!actor) return SIGNED_OUT;
  if (!can(actor, "account:manage")) return NOT_ALLOWED;
  const parsed = ZSwitch.safeParse({ dealershipId: formData.get("dealershipId") });
  if (!parsed.success) return { ok: false, code: "invalid_input", message: "Choose a dealership." };
  const db = getDb();
  // Membership is checked here: the id in the form is only a wish.
  if (!(await hasMembership(db, actor.userId, parsed.data.dealershipId))) {
    return { ok: false, code: "not_found", message: "You are not a member of that dealership." };
  }
  await db
    .update(users)
    .set({ activeDealershipId: parsed.data.dealershipId })
    .where(eq(users.id, actor.userId));
  revalidatePath("/", "layout");
  return { ok: true, message: "Dealership switched." };
}

const ZUnits = z.object({
  unitSystem: z.enum(["metric", "imperial"], { message: "Choose metric or imperial." }),
});

/** Stores the user's unit preference (metric or imperial). */
export async function setUnitSystemAction(
  _prev: TActionState | undefined,
  formData: FormData,
): Promise<TActionState> {
  const actor = await getActor();
  if (!actor) return SIGNED_OUT;
  if (!can(actor, "account:manage")) return NOT_ALLOWED;
  const parsed = ZUnits.safeParse({ unitSystem: formData.get("unitSystem") });
  if (!parsed.success) {
    return {
      ok: false,
      code: "invalid_input",
      message: "Choose metric or imperial.",
      fieldErrors: { unitSystem: "Choose metric or imperial." },
    };
  }
  await getDb()
    .update(users)
    .set({ unitSystem: parsed.data.unitSystem })
    .where(eq(users.id, actor.userId));
  revalidatePath("/", "layout");
  return { ok: true, message: `Units set to ${parsed.data.unitSystem}.` };
}

/** Dealer admin: the currency the active dealership's amounts are shown in. */
export async function setDealershipCurrencyAction(
  _prev: TActionState | undefined,
  formData: FormData,
): Promise<TActionState> {
  const actor = await getActor();
  if (!actor) return SIGNED_OUT;
  const parsed = ZDealershipCurrency.safeParse({ currency: formData.get("currency") ?? "" });
  if (!parsed.success) return invalidInput(parsed.error);
  const result = await setDealershipCurrency(getDb(), actor, parsed.data);
  if (result.ok) revalidatePath("/", "layout");
  return result;
}
