import "server-only";
import nodemailer from "nodemailer";
import { getEnv } from "@/lib/env";

export type TMail = { to: string; subject: string; text: string; html?: string };
export type TMailer = { send: (mail: TMail) => Promise<void> };

/** An SMTP mailer; the same transport serves the local fake and a real provider. */
export function createMailer(opts: {
  host: string;
  port: number;
  secure?: boolean;
  user?: string;
  password?: string;
  from: string;
}): TMailer {
  const transport = nodemailer.createTransport({
    host: opts.host,
    port: opts.port,
    secure: opts.secure ?? false,
    auth: opts.user ? { user: opts.user, pass: opts.password ?? "" } : undefined,
    connectionTimeout: 5_000,
  });
  return {
    async send(mail) {
      await transport.sendMail({ from: opts.from, ...mail });
    },
  };
}

let cached: TMailer | undefined;

/** The mailer configured by SMTP_* and MAIL_FROM. */
export function getMailer(): TMailer {
  if (!cached) {
    const env = getEnv();
    cached = createMailer({
      host: env.SMTP_HOST,
      port: env.SMTP_PORT,
      secure: env.SMTP_SECURE,
      user: env.SMTP_USER,
      password: env.SMTP_PASSWORD,
      from: env.MAIL_FROM,
    });
  }
  return cached;
}
