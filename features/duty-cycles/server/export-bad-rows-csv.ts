import "server-only";
import { asc, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { dutyCycleImportErrors } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { csvLine } from "@/lib/duty-cycles/csv-export";
import { loadDutyCycleFor } from "@/features/duty-cycles/server/authorize";

/** The rows an import skipped, as CSV (line, column, reason, value), safe to open in a spreadsheet. */
export async function exportBadRowsCsv({
  db,
  actor,
  id,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
}): Promise<{ fileName: string; csv: string }> {
  const cycle = await loadDutyCycleFor(db, actor, id, "duty-cycle:read");
  const rows = await db
    .select()
    .from(dutyCycleImportErrors)
    .where(eq(dutyCycleImportErrors.dutyCycleId, id))
    .orderBy(
      asc(dutyCycleImportErrors.truncated),
      asc(dutyCycleImportErrors.line),
      asc(dutyCycleImportErrors.id),
    );
  let csv = csvLine(["line", "column", "reason", "value"]);
  for (const r of rows) csv += csvLine([r.truncated ? "" : r.line, r.column, r.reason, r.value]);
  const safeName = cycle.name.replace(/[^A-Za-z0-9._-]+/g, "-").slice(0, 60) || "duty-cycle";
  return { fileName: `${safeName}-bad-rows.csv`, csv };
}
