"use server";

import { AuthError } from "next-auth";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { z } from "zod";
import { getDb } from "@/db/client";
import { ZNewPassword } from "@/features/auth/schemas/sign-in";
import { ZAcceptInvitationInput } from "@/features/auth/schemas/team";
import { acceptInvitation } from "@/features/auth/server/accept-invitation";
import { invalidInput, type TActionState } from "@/features/auth/server/action-state";
import { signIn } from "@/features/auth/server/auth-config";
import { getActor } from "@/features/auth/server/get-actor";
import { clientIp } from "@/features/auth/server/sign-in-limits";

const ZWithPassword = ZAcceptInvitationInput.extend({
  password: ZNewPassword,
  confirm: z.string(),
}).refine((v) => v.password === v.confirm, {
  path: ["confirm"],
  message: "The two passwords differ. Type the same password twice.",
});

/**
 * Accepts an invitation (public: the e-mailed link is the proof). A new person chooses a
 * password and is signed in; someone with an account signs in as usual afterwards.
 */
export async function acceptInvitationAction(
  _prev: TActionState | undefined,
  formData: FormData,
): Promise<TActionState> {
  const needsPassword = formData.get("needsPassword") === "1";
  const raw = {
    token: formData.get("token"),
    name: formData.get("name"),
    password: formData.get("password"),
    confirm: formData.get("confirm"),
  };
  const parsed = needsPassword
    ? ZWithPassword.safeParse(raw)
    : ZAcceptInvitationInput.safeParse(raw);
  if (!parsed.success) return invalidInput(parsed.error);
  const password = needsPassword && typeof raw.password === "string" ? raw.password : null;
  const result = await acceptInvitation({
    db: getDb(),
    token: parsed.data.token,
    name: parsed.data.name,
    password,
    ip: clientIp(await headers()),
  });
  if (!result.ok) {
    return result.reason === "password_required"
      ? {
          ok: false,
          code: "invalid_input",
          message: "Choose a password for your new account.",
          fieldErrors: { password: "Choose a password." },
        }
      : {
          ok: false,
          code: "not_found",
          message:
            "This invitation has expired, was revoked or was already used. Ask for a new one.",
        };
  }
  const current = await getActor();
  if (current?.userId === result.userId) redirect("/dashboard");
  if (password) {
    try {
      await signIn("credentials", { email: result.email, password, redirectTo: "/dashboard" });
    } catch (error) {
      if (error instanceof AuthError) redirect("/sign-in?joined=1");
      throw error;
    }
  }
  redirect("/sign-in?joined=1");
}
