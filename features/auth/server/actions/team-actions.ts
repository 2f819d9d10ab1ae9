"use server";

import { revalidatePath } from "next/cache";
import { headers } from "next/headers";
import { z } from "zod";
import { getDb } from "@/db/client";
import { getEnv } from "@/lib/env";
import { ZInviteInput, ZRemoveMemberInput, ZSetRolesInput } from "@/features/auth/schemas/team";
import { invalidInput, SIGNED_OUT, type TActionState } from "@/features/auth/server/action-state";
import { getActor } from "@/features/auth/server/get-actor";
import { inviteMember } from "@/features/auth/server/invite-member";
import { getMailer } from "@/features/auth/server/mailer";
import { clientIp } from "@/features/auth/server/sign-in-limits";
import { removeMember, revokeInvitation, setMemberRoles } from "@/features/auth/server/team";

/** Dealer admin: invite someone by e-mail with one role. */
export async function inviteMemberAction(
  _prev: TActionState | undefined,
  formData: FormData,
): Promise<TActionState> {
  const actor = await getActor();
  if (!actor) return SIGNED_OUT;
  const parsed = ZInviteInput.safeParse({
    email: formData.get("email"),
    role: formData.get("role"),
    customerId: formData.get("customerId"),
  });
  if (!parsed.success) return invalidInput(parsed.error);
  const result = await inviteMember({
    db: getDb(),
    mailer: getMailer(),
    actor,
    input: parsed.data,
    appUrl: getEnv().APP_URL,
    ip: clientIp(await headers()),
  });
  if (result.ok) revalidatePath("/team");
  return {
    ok: result.ok,
    code: result.code,
    message: result.message,
    fieldErrors: result.fieldErrors,
  };
}

export async function revokeInvitationAction(
  _prev: TActionState | undefined,
  formData: FormData,
): Promise<TActionState> {
  const actor = await getActor();
  if (!actor) return SIGNED_OUT;
  const parsed = z.object({ invitationId: z.string().uuid() }).safeParse({
    invitationId: formData.get("invitationId"),
  });
  if (!parsed.success) return { ok: false, code: "invalid_input", message: "No such invitation." };
  const result = await revokeInvitation({ db: getDb(), actor, ...parsed.data });
  if (result.ok) revalidatePath("/team");
  return result;
}

export async function setMemberRolesAction(
  _prev: TActionState | undefined,
  formData: FormData,
): Promise<TActionState> {
  const actor = await getActor();
  if (!actor) return SIGNED_OUT;
  const parsed = ZSetRolesInput.safeParse({
    userId: formData.get("userId"),
    roles: formData.getAll("roles"),
  });
  if (!parsed.success) return invalidInput(parsed.error);
  const result = await setMemberRoles({ db: getDb(), actor, ...parsed.data });
  if (result.ok) revalidatePath("/team");
  return result;
}

export async function removeMemberAction(
  _prev: TActionState | undefined,
  formData: FormData,
): Promise<TActionState> {
  const actor = await getActor();
  if (!actor) return SIGNED_OUT;
  const parsed = ZRemoveMemberInput.safeParse({ userId: formData.get("userId") });
  if (!parsed.success) return invalidInput(parsed.error);
  const result = await removeMember({ db: getDb(), actor, ...parsed.data });
  if (result.ok) revalidatePath("/team");
  return result;
}
