import "server-only";
import { and, eq, isNotNull, isNull, or } from "drizzle-orm";
import type { Db } from "@/db/client";
import { reportMessages, reportShares, users } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can, isStaff } from "@/lib/authz/policy";
import { getEnv } from "@/lib/env";
import type { TMailer } from "@/features/auth";
import { ZReportMessage, type TReportMessageDto } from "@/features/reports/schemas/report";
import { loadReport } from "@/features/reports/server/report-access";
import { reportMessageMail } from "@/features/reports/server/report-mails";
import { forbidden, parseOrThrow } from "@/features/platform";

/**
 * Adds a message to a report's thread. A customer's question is e-mailed to the estimator who
 * prepared the report (and whoever shared it); a staff reply goes to the customer's addresses
 * the report was shared with. Staff who may only read (billing) cannot post.
 */
export async function postReportMessage({
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
}): Promise<TReportMessageDto> {
  const report = await loadReport(db, actor, id, "read");
  const staff = isStaff(actor);
  if (staff && !can(actor, "report:share")) throw forbidden("this report's thread");
  const { body } = parseOrThrow(ZReportMessage, input);
  const authorName = actor.name ?? actor.email;
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(reportMessages)
      .values({
        reportId: id,
        dealershipId: actor.dealershipId,
        authorId: actor.userId,
        authorName,
        fromCustomer: !staff,
        body,
      })
      .returning();
    const recipients = staff
      ? await tx
          .selectDistinct({ email: reportShares.email })
          .from(reportShares)
          .where(and(eq(reportShares.reportId, id), isNull(reportShares.withdrawnAt)))
      : await tx
          .selectDistinct({ email: users.email })
          .from(users)
          .leftJoin(reportShares, eq(reportShares.reportId, id))
          .where(
            or(
              eq(users.id, report.createdById ?? ""),
              and(isNotNull(reportShares.sharedById), eq(users.id, reportShares.sharedById)),
            ),
          );
    const url = `${getEnv().APP_URL}/reports/${id}`;
    for (const { email } of recipients) {
      if (email === actor.email) continue;
      await mailer.send(
        reportMessageMail({
          to: email,
          url,
          title: report.title,
          authorName,
          body,
          fromCustomer: !staff,
        }),
      );
    }
    return {
      id: row!.id,
      authorName,
      fromCustomer: !staff,
      body,
      createdAt: row!.createdAt.toISOString(),
    };
  });
}
