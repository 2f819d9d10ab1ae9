import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, reports, type TReport } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ZReportCreate, type TReportDto } from "@/features/reports/schemas/report";
import { assertMayPrepareReports } from "@/features/reports/server/report-access";
import { toReportDto } from "@/features/reports/server/report-dto";
import { invalidReference, parseOrThrow, ApiError } from "@/features/platform";
import { loadEstimate } from "@/features/estimates";
import { readComparison } from "@/features/options";

type TDraft = Pick<
  typeof reports.$inferInsert,
  "customerId" | "machineId" | "sourceKind" | "estimateId" | "comparisonId" | "machineName"
> & { customerName: string; defaultTitle: string };

/**
 * Starts a draft quote report from a stored estimate (one option) or a stored comparison (the
 * machine as fitted and every option the dealer priced). Nothing is frozen yet: issuing does that.
 */
export async function createReport({
  db,
  actor,
  input,
}: {
  db: DbOrTx;
  actor: TActor;
  input: unknown;
}): Promise<TReportDto> {
  assertMayPrepareReports(actor);
  const values = parseOrThrow(ZReportCreate, input);
  const draft = values.comparisonId
    ? await fromComparison(db, actor, values.comparisonId)
    : await fromEstimate(db, actor, values.estimateId!);
  const [report] = await db
    .insert(reports)
    .values({
      dealershipId: actor.dealershipId,
      customerId: draft.customerId,
      machineId: draft.machineId,
      sourceKind: draft.sourceKind,
      estimateId: draft.estimateId,
      comparisonId: draft.comparisonId,
      title: values.title || draft.defaultTitle,
      customerName: draft.customerName,
      machineName: draft.machineName,
      createdById: actor.userId,
    })
    .returning();
  return toReportDto(report as TReport, [], [], true);
}

async function fromEstimate(db: DbOrTx, actor: TActor, estimateId: string): Promise<TDraft> {
  let row;
  try {
    row = await loadEstimate(db, actor, estimateId, "read");
  } catch (e) {
    if (e instanceof ApiError && e.status === 404)
      throw invalidReference("estimateId", "No estimate with that id in your workspace.");
    throw e;
  }
  const { estimate, customerName } = row;
  if (!estimate.customerId || !customerName)
    throw invalidReference(
      "estimateId",
      "This estimate is of a dealership template with no customer: run it on a customer's machine to quote.",
    );
  return {
    customerId: estimate.customerId,
    customerName,
    machineId: estimate.machineId,
    machineName: estimate.machineName,
    sourceKind: "estimate",
    estimateId: estimate.id,
    comparisonId: null,
    defaultTitle: `Tyre quote · ${estimate.machineName}`,
  };
}

/** Another dealership's comparison answers 404 (readComparison), so its existence does not leak. */
async function fromComparison(db: DbOrTx, actor: TActor, comparisonId: string): Promise<TDraft> {
  const comparison = await readComparison({ db, actor, id: comparisonId });
  const [customer] = comparison.customerId
    ? await db
        .select({ id: customers.id, name: customers.name })
        .from(customers)
        .where(
          and(
            eq(customers.id, comparison.customerId),
            eq(customers.dealershipId, actor.dealershipId),
          ),
        )
    : [];
  if (!customer)
    throw invalidReference(
      "comparisonId",
      "This comparison is of a dealership template with no customer: compare options on a customer's machine to quote.",
    );
  return {
    customerId: customer.id,
    customerName: customer.name,
    machineId: comparison.machineId,
    machineName: comparison.machineName,
    sourceKind: "comparison",
    estimateId: null,
    comparisonId: comparison.id,
    defaultTitle: `Tyre options compared · ${comparison.machineName}`,
  };
}
