import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getDb } from "@/db/client";
import { can } from "@/lib/authz/policy";
import { Card } from "@/lib/ui/card";
import { DataTableShell } from "@/lib/ui/data-table-shell";
import { InviteForm } from "@/features/auth/components/invite-form";
import { MemberRow } from "@/features/auth/components/member-row";
import { NotAllowed } from "@/features/auth/components/not-allowed";
import { PendingInvitationRow } from "@/features/auth/components/pending-invitation-row";
import { getActor } from "@/features/auth/server/get-actor";
import {
  listInvitableCustomers,
  listMembers,
  listPendingInvitations,
} from "@/features/auth/server/team";

export const metadata: Metadata = { title: "Team" };
export const dynamic = "force-dynamic";

export default async function TeamPage() {
  const actor = await getActor();
  if (!actor) redirect("/sign-in?callbackUrl=/team");
  if (!can(actor, "staff:manage")) return <NotAllowed what="Managing the team" />;
  const db = getDb();
  const [members, pending, customers] = await Promise.all([
    listMembers(db, actor),
    listPendingInvitations(db, actor),
    listInvitableCustomers(db, actor),
  ]);
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-2xl font-bold text-ink-900">Team</h1>
      <Card title="Invite someone">
        <InviteForm customers={customers ?? []} />
      </Card>
      <Card title="Members">
        <DataTableShell
          caption="Members of this dealership"
          head={
            <tr>
              <th className="px-3 py-2">Person</th>
              <th className="px-3 py-2">Roles</th>
              <th className="px-3 py-2 text-right">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          }
          body={(members ?? []).map((m) => (
            <MemberRow key={m.userId} member={m} isSelf={m.userId === actor.userId} />
          ))}
        />
      </Card>
      <Card title="Pending invitations">
        {pending && pending.length > 0 ? (
          <DataTableShell
            caption="Invitations not yet accepted"
            head={
              <tr>
                <th className="px-3 py-2">E-mail</th>
                <th className="px-3 py-2">Role</th>
                <th className="px-3 py-2">Expires</th>
                <th className="px-3 py-2 text-right">
                  <span className="sr-only">Actions</span>
                </th>
              </tr>
            }
            body={pending.map((inv) => (
              <PendingInvitationRow key={inv.id} invitation={inv} />
            ))}
          />
        ) : (
          <p className="text-sm text-ink-600">No invitations are waiting.</p>
        )}
      </Card>
    </div>
  );
}
