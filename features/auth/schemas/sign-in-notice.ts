export type TNotice = { ok: boolean; text: string };

/** Plain words for the codes Auth.js and our own pages put on the sign-in URL. */
export function signInNotice(
  params: Record<string, string | string[] | undefined>,
): TNotice | undefined {
  if (params.reset === "1")
    return { ok: true, text: "Password changed. Sign in with the new one." };
  if (params.joined === "1")
    return { ok: true, text: "You joined the dealership. Sign in to continue." };
  const error = typeof params.error === "string" ? params.error : undefined;
  if (!error) return undefined;
  if (error === "Verification")
    return {
      ok: false,
      text: "That sign-in link has expired or was already used. Ask for a new one.",
    };
  if (error === "AccessDenied")
    return { ok: false, text: "That link cannot sign you in. Ask for a new one." };
  return { ok: false, text: "Sign-in did not complete. Try again." };
}
