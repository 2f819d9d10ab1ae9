/**
 * A first guess at the column mapping from the header row and a few sample rows, for the
 * dealer to correct. Matching is by common words in column names, in English and in the
 * languages European telematics exports are commonly written in (German, French, Spanish,
 * Italian, Dutch, Polish; everyday words of each language, from memory, no source). Names are
 * compared without accents ("Länge" as "lange"); a guess never overrides a template.
 */
import {
  ROLE_UNITS,
  type TColumnMapping,
  type TColumnRole,
  type TFileKind,
  type TUnit,
} from "@/lib/duty-cycles/column-mapping";
import { normaliseWord } from "@/lib/duty-cycles/normalise-word";

type TRule = {
  role: TColumnRole;
  words: RegExp;
  /** Names that match `words` but mean something else ("vitesse de lacet" is a yaw rate). */
  not?: RegExp;
  unit?: (h: string) => TUnit | undefined;
};

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
    words:
      /^(time|timestamp|t|date.?time|zeit|secs?|seconds|utc|temps|heure|horodatage|tiempo|hora|tempo|ora|orario|tijd|czas|godzina)\b|time|zeitstempel|uhrzeit|tijdstip|znacznik.?czasu/,
    not: /moteur|motor|compteur|contaore|horometro|draaiuren|motogodz|betriebsstunden|hour.?meter/,
    unit: timeUnit,
  },
  {
    role: "speed",
    words:
      /speed|velocity|\bkph\b|\bmph\b|geschw|vitesse|velocidad|velocita|snelheid|predkosc|szybkosc/,
    not: /yaw|lacet|guinada|imbardata|gier|odchyl/,
    unit: speedUnit,
  },
  {
    role: "yawRate",
    words: /yaw|gyro|turn.?rate|gierrate|drehrate|lacet|guinada|imbardata|giersnelheid|odchyl/,
    unit: rateUnit,
  },
  {
    role: "steer",
    words:
      /steer|wheel.?angle|lenk|braquage|angulo.?de.?direccion|angulo.?de.?giro|sterz|stuurhoek|skretu/,
    unit: angleUnit,
  },
  {
    role: "heading",
    words: /heading|course|compass|bearing|kurs|\bcap\b|rumbo|rotta|prua|koers/,
    unit: angleUnit,
  },
  { role: "lat", words: /^lat|latitud|breite|breedte|szerokosc/ },
  { role: "lon", words: /^(lon|lng)|longitud|laenge|lange|lengte|dlugosc/ },
  {
    role: "surface",
    words:
      /surface|ground|terrain|untergrund|boden|oberflaeche|\bsol\b|superficie|suelo|terreno|suolo|ondergrond|bodem|podloze|nawierzchnia|grunt/,
  },
  {
    role: "load",
    words:
      /load|laden|payload|beladung|zuladung|\blast\b|charge|carga|carico|lading|ladunek|obciazenie/,
  },
  {
    role: "direction",
    words:
      /gear|direction|fnr|shuttle|fahrtrichtung|\bgang\b|sens.?de.?marche|\bmarche\b|\bmarcha\b|sentido|\bmarcia\b|rijrichting|versnelling|\bbieg\b|kierunek/,
  },
  {
    role: "hourMeter",
    words:
      /hour.?meter|engine.?hours|hobbs|\bhours\b|betriebsstunden|motorstunden|heures.?moteur|compteur.?horaire|horas.?de.?motor|horometro|ore.?motore|contaore|draaiuren|urenteller|motogodz/,
  },
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
    const index = headers.findIndex((h, i) => {
      const name = normaliseWord(h);
      return !taken.has(i) && rule.words.test(name) && !rule.not?.test(name);
    });
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
