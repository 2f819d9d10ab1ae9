import type { TEstimateResult, TPositionResult } from "./schemas";

/** Smallest relative change worth a sentence [J]. */
const NOTABLE = 0.05;

type Pair = [TPositionResult, TPositionResult];

function axlePair(r: TEstimateResult, front: boolean): Pair {
  return (front ? [r.positions[0]!, r.positions[1]!] : [r.positions[2]!, r.positions[3]!]) as Pair;
}

const sum = (pair: Pair, pick: (p: TPositionResult) => number) => pick(pair[0]) + pick(pair[1]);

function change(before: number, after: number): number | null {
  if (!(before > 0)) return after > 0 ? Infinity : null;
  return (after - before) / before;
}

function percent(c: number): string {
  return `${Math.round(Math.abs(c) * 100)} %`;
}

function life(pair: Pair): number | null {
  const hours = pair.map((p) => p.hoursToReplacement).filter((h): h is number => h !== null);
  return hours.length > 0 ? Math.min(...hours) : null;
}

const round = (h: number) => Math.round(h).toLocaleString("en-GB");

/**
 * Reasons in plain words, computed from the two estimates: the lead change, then per axle the
 * wear terms that moved by at least 5 % and the life that results.
 */
export function optionReasons(current: TEstimateResult, option: TEstimateResult): string[] {
  const reasons: string[] = [];
  const leadFront = [axlePair(current, true), axlePair(option, true)] as const;
  if (
    current.lead !== null &&
    option.lead !== null &&
    Math.abs(current.lead - option.lead) > 1e-4
  ) {
    const c = change(
      sum(leadFront[0], (p) => p.energyPerHour.longitudinal),
      sum(leadFront[1], (p) => p.energyPerHour.longitudinal),
    );
    const effect =
      c === null || !Number.isFinite(c) || Math.abs(c) < NOTABLE
        ? "little change in fore-aft scrub"
        : `${percent(c)} ${c < 0 ? "less" : "more"} fore-aft scrub on the front tyres in assisted driving`;
    reasons.push(
      `Front-axle lead ${(current.lead * 100).toFixed(1)} % → ${(option.lead * 100).toFixed(1)} %: ${effect}.`,
    );
  }
  for (const front of [true, false]) {
    const before = axlePair(current, front);
    const after = axlePair(option, front);
    const name = front ? "front" : "rear";
    const parts: string[] = [];
    const terms: [string, (p: TPositionResult) => number][] = [
      ["sideways scrub in turns", (p) => p.energyPerHour.lateral],
      ["traction and braking slip", (p) => p.energyPerHour.traction],
      ["rolling wear from load", (p) => p.wearPer100h.base],
    ];
    for (const [label, pick] of terms) {
      const c = change(sum(before, pick), sum(after, pick));
      if (c === null || Math.abs(c) < NOTABLE) continue;
      parts.push(
        Number.isFinite(c) ? `${percent(c)} ${c < 0 ? "less" : "more"} ${label}` : `new ${label}`,
      );
    }
    if (after[0].designation !== before[0].designation) {
      parts.push(`${before[0].designation} → ${after[0].designation}`);
    }
    const loadBefore = before[0].loadRatio;
    const loadAfter = after[0].loadRatio;
    if (Math.abs(loadAfter - loadBefore) > 0.02) {
      parts.push(
        `load ${Math.round(loadBefore * 100)} % → ${Math.round(loadAfter * 100)} % of the rated load`,
      );
    }
    const lb = life(before);
    const la = life(after);
    if (lb !== null && la !== null && Math.abs(la - lb) / lb >= NOTABLE) {
      parts.push(`they last ${round(la)} h instead of ${round(lb)} h`);
    }
    if (parts.length > 0)
      reasons.push(`${name[0]!.toUpperCase()}${name.slice(1)} tyres: ${parts.join("; ")}.`);
  }
  if (reasons.length === 0) reasons.push("No wear term changes by 5 % or more on this duty cycle.");
  return reasons;
}
