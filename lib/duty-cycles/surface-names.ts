/**
 * Reads the words dealers' exports use for ground, load and direction into the engine's kinds:
 * English, German, French, Spanish, Italian, Dutch and Polish (everyday words, from memory,
 * no source), compared without accents.
 */
import { ZSurfaceKind, type TSurfaceKind } from "@/lib/scrub/schemas";
import { normaliseWord } from "@/lib/duty-cycles/normalise-word";

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
  // German
  beton: "concrete-asphalt",
  strasse: "concrete-asphalt",
  hof: "concrete-asphalt",
  schotter: "gravel",
  kies: "gravel",
  feldweg: "gravel",
  acker: "firm-soil",
  feld: "firm-soil",
  stoppel: "firm-soil",
  stoppelfeld: "firm-soil",
  gepfluegt: "loose-soil",
  locker: "loose-soil",
  grubber: "loose-soil",
  wiese: "grass",
  gruenland: "grass",
  gras: "grass",
  weide: "grass",
  // French
  route: "concrete-asphalt",
  goudron: "concrete-asphalt",
  bitume: "concrete-asphalt",
  asphalte: "concrete-asphalt",
  cour: "concrete-asphalt",
  gravier: "gravel",
  chemin: "gravel",
  champ: "firm-soil",
  chaume: "firm-soil",
  laboure: "loose-soil",
  meuble: "loose-soil",
  sable: "loose-soil",
  prairie: "grass",
  herbe: "grass",
  pature: "grass",
  // Spanish
  carretera: "concrete-asphalt",
  asfalto: "concrete-asphalt",
  hormigon: "concrete-asphalt",
  patio: "concrete-asphalt",
  grava: "gravel",
  camino: "gravel",
  campo: "firm-soil",
  rastrojo: "firm-soil",
  arado: "loose-soil",
  suelto: "loose-soil",
  arena: "loose-soil",
  prado: "grass",
  hierba: "grass",
  cesped: "grass",
  pasto: "grass",
  // Italian (campo as in Spanish)
  strada: "concrete-asphalt",
  cemento: "concrete-asphalt",
  cortile: "concrete-asphalt",
  ghiaia: "gravel",
  sterrato: "gravel",
  stoppie: "firm-soil",
  arato: "loose-soil",
  sciolto: "loose-soil",
  sabbia: "loose-soil",
  prato: "grass",
  erba: "grass",
  pascolo: "grass",
  // Dutch
  weg: "concrete-asphalt",
  asfalt: "concrete-asphalt",
  erf: "concrete-asphalt",
  grind: "gravel",
  akker: "firm-soil",
  veld: "firm-soil",
  stoppelveld: "firm-soil",
  geploegd: "loose-soil",
  los: "loose-soil",
  zand: "loose-soil",
  grasland: "grass",
  wei: "grass",
  weiland: "grass",
  // Polish (asfalt, beton as in Dutch and German)
  droga: "concrete-asphalt",
  podworze: "concrete-asphalt",
  zwir: "gravel",
  szuter: "gravel",
  pole: "firm-soil",
  scierniska: "firm-soil",
  sciernisko: "firm-soil",
  zaorane: "loose-soil",
  orka: "loose-soil",
  luzny: "loose-soil",
  piasek: "loose-soil",
  laka: "grass",
  trawa: "grass",
  pastwisko: "grass",
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
  const key = normaliseWord(text).replace(/[\s_/]+/g, "-");
  const direct = ZSurfaceKind.safeParse(key);
  if (direct.success) return direct.data;
  return SYNONYMS[key] ?? SYNONYMS[key.split("-")[0] ?? ""];
}

const LADEN = new Set([
  ...["laden", "loaded", "full", "1", "yes", "y", "true"],
  ...["beladen", "voll", "charge", "plein", "cargado", "lleno", "carico", "pieno"],
  ...["geladen", "vol", "zaladowany", "pelny"],
]);
const UNLADEN = new Set([
  ...["unladen", "empty", "0", "no", "n", "false", "unloaded"],
  ...["leer", "unbeladen", "vide", "vacio", "vuoto", "leeg", "pusty"],
]);

export function parseLoadState(text: string): "laden" | "unladen" | undefined {
  const key = normaliseWord(text);
  if (LADEN.has(key)) return "laden";
  if (UNLADEN.has(key)) return "unladen";
  return undefined;
}

const REVERSE = new Set([
  ...["r", "rev", "reverse", "-1", "backward", "back"],
  ...["rueckwaerts", "arriere", "ar", "atras", "marcha-atras", "indietro", "retro"],
  ...["achteruit", "wstecz", "tyl"],
]);
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
  ...["v", "vorwaerts", "avant", "av", "adelante", "avanti", "vooruit", "przod"],
]);

/** true when reversing, false when not, undefined when the cell is not a direction we know. */
export function parseReverse(text: string): boolean | undefined {
  const key = normaliseWord(text).replace(/\s+/g, "-");
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
