/**
 * Reads a turn schedule: one row per kind of turn, with how many happen per hour or per shift.
 */
import type { TColumnMapping } from "@/lib/duty-cycles/column-mapping";
import { parseDecimal, toSi, formatKmh } from "@/lib/duty-cycles/units";
import { parseLoadState, parseSurface, parseTurnDirection } from "@/lib/duty-cycles/surface-names";
import {
  ImportFailure,
  RowErrorLog,
  columnName,
  tooFewRowsFailure,
} from "@/lib/duty-cycles/row-errors";
import type { TStoredTurn } from "@/lib/duty-cycles/stored-duty-cycle";
import type {
  TImportOptions,
  TImportResult,
  TRowImporter,
} from "@/lib/duty-cycles/telematics-import";

const MAX_ENGINE_SPEED = 20; // m/s, the engine's limit for a turn

export function createScheduleImporter(
  mapping: TColumnMapping,
  options: TImportOptions = {},
): TRowImporter {
  const log = new RowErrorLog(options.maxStoredErrors ?? 10_000);
  const { columns, decimal, defaults } = mapping;
  const { radius, steerInput, headingChange, speed, count, surface, load, direction, label } =
    columns;
  if (!headingChange || !speed || !count || (!radius && !steerInput))
    throw new ImportFailure(
      "Map the radius or steer, heading change, speed and count columns first.",
    );
  const widest = Math.max(...Object.values(columns).map((c) => c.index)) + 1;
  const turns: TStoredTurn[] = [];

  const cell = (fields: readonly string[], index: number) => fields[index]!.trim();

  function pushRow(fields: readonly string[], line: number) {
    if (fields.length < widest)
      return log.add(
        line,
        "(row)",
        `has ${fields.length} fields; the mapping needs at least ${widest}`,
        fields.join(mapping.delimiter).slice(0, 200),
      );
    const num = (ref: NonNullable<typeof radius>) => {
      const text = cell(fields, ref.index);
      return text === "" ? undefined : toSi(parseDecimal(text, decimal), ref.unit);
    };
    const r = radius ? num(radius) : undefined;
    const s = steerInput ? num(steerInput) : undefined;
    if (r === undefined && s === undefined)
      return log.add(
        line,
        columnName((radius ?? steerInput)!),
        "is empty: give a turn radius or a steer angle",
        "",
      );
    if (r !== undefined && s !== undefined)
      return log.add(
        line,
        columnName(radius!),
        "give a radius or a steer angle, not both",
        cell(fields, radius!.index),
      );
    if (r !== undefined && !(r >= 0 && r <= 10_000))
      return log.add(
        line,
        columnName(radius!),
        "is not a radius between 0 and 10 000 m",
        cell(fields, radius!.index),
      );
    if (s !== undefined && !(s >= 0 && s < 89))
      return log.add(
        line,
        columnName(steerInput!),
        "is not a steer angle between 0° and 89°",
        cell(fields, steerInput!.index),
      );
    const dh = num(headingChange!);
    if (dh === undefined || !(dh > 0 && dh <= 3600))
      return log.add(
        line,
        columnName(headingChange!),
        "is not a heading change between 0° and 3600°",
        cell(fields, headingChange!.index),
      );
    const v = num(speed!);
    if (v === undefined || !(v >= 0))
      return log.add(line, columnName(speed!), "is not a speed", cell(fields, speed!.index));
    if (v > Math.min(defaults.maxSpeed, MAX_ENGINE_SPEED))
      return log.add(
        line,
        columnName(speed!),
        `${formatKmh(v)} is too fast for a turn (limit ${formatKmh(Math.min(defaults.maxSpeed, MAX_ENGINE_SPEED))})`,
        cell(fields, speed!.index),
      );
    const n = num(count!);
    if (n === undefined || !(n >= 0))
      return log.add(
        line,
        columnName(count!),
        "is not a count of turns",
        cell(fields, count!.index),
      );
    let surf = defaults.surface;
    if (surface && cell(fields, surface.index) !== "") {
      const parsed = parseSurface(cell(fields, surface.index));
      if (!parsed)
        return log.add(
          line,
          columnName(surface),
          "is not a surface we know (concrete, gravel, firm soil, loose soil, grass)",
          cell(fields, surface.index),
        );
      surf = parsed;
    }
    let loadState = defaults.loadState;
    if (load && cell(fields, load.index) !== "") {
      const parsed = parseLoadState(cell(fields, load.index));
      if (!parsed)
        return log.add(
          line,
          columnName(load),
          "is not a load state (laden or empty)",
          cell(fields, load.index),
        );
      loadState = parsed;
    }
    let dir: "left" | "right" = "left";
    if (direction && cell(fields, direction.index) !== "") {
      const parsed = parseTurnDirection(cell(fields, direction.index));
      if (!parsed)
        return log.add(
          line,
          columnName(direction),
          "is not a turn direction (left or right)",
          cell(fields, direction.index),
        );
      dir = parsed;
    }
    const perHour = count!.unit === "per-shift" ? n / defaults.shiftHours : n;
    turns.push({
      seq: turns.length + 1,
      label: label ? cell(fields, label.index).slice(0, 120) || null : null,
      direction: dir,
      radius: r ?? null,
      steerInput: s ?? null,
      headingChange: dh,
      speed: v,
      perHour,
      surface: surf,
      loadState,
      reverse: false,
      distance: r !== undefined ? (r * dh * Math.PI) / 180 : null,
      duration: r !== undefined && v > 0 ? (r * dh * Math.PI) / 180 / v : null,
      startTime: null,
    });
  }

  function finish(): TImportResult {
    if (turns.length === 0 || log.count > turns.length)
      throw tooFewRowsFailure(turns.length, log.count, log);
    const meanSpeed = turns.reduce((s, t) => s + t.speed, 0) / turns.length;
    return {
      turns,
      straight: {
        distancePerHour: defaults.straightDistancePerHour ?? 0,
        speed: Math.min(MAX_ENGINE_SPEED, defaults.straightSpeed ?? meanSpeed),
        surfaceShares: { [defaults.surface]: 1 },
        ladenShare: defaults.loadState === "laden" ? 1 : 0,
      },
      operatingHours: null,
      rowsUsed: turns.length,
      rowsSkipped: log.count,
      errors: log.errors,
      errorCount: log.count,
      speedHistogram: null,
    };
  }

  return { pushRow, finish };
}
