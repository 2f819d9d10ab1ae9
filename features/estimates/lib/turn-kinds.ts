import {
  DEFAULT_SURFACES,
  type TEstimateResult,
  type TSteeringLayout,
  type TSurfaceKind,
  type TSurfaceOverrides,
} from "@/lib/scrub";

/** What the duty cycle said about one turn kind: the traits that tell otherwise alike rows apart. */
export type TTurnTrait = {
  direction: "left" | "right";
  surface: TSurfaceKind;
  /** Travel speed (m/s). */
  speed: number;
  loadState: "unladen" | "laden";
  steeringMode: TSteeringLayout;
  /** Heading change of one occurrence (deg). */
  headingChange: number;
  /** The surface's abrasion multiplier used by the wear model (defaults with the cycle's overrides). */
  abrasion: number;
};

/** The frozen engine input's turns as traits, index-aligned with `result.turns`. */
export function turnTraitsFromInputs(
  inputs: unknown,
  defaultLayout: TSteeringLayout,
): TTurnTrait[] {
  const dutyCycle = (inputs as { dutyCycle?: { turns?: unknown[]; surfaces?: unknown } } | null)
    ?.dutyCycle;
  const overrides = (dutyCycle?.surfaces ?? {}) as TSurfaceOverrides;
  return (dutyCycle?.turns ?? []).map((raw) => {
    const t = ((raw as { turn?: Record<string, unknown> }).turn ?? {}) as {
      direction?: "left" | "right";
      surface?: TSurfaceKind;
      speed?: number;
      loadState?: "unladen" | "laden";
      steeringMode?: TSteeringLayout;
      headingChange?: number;
    };
    const surface = t.surface ?? "firm-soil";
    return {
      direction: t.direction === "right" ? "right" : "left",
      surface,
      // The engine's defaults when the stored input left them out.
      speed: t.speed ?? 1.5,
      loadState: t.loadState === "laden" ? "laden" : "unladen",
      steeringMode: t.steeringMode ?? defaultLayout,
      headingChange: t.headingChange ?? 0,
      abrasion: overrides[surface]?.abrasion ?? DEFAULT_SURFACES[surface]?.abrasion ?? 1,
    };
  });
}

/** One row of the turns table: identical duty-cycle rows merged, with what the kind costs. */
export type TTurnKindRow = {
  label: string;
  trait: TTurnTrait | null;
  /** Reference-point path radius (m). */
  radius: number;
  turningDiameter: number | null;
  feasible: boolean;
  /** How many rows of the duty cycle were identical and merged into this one. */
  rows: number;
  perHour: number;
  /** Frictional scrub energy of all wheels per operating hour (J/h). */
  energyPerHour: number;
  /** Share of the machine's scrub energy per hour (turns and straight-travel wind-up), 0..1. */
  energyShare: number | null;
  /** Share of the scrub tread wear (all four tyres, mm per hour), 0..1; null without wheel detail. */
  wearShare: number | null;
  /** Tyre cost per operating hour of that scrub wear (dealership currency); null without detail. */
  costPerHour: number | null;
};

export type TTurnKinds = {
  kinds: TTurnKindRow[];
  /** Traits that differ between the kinds (the table shows a column for each). */
  varying: Set<"direction" | "surface" | "speed" | "loadState" | "steeringMode">;
  /** Scrub not from turns (wind-up of coupled axles in straight travel), as shares. */
  straight: { energyShare: number | null; wearShare: number | null };
};

const TRAIT_KEYS = ["direction", "surface", "speed", "loadState", "steeringMode"] as const;

const share = (part: number, whole: number) => (whole > 0 ? part / whole : null);

/**
 * Groups an estimate's turn kinds that are identical in every input and result (six rows of the
 * same headland turn become one row with six times the count) and works out each kind's share
 * of the scrub energy, of the scrub wear and its scrub cost per hour, largest first.
 *
 * Wear of a wheel in a turn follows the engine's model (docs/engine.md, "Wear"): tread loss =
 * k_h × surface abrasion × frictional energy, with each position's k_h from the result; its
 * cost is that loss × the position's cost per millimetre (cost per hour ÷ total wear per hour).
 */
