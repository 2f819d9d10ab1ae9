import type { TTyrePosition, TWearComponents, TWearInterval } from "./types";

/**
 * A stored reading as the pure code needs it. kind "fitted" marks a tyre change: the position's
 * history starts again there, with the new tyre's depth as its first point.
 */
export type TReadingPoint = {
  position: TTyrePosition;
  kind: "reading" | "fitted";
  measuredOn: string; // yyyy-mm-dd
  hourMeter: number;
  depthCentre: number;
  depthInner: number | null;
  depthOuter: number | null;
  designation?: string | null;
};

/** Mean of the points measured across the tread (centre and whichever shoulders were read). */
export function meanDepth(r: Pick<TReadingPoint, "depthCentre" | "depthInner" | "depthOuter">) {
  const points = [r.depthCentre, r.depthInner, r.depthOuter].filter(
    (v): v is number => v !== null && Number.isFinite(v),
  );
  return points.reduce((s, v) => s + v, 0) / points.length;
}

const byHourThenDate = (a: TReadingPoint, b: TReadingPoint) =>
  a.hourMeter - b.hourMeter ||
  a.measuredOn.localeCompare(b.measuredOn) ||
  (a.kind === "fitted" ? -1 : 0) - (b.kind === "fitted" ? -1 : 0);

/** The readings of the tyre now on `position`: everything from its last fitting on, oldest first. */
export function currentFitment(readings: readonly TReadingPoint[], position: TTyrePosition) {
  const mine = readings.filter((r) => r.position === position).sort(byHourThenDate);
  let start = 0;
  mine.forEach((r, i) => {
    if (r.kind === "fitted") start = i;
  });
  return mine.slice(start);
}

/**
 * Consecutive pairs of readings of one fitment become measured intervals; pairs across a tyre
 * change never do. Intervals with no hours between them are dropped (a re-measure on the day).
 */
export function wearIntervals(
  machineId: string,
  readings: readonly TReadingPoint[],
  components: Partial<Record<TTyrePosition, TWearComponents>>,
): TWearInterval[] {
  const out: TWearInterval[] = [];
  const positions = new Set(readings.map((r) => r.position));
  for (const position of positions) {
    const c = components[position];
    if (!c) continue;
    const mine = readings.filter((r) => r.position === position).sort(byHourThenDate);
    for (let i = 1; i < mine.length; i++) {
      const prev = mine[i - 1]!;
      const next = mine[i]!;
      if (next.kind === "fitted") continue;
      if (!(next.hourMeter > prev.hourMeter)) continue;
      out.push({
        machineId,
        position,
        fromHour: prev.hourMeter,
        toHour: next.hourMeter,
        loss: meanDepth(prev) - meanDepth(next),
        components: c,
      });
    }
  }
  return out;
}
