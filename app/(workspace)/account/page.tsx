import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { getDb } from "@/db/client";
import { can, ROLE_LABELS } from "@/lib/authz/policy";
import { Card } from "@/lib/ui/card";
import {
  ActiveDealershipForm,
  DealershipCurrencyForm,
  UnitPreferenceForm,
} from "@/features/auth/components/account-settings";
import { getActor } from "@/features/auth/server/get-actor";
import { listMyDealerships } from "@/features/auth/server/list-my-dealerships";

export const metadata: Metadata = { title: "Account" };
export const dynamic = "force-dynamic";

export default async function AccountPage() {
  const actor = await getActor();
  if (!actor) redirect("/sign-in?callbackUrl=/account");
  const dealerships = await listMyDealerships(getDb(), actor.userId);
  const active = dealerships.find((d) => d.id === actor.dealershipId);
  return (
    <div className="flex max-w-2xl flex-col gap-6">
      <h1 className="text-2xl font-bold text-ink-900">Account</h1>
      <Card title="You">
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
          <dt className="text-ink-600">Name</dt>
          <dd>{actor.name ?? "—"}</dd>
          <dt className="text-ink-600">E-mail</dt>
          <dd>{actor.email}</dd>
          <dt className="text-ink-600">Roles in {active?.name ?? "this dealership"}</dt>
          <dd>{actor.roles.map((r) => ROLE_LABELS[r]).join(", ")}</dd>
        </dl>
        <Link
          href="/reset-password"
          className="mt-3 inline-block text-sm text-furrow-700 hover:underline"
        >
          Change password by e-mail link
        </Link>
      </Card>
      <Card title="Units">
        <UnitPreferenceForm unitSystem={actor.unitSystem} />
      </Card>
      {can(actor, "staff:manage") ? (
        <Card title={`Currency of ${active?.name ?? "this dealership"}`}>
          <DealershipCurrencyForm currency={actor.currency} />
        </Card>
      ) : null}
      {dealerships.length > 1 ? (
        <Card title="Dealership">
          <ActiveDealershipForm activeId={actor.dealershipId} dealerships={dealerships} />
        </Card>
      ) : null}
    </div>
  );
}
