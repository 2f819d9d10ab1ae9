import { linearRegression } from "simple-statistics";

const DAY_MS = 86_400_000;

export const dayNumber = (isoDate: string) =>
  Math.floor(Date.parse(`${isoDate}T00:00:00Z`) / DAY_MS);
export const isoFromDayNumber = (day: number) =>
  new Date(Math.round(day) * DAY_MS).toISOString().slice(0, 10);

/**
 * Operating hours per week from hour-meter readings (date, hours): the least-squares slope of
 * hours against days, times 7. Null when the readings span less than a week or show no use.
 */
export function hoursPerWeek(points: readonly { measuredOn: string; hourMeter: number }[]) {
  const pairs = points.map((p) => [dayNumber(p.measuredOn), p.hourMeter] as [number, number]);
  const days = pairs.map(([d]) => d);
  if (pairs.length < 2 || Math.max(...days) - Math.min(...days) < 7) return null;
  const { m } = linearRegression(pairs);
  return m > 0 ? m * 7 : null;
}
