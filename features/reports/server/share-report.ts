import "server-only";
import { and, eq, gt, isNull } from "drizzle-orm";
import type { Db } from "@/db/client";
import { customers, dealerships, invitations, memberships, reportShares, users } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { getEnv } from "@/lib/env";
import type { TMailer } from "@/features/auth";
import { issueInvitation } from "@/features/auth";
import { ZReportShare, type TReportDto } from "@/features/reports/schemas/report";
import { assertMayPrepareReports, loadReport } from "@/features/reports/server/report-access";
import { getReport } from "@/features/reports/server/get-report";
import { reportInvitationMail, reportSharedMail } from "@/features/reports/server/report-mails";
import { invalidReference, parseOrThrow, ApiError } from "@/features/platform";

/**
 * Shares an issued report with its customer: every customer account of that customer record is
 * e-mailed a link to it; with no account yet, the customer contact (or the address given) gets
 * an invitation whose acceptance opens the portal with the report in it.
 */
export async function shareReport({
  db,
  mailer,
  actor,
  id,
  input,
}: {
  db: Db;
  mailer: TMailer;
  actor: TActor;
  id: string;
  input: unknown;
}): Promise<TReportDto & { message: string }> {
  assertMayPrepareReports(actor);
  const report = await loadReport(db, actor, id, "write");
  const values = parseOrThrow(ZReportShare, input);
  if (report.latestVersion === 0)
    throw new ApiError(409, "not_issued", "Issue the report before sharing it.");
  const appUrl = getEnv().APP_URL;
  const [dealership] = await db
    .select({ name: dealerships.name })
    .from(dealerships)
    .where(eq(dealerships.id, actor.dealershipId));
  const dealershipName = dealership?.name ?? "Your dealership";
  const senderName = actor.name ?? actor.email;
  const accounts = await db
    .select({ id: users.id, email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(
      and(
        eq(memberships.dealershipId, actor.dealershipId),
        eq(memberships.role, "customer"),
        eq(memberships.customerId, report.customerId),
      ),
    );
  const url = `${appUrl}/reports/${report.id}`;
  if (accounts.length > 0) {
    for (const account of accounts) {
      await db.transaction(async (tx) => {
        await tx.insert(reportShares).values({
          reportId: report.id,
          dealershipId: actor.dealershipId,
          customerId: report.customerId,
          email: account.email,
          userId: account.id,
          sharedById: actor.userId,
        });
        await mailer.send(
          reportSharedMail({
            to: account.email,
            url,
            dealershipName,
            title: report.title,
            senderName,
          }),
        );
      });
    }
    const list = accounts.map((a) => a.email).join(", ");
    return { ...(await getReport({ db, actor, id })), message: `Shared with ${list}.` };
  }
  const [customer] = await db
    .select({ contactEmail: customers.contactEmail, name: customers.name })
    .from(customers)
    .where(eq(customers.id, report.customerId));
  const email = (values.email ?? customer?.contactEmail ?? "").trim().toLowerCase();
  if (!email)
    throw invalidReference(
      "email",
      `${customer?.name ?? "This customer"} has no Treadcast account and no contact e-mail: give the address to invite.`,
    );
  const [pending] = await db
    .select({ id: invitations.id })
    .from(invitations)
    .where(
      and(
        eq(invitations.dealershipId, actor.dealershipId),
        eq(invitations.email, email),
        eq(invitations.role, "customer"),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
        gt(invitations.expiresAt, new Date()),
      ),
    );
  let invitationId = pending?.id ?? null;
  if (!invitationId) {
    ({ invitationId } = await issueInvitation({
      db,
      mailer,
      actor,
      email,
      role: "customer",
      customerId: report.customerId,
      customerName: customer?.name,
      appUrl,
      mail: (link) => reportInvitationMail({ ...link, title: report.title, senderName }),
    }));
  }
  await db.insert(reportShares).values({
    reportId: report.id,
    dealershipId: actor.dealershipId,
    customerId: report.customerId,
    email,
    invitationId,
    sharedById: actor.userId,
  });
  return {
    ...(await getReport({ db, actor, id })),
    message: pending
      ? `${email} already has a pending invitation; the report will be there once they accept it.`
      : `Invitation with the report sent to ${email}.`,
  };
}
