import "server-only";
import type { TMail } from "@/features/auth/server/mailer";

function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

function linkMail(opts: {
  to: string;
  subject: string;
  lead: string;
  url: string;
  after: string;
}): TMail {
  return {
    to: opts.to,
    subject: opts.subject,
    text: `${opts.lead}\n\n${opts.url}\n\n${opts.after}\n\n— Treadcast`,
    html: `<p>${escapeHtml(opts.lead)}</p><p><a href="${escapeHtml(opts.url)}">${escapeHtml(
      opts.url,
    )}</a></p><p>${escapeHtml(opts.after)}</p><p>— Treadcast</p>`,
  };
}

export function magicLinkMail(to: string, url: string): TMail {
  return linkMail({
    to,
    subject: "Your Treadcast sign-in link",
    lead: "Open this link to sign in to Treadcast:",
    url,
    after:
      "The link works once and expires in 15 minutes. If you did not ask for it, ignore this message.",
  });
}

export function invitationMail(opts: {
  to: string;
  url: string;
  dealershipName: string;
  roleLabel: string;
  inviterName: string;
  expiresAt: Date;
}): TMail {
  return linkMail({
    to: opts.to,
    subject: `${opts.inviterName} invited you to ${opts.dealershipName} on Treadcast`,
    lead: `${opts.inviterName} invited you to join ${opts.dealershipName} on Treadcast as ${opts.roleLabel}. Open this link to accept:`,
    url: opts.url,
    after: `The link works once and expires on ${opts.expiresAt.toUTCString()}.`,
  });
}

export function passwordResetMail(to: string, url: string): TMail {
  return linkMail({
    to,
    subject: "Reset your Treadcast password",
    lead: "Open this link to choose a new Treadcast password:",
    url,
    after:
      "The link works once and expires in 30 minutes. If you did not ask for it, your password is unchanged.",
  });
}
