import "server-only";
import { z } from "zod";
import type { DbOrTx } from "@/db/client";
import { treadReadings } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { parseReadingsCsv } from "@/lib/calibration";
import { loadMachine } from "@/features/calibration/server/load-machine";
import { CalibrationError, parseOrThrow } from "@/features/calibration/server/errors";

export const ZImport = z.object({
  csv: z
    .string()
    .min(1, "The file is empty.")
    .max(2_000_000, "Files up to 2 MB; split a larger one."),
  depthUnit: z.enum(["mm", "in"]).default("mm"),
  measuredBy: z.string().trim().max(120).default(""),
});

/**
 * Imports a machine's readings from CSV, all or nothing: one bad row rejects the file with every
 * row error listed, so a corrected file can be sent again without duplicates.
 */
export async function importReadings({
  db,
  actor,
  machineId,
  input,
}: {
  db: DbOrTx;
  actor: TActor;
  machineId: string;
  input: unknown;
}): Promise<{ imported: number }> {
  const { machine } = await loadMachine(db, actor, machineId, "write");
  const values = parseOrThrow(ZImport, input);
  const { rows, errors, errorCount, missing } = parseReadingsCsv(values.csv, {
    depthUnit: values.depthUnit,
  });
  if (missing.length) {
    throw new CalibrationError(
      400,
      "invalid_input",
      `The file has no ${missing.join(", ")} column. The header needs position, date, hour meter and centre depth (shoulders, measured by, size, note optional).`,
      { csv: [`Missing columns: ${missing.join(", ")}`] },
    );
  }
  if (errorCount > 0 || rows.length === 0) {
    const first = errors[0];
    throw new CalibrationError(
      400,
      "invalid_input",
      rows.length === 0 && errorCount === 0
        ? "The file has no data rows."
        : `${errorCount} row error${errorCount === 1 ? "" : "s"}; nothing was imported. First: line ${first?.line}, ${first?.column}: ${first?.reason}`,
      { csv: errors.map((e) => `line ${e.line}, ${e.column}: ${e.reason}`) },
      { rowErrors: errors, errorCount },
    );
  }
  const noName = rows.find((r) => !r.measuredBy && !values.measuredBy);
  if (noName) {
    throw new CalibrationError(
      400,
      "invalid_input",
      `Line ${noName.line} does not say who measured: add a "measured by" column or fill in who measured.`,
      {
        measuredBy: ["Say who measured."],
      },
    );
  }
  await db.insert(treadReadings).values(
    rows.map((r) => ({
      dealershipId: actor.dealershipId,
      machineId: machine.id,
      position: r.position,
      kind: r.kind,
      measuredOn: r.measuredOn,
      hourMeter: r.hourMeter,
      depthCentre: r.depthCentre,
      depthInner: r.depthInner,
      depthOuter: r.depthOuter,
      designation: r.designation,
      measuredBy: r.measuredBy ?? values.measuredBy,
      note: r.note,
      createdById: actor.userId,
    })),
  );
  return { imported: rows.length };
}
