"use server";

import { redirect } from "next/navigation";
import { z } from "zod";
import { getDb } from "@/db/client";
import { ZNewPassword } from "@/features/auth/schemas/sign-in";
import { invalidInput, type TActionState } from "@/features/auth/server/action-state";
import { resetPassword } from "@/features/auth/server/password-reset";

const ZReset = z
  .object({ token: z.string().min(10).max(200), password: ZNewPassword, confirm: z.string() })
  .refine((v) => v.password === v.confirm, {
    path: ["confirm"],
    message: "The two passwords differ. Type the same password twice.",
  });

/** Sets a new password from an e-mailed link (public: the link itself is the proof). */
export async function resetPasswordAction(
  _prev: TActionState | undefined,
  formData: FormData,
): Promise<TActionState> {
  const parsed = ZReset.safeParse({
    token: formData.get("token"),
    password: formData.get("password"),
    confirm: formData.get("confirm"),
  });
  if (!parsed.success) return invalidInput(parsed.error);
  const result = await resetPassword({
    db: getDb(),
    token: parsed.data.token,
    newPassword: parsed.data.password,
  });
  if (!result.ok) {
    return {
      ok: false,
      code: "not_found",
      message: "This reset link has expired or was already used. Ask for a new one.",
    };
  }
  redirect("/sign-in?reset=1");
}
