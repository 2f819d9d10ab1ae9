"use client";

import { useActionState, useState } from "react";
import { Button } from "@/lib/ui/button";
import { Dialog } from "@/lib/ui/dialog";
import { ROLE_LABELS } from "@/lib/authz/policy";
import type { TRole } from "@/lib/authz/actor";
import {
  removeMemberAction,
  setMemberRolesAction,
} from "@/features/auth/server/actions/team-actions";

const STAFF: Exclude<TRole, "customer">[] = ["dealer_admin", "estimator", "billing_admin"];

export type TMemberView = {
  userId: string;
  name: string | null;
  email: string;
  roles: TRole[];
  customerName: string | null;
};

/** One member: roles (editable for staff) and removal behind a confirmation. */
export function MemberRow({ member, isSelf }: { member: TMemberView; isSelf: boolean }) {
  const [rolesState, rolesAction, rolesPending] = useActionState(setMemberRolesAction, undefined);
  const [removeState, removeAction, removePending] = useActionState(removeMemberAction, undefined);
  const [confirming, setConfirming] = useState(false);
  const isCustomer = member.roles.includes("customer");
  const label = member.name ?? member.email;
  const message = removeState?.message ?? rolesState?.message;
  const ok = removeState ? removeState.ok : rolesState?.ok;
  return (
    <tr className="align-top">
      <td className="px-3 py-3">
        <p className="font-medium text-ink-900">
          {label}
          {isSelf ? <span className="ml-1 text-xs text-ink-600">(you)</span> : null}
        </p>
        <p className="text-xs text-ink-600">{member.email}</p>
      </td>
      <td className="px-3 py-3">
        {isCustomer ? (
          <p>
            Customer
            {member.customerName ? (
              <span className="block text-xs text-ink-600">{member.customerName}</span>
            ) : null}
          </p>
        ) : (
          <form action={rolesAction} className="flex flex-wrap items-center gap-3">
            <input type="hidden" name="userId" value={member.userId} />
            {STAFF.map((r) => (
              <label key={r} className="flex min-h-9 items-center gap-1.5">
                <input
                  type="checkbox"
                  name="roles"
                  value={r}
                  defaultChecked={member.roles.includes(r)}
                  className="size-4 accent-furrow-600"
                />
                {ROLE_LABELS[r]}
              </label>
            ))}
            <Button type="submit" size="sm" variant="secondary" busy={rolesPending}>
              Save roles
            </Button>
          </form>
        )}
        {message ? (
          <p
            role={ok ? "status" : "alert"}
            className={ok ? "text-sm text-ok-700" : "text-sm text-danger-700"}
          >
            {message}
          </p>
        ) : null}
      </td>
      <td className="px-3 py-3 text-right">
        <Button size="sm" variant="ghost" onClick={() => setConfirming(true)}>
          Remove
        </Button>
        <Dialog
          open={confirming}
          onOpenChange={setConfirming}
          title={`Remove ${label}?`}
          description="They lose access to this dealership at once. Their records stay."
          footer={
            <form action={removeAction} onSubmit={() => setConfirming(false)}>
              <input type="hidden" name="userId" value={member.userId} />
              <Button type="button" variant="secondary" onClick={() => setConfirming(false)}>
                Keep
              </Button>{" "}
              <Button type="submit" variant="danger" busy={removePending}>
                Remove
              </Button>
            </form>
          }
        />
      </td>
    </tr>
  );
}
