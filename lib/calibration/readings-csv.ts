import Papa from "papaparse";
import { RowErrorLog, type TRowError } from "@/lib/duty-cycles/row-errors";
import { TYRE_POSITIONS, type TTyrePosition } from "./types";

/** Columns of a readings file, found by words in the header (a guess the error names if wrong). */
const COLUMNS = {
  position: /^(position|pos|wheel|tyre position|tire position)$/,
  measuredOn: /date|measured on|day/,
  hourMeter: /hour|hrs|engine h/,
  depthCentre: /cent(re|er)|middle|mid/,
  depthInner: /inner|inside|\bin\b shoulder|left shoulder/,
  depthOuter: /outer|outside|right shoulder/,
  measuredBy: /by|measurer|technician|who/,
  kind: /kind|type|event|change/,
  designation: /size|designation|fitment/,
  note: /note|comment|remark/,
} as const;
type TColumn = keyof typeof COLUMNS;
const REQUIRED: TColumn[] = ["position", "measuredOn", "hourMeter", "depthCentre"];

const POSITION_WORDS: Record<string, TTyrePosition> = {
  fl: "front-left",
  lf: "front-left",
  fr: "front-right",
  rf: "front-right",
  rl: "rear-left",
  lr: "rear-left",
  rr: "rear-right",
};

export function parsePosition(raw: string): TTyrePosition | null {
  const v = raw
    .trim()
    .toLowerCase()
    .replace(/[\s_]+/g, "-");
  if ((TYRE_POSITIONS as readonly string[]).includes(v)) return v as TTyrePosition;
  return POSITION_WORDS[v.replace(/-/g, "")] ?? null;
}

export type TParsedReadingRow = {
  line: number;
  position: TTyrePosition;
  kind: "reading" | "fitted";
  measuredOn: string;
  hourMeter: number;
  depthCentre: number;
  depthInner: number | null;
  depthOuter: number | null;
  measuredBy: string | null;
  designation: string | null;
  note: string;
};

const MM_PER_INCH = 25.4;

/**
 * Reads a readings CSV (header row required). Depths in mm, or inches with `depthUnit: "in"`;
 * decimal commas are accepted with a semicolon delimiter. Every bad cell is reported with its
 * line and column; the caller stores nothing unless the whole file is clean.
 */
export function parseReadingsCsv(
  text: string,
  { depthUnit = "mm" }: { depthUnit?: "mm" | "in" } = {},
): { rows: TParsedReadingRow[]; errors: TRowError[]; errorCount: number; missing: string[] } {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), { skipEmptyLines: "greedy" });
  const [header = [], ...data] = parsed.data;
  const heads = header.map((h) => h.trim().toLowerCase());
  const index: Partial<Record<TColumn, number>> = {};
  for (const col of Object.keys(COLUMNS) as TColumn[]) {
    const i = heads.findIndex((h, j) => COLUMNS[col].test(h) && !Object.values(index).includes(j));
    if (i >= 0) index[col] = i;
  }
  const missing = REQUIRED.filter((c) => index[c] === undefined);
  const log = new RowErrorLog(100);
  if (missing.length) return { rows: [], errors: [], errorCount: 0, missing };
  const commaDecimal = parsed.meta.delimiter === ";";
  const cell = (row: string[], col: TColumn) => {
    const i = index[col];
    return i === undefined ? "" : (row[i] ?? "").trim();
  };
  const num = (raw: string) => Number(commaDecimal ? raw.replace(",", ".") : raw);
  const rows: TParsedReadingRow[] = [];
  data.forEach((row, k) => {
    const line = k + 2;
    const before = log.count;
    const position = parsePosition(cell(row, "position"));
    if (!position)
      log.add(
        line,
        header[index.position!] ?? "position",
        "Use front-left, front-right, rear-left or rear-right (or FL, FR, RL, RR).",
        cell(row, "position"),
      );
    const dateRaw = cell(row, "measuredOn");
    const measuredOn =
      /^\d{4}-\d{2}-\d{2}$/.test(dateRaw) && !Number.isNaN(Date.parse(`${dateRaw}T00:00:00Z`))
        ? dateRaw
        : null;
    if (!measuredOn)
      log.add(line, header[index.measuredOn!] ?? "date", "Use a date like 2026-03-29.", dateRaw);
    const hours = num(cell(row, "hourMeter"));
    if (!(hours >= 0) || cell(row, "hourMeter") === "")
      log.add(
        line,
        header[index.hourMeter!] ?? "hours",
        "Hour meter must be a number of hours, 0 or more.",
        cell(row, "hourMeter"),
      );
    const depth = (col: TColumn, required: boolean): number | null => {
      const raw = cell(row, col);
      if (raw === "") {
        if (required) log.add(line, header[index[col]!] ?? col, "Enter the centre depth.", raw);
        return null;
      }
      const v = num(raw) * (depthUnit === "in" ? MM_PER_INCH : 1);
      if (!(v >= 0 && v <= 150)) {
        log.add(
          line,
          header[index[col]!] ?? col,
          `Depth must be between 0 and 150 mm${depthUnit === "in" ? " (the file is read in inches)" : ""}.`,
          raw,
        );
        return null;
      }
      return v;
    };
    const depthCentre = depth("depthCentre", true);
    const depthInner = depth("depthInner", false);
    const depthOuter = depth("depthOuter", false);
    const kind = /fit|change|new/i.test(cell(row, "kind")) ? "fitted" : "reading";
    const designation = cell(row, "designation") || null;
    if (kind === "fitted" && !designation)
      log.add(line, "size", "A tyre change needs the new tyre's size.", null);
    if (log.count > before) return;
    rows.push({
      line,
      position: position!,
      kind,
      measuredOn: measuredOn!,
      hourMeter: hours,
      depthCentre: depthCentre!,
      depthInner,
      depthOuter,
      measuredBy: cell(row, "measuredBy") || null,
      designation,
      note: cell(row, "note"),
    });
  });
  return { rows, errors: log.errors, errorCount: log.count, missing };
}
