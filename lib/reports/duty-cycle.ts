import type { TDutyCycleInput, TSurfaceKind } from "@/lib/scrub";

export type TReportDutyCycleSummary = {
  name: string;
  turnKinds: number;
  turnsPerHour: number;
  /** m per operating hour of straight travel */
  straightDistancePerHour: number;
  /** m/s */
  straightSpeed: number;
  /** Turns per hour by radius band (m). */
  byRadius: { label: string; from: number; to: number | null; perHour: number }[];
  /** Share of turns per surface (0..1). */
  surfaces: { surface: TSurfaceKind; share: number }[];
};

const BANDS = [
  { label: "under 5 m", from: 0, to: 5 },
  { label: "5–10 m", from: 5, to: 10 },
  { label: "10–20 m", from: 10, to: 20 },
  { label: "20 m and over", from: 20, to: null },
] as const;

/** What one hour of the customer's work looks like, from the duty cycle the engine ran. */
export function summariseEngineDutyCycle(cycle: TDutyCycleInput): TReportDutyCycleSummary {
  let total = 0;
  const bySurface = new Map<TSurfaceKind, number>();
  const byRadius: number[] = BANDS.map(() => 0);
  for (const kind of cycle.turns) {
    total += kind.perHour;
    const { turn } = kind;
    bySurface.set(turn.surface, (bySurface.get(turn.surface) ?? 0) + kind.perHour);
    if (turn.radius !== undefined) {
      const i = BANDS.findIndex((b) => b.to === null || turn.radius! < b.to);
      byRadius[i] = (byRadius[i] ?? 0) + kind.perHour;
    }
  }
  return {
    name: cycle.name,
    turnKinds: cycle.turns.length,
    turnsPerHour: total,
    straightDistancePerHour: cycle.straight.distancePerHour,
    straightSpeed: cycle.straight.speed,
    byRadius: BANDS.map((b, i) => ({ ...b, perHour: byRadius[i] ?? 0 })),
    surfaces: [...bySurface]
      .map(([surface, n]) => ({ surface, share: total > 0 ? n / total : 0 }))
      .sort((a, b) => b.share - a.share),
  };
}
