import "server-only";
import { and, eq, gt, isNull } from "drizzle-orm";
import type { Db } from "@/db/client";
import {
  customers,
  dealerships,
  invitations,
  memberships,
  users,
  type TMembershipRole,
} from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can, ROLE_LABELS } from "@/lib/authz/policy";
import type { TInviteInput } from "@/features/auth/schemas/team";
import type { TActionState } from "@/features/auth/server/action-state";
import { recordAudit } from "@/features/auth/server/audit";
import type { TMail, TMailer } from "@/features/auth/server/mailer";
import { invitationMail } from "@/features/auth/server/mail-templates";
import { newLinkToken } from "@/features/auth/server/tokens";

export const INVITATION_TTL_MS = 7 * 24 * 3600 * 1000;

/**
 * A dealer admin invites someone by e-mail to the active dealership with one role; a customer
 * account is tied to one of the dealership's customer records. The link is single use and
 * expires in 7 days.
 */
export async function inviteMember(opts: {
  db: Db;
  mailer: TMailer;
  actor: TActor;
  input: TInviteInput;
  appUrl: string;
  ip?: string | null;
}): Promise<TActionState & { invitationId?: string }> {
  const { db, actor, input } = opts;
  if (!can(actor, "staff:manage")) {
    return { ok: false, code: "forbidden", message: "Only a dealer admin can invite people." };
  }
  let customerName: string | null = null;
  if (input.role === "customer") {
    // The customer must belong to the actor's dealership; the id in the form is only a wish.
    const [customer] = await db
      .select({ name: customers.name })
      .from(customers)
      .where(
        and(eq(customers.id, input.customerId!), eq(customers.dealershipId, actor.dealershipId)),
      );
    if (!customer) {
      return {
        ok: false,
        code: "invalid_input",
        message: "Choose one of your dealership's customers.",
        fieldErrors: { customerId: "Choose one of your dealership's customers." },
      };
    }
    customerName = customer.name;
  }
  const [already] = await db
    .select({ id: memberships.id })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(
      and(
        eq(users.email, input.email),
        eq(memberships.dealershipId, actor.dealershipId),
        eq(memberships.role, input.role),
      ),
    );
  if (already) {
    return {
      ok: false,
      code: "conflict",
      message: `${input.email} already has the ${ROLE_LABELS[input.role]} role here.`,
      fieldErrors: { email: "Already a member with this role." },
    };
  }
  const [pending] = await db
    .select({ id: invitations.id })
    .from(invitations)
    .where(
      and(
        eq(invitations.dealershipId, actor.dealershipId),
        eq(invitations.email, input.email),
        eq(invitations.role, input.role),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
        gt(invitations.expiresAt, new Date()),
      ),
    );
  if (pending) {
    return {
      ok: false,
      code: "conflict",
      message: `${input.email} already has a pending invitation for this role. Revoke it to send a new one.`,
      fieldErrors: { email: "Invitation already pending." },
    };
  }
  const { invitationId } = await issueInvitation({
    db,
    mailer: opts.mailer,
    actor,
    email: input.email,
    role: input.role,
    customerId: input.role === "customer" ? input.customerId! : null,
    customerName,
    appUrl: opts.appUrl,
    ip: opts.ip,
  });
  return { ok: true, message: `Invitation sent to ${input.email}.`, invitationId };
}

/**
 * Stores a single-use invitation and e-mails its link, in one transaction (if the mail cannot be
 * sent, no invitation is left behind). Callers check who may invite first: a dealer admin for
 * the team page, an estimator sharing a report with a customer who has no account yet.
 */
export async function issueInvitation(opts: {
  db: Db;
  mailer: TMailer;
  actor: TActor;
  email: string;
  role: TMembershipRole;
  customerId: string | null;
  customerName?: string | null;
  appUrl: string;
  ip?: string | null;
  /** A different message around the link (e.g. "a report is waiting for you"). */
  mail?: (link: { to: string; url: string; dealershipName: string; expiresAt: Date }) => TMail;
}): Promise<{ invitationId: string }> {
  const { db, actor } = opts;
  const [dealership] = await db
    .select({ name: dealerships.name })
    .from(dealerships)
    .where(eq(dealerships.id, actor.dealershipId));
  const dealershipName = dealership?.name ?? "a dealership";
  const { token, hash } = newLinkToken();
  const expiresAt = new Date(Date.now() + INVITATION_TTL_MS);
  const invitationId = await db.transaction(async (tx) => {
    const [row] = await tx
      .insert(invitations)
      .values({
        dealershipId: actor.dealershipId,
        email: opts.email,
        role: opts.role,
        customerId: opts.customerId,
        tokenHash: hash,
        invitedById: actor.userId,
        expiresAt,
      })
      .returning({ id: invitations.id });
    await recordAudit(tx, {
      kind: "invitation_sent",
      dealershipIds: [actor.dealershipId],
      actorUserId: actor.userId,
      subject: opts.email,
      detail: { role: opts.role, ...(opts.customerName ? { customer: opts.customerName } : {}) },
      ip: opts.ip,
    });
    const url = `${opts.appUrl}/invite/${token}`;
    await opts.mailer.send(
      opts.mail
        ? opts.mail({ to: opts.email, url, dealershipName, expiresAt })
        : invitationMail({
            to: opts.email,
            url,
            dealershipName,
            roleLabel: ROLE_LABELS[opts.role],
            inviterName: actor.name ?? actor.email,
            expiresAt,
          }),
    );
    return row!.id;
  });
  return { invitationId };
}
