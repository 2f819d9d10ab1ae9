import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getDb } from "@/db/client";
import { can } from "@/lib/authz/policy";
import { AuditTable } from "@/features/auth/components/audit-table";
import { NotAllowed } from "@/features/auth/components/not-allowed";
import { getActor } from "@/features/auth/server/get-actor";
import { listAuditEvents } from "@/features/auth/server/list-audit-events";

export const metadata: Metadata = { title: "Audit log" };
export const dynamic = "force-dynamic";

export default async function AuditPage() {
  const actor = await getActor();
  if (!actor) redirect("/sign-in?callbackUrl=/audit");
  if (!can(actor, "audit:read")) return <NotAllowed what="The audit log" />;
  const events = (await listAuditEvents(getDb(), actor)) ?? [];
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold text-ink-900">Audit log</h1>
      <p className="text-sm text-ink-700">
        Sign-ins, failed sign-ins, invitations, role changes and removals in this dealership (latest
        200).
      </p>
      <AuditTable events={events} />
    </div>
  );
}
