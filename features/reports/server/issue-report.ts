import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import type { Db } from "@/db/client";
import { customers, estimates, reports, reportVersions, users } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { buildReportContent } from "@/lib/reports";
import type { TDutyCycleInput, TEstimateResult, TMachineInput } from "@/lib/scrub";
import { consumeReportAllowance, ReportAllowanceError } from "@/features/billing";
import type { TReportVersionDto } from "@/features/reports/schemas/report";
import { assertMayPrepareReports, loadReport } from "@/features/reports/server/report-access";
import { loadBranding } from "@/features/reports/server/get-branding";
import { toVersionDto } from "@/features/reports/server/version-dto";
import { ApiError } from "@/features/platform";

type TEstimateInputs = { machine: TMachineInput; dutyCycle: TDutyCycleInput };

/**
 * Issues the next version of a report: freezes the estimate's inputs and result, the customer,
 * the branding and the draft text into an immutable row, marks the previous version superseded
 * and consumes one report from the dealership's allowance, all in one transaction (a refused
 * allowance leaves nothing issued).
 */
export async function issueReport({
  db,
  actor,
  id,
}: {
  db: Db;
  actor: TActor;
  id: string;
}): Promise<TReportVersionDto> {
  assertMayPrepareReports(actor);
  try {
    return await db.transaction(async (tx) => {
      // The row lock serialises two issues of the same report: versions stay 1, 2, 3...
      const report = await loadReport(tx, actor, id, "write", { lock: true });
      if (!report.estimateId)
        throw new ApiError(
          409,
          "source_missing",
          "The estimate this report was built from has been deleted: start a new report from a current estimate.",
        );
      const [source] = await tx
        .select({ estimate: estimates, customer: customers })
        .from(estimates)
        .innerJoin(customers, eq(customers.id, report.customerId))
        .where(
          and(eq(estimates.id, report.estimateId), eq(estimates.dealershipId, actor.dealershipId)),
        );
      if (!source) throw new ApiError(409, "source_missing", "The report's estimate is gone.");
      const { dealershipName, branding } = await loadBranding(tx, actor.dealershipId);
      const [issuer] = await tx
        .select({ name: users.name })
        .from(users)
        .where(eq(users.id, actor.userId));
      const inputs = source.estimate.inputs as TEstimateInputs;
      const issuedAt = new Date();
      const content = buildReportContent({
        kind: "estimate",
        title: report.title,
        currency: branding?.currency ?? "EUR",
        dealership: {
          name: branding?.displayName || dealershipName,
          contactLine: branding?.contactLine ?? "",
        },
        customer: { name: source.customer.name, contactName: source.customer.contactName },
        dutyCycle: inputs.dutyCycle,
        options: [
          {
            key: "current",
            label: "As fitted today",
            description: `${source.estimate.machineName} on ${source.estimate.dutyCycleName}`,
            baseline: true,
            estimateId: source.estimate.id,
            oneOffCost: 0,
            machine: inputs.machine,
            result: source.estimate.result as TEstimateResult,
          },
        ],
        recommendations: report.recommendations,
        customerNote: report.customerNote,
        issuedAt,
        issuedBy: issuer?.name ?? actor.email,
      });
      const version = report.latestVersion + 1;
      await consumeReportAllowance(tx, { dealershipId: actor.dealershipId, reportId: report.id });
      await tx
        .update(reportVersions)
        .set({ supersededAt: issuedAt })
        .where(and(eq(reportVersions.reportId, report.id), isNull(reportVersions.supersededAt)));
      const [row] = await tx
        .insert(reportVersions)
        .values({
          reportId: report.id,
          dealershipId: actor.dealershipId,
          customerId: report.customerId,
          version,
          content,
          logo: branding?.logo ?? null,
          logoMime: branding?.logo ? branding.logoMime : null,
          engineVersion: content.engineVersion,
          issuedById: actor.userId,
          issuedAt,
        })
        .returning();
      await tx
        .update(reports)
        .set({ latestVersion: version, customerName: source.customer.name, updatedAt: issuedAt })
        .where(eq(reports.id, report.id));
      return toVersionDto(row!, version);
    });
  } catch (e) {
    if (e instanceof ReportAllowanceError)
      throw new ApiError(402, e.code, e.message, undefined, { billingHref: e.billingHref });
    throw e;
  }
}
