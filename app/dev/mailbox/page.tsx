import type { Metadata } from "next";
import { headers } from "next/headers";
import { notFound } from "next/navigation";
import { getDb } from "@/db/client";
import { getEnv } from "@/lib/env";
import { mailboxAllowed } from "@/lib/platform/mailbox-access";
import { AppShell } from "@/lib/ui/app-shell";
import { MailboxList } from "@/features/auth/components/mailbox-list";
import { listCapturedMail } from "@/features/auth/server/list-captured-mail";

export const metadata: Metadata = { title: "Mailbox (development)" };
export const dynamic = "force-dynamic";

// Only with MAILBOX_ENABLED=true (npm start and the e2e tier), on a local (loopback) app, for a
// request from this machine; a 404 everywhere else, so its existence does not leak.
export default async function MailboxPage() {
  const env = getEnv();
  if (!env.MAILBOX_ENABLED) notFound();
  const h = await headers();
  const allowed = mailboxAllowed({
    enabled: env.MAILBOX_ENABLED,
    appUrl: env.APP_URL,
    host: h.get("host"),
    forwardedFor: h.get("x-forwarded-for"),
  });
  if (!allowed) notFound();
  const mails = await listCapturedMail(getDb());
  return (
    <AppShell nav={[]} userMenu={null}>
      <h1 className="mb-4 text-2xl font-bold text-ink-900">Mailbox</h1>
      <MailboxList mails={mails} />
    </AppShell>
  );
}
