"use client";

import { useActionState } from "react";
import { Button } from "@/lib/ui/button";
import { ROLE_LABELS } from "@/lib/authz/policy";
import type { TRole } from "@/lib/authz/actor";
import { revokeInvitationAction } from "@/features/auth/server/actions/team-actions";

export function PendingInvitationRow({
  invitation,
}: {
  invitation: {
    id: string;
    email: string;
    role: TRole;
    expiresAt: Date;
    customerName: string | null;
  };
}) {
  const [state, action, pending] = useActionState(revokeInvitationAction, undefined);
  return (
    <tr>
      <td className="px-3 py-3">{invitation.email}</td>
      <td className="px-3 py-3">
        {ROLE_LABELS[invitation.role]}
        {invitation.customerName ? (
          <span className="block text-xs text-ink-600">{invitation.customerName}</span>
        ) : null}
      </td>
      <td className="px-3 py-3 text-ink-700">{invitation.expiresAt.toISOString().slice(0, 10)}</td>
      <td className="px-3 py-3 text-right">
        <form action={action}>
          <input type="hidden" name="invitationId" value={invitation.id} />
          <Button type="submit" size="sm" variant="ghost" busy={pending}>
            Revoke
          </Button>
        </form>
        {state?.message ? <p className="text-sm text-ink-700">{state.message}</p> : null}
      </td>
    </tr>
  );
}
