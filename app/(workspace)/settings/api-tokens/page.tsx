import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { getDb } from "@/db/client";
import { can } from "@/lib/authz/policy";
import { Card } from "@/lib/ui/card";
import { DataTableShell } from "@/lib/ui/data-table-shell";
import { getActor } from "@/features/auth";
import { listApiTokens } from "@/features/api";
import { ApiTokenForm } from "@/features/api/components/api-token-form";
import { ApiTokenRow } from "@/features/api/components/api-token-row";

export const metadata: Metadata = { title: "API tokens" };
export const dynamic = "force-dynamic";

export default async function ApiTokensPage() {
  const actor = await getActor();
  if (!actor) redirect("/sign-in?callbackUrl=/settings/api-tokens");
  if (!can(actor, "staff:manage"))
    return (
      <p role="alert" className="text-ink-700">
        Only a dealer admin may manage API tokens.
      </p>
    );
  const tokens = await listApiTokens({ db: getDb(), actor });
  const now = new Date().toISOString();
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-2xl font-bold text-ink-900">API tokens</h1>
      <p className="max-w-prose text-sm text-ink-700">
        A token lets your own systems (dealer management, telematics portals, spreadsheets) use the
        Treadcast API for this dealership without a browser. It acts for you, within its scopes. How
        to use it: <Link href="/developers">API reference and guides</Link>.
      </p>
      <Card title="Make a token">
        <ApiTokenForm />
      </Card>
      <Card title="Tokens">
        {tokens.length ? (
          <DataTableShell
            caption="API tokens of this dealership"
            head={
              <tr>
                <th className="px-3 py-2">Name</th>
                <th className="px-3 py-2">Scopes</th>
                <th className="px-3 py-2">Expires</th>
                <th className="px-3 py-2">Last used</th>
                <th className="px-3 py-2">Status</th>
                <th className="px-3 py-2 text-right">
                  <span className="sr-only">Actions</span>
                </th>
              </tr>
            }
            body={tokens.map((t) => (
              <ApiTokenRow key={t.id} token={t} now={now} />
            ))}
          />
        ) : (
          <p className="text-sm text-ink-600">No tokens yet.</p>
        )}
      </Card>
    </div>
  );
}
