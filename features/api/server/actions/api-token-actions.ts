"use server";

import { revalidatePath } from "next/cache";
import { headers } from "next/headers";
import { z } from "zod";
import { getDb } from "@/db/client";
import { clientIp, getActor, SIGNED_OUT, type TActionState } from "@/features/auth";
import { ApiError, fieldErrorsOf } from "@/features/platform";
import { ZCreateApiTokenInput } from "@/features/api/schemas/api-token";
import { createApiToken } from "@/features/api/server/create-api-token";
import { revokeApiToken } from "@/features/api/server/revoke-api-token";

export type TCreateTokenState = TActionState & { secret?: string; name?: string };

function refusal(error: unknown): TActionState {
  if (error instanceof ApiError)
    return {
      ok: false,
      code:
        error.status === 403 ? "forbidden" : error.status === 404 ? "not_found" : "invalid_input",
      message: error.message,
    };
  throw error;
}

/** Dealer admin: makes a token and hands its secret back this once. */
export async function createApiTokenAction(
  _prev: TCreateTokenState | undefined,
  formData: FormData,
): Promise<TCreateTokenState> {
  const actor = await getActor();
  if (!actor) return SIGNED_OUT;
  const raw = {
    name: formData.get("name") ?? "",
    scopes: formData.getAll("scopes"),
    expiresInDays: formData.get("expiresInDays") || undefined,
    requestsPerMinute: formData.get("requestsPerMinute") || undefined,
  };
  const parsed = ZCreateApiTokenInput.safeParse(raw);
  if (!parsed.success) {
    const fields = fieldErrorsOf(parsed.error);
    return {
      ok: false,
      code: "invalid_input",
      message: "Check the highlighted fields.",
      fieldErrors: Object.fromEntries(Object.entries(fields).map(([k, v]) => [k, v[0] ?? ""])),
    };
  }
  try {
    const made = await createApiToken({
      db: getDb(),
      actor,
      input: parsed.data,
      ip: clientIp(await headers()),
    });
    revalidatePath("/settings/api-tokens");
    return {
      ok: true,
      message: `Token "${made.name}" made. Copy it now: it will not be shown again.`,
      secret: made.secret,
      name: made.name,
    };
  } catch (error) {
    return refusal(error);
  }
}

/** Dealer admin: stops a token at once. */
export async function revokeApiTokenAction(
  _prev: TActionState | undefined,
  formData: FormData,
): Promise<TActionState> {
  const actor = await getActor();
  if (!actor) return SIGNED_OUT;
  const parsed = z.object({ tokenId: z.uuid() }).safeParse({ tokenId: formData.get("tokenId") });
  if (!parsed.success) return { ok: false, code: "not_found", message: "No such API token." };
  try {
    await revokeApiToken({
      db: getDb(),
      actor,
      tokenId: parsed.data.tokenId,
      ip: clientIp(await headers()),
    });
    revalidatePath("/settings/api-tokens");
    return { ok: true, message: "Revoked." };
  } catch (error) {
    return refusal(error);
  }
}
