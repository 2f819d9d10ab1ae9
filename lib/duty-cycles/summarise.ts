/**
 * The summary shown beside each duty cycle and stored with it: hours, distance, time spent
 * turning, turns per hour by radius band and by surface, and how time splits across speeds.
 */
import type { TSurfaceKind } from "@/lib/scrub/schemas";
import {
  SPEED_BINS,
  SPEED_BIN_WIDTH,
  type TSpeedHistogram,
  type TStoredTurn,
  type TStraight,
} from "@/lib/duty-cycles/stored-duty-cycle";

export const RADIUS_BANDS = [
  { key: "pivot", label: "pivot (0 m)", from: 0, to: 0 },
  { key: "under-5", label: "under 5 m", from: 0, to: 5 },
  { key: "5-10", label: "5–10 m", from: 5, to: 10 },
  { key: "10-20", label: "10–20 m", from: 10, to: 20 },
  { key: "20-50", label: "20–50 m", from: 20, to: 50 },
  { key: "50-up", label: "50 m and over", from: 50, to: Infinity },
] as const;

export type TDutyCycleSummary = {
  /** Hours the source covers (telematics), or null when the cycle describes one typical hour. */
  operatingHours: number | null;
  /** Distance per operating hour, turns and straight (m). */
  distancePerHour: number;
  /** Share of operating time spent turning (0..1). */
  turningShare: number;
  turnsPerHour: number;
  byRadiusBand: { key: string; label: string; perHour: number }[];
  bySurface: { surface: TSurfaceKind; perHour: number }[];
  /** Share of moving time in each speed band (m/s); sums to 1 when anything moved. */
  speedDistribution: { from: number; to: number; share: number }[];
  /** Turns given as a steer input (no radius) per hour, not in any radius band. */
  steerInputPerHour: number;
  rowsUsed: number;
  rowsSkipped: number;
};

function bandOf(radius: number): string {
  if (radius === 0) return "pivot";
  for (const b of RADIUS_BANDS)
    if (b.key !== "pivot" && radius >= b.from && radius < b.to) return b.key;
  return "50-up";
}

function turnSeconds(t: TStoredTurn): number {
  if (t.duration !== null) return t.duration;
  if (t.radius !== null && t.speed > 0)
    return (t.radius * t.headingChange * Math.PI) / 180 / t.speed;
  return 0;
}

export function summariseDutyCycle({
  turns,
  straight,
  operatingHours,
  speedHistogram,
  speedSeconds,
  rowsUsed = 0,
  rowsSkipped = 0,
}: {
  turns: readonly TStoredTurn[];
  straight: TStraight;
  operatingHours: number | null;
  speedHistogram?: TSpeedHistogram | null;
  /** Seconds in each SPEED_BIN_WIDTH band, all moving (the builder's split by block). */
  speedSeconds?: readonly number[];
  rowsUsed?: number;
  rowsSkipped?: number;
}): TDutyCycleSummary {
  const bands = new Map<string, number>(RADIUS_BANDS.map((b) => [b.key, 0]));
  const surfaces = new Map<TSurfaceKind, number>();
  let perHour = 0;
  let steerInputPerHour = 0;
  let turnDistance = 0;
  let turningSecondsPerHour = 0;
  // Seconds per hour in each speed band, when no measured histogram is at hand.
  const seconds = new Array<number>(SPEED_BINS).fill(0);
  const bin = (v: number) => Math.min(SPEED_BINS - 1, Math.floor(Math.abs(v) / SPEED_BIN_WIDTH));
  for (const t of turns) {
    perHour += t.perHour;
    if (t.radius === null) steerInputPerHour += t.perHour;
    else bands.set(bandOf(t.radius), bands.get(bandOf(t.radius))! + t.perHour);
    surfaces.set(t.surface, (surfaces.get(t.surface) ?? 0) + t.perHour);
    const s = turnSeconds(t) * t.perHour;
    turningSecondsPerHour += s;
    seconds[bin(t.speed)]! += s;
    turnDistance += (t.distance ?? t.speed * turnSeconds(t)) * t.perHour;
  }
  if (straight.speed > 0)
    seconds[bin(straight.speed)]! += straight.distancePerHour / straight.speed;
  const measured = speedHistogram?.seconds;
  const source =
    measured && measured.some((x) => x > 0)
      ? measured
      : speedSeconds && speedSeconds.some((x) => x > 0)
        ? speedSeconds
        : seconds;
  // Standing time says nothing about tyre wear in motion: shares are of moving time.
  const moving = source.reduce((s, x, i) => (i === 0 && measured ? s : s + x), 0);
  const binWidth = speedHistogram?.binWidth ?? SPEED_BIN_WIDTH;
  return {
    operatingHours,
    distancePerHour: turnDistance + straight.distancePerHour,
    turningShare: Math.min(1, turningSecondsPerHour / 3600),
    turnsPerHour: perHour,
    byRadiusBand: RADIUS_BANDS.map((b) => ({
      key: b.key,
      label: b.label,
      perHour: bands.get(b.key)!,
    })),
    bySurface: [...surfaces].map(([surface, n]) => ({ surface, perHour: n })),
    speedDistribution: source.map((x, i) => ({
      from: i * binWidth,
      to: (i + 1) * binWidth,
      share: moving > 0 && !(i === 0 && measured) ? x / moving : 0,
    })),
    steerInputPerHour,
    rowsUsed,
    rowsSkipped,
  };
}
