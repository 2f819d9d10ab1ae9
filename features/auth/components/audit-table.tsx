import { DataTableShell } from "@/lib/ui/data-table-shell";
import { EmptyState } from "@/lib/ui/empty-state";

const KIND_LABELS: Record<string, string> = {
  sign_in: "Signed in",
  sign_in_failed: "Failed sign-in",
  sign_in_rate_limited: "Sign-in blocked (too many attempts)",
  magic_link_requested: "Sign-in link requested",
  password_reset_requested: "Password reset requested",
  password_reset: "Password changed by reset link",
  invitation_sent: "Invitation sent",
  invitation_revoked: "Invitation revoked",
  invitation_accepted: "Invitation accepted",
  role_changed: "Roles changed",
  member_removed: "Member removed",
  api_token_created: "API token created",
  api_token_revoked: "API token revoked",
  api_token_refused: "API token refused (revoked or expired)",
  api_token_rate_limited: "API token over its rate limit",
  api_request: "Change made with an API token",
};

export type TAuditRow = {
  id: string;
  kind: string;
  subject: string | null;
  detail: Record<string, unknown>;
  ip: string | null;
  createdAt: Date;
  actorName: string | null;
  actorEmail: string | null;
};

function describeDetail(detail: Record<string, unknown>): string {
  return Object.entries(detail)
    .map(([k, v]) => `${k}: ${Array.isArray(v) ? v.join(", ") : String(v)}`)
    .join(" · ");
}

/** The dealership's security events, newest first. */
export function AuditTable({ events }: { events: TAuditRow[] }) {
  return (
    <DataTableShell
      caption="Security events"
      isEmpty={events.length === 0}
      empty={<EmptyState title="No events yet">Sign-ins and team changes show here.</EmptyState>}
      head={
        <tr>
          <th className="px-3 py-2">When (UTC)</th>
          <th className="px-3 py-2">Event</th>
          <th className="px-3 py-2">About</th>
          <th className="px-3 py-2">By</th>
          <th className="px-3 py-2">Details</th>
          <th className="px-3 py-2">IP</th>
        </tr>
      }
      body={events.map((e) => (
        <tr key={e.id}>
          <td className="whitespace-nowrap px-3 py-2 text-ink-700">
            {e.createdAt.toISOString().slice(0, 19).replace("T", " ")}
          </td>
          <td className="px-3 py-2 font-medium">{KIND_LABELS[e.kind] ?? e.kind}</td>
          <td className="px-3 py-2">{e.subject ?? "—"}</td>
          <td className="px-3 py-2">{e.actorName ?? e.actorEmail ?? "—"}</td>
          <td className="px-3 py-2 text-ink-700">{describeDetail(e.detail) || "—"}</td>
          <td className="px-3 py-2 text-ink-700">{e.ip ?? "—"}</td>
        </tr>
      ))}
    />
  );
}
