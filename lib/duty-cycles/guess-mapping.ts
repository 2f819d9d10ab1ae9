/**
 * A first guess at the column mapping from the header row and a few sample rows, for the
 * dealer to correct. Matching is by common words in column names; a guess never overrides a
 * template.
 */
import {
  ROLE_UNITS,
  type TColumnMapping,
  type TColumnRole,
  type TFileKind,
  type TUnit,
} from "@/lib/duty-cycles/column-mapping";

type TRule = { role: TColumnRole; words: RegExp; unit?: (h: string) => TUnit | undefined };

const speedUnit = (h: string): TUnit | undefined =>
  /mph/.test(h) ? "mph" : /m\/?s\b|mps/.test(h) ? "m/s" : /km|kph/.test(h) ? "km/h" : undefined;
const angleUnit = (h: string): TUnit | undefined => (/rad/.test(h) ? "rad" : undefined);
const rateUnit = (h: string): TUnit | undefined => (/rad/.test(h) ? "rad/s" : undefined);
const lengthUnit = (h: string): TUnit | undefined =>
  /\bft\b|feet|foot/.test(h) ? "ft" : undefined;
const countUnit = (h: string): TUnit | undefined => (/shift/.test(h) ? "per-shift" : undefined);
const timeUnit = (h: string): TUnit | undefined => (/\bms\b|millis/.test(h) ? "ms" : undefined);

const TELEMATICS_RULES: TRule[] = [
  {
    role: "time",
    words: /^(time|timestamp|t|date.?time|zeit|secs?|seconds|utc)\b|time/,
    unit: timeUnit,
  },
  { role: "speed", words: /speed|velocity|\bkph\b|\bmph\b|geschw|vitesse/, unit: speedUnit },
  { role: "yawRate", words: /yaw|gyro|turn.?rate/, unit: rateUnit },
  { role: "steer", words: /steer|wheel.?angle|lenk/, unit: angleUnit },
  { role: "heading", words: /heading|course|compass|bearing|kurs/, unit: angleUnit },
  { role: "lat", words: /^lat|latitude/ },
  { role: "lon", words: /^(lon|lng)|longitude/ },
  { role: "surface", words: /surface|ground|terrain/ },
  { role: "load", words: /load|laden|payload/ },
  { role: "direction", words: /gear|direction|fnr|shuttle/ },
  { role: "hourMeter", words: /hour.?meter|engine.?hours|hobbs|\bhours\b/ },
];

const SCHEDULE_RULES: TRule[] = [
  { role: "radius", words: /radius/, unit: lengthUnit },
  { role: "steerInput", words: /steer|angle.?input/, unit: angleUnit },
  { role: "headingChange", words: /heading|turn.?angle|degrees?|change/, unit: angleUnit },
  { role: "speed", words: /speed/, unit: speedUnit },
  { role: "count", words: /count|per.?(hour|shift)|times|number|freq/, unit: countUnit },
  { role: "surface", words: /surface|ground/ },
  { role: "load", words: /load|laden/ },
  { role: "direction", words: /direction|side|left|right/ },
  { role: "label", words: /label|name|description|kind/ },
];

/** Telematics logs have many rows and a time column; schedules have a few rows and radii. */
export function guessKind(headers: readonly string[], rowCount: number): TFileKind {
  const h = headers.map((x) => x.toLowerCase());
  if (h.some((x) => /radius/.test(x)) && !h.some((x) => /^time|timestamp/.test(x)))
    return "schedule";
  return rowCount > 0 && h.some((x) => /count|per.?hour|per.?shift/.test(x))
    ? "schedule"
    : "telematics";
}

/** Decimal comma when the separator is not a comma and numbers look like "12,5". */
export function guessDecimal(delimiter: string, rows: readonly (readonly string[])[]): "." | "," {
  if (delimiter === ",") return ".";
  const cells = rows.slice(0, 20).flat();
  const comma = cells.filter((c) => /^-?\d+,\d+$/.test(c.trim())).length;
  const dot = cells.filter((c) => /^-?\d+\.\d+$/.test(c.trim())).length;
  return comma > dot ? "," : ".";
}

/** ISO 8601 when the first time cell looks like a date, else seconds. */
function guessTimeUnit(sample: string | undefined, fromHeader: TUnit | undefined): TUnit {
  if (sample && /^\d{4}-\d{2}-\d{2}[T ]/.test(sample.trim())) return "iso8601";
  if (fromHeader) return fromHeader;
  // Epoch milliseconds are 13 digits now.
  return sample && /^\d{13}(\.\d+)?$/.test(sample.trim()) ? "ms" : "s";
}

export function guessColumns(
  kind: TFileKind,
  headers: readonly string[],
  firstRow: readonly string[] | undefined,
): TColumnMapping["columns"] {
  const rules = kind === "telematics" ? TELEMATICS_RULES : SCHEDULE_RULES;
  const columns: TColumnMapping["columns"] = {};
  const taken = new Set<number>();
  for (const rule of rules) {
    const index = headers.findIndex(
      (h, i) => !taken.has(i) && rule.words.test(h.toLowerCase().trim()),
    );
    if (index < 0) continue;
    taken.add(index);
    const header = headers[index]!;
    let unit = rule.unit?.(header.toLowerCase()) ?? ROLE_UNITS[rule.role][0]!;
    if (rule.role === "time")
      unit = guessTimeUnit(firstRow?.[index], rule.unit?.(header.toLowerCase()));
    columns[rule.role] = { index, header, unit };
  }
  return columns;
}
