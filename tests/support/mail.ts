import { and, desc, gte, sql } from "drizzle-orm";
import type { Db } from "@/db/client";
import { capturedMails, type TCapturedMail } from "@/db/schema";

/**
 * Waits for a message to `to` caught by the SMTP fake (stored in PostgreSQL), newest first,
 * received at or after `since`.
 */
export async function waitForMail(opts: {
  db: Db;
  to: string;
  since?: Date;
  subjectIncludes?: string;
  timeoutMs?: number;
}): Promise<TCapturedMail> {
  const deadline = Date.now() + (opts.timeoutMs ?? 10_000);
  const to = opts.to.toLowerCase();
  while (Date.now() < deadline) {
    const rows = await opts.db
      .select()
      .from(capturedMails)
      .where(
        and(
          sql`${to} = any(${capturedMails.to})`,
          gte(capturedMails.receivedAt, opts.since ?? new Date(0)),
        ),
      )
      .orderBy(desc(capturedMails.receivedAt))
      .limit(10);
    const hit = rows.find((m) => !opts.subjectIncludes || m.subject.includes(opts.subjectIncludes));
    if (hit) return hit;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail to ${opts.to} arrived within ${opts.timeoutMs ?? 10_000} ms`);
}

/** The first link in a message's text whose path starts with `pathPrefix`. */
export function linkFrom(mail: TCapturedMail, pathPrefix: string): string {
  const urls = mail.text.match(/https?:\/\/[^\s<>"]+/g) ?? [];
  const hit = urls.find((u) => new URL(u).pathname.startsWith(pathPrefix));
  if (!hit) throw new Error(`no ${pathPrefix} link in mail "${mail.subject}": ${mail.text}`);
  return hit;
}
