import { SMTPServer } from "smtp-server";
import { simpleParser, type AddressObject } from "mailparser";
import type { AddressInfo } from "node:net";
import { getDb } from "@/db/client";
import { capturedMails } from "@/db/schema";
import { getEnv } from "@/lib/env";
import type { Fake } from "@/mocks/fake";

export type TCaughtMail = {
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
};

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((a) => a.value.map((v) => (v.address ?? "").toLowerCase())).filter(Boolean);
}

/** Stores a caught message in PostgreSQL, where tests and the mailbox page read it. */
async function storeInDatabase(mail: TCaughtMail): Promise<void> {
  await getDb().insert(capturedMails).values(mail);
}

/**
 * A local SMTP server that accepts every message (no auth, no TLS) and hands it, parsed, to
 * `store`. Stands in for a hosted mail provider behind the same nodemailer transport.
 */
export async function startSmtpFake(opts: {
  port: number;
  host?: string;
  store?: (mail: TCaughtMail) => Promise<void>;
}): Promise<{ url: string; port: number; stop: () => Promise<void> }> {
  const store = opts.store ?? storeInDatabase;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const envelopeTo = session.envelope.rcptTo.map((r) => r.address.toLowerCase());
          await store({
            from: parsed.from?.text ?? session.envelope.mailFrom?.toString() ?? "",
            to: envelopeTo.length ? envelopeTo : addresses(parsed.to),
            subject: parsed.subject ?? "",
            text: parsed.text ?? "",
            html: typeof parsed.html === "string" ? parsed.html : null,
          });
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  const host = opts.host ?? "127.0.0.1";
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, host, () => resolve());
  });
  const port = (server.server.address() as AddressInfo).port;
  return {
    url: `smtp://${host}:${port}`,
    port,
    stop: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

export const mailFake: Fake = {
  name: "mail (SMTP)",
  start: () => startSmtpFake({ port: getEnv().SMTP_PORT, host: getEnv().SMTP_HOST }),
};