export function turnKinds(result: TEstimateResult, traits: readonly TTurnTrait[]): TTurnKinds {
  const positions = new Map(result.positions.map((p) => [p.position, p]));
  const scrubEnergyTotal = result.positions.reduce(
    (sum, p) => sum + p.energyPerHour.lateral + p.energyPerHour.longitudinal,
    0,
  );
  const scrubWearTotal = result.positions.reduce((sum, p) => sum + p.wearPer100h.scrub / 100, 0);
  const costPerMm = (position: string) => {
    const p = positions.get(position as never);
    const rate = p ? p.wearPer100h.total / 100 : 0;
    return p && rate > 0 ? p.costPerHour / rate : 0;
  };

  const groups = new Map<string, TTurnKindRow & { wear: number | null; cost: number | null }>();
  let turnEnergy = 0;
  let turnWear = 0;
  for (const t of result.turns) {
    const trait = traits[t.index] ?? null;
    const energyPerHour = t.energy * t.perHour;
    let wear: number | null = null;
    let cost: number | null = null;
    if (t.feasible && t.wheels.length > 0 && trait) {
      wear = 0;
      cost = 0;
      for (const w of t.wheels) {
        const kh = positions.get(w.position)?.wearCoefficient.value ?? 0;
        const mm = (kh * trait.abrasion * w.energy * t.perHour) / 1e6;
        wear += mm;
        cost += mm * costPerMm(w.position);
      }
    } else if (!t.feasible) {
      wear = 0;
      cost = 0;
    }
    turnEnergy += energyPerHour;
    turnWear += wear ?? 0;
    const key = JSON.stringify([
      t.label,
      trait && TRAIT_KEYS.map((k) => trait[k]),
      trait?.headingChange,
      t.radius,
      t.steerInput,
      t.feasible,
    ]);
    const g = groups.get(key);
    if (g) {
      g.rows += 1;
      g.perHour += t.perHour;
      g.energyPerHour += energyPerHour;
      g.wear = g.wear === null || wear === null ? null : g.wear + wear;
      g.cost = g.cost === null || cost === null ? null : g.cost + cost;
    } else {
      groups.set(key, {
        label: t.label,
        trait,
        radius: t.radius,
        turningDiameter: t.turningDiameter,
        feasible: t.feasible,
        rows: 1,
        perHour: t.perHour,
        energyPerHour,
        energyShare: null,
        wearShare: null,
        costPerHour: null,
        wear,
        cost,
      });
    }
  }
  // A tracked machine or an all-infeasible cycle has no scrub wear: shares stay empty.
  const wearWhole = scrubWearTotal > 0 ? scrubWearTotal : 0;
  const kinds = [...groups.values()].map(({ wear, cost, ...row }) => ({
    ...row,
    energyShare: share(row.energyPerHour, scrubEnergyTotal),
    wearShare: wear === null ? null : share(wear, wearWhole),
    costPerHour: wearWhole > 0 ? cost : null,
  }));
  kinds.sort(
    (a, b) => (b.costPerHour ?? -1) - (a.costPerHour ?? -1) || b.energyPerHour - a.energyPerHour,
  );
  const varying = new Set<TTurnKinds["varying"] extends Set<infer K> ? K : never>();
  for (const k of TRAIT_KEYS) {
    const values = new Set(kinds.map((row) => row.trait?.[k]));
    if (values.size > 1) varying.add(k);
  }
  return {
    kinds,
    varying,
    straight: {
      energyShare: share(Math.max(0, scrubEnergyTotal - turnEnergy), scrubEnergyTotal),
      wearShare: share(Math.max(0, wearWhole - turnWear), wearWhole),
    },
  };
}
