/**
 * Nominal tyre dimensions from the size designation (ISO 4251-1 designation convention,
 * PHYSICS.md §8 [trade practice / C]): section height H = S·AR/100, overall diameter
 * D = 25.4·rim + 2H (mm). Real tyres differ by maker (±3 % is quoted [trade practice]): data-book
 * values entered on the machine override these.
 */

export type TTyreConstruction = "radial" | "bias" | "belted";
export type TTyreFamily = "metric" | "code-inch" | "flotation" | "industrial";

export interface TTyreDimensions {
  /** Nominal section width (mm). */
  sectionWidth: number;
  /** Aspect ratio (section height / width, percent). */
  aspectRatio: number;
  /** Rim diameter code (inches). */
  rimDiameter: number;
  /** Nominal overall diameter (mm). */
  overallDiameter: number;
  construction: TTyreConstruction;
  family: TTyreFamily;
  /** IF / VF prefix (load capacity only; dimensions unchanged). */
  flexion: "standard" | "IF" | "VF";
}

/** Code-inch sizes print no series; conventional drive tyres are taken as 85 % [trade practice, weak]. */
export const CODE_INCH_ASSUMED_SERIES = 85;
/**
 * Industrial / skid-steer sizes (rim code ending in .5, e.g. 12-16.5) print no series. 70 % is a
 * judgement placeholder from memory of published 10-16.5 and 12-16.5 overall diameters
 * (about 30–33 in) [M, verify]; enter the data-book diameter for quotes.
 */
export const INDUSTRIAL_ASSUMED_SERIES = 70;

const MM_PER_INCH = 25.4;

/** Parse a tyre size designation. Throws an Error naming the part that is wrong. */
export function tyreDimensions(designation: string): TTyreDimensions {
  const raw = designation
    .trim()
    .toUpperCase()
    .replace(/^(IF|VF)\s+/, "$1");
  if (raw.length === 0)
    throw new Error("Tyre designation is empty: enter a size such as 480/80R46.");
  const [size = "", ...rest] = raw.split(/\s+/);
  const extra = rest.join(" ");
  if (extra && !/^(\d{2,3}(\/\d{2,3})?[A-Z]\d?\s*)+(TL|TT)?$|^(TL|TT)$/.test(extra)) {
    throw new Error(
      `Tyre designation "${designation}": unexpected text "${extra}" after the size; only a service description such as 158A8 may follow.`,
    );
  }
  const where = `Tyre designation "${designation}"`;
  if (size.includes("/")) return parseMetric(size, where);
  if (size.includes("X")) return parseFlotation(size, where);
  return parseInch(size, where);
}

function parseMetric(size: string, where: string): TTyreDimensions {
  const m = /^(IF|VF)?(\d+)\/(\d+)([A-Z-]+)(\d+(?:\.\d+)?)$/.exec(size);
  if (!m) {
    throw new Error(
      `${where}: metric sizes read width/aspect, construction letter, rim, e.g. IF710/70R42.`,
    );
  }
  const [, prefix, widthText = "", aspectText = "", constructionText = "", rimText = ""] = m;
  const sectionWidth = Number(widthText);
  if (!/^\d{3}$/.test(widthText) || sectionWidth < 100) {
    throw new Error(`${where}: section width "${widthText}" must be three digits in mm, e.g. 480.`);
  }
  const aspectRatio = Number(aspectText);
  if (!/^\d{2}$/.test(aspectText) || aspectRatio < 20 || aspectRatio > 100) {
    throw new Error(`${where}: aspect ratio "${aspectText}" must be two digits (20–100), e.g. 80.`);
  }
  const construction = parseConstruction(constructionText, where);
  const rimDiameter = parseRim(rimText, where);
  return build(sectionWidth, aspectRatio, rimDiameter, construction, "metric", prefix);
}

