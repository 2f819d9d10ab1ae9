import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getDb } from "@/db/client";
import { getEnv } from "@/lib/env";
import { AppShell } from "@/lib/ui/app-shell";
import { MailboxList } from "@/features/auth/components/mailbox-list";
import { listCapturedMail } from "@/features/auth/server/list-captured-mail";

export const metadata: Metadata = { title: "Mailbox (development)" };
export const dynamic = "force-dynamic";

// Only when MAILBOX_ENABLED=true (npm start and the e2e tier); a 404 everywhere else.
export default async function MailboxPage() {
  if (!getEnv().MAILBOX_ENABLED) notFound();
  const mails = await listCapturedMail(getDb());
  return (
    <AppShell nav={[]} userMenu={null}>
      <h1 className="mb-4 text-2xl font-bold text-ink-900">Mailbox</h1>
      <MailboxList mails={mails} />
    </AppShell>
  );
}
