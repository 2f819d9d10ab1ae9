import type { TCapturedMail } from "@/db/schema";
import { Caution } from "@/lib/ui/caution";
import { EmptyState } from "@/lib/ui/empty-state";

/** Renders text with its links clickable, so invitation and sign-in links can be followed. */
function Linked({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s<>"]+)/g);
  return (
    <>
      {parts.map((part, i) =>
        /^https?:\/\//.test(part) ? (
          <a key={i} href={part} className="break-all text-furrow-700 underline">
            {part}
          </a>
        ) : (
          <span key={i}>{part}</span>
        ),
      )}
    </>
  );
}

/** The local mail fake's inbox: every message the app sent, newest first. */
export function MailboxList({ mails }: { mails: TCapturedMail[] }) {
  return (
    <div className="flex flex-col gap-4">
      <Caution title="Development mailbox" tone="info">
        Messages the app sent through the local mail fake. Nothing here reached a real inbox.
      </Caution>
      {mails.length === 0 ? (
        <EmptyState title="No messages yet">
          Invite someone, ask for a sign-in link or a password reset, and the message shows here.
        </EmptyState>
      ) : (
        <ul className="flex flex-col gap-3">
          {mails.map((m) => (
            <li key={m.id} className="rounded-lg border border-ink-200 bg-white p-4">
              <p className="font-medium text-ink-900">{m.subject || "(no subject)"}</p>
              <p className="text-xs text-ink-600">
                To {m.to.join(", ")} · from {m.from} · {m.receivedAt.toISOString()}
              </p>
              <pre className="mt-2 whitespace-pre-wrap font-sans text-sm text-ink-800">
                <Linked text={m.text} />
              </pre>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
