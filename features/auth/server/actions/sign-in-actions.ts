"use server";

import { AuthError, CredentialsSignin } from "next-auth";
import { headers } from "next/headers";
import { getDb } from "@/db/client";
import { getEnv } from "@/lib/env";
import { signIn } from "@/features/auth/server/auth-config";
import { ZMagicLinkInput, ZSignInInput } from "@/features/auth/schemas/sign-in";
import { safeCallbackPath } from "@/features/auth/schemas/callback-url";
import { invalidInput, type TActionState } from "@/features/auth/server/action-state";
import { requestPasswordReset } from "@/features/auth/server/password-reset";
import { clientIp } from "@/features/auth/server/sign-in-limits";
import { getMailer } from "@/features/auth/server/mailer";

const WRONG_CREDENTIALS =
  "That e-mail address and password do not match. Check both, or sign in with an e-mailed link.";
const TOO_MANY = "Too many attempts from this address or network. Wait 15 minutes, then try again.";

/** Signs in with e-mail and password; public by design, rate-limited inside the provider. */
export async function signInWithPasswordAction(
  _prev: TActionState | undefined,
  formData: FormData,
): Promise<TActionState> {
  const parsed = ZSignInInput.safeParse({
    email: formData.get("email"),
    password: formData.get("password"),
  });
  if (!parsed.success) return invalidInput(parsed.error);
  try {
    await signIn("credentials", {
      ...parsed.data,
      redirectTo: safeCallbackPath(formData.get("callbackUrl")),
    });
    return { ok: true };
  } catch (error) {
    if (error instanceof CredentialsSignin && error.code === "rate_limited") {
      return { ok: false, code: "rate_limited", message: TOO_MANY };
    }
    if (error instanceof AuthError) return { ok: false, message: WRONG_CREDENTIALS };
    throw error; // the redirect that completes a successful sign-in
  }
}

/**
 * E-mails a one-time sign-in link. The answer is the same whether or not the address has an
 * account, so the form cannot be used to find out who is a customer.
 */
export async function requestMagicLinkAction(
  _prev: TActionState | undefined,
  formData: FormData,
): Promise<TActionState> {
  const parsed = ZMagicLinkInput.safeParse({ email: formData.get("email") });
  if (!parsed.success) return invalidInput(parsed.error);
  try {
    await signIn("nodemailer", {
      email: parsed.data.email,
      redirect: false,
      redirectTo: safeCallbackPath(formData.get("callbackUrl")),
    });
  } catch (error) {
    if (error instanceof AuthError) return { ok: false, code: "rate_limited", message: TOO_MANY };
    throw error;
  }
  return {
    ok: true,
    message: `If ${parsed.data.email} has a Treadcast account, a sign-in link is on its way. It works once and expires in 15 minutes.`,
  };
}

/** E-mails a password-reset link; same answer whether or not the address has an account. */
export async function requestPasswordResetAction(
  _prev: TActionState | undefined,
  formData: FormData,
): Promise<TActionState> {
  const parsed = ZMagicLinkInput.safeParse({ email: formData.get("email") });
  if (!parsed.success) return invalidInput(parsed.error);
  const result = await requestPasswordReset({
    db: getDb(),
    mailer: getMailer(),
    email: parsed.data.email,
    ip: clientIp(await headers()),
    appUrl: getEnv().APP_URL,
  });
  if (!result.allowed) return { ok: false, code: "rate_limited", message: TOO_MANY };
  return {
    ok: true,
    message: `If ${parsed.data.email} has a Treadcast account, a reset link is on its way. It works once and expires in 30 minutes.`,
  };
}
