import { STEERING_LAYOUTS, type TTurn, type TTurnKind } from "./schemas";

/**
 * Fast path for validating one duty-cycle turn kind, for imports of a million turns where zod's
 * general machinery dominates the run time. It accepts only the plain, valid case (known keys,
 * no undefined values, every value within the ZTurnKind schema) and returns exactly what
 * ZTurnKind.parse would; anything else returns undefined and the caller falls back to zod,
 * which also produces the error messages. A property test pins the two together.
 */
const DIRECTIONS = new Set(["left", "right"]);
const SURFACES = new Set(["concrete-asphalt", "gravel", "firm-soil", "loose-soil", "grass"]);
const LOAD_STATES = new Set(["unladen", "laden"]);
const FRONT_DRIVE = new Set(["engaged", "disengaged"]);
const LAYOUTS = new Set<string>(STEERING_LAYOUTS);
const TURN_KEYS = new Set([
  "label",
  "direction",
  "radius",
  "steerInput",
  "headingChange",
  "crabDistance",
  "speed",
  "surface",
  "loadState",
  "steeringMode",
  "frontDrive",
  "differentialLock",
]);

function inRange(x: unknown, min: number, max: number): x is number {
  return typeof x === "number" && Number.isFinite(x) && x >= min && x <= max;
}

export function fastTurnKind(raw: unknown): TTurnKind | undefined {
  if (typeof raw !== "object" || raw === null || Array.isArray(raw)) return undefined;
  const kind = raw as Record<string, unknown>;
  let kindKeys = 0;
  for (const key in kind) {
    if (key !== "turn" && key !== "perHour") return undefined;
    kindKeys++;
  }
  if (kindKeys !== 2 || !inRange(kind.perHour, 0, Infinity)) return undefined;
  const t = kind.turn;
  if (typeof t !== "object" || t === null || Array.isArray(t)) return undefined;
  const turn = t as Record<string, unknown>;
  for (const key in turn) {
    if (!TURN_KEYS.has(key) || turn[key] === undefined) return undefined;
  }
  const { direction, radius, steerInput, headingChange, crabDistance, surface } = turn;
  if (typeof direction !== "string" || !DIRECTIONS.has(direction)) return undefined;
  if (typeof surface !== "string" || !SURFACES.has(surface)) return undefined;
  if (!inRange(headingChange, 0, 3600)) return undefined;
  if ((radius === undefined) === (steerInput === undefined)) return undefined;
  if (radius !== undefined && !inRange(radius, 0, 10_000)) return undefined;
  if (steerInput !== undefined && !inRange(steerInput, 0, 89)) return undefined;
  if (crabDistance !== undefined && !inRange(crabDistance, 0, Infinity)) return undefined;
  const speed = turn.speed === undefined ? 1.5 : turn.speed;
  if (!inRange(speed, 0, 20)) return undefined;
  const loadState = turn.loadState === undefined ? "unladen" : turn.loadState;
  if (typeof loadState !== "string" || !LOAD_STATES.has(loadState)) return undefined;
  const frontDrive = turn.frontDrive === undefined ? "engaged" : turn.frontDrive;
  if (typeof frontDrive !== "string" || !FRONT_DRIVE.has(frontDrive)) return undefined;
  const differentialLock = turn.differentialLock === undefined ? false : turn.differentialLock;
  if (typeof differentialLock !== "boolean") return undefined;
  const mode = turn.steeringMode;
  if (mode !== undefined && (typeof mode !== "string" || !LAYOUTS.has(mode))) return undefined;
  let label = turn.label;
  if (label !== undefined) {
    if (typeof label !== "string") return undefined;
    label = label.trim();
    if ((label as string).length > 120) return undefined;
  }
  const out: Record<string, unknown> = {
    direction,
    headingChange,
    speed,
    surface,
    loadState,
    frontDrive,
    differentialLock,
  };
  if (label !== undefined) out.label = label;
  if (radius !== undefined) out.radius = radius;
  if (steerInput !== undefined) out.steerInput = steerInput;
  if (crabDistance !== undefined) out.crabDistance = crabDistance;
  if (mode !== undefined) out.steeringMode = mode;
  return { turn: out as TTurn, perHour: kind.perHour };
}
