/**
 * Duty cycles without a file: turns per operating hour worked out from the work itself. Field
 * work from run length, width, speed and headland turn; yard and loader work from cycles per
 * hour; road transport from speed and the share of the route in bends. Blocks mix by share of
 * operating hours, each on its own surface. Geometry: docs/duty-cycle-builder.md.
 */
import type { TSurfaceKind } from "@/lib/scrub/schemas";
import {
  SPEED_BINS,
  SPEED_BIN_WIDTH,
  type TStoredTurn,
  type TStraight,
} from "@/lib/duty-cycles/stored-duty-cycle";

export const HEADLAND_TURNS = ["loop", "bulb", "three-point"] as const;
export type THeadlandTurn = (typeof HEADLAND_TURNS)[number];

export type TFieldBlock = {
  kind: "field";
  label: string;
  /** Share of operating hours spent on this block (normalised over all blocks). */
  share: number;
  surface: TSurfaceKind;
  /** Length of one pass across the field, headland to headland (m). */
  runLength: number;
  /** Implement working width = spacing between adjacent passes (m). */
  workingWidth: number;
  /** Working speed along the pass (m/s). */
  workingSpeed: number;
  /** Speed through the headland turn (m/s). */
  turnSpeed: number;
  headlandTurn: THeadlandTurn;
  laden: boolean;
};

export type TYardTurn = { headingChange: number; radius: number; reverse: boolean; laden: boolean };

export type TYardBlock = {
  kind: "yard";
  label: string;
  share: number;
  surface: TSurfaceKind;
  cyclesPerHour: number;
  /** The turns of one work cycle, e.g. a loader's reverse-out and swing to the trailer. */
  turns: TYardTurn[];
  /** Straight travel in one cycle (m). */
  travelPerCycle: number;
  speed: number;
};

export type TRoadBlock = {
  kind: "road";
  label: string;
  share: number;
  surface: TSurfaceKind;
  speed: number;
  /** Share of the route distance that is bends (0..1). */
  bendShare: number;
  bendRadius: number;
  /** Heading change of a typical bend (deg). */
  bendAngle: number;
  laden: boolean;
};

export type TBuilderBlock = TFieldBlock | TYardBlock | TRoadBlock;

export type TBuilderInput = {
  /** Tightest path radius the machine can hold at its reference point (m). */
  minTurningRadius: number;
  blocks: TBuilderBlock[];
};

export type TBuiltDutyCycle = {
  turns: TStoredTurn[];
  straight: TStraight;
  /**
   * Seconds of one operating hour in each speed band, every block at its own speeds: the
   * straight's one mean speed would put field work and road transport in one band between them.
   */
  speedSeconds: number[];
  /** Plain-language notes on choices the builder made (e.g. a loop that does not fit). */
  notes: string[];
};

const DEG = Math.PI / 180;
/** Time lost to the shuttle shift in each direction change of a three-point turn (s). Common practice, no source. */
const SHUTTLE_SECONDS = 3;

type Arc = { headingChange: number; radius: number; reverse: boolean; flip: boolean };
type BlockTurns = {
  arcs: Arc[];
  /** Straight travel inside the turn (m) and whether it is driven in reverse. */
  straight: number;
  reverseStraight: number;
  extraSeconds: number;
};

/**
 * The arcs of one headland turn between adjacent passes `w` apart with tightest radius `r`.
 * Loop: a half circle of radius w/2 (needs w ≥ 2r). Bulb (omega): away by α, round by 180+2α,
 * back by α, all at r, with cos α = (w/2 + r)/(2r). Three-point: two quarter turns at r with a
 * straight of |2r − w| between, reversed when the turns overlap.
 */
