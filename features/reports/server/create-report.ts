import "server-only";
import type { DbOrTx } from "@/db/client";
import { reports } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ZReportCreate, type TReportDto } from "@/features/reports/schemas/report";
import { assertMayPrepareReports } from "@/features/reports/server/report-access";
import { toReportDto } from "@/features/reports/server/report-dto";
import { invalidReference, parseOrThrow, ApiError } from "@/features/platform";
import { loadEstimate } from "@/features/estimates";

/** Starts a draft quote report from a stored estimate (the one-option case of a comparison). */
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
  let row;
  try {
    row = await loadEstimate(db, actor, values.estimateId, "read");
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
  const [report] = await db
    .insert(reports)
    .values({
      dealershipId: actor.dealershipId,
      customerId: estimate.customerId,
      machineId: estimate.machineId,
      sourceKind: "estimate",
      estimateId: estimate.id,
      title: values.title || `Tyre quote · ${estimate.machineName}`,
      customerName,
      machineName: estimate.machineName,
      createdById: actor.userId,
    })
    .returning();
  return toReportDto(report!, [], [], true);
}
