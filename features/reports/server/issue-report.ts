import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import type { Db, DbOrTx } from "@/db/client";
import { customers, estimates, reports, reportVersions, users, type TReport } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { buildReportContent, type TOptionSource } from "@/lib/reports";
import { comparisonOptionSources, ComparisonOutdatedError } from "@/lib/reports/from-comparison";
import type { TReportCalibration } from "@/lib/reports/calibration-note";
import type { TDutyCycleInput, TEstimateResult, TMachineInput } from "@/lib/scrub";
import { consumeReportAllowance, ReportAllowanceError } from "@/features/billing";
import { readComparisonSource } from "@/features/options";
import type { TReportVersionDto } from "@/features/reports/schemas/report";
import { assertMayPrepareReports, loadReport } from "@/features/reports/server/report-access";
import { loadBranding } from "@/features/reports/server/get-branding";
import { toVersionDto } from "@/features/reports/server/version-dto";
import { ApiError } from "@/features/platform";

type TEstimateInputs = {
  machine: TMachineInput;
  dutyCycle: TDutyCycleInput;
  calibration?: TReportCalibration | null;
};
type TSource = {
  kind: "estimate" | "comparison";
  dutyCycle: TDutyCycleInput;
  options: TOptionSource[];
  calibration: TReportCalibration | null;
};

/**
 * Issues the next version of a report: freezes the source's inputs and results (one estimate, or
 * every option of a comparison with its payback, reasons and cautions), the customer,
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
      const source = await loadSource(tx, actor, report);
      const [customer] = await tx
        .select({ name: customers.name, contactName: customers.contactName })
        .from(customers)
        .where(
          and(eq(customers.id, report.customerId), eq(customers.dealershipId, actor.dealershipId)),
        );
      if (!customer) throw new ApiError(409, "source_missing", "The report's customer is gone.");
      const { dealershipName, branding } = await loadBranding(tx, actor.dealershipId);
      const [issuer] = await tx
        .select({ name: users.name })
        .from(users)
        .where(eq(users.id, actor.userId));
      const issuedAt = new Date();
      const content = buildReportContent({
        kind: source.kind,
        title: report.title,
        currency: branding?.currency ?? "EUR",
        dealership: {
          name: branding?.displayName || dealershipName,
          contactLine: branding?.contactLine ?? "",
        },
        customer: { name: customer.name, contactName: customer.contactName },
        dutyCycle: source.dutyCycle,
        options: source.options,
        recommendations: report.recommendations,
        customerNote: report.customerNote,
        issuedAt,
        issuedBy: issuer?.name ?? actor.email,
        calibration: source.calibration,
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
        .set({ latestVersion: version, customerName: customer.name, updatedAt: issuedAt })
        .where(eq(reports.id, report.id));
      return toVersionDto(row!, version);
    });
  } catch (e) {
    if (e instanceof ReportAllowanceError)
      throw new ApiError(402, e.code, e.message, undefined, { billingHref: e.billingHref });
    throw e;
  }
}

const sourceMissing = (what: string) =>
  new ApiError(
    409,
    "source_missing",
    `The ${what} this report was built from has been deleted: start a new report from a current ${what}.`,
  );

/** What the report is built from, as option sources: one estimate or a stored comparison. */
async function loadSource(tx: DbOrTx, actor: TActor, report: TReport): Promise<TSource> {
  if (report.sourceKind === "comparison") {
    if (!report.comparisonId) throw sourceMissing("comparison");
    let found;
    try {
      found = await readComparisonSource({ db: tx, actor, id: report.comparisonId });
    } catch (e) {
      if (e instanceof ApiError && e.status === 404) throw sourceMissing("comparison");
      throw e;
    }
    const { comparison, machine, dutyCycle, engineOptions, calibration } = found;
    try {
      return {
        kind: "comparison",
        dutyCycle,
        calibration,
        options: comparisonOptionSources({
          machine,
          dutyCycle,
          engineOptions,
          result: comparison.result,
          baselineDescription: `${comparison.machineName} on ${dutyCycle.name}, as fitted today`,
        }),
      };
    } catch (e) {
      if (e instanceof ComparisonOutdatedError)
        throw new ApiError(409, "comparison_outdated", e.message);
      throw e;
    }
  }
  if (!report.estimateId) throw sourceMissing("estimate");
  const [estimate] = await tx
    .select()
    .from(estimates)
    .where(
      and(eq(estimates.id, report.estimateId), eq(estimates.dealershipId, actor.dealershipId)),
    );
  if (!estimate) throw sourceMissing("estimate");
  const inputs = estimate.inputs as TEstimateInputs;
  return {
    kind: "estimate",
    dutyCycle: inputs.dutyCycle,
    calibration: inputs.calibration ?? null,
    options: [
      {
        key: "current",
        label: "As fitted today",
        description: `${estimate.machineName} on ${estimate.dutyCycleName}`,
        baseline: true,
        estimateId: estimate.id,
        oneOffCost: 0,
        machine: inputs.machine,
        result: estimate.result as TEstimateResult,
      },
    ],
  };
}