export function headlandTurnArcs(
  type: THeadlandTurn,
  w: number,
  r: number,
  notes: string[],
  label: string,
): BlockTurns {
  if (type === "loop" && w < 2 * r) {
    notes.push(
      `${label}: a loop turn needs a turning circle no wider than the pass spacing (${w.toFixed(1)} m < 2 × ${r.toFixed(1)} m), so a bulb turn is used.`,
    );
    type = "bulb";
  }
  if (type === "bulb" && w >= 2 * r) {
    notes.push(
      `${label}: the machine turns inside the pass spacing, so a loop turn is used instead of a bulb.`,
    );
    type = "loop";
  }
  switch (type) {
    case "loop":
      return {
        arcs: [{ headingChange: 180, radius: w / 2, reverse: false, flip: false }],
        straight: 0,
        reverseStraight: 0,
        extraSeconds: 0,
      };
    case "bulb": {
      const alpha = Math.acos((w / 2 + r) / (2 * r)) / DEG;
      return {
        arcs: [
          { headingChange: alpha, radius: r, reverse: false, flip: true },
          { headingChange: 180 + 2 * alpha, radius: r, reverse: false, flip: false },
          { headingChange: alpha, radius: r, reverse: false, flip: true },
        ],
        straight: 0,
        reverseStraight: 0,
        extraSeconds: 0,
      };
    }
    case "three-point": {
      const gap = 2 * r - w;
      return {
        arcs: [
          { headingChange: 90, radius: r, reverse: false, flip: false },
          { headingChange: 90, radius: r, reverse: false, flip: false },
        ],
        straight: gap < 0 ? -gap : 0,
        reverseStraight: gap > 0 ? gap : 0,
        extraSeconds: gap > 0 ? 2 * SHUTTLE_SECONDS : 0,
      };
    }
  }
}

type BlockResult = {
  turns: Omit<TStoredTurn, "seq">[];
  straightDistance: number;
  straightSeconds: number;
  /** Straight travel time split by speed: [m/s, s per hour of the block]. */
  straightBySpeed: [number, number][];
  ladenDistance: number;
};

function fieldBlock(b: TFieldBlock, rMin: number, notes: string[]): BlockResult {
  const turn = headlandTurnArcs(b.headlandTurn, b.workingWidth, rMin, notes, b.label);
  const arcLength = turn.arcs.reduce((s, a) => s + a.radius * a.headingChange * DEG, 0);
  const turnSeconds =
    (arcLength + turn.straight + turn.reverseStraight) / b.turnSpeed + turn.extraSeconds;
  const passSeconds = b.runLength / b.workingSpeed;
  const turnsPerHour = 3600 / (passSeconds + turnSeconds);
  const load = b.laden ? "laden" : "unladen";
  // Passes alternate: one headland turn to the left, the next to the right.
  const turns = (["left", "right"] as const).flatMap((side) =>
    turn.arcs.map((a) => ({
      label: `${b.label}: headland ${turn.arcs.length === 1 ? "loop" : b.headlandTurn} turn`,
      direction: a.flip ? (side === "left" ? "right" : "left") : side,
      radius: a.radius,
      steerInput: null,
      headingChange: a.headingChange,
      speed: b.turnSpeed,
      perHour: turnsPerHour / 2,
      surface: b.surface,
      loadState: load,
      reverse: a.reverse,
      distance: a.radius * a.headingChange * DEG,
      duration: (a.radius * a.headingChange * DEG) / b.turnSpeed,
      startTime: null,
    })),
  );
  const straightDistance = turnsPerHour * (b.runLength + turn.straight + turn.reverseStraight);
  return {
    turns: turns as Omit<TStoredTurn, "seq">[],
    straightDistance,
    straightSeconds:
      turnsPerHour * (passSeconds + (turn.straight + turn.reverseStraight) / b.turnSpeed),
    straightBySpeed: [
      [b.workingSpeed, turnsPerHour * passSeconds],
      [b.turnSpeed, (turnsPerHour * (turn.straight + turn.reverseStraight)) / b.turnSpeed],
    ],
    ladenDistance: b.laden ? straightDistance + turnsPerHour * arcLength : 0,
  };
}

function yardBlock(b: TYardBlock, rMin: number, notes: string[]): BlockResult {
  const turns = b.turns.map((t, i) => {
    if (t.radius < rMin)
      notes.push(
        `${b.label}: turn ${i + 1} is tighter than the machine can steer; ${rMin.toFixed(1)} m is used.`,
      );
    const radius = Math.max(t.radius, rMin);
    return {
      label: `${b.label}: cycle turn ${i + 1}${t.reverse ? " (reversing)" : ""}`,
      // Alternate sides so a cycle does not wear one side only.
      direction: (i % 2 === 0 ? "left" : "right") as "left" | "right",
      radius,
      steerInput: null,
      headingChange: t.headingChange,
      speed: b.speed,
      perHour: b.cyclesPerHour,
      surface: b.surface,
      loadState: (t.laden ? "laden" : "unladen") as "laden" | "unladen",
      reverse: t.reverse,
      distance: radius * t.headingChange * DEG,
      duration: (radius * t.headingChange * DEG) / b.speed,
      startTime: null,
    };
  });
  const ladenTurnDistance = turns.reduce(
    (s, t) => s + (t.loadState === "laden" ? t.distance : 0),
    0,
  );
  const ladenTurnShare = turns.length
    ? turns.filter((t) => t.loadState === "laden").length / turns.length
    : 0;
  const straightDistance = b.cyclesPerHour * b.travelPerCycle;
  return {
    turns,
    straightDistance,
    straightSeconds: straightDistance / b.speed,
    straightBySpeed: [[b.speed, straightDistance / b.speed]],
    ladenDistance: b.cyclesPerHour * ladenTurnDistance + straightDistance * ladenTurnShare,
  };
}

