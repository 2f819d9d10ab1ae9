import "server-only";
import type { TMail } from "@/features/auth";

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

function mail(to: string, subject: string, paragraphs: string[], url: string): TMail {
  return {
    to,
    subject,
    text: `${paragraphs.join("\n\n")}\n\n${url}\n\n— Treadcast`,
    html: `${paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join("")}<p><a href="${escapeHtml(url)}">${escapeHtml(url)}</a></p><p>— Treadcast</p>`,
  };
}

export function reportSharedMail(o: {
  to: string;
  url: string;
  dealershipName: string;
  title: string;
  senderName: string;
}): TMail {
  return mail(
    o.to,
    `${o.dealershipName} shared a tyre report with you: ${o.title}`,
    [
      `${o.senderName} at ${o.dealershipName} shared the report "${o.title}" with you on Treadcast.`,
      "Sign in to read it, compare the options and download the PDF:",
    ],
    o.url,
  );
}

export function reportInvitationMail(o: {
  to: string;
  url: string;
  dealershipName: string;
  title: string;
  senderName: string;
  expiresAt: Date;
}): TMail {
  return mail(
    o.to,
    `${o.dealershipName} prepared a tyre report for you: ${o.title}`,
    [
      `${o.senderName} at ${o.dealershipName} prepared the report "${o.title}" for you on Treadcast.`,
      `Open this link to create your account and read it (the link works once and expires on ${o.expiresAt.toUTCString()}):`,
    ],
    o.url,
  );
}

export function reportMessageMail(o: {
  to: string;
  url: string;
  title: string;
  authorName: string;
  body: string;
  fromCustomer: boolean;
}): TMail {
  return mail(
    o.to,
    o.fromCustomer
      ? `Question from ${o.authorName} on "${o.title}"`
      : `Reply from ${o.authorName} on "${o.title}"`,
    [
      o.fromCustomer
        ? `${o.authorName} asked about the report "${o.title}":`
        : `${o.authorName} replied on the report "${o.title}":`,
      o.body,
      "Read and answer on Treadcast:",
    ],
    o.url,
  );
}
