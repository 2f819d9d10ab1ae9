import "server-only";
import type { DbOrTx } from "@/db/client";
import { auditEvents } from "@/db/schema";

export type TAuditKind =
  | "sign_in"
  | "sign_in_failed"
  | "sign_in_rate_limited"
  | "magic_link_requested"
  | "password_reset_requested"
  | "password_reset"
  | "invitation_sent"
  | "invitation_revoked"
  | "invitation_accepted"
  | "role_changed"
  | "member_removed"
  | "api_token_created"
  | "api_token_revoked"
  | "api_token_refused"
  | "api_token_rate_limited"
  | "api_request";

/** Records one security event, once per dealership it concerns (or once with none). */
export async function recordAudit(
  db: DbOrTx,
  event: {
    kind: TAuditKind;
    dealershipIds: string[];
    actorUserId?: string | null;
    subject?: string | null;
    detail?: Record<string, unknown>;
    ip?: string | null;
  },
): Promise<void> {
  const ip = event.ip && /^[0-9a-fA-F:.]+$/.test(event.ip) ? event.ip : null;
  const targets = event.dealershipIds.length ? event.dealershipIds : [null];
  await db.insert(auditEvents).values(
    targets.map((dealershipId) => ({
      dealershipId,
      actorUserId: event.actorUserId ?? null,
      kind: event.kind,
      subject: event.subject ?? null,
      detail: event.detail ?? {},
      ip,
    })),
  );
}
