"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { getDb } from "@/db/client";
import { getEnv } from "@/lib/env";
import { getActor } from "@/features/auth/server/get-actor";
import type { TBillingActionState } from "@/features/billing/schemas/billing-action";
import { changeSubscription } from "@/features/billing/server/change-subscription";
import { openPaymentPortal } from "@/features/billing/server/open-payment-portal";
import { setBillingEmail } from "@/features/billing/server/set-billing-email";
import { startCheckout } from "@/features/billing/server/start-checkout";
import { billingProvider } from "@/features/billing/server/stripe";

const SIGNED_OUT: TBillingActionState = {
  ok: false,
  code: "unauthenticated",
  message: "Your session has ended. Sign in again.",
};

const field = (form: FormData, name: string) => String(form.get(name) ?? "");

/** Billing admin: go to checkout for a plan or bundle. */
export async function startCheckoutAction(
  _prev: TBillingActionState | undefined,
  form: FormData,
): Promise<TBillingActionState> {
  const actor = await getActor();
  if (!actor) return SIGNED_OUT;
  const result = await startCheckout({
    db: getDb(),
    provider: billingProvider(),
    actor,
    planKey: field(form, "planKey"),
    appUrl: getEnv().APP_URL,
  });
  if (!result.ok) return result;
  redirect(result.value.url);
}

/** Billing admin: open the payment service's page for the card and invoices. */
export async function openPortalAction(
  _prev: TBillingActionState | undefined,
): Promise<TBillingActionState> {
  const actor = await getActor();
  if (!actor) return SIGNED_OUT;
  const result = await openPaymentPortal({
    db: getDb(),
    provider: billingProvider(),
    actor,
    appUrl: getEnv().APP_URL,
  });
  if (!result.ok) return result;
  redirect(result.value.url);
}

async function change(
  kind: "switch" | "cancel" | "resume",
  form: FormData,
  done: string,
): Promise<TBillingActionState> {
  const actor = await getActor();
  if (!actor) return SIGNED_OUT;
  const result = await changeSubscription({
    db: getDb(),
    provider: billingProvider(),
    actor,
    change: kind === "switch" ? { kind, planKey: field(form, "planKey") } : { kind },
  });
  if (!result.ok) return result;
  revalidatePath("/billing");
  return { ok: true, message: done };
}

export async function switchPlanAction(
  _prev: TBillingActionState | undefined,
  form: FormData,
): Promise<TBillingActionState> {
  return change("switch", form, "Plan switched. The difference is prorated on the next invoice.");
}

export async function cancelPlanAction(
  _prev: TBillingActionState | undefined,
  form: FormData,
): Promise<TBillingActionState> {
  return change(
    "cancel",
    form,
    "The plan stops at the end of this billing period. Issued reports stay readable.",
  );
}

export async function resumePlanAction(
  _prev: TBillingActionState | undefined,
  form: FormData,
): Promise<TBillingActionState> {
  return change("resume", form, "The plan keeps running and renews as usual.");
}

export async function setBillingEmailAction(
  _prev: TBillingActionState | undefined,
  form: FormData,
): Promise<TBillingActionState> {
  const actor = await getActor();
  if (!actor) return SIGNED_OUT;
  const result = await setBillingEmail({
    db: getDb(),
    provider: billingProvider(),
    actor,
    email: field(form, "email"),
  });
  if (!result.ok) return result;
  revalidatePath("/billing");
  return { ok: true, message: "Receipts and payment warnings now go to this address." };
}
