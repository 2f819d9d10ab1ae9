"use client";

import { useActionState } from "react";
import { Button } from "@/lib/ui/button";
import { SCOPE_LABELS, type TApiScope } from "@/lib/authz/api-scopes";
import { revokeApiTokenAction } from "@/features/api/server/actions/api-token-actions";
import type { TApiTokenDto } from "@/features/api/schemas/api-token";

function when(iso: string | null, none: string): string {
  return iso ? `${iso.slice(0, 16).replace("T", " ")} UTC` : none;
}

/** One token: what it may do, when it stops, when it was last used, and a revoke button. */
export function ApiTokenRow({ token, now }: { token: TApiTokenDto; now: string }) {
  const [state, action, pending] = useActionState(revokeApiTokenAction, undefined);
  const expired = token.expiresAt !== null && token.expiresAt <= now;
  const status = token.revokedAt
    ? `Revoked ${when(token.revokedAt, "")}`
    : expired
      ? "Expired"
      : "Active";
  return (
    <tr>
      <td className="px-3 py-3">
        <span className="font-medium">{token.name}</span>
        <span className="block font-mono text-xs text-ink-600">{token.prefix}…</span>
      </td>
      <td className="px-3 py-3 text-sm">
        {token.scopes.map((s) => SCOPE_LABELS[s as TApiScope] ?? s).join(", ")}
        <span className="block text-xs text-ink-600">{token.requestsPerMinute} requests/min</span>
      </td>
      <td className="px-3 py-3 text-sm">{when(token.expiresAt, "Never")}</td>
      <td className="px-3 py-3 text-sm">{when(token.lastUsedAt, "Not yet")}</td>
      <td className="px-3 py-3 text-sm">{status}</td>
      <td className="px-3 py-3 text-right">
        {token.revokedAt ? null : (
          <form action={action}>
            <input type="hidden" name="tokenId" value={token.id} />
            <Button type="submit" size="sm" variant="ghost" busy={pending}>
              Revoke
            </Button>
          </form>
        )}
        {state?.message ? <p className="text-sm text-ink-700">{state.message}</p> : null}
      </td>
    </tr>
  );
}