function roadBlock(b: TRoadBlock, rMin: number, notes: string[]): BlockResult {
  const radius = Math.max(b.bendRadius, rMin);
  if (radius > b.bendRadius)
    notes.push(`${b.label}: bend radius raised to the machine's ${rMin.toFixed(1)} m.`);
  const distance = b.speed * 3600;
  const bendLength = radius * b.bendAngle * DEG;
  const bendsPerHour = (b.bendShare * distance) / bendLength;
  const load = b.laden ? "laden" : "unladen";
  const turns = (["left", "right"] as const).map((direction) => ({
    label: `${b.label}: bend`,
    direction,
    radius,
    steerInput: null,
    headingChange: b.bendAngle,
    speed: b.speed,
    perHour: bendsPerHour / 2,
    surface: b.surface,
    loadState: load as "laden" | "unladen",
    reverse: false,
    distance: bendLength,
    duration: bendLength / b.speed,
    startTime: null,
  }));
  const straightDistance = (1 - b.bendShare) * distance;
  return {
    turns,
    straightDistance,
    straightSeconds: straightDistance / b.speed,
    straightBySpeed: [[b.speed, straightDistance / b.speed]],
    ladenDistance: b.laden ? distance : 0,
  };
}

/** Builds the stored duty cycle for one operating hour of the mixed blocks. */
export function buildDutyCycle(input: TBuilderInput): TBuiltDutyCycle {
  const notes: string[] = [];
  const totalShare = input.blocks.reduce((s, b) => s + b.share, 0);
  if (input.blocks.length === 0 || totalShare <= 0)
    throw new Error("Add at least one block of work with a share of the hours above zero.");
  const turns: TStoredTurn[] = [];
  let straightDistance = 0;
  let straightSeconds = 0;
  let ladenDistance = 0;
  let totalDistance = 0;
  const surfaceDistance: Partial<Record<TSurfaceKind, number>> = {};
  const speedSeconds = new Array<number>(SPEED_BINS).fill(0);
  const addSeconds = (speed: number, seconds: number) => {
    const bin = Math.min(SPEED_BINS - 1, Math.floor(Math.abs(speed) / SPEED_BIN_WIDTH));
    speedSeconds[bin]! += seconds;
  };
  for (const block of input.blocks) {
    const share = block.share / totalShare;
    const part =
      block.kind === "field"
        ? fieldBlock(block, input.minTurningRadius, notes)
        : block.kind === "yard"
          ? yardBlock(block, input.minTurningRadius, notes)
          : roadBlock(block, input.minTurningRadius, notes);
    for (const t of part.turns) {
      if (t.perHour * share <= 0) continue;
      turns.push({ ...t, perHour: t.perHour * share, seq: turns.length + 1 });
      addSeconds(t.speed, (t.duration ?? 0) * t.perHour * share);
      totalDistance += (t.distance ?? 0) * t.perHour * share;
    }
    straightDistance += part.straightDistance * share;
    straightSeconds += part.straightSeconds * share;
    for (const [speed, seconds] of part.straightBySpeed) addSeconds(speed, seconds * share);
    ladenDistance += part.ladenDistance * share;
    totalDistance += part.straightDistance * share;
    surfaceDistance[block.surface] =
      (surfaceDistance[block.surface] ?? 0) + part.straightDistance * share;
  }
  const shares: Partial<Record<TSurfaceKind, number>> = {};
  for (const [k, d] of Object.entries(surfaceDistance) as [TSurfaceKind, number][])
    if (straightDistance > 0) shares[k] = d / straightDistance;
  return {
    turns,
    straight: {
      distancePerHour: straightDistance,
      speed: straightSeconds > 0 ? Math.min(20, straightDistance / straightSeconds) : 0,
      surfaceShares: Object.keys(shares).length ? shares : { [input.blocks[0]!.surface]: 1 },
      ladenShare: totalDistance > 0 ? Math.min(1, ladenDistance / totalDistance) : 0,
    },
    speedSeconds,
    notes,
  };
}
