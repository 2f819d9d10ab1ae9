/** Reads the words dealers' exports use for ground into the engine's surface kinds. */
import { ZSurfaceKind, type TSurfaceKind } from "@/lib/scrub/schemas";

const SYNONYMS: Record<string, TSurfaceKind> = {
  concrete: "concrete-asphalt",
  asphalt: "concrete-asphalt",
  tarmac: "concrete-asphalt",
  road: "concrete-asphalt",
  yard: "concrete-asphalt",
  paved: "concrete-asphalt",
  gravel: "gravel",
  hardcore: "gravel",
  track: "gravel",
  stone: "gravel",
  soil: "firm-soil",
  field: "firm-soil",
  firm: "firm-soil",
  stubble: "firm-soil",
  loose: "loose-soil",
  cultivated: "loose-soil",
  ploughed: "loose-soil",
  plowed: "loose-soil",
  sand: "loose-soil",
  grass: "grass",
  pasture: "grass",
  turf: "grass",
  meadow: "grass",
};

export const SURFACE_LABELS: Record<TSurfaceKind, string> = {
  "concrete-asphalt": "Concrete or asphalt",
  gravel: "Gravel",
  "firm-soil": "Firm soil",
  "loose-soil": "Loose soil",
  grass: "Grass",
};

/** The surface kind a cell names, or undefined when it names none we know. */
export function parseSurface(text: string): TSurfaceKind | undefined {
  const key = text
    .trim()
    .toLowerCase()
    .replace(/[\s_/]+/g, "-");
  const direct = ZSurfaceKind.safeParse(key);
  if (direct.success) return direct.data;
  return SYNONYMS[key] ?? SYNONYMS[key.split("-")[0] ?? ""];
}

const LADEN = new Set(["laden", "loaded", "full", "1", "yes", "y", "true"]);
const UNLADEN = new Set(["unladen", "empty", "0", "no", "n", "false", "unloaded"]);

export function parseLoadState(text: string): "laden" | "unladen" | undefined {
  const key = text.trim().toLowerCase();
  if (LADEN.has(key)) return "laden";
  if (UNLADEN.has(key)) return "unladen";
  return undefined;
}

const REVERSE = new Set(["r", "rev", "reverse", "-1", "backward", "back"]);
const FORWARD = new Set([
  "f",
  "fwd",
  "forward",
  "1",
  "d",
  "drive",
  "n",
  "neutral",
  "p",
  "park",
  "0",
]);

/** true when reversing, false when not, undefined when the cell is not a direction we know. */
export function parseReverse(text: string): boolean | undefined {
  const key = text.trim().toLowerCase();
  if (REVERSE.has(key)) return true;
  if (FORWARD.has(key)) return false;
  return undefined;
}

export function parseTurnDirection(text: string): "left" | "right" | undefined {
  const key = text.trim().toLowerCase();
  if (key === "l" || key === "left") return "left";
  if (key === "r" || key === "right") return "right";
  return undefined;
}
