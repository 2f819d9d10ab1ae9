/**
 * Simple payback in operating hours: the one-off cost divided by the saving per hour. A change
 * that saves nothing never pays back (null); a change that costs nothing pays back at once (0).
 * Common practice, no source: no discounting, tyre prices as entered.
 */
export function paybackOf(oneOffCost: number, savingPerHour: number): number | null {
  if (!Number.isFinite(oneOffCost) || !Number.isFinite(savingPerHour)) return null;
  if (oneOffCost <= 0) return savingPerHour >= 0 ? 0 : null;
  if (savingPerHour <= 0) return null;
  return oneOffCost / savingPerHour;
}
