import "server-only";
import { desc, eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { auditEvents, users } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";

/** The active dealership's security events, newest first; null when the role may not read them. */
export async function listAuditEvents(db: Db, actor: TActor, limit = 200) {
  if (!can(actor, "audit:read")) return null;
  return db
    .select({
      id: auditEvents.id,
      kind: auditEvents.kind,
      subject: auditEvents.subject,
      detail: auditEvents.detail,
      ip: auditEvents.ip,
      createdAt: auditEvents.createdAt,
      actorName: users.name,
      actorEmail: users.email,
    })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorUserId))
    .where(eq(auditEvents.dealershipId, actor.dealershipId))
    .orderBy(desc(auditEvents.createdAt))
    .limit(limit);
}