function parseFlotation(size: string, where: string): TTyreDimensions {
  const m = /^(\d+(?:\.\d+)?)X(\d+(?:\.\d+)?)([A-Z-]+)(\d+(?:\.\d+)?)$/.exec(size);
  if (!m) {
    throw new Error(
      `${where}: flotation sizes read diameter x width - rim in inches, e.g. 31x15.50-15.`,
    );
  }
  const [, diameterText = "", widthText = "", constructionText = "", rimText = ""] = m;
  const diameterIn = Number(diameterText);
  const widthIn = Number(widthText);
  const rimDiameter = parseRim(rimText, where);
  if (!(widthIn > 3 && widthIn < 60)) {
    throw new Error(`${where}: section width "${widthText}" in inches is out of range (3–60).`);
  }
  if (!(diameterIn > rimDiameter)) {
    throw new Error(`${where}: overall diameter "${diameterText}" must exceed the rim diameter.`);
  }
  const construction = parseConstruction(constructionText, where);
  const sectionWidth = widthIn * MM_PER_INCH;
  const overallDiameter = diameterIn * MM_PER_INCH;
  const aspectRatio = (100 * (overallDiameter - rimDiameter * MM_PER_INCH)) / 2 / sectionWidth;
  return {
    sectionWidth,
    aspectRatio,
    rimDiameter,
    overallDiameter,
    construction,
    family: "flotation",
    flexion: "standard",
  };
}

function parseInch(size: string, where: string): TTyreDimensions {
  const m = /^(IF|VF)?(\d+(?:\.\d+)?)(L?)([A-Z-]+)(\d+(?:\.\d+)?)$/.exec(size);
  if (!m) {
    throw new Error(
      `${where}: not a recognised size. Use metric (480/80R46), code-inch (18.4-38, 14.9R24), flotation (31x15.50-15) or industrial (12-16.5).`,
    );
  }
  const [, prefix, widthText = "", lowSection, constructionText = "", rimText = ""] = m;
  if (lowSection) {
    throw new Error(
      `${where}: low-section (L) sizes have no standard series; enter the overall diameter and section width from the data book.`,
    );
  }
  const widthIn = Number(widthText);
  if (!(widthIn >= 4 && widthIn <= 45)) {
    throw new Error(`${where}: section width "${widthText}" in inches is out of range (4–45).`);
  }
  const construction = parseConstruction(constructionText, where);
  const rimDiameter = parseRim(rimText, where);
  const industrial = Math.abs(rimDiameter - Math.floor(rimDiameter) - 0.5) < 1e-9;
  const series = industrial ? INDUSTRIAL_ASSUMED_SERIES : CODE_INCH_ASSUMED_SERIES;
  return build(
    widthIn * MM_PER_INCH,
    series,
    rimDiameter,
    construction,
    industrial ? "industrial" : "code-inch",
    prefix,
  );
}

function parseConstruction(text: string, where: string): TTyreConstruction {
  if (text === "R") return "radial";
  if (text === "-" || text === "D") return "bias";
  if (text === "B") return "belted";
  throw new Error(
    `${where}: construction "${text}" must be R (radial), - or D (diagonal) or B (belted).`,
  );
}

function parseRim(text: string, where: string): number {
  const rim = Number(text);
  if (!(rim >= 8 && rim <= 63)) {
    throw new Error(`${where}: rim diameter "${text}" must be in inches between 8 and 63.`);
  }
  return rim;
}

function build(
  sectionWidth: number,
  aspectRatio: number,
  rimDiameter: number,
  construction: TTyreConstruction,
  family: TTyreFamily,
  prefix: string | undefined,
): TTyreDimensions {
  const sectionHeight = (sectionWidth * aspectRatio) / 100;
  return {
    sectionWidth,
    aspectRatio,
    rimDiameter,
    overallDiameter: rimDiameter * MM_PER_INCH + 2 * sectionHeight,
    construction,
    family,
    flexion: prefix === "IF" ? "IF" : prefix === "VF" ? "VF" : "standard",
  };
}
