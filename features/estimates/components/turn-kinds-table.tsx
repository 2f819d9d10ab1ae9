"use client";

import type { TEstimateResult } from "@/lib/scrub";
import { SURFACE_LABELS } from "@/lib/duty-cycles/surface-names";
import { formatQuantity, formatSpeed, type TUnitSystem } from "@/lib/format/units";
import { formatMoney, formatPerHour } from "@/lib/format/format";
import { LAYOUT_LABELS } from "@/features/machines/client";
import { turnKinds, type TTurnKindRow, type TTurnTrait } from "@/features/estimates/lib/turn-kinds";

/** Rows shown; the CSV has every turn. */
const SHOWN = 50;

const percent = (share: number | null) =>
  share === null
    ? "—"
    : share > 0 && share < 0.001
      ? "<0.1 %"
      : `${(share * 100).toLocaleString("en-GB", { maximumFractionDigits: 1, minimumFractionDigits: 1 })} %`;

type TTraitColumn = {
  key: "direction" | "surface" | "speed" | "loadState" | "steeringMode";
  header: string;
  show: (t: TTurnTrait, system: TUnitSystem) => string;
};

const TRAIT_COLUMNS: TTraitColumn[] = [
  { key: "direction", header: "Direction", show: (t) => t.direction },
  { key: "surface", header: "Surface", show: (t) => SURFACE_LABELS[t.surface] ?? t.surface },
  { key: "speed", header: "Speed", show: (t, system) => formatSpeed(system, t.speed) },
  { key: "loadState", header: "Load", show: (t) => t.loadState },
  {
    key: "steeringMode",
    header: "Steering",
    show: (t) => LAYOUT_LABELS[t.steeringMode] ?? t.steeringMode,
  },
];

/**
 * The duty cycle's kinds of turn: identical rows merged, a column for each trait that tells the
 * kinds apart (the traits they share said once above), and what each kind costs in scrub.
 */
export function TurnKindsTable({
  result,
  traits,
  system,
  currency,
}: {
  result: TEstimateResult;
  traits: TTurnTrait[];
  system: TUnitSystem;
  currency: string;
}) {
  const { kinds, varying, straight } = turnKinds(result, traits);
  const columns = TRAIT_COLUMNS.filter((c) => varying.has(c.key));
  const common = TRAIT_COLUMNS.filter((c) => !varying.has(c.key));
  const sample = kinds.find((k) => k.trait)?.trait;
  const merged = result.turns.length - kinds.length;
  const infeasible = kinds.filter((k) => !k.feasible).length;
  const cell = "px-2 py-2";
  return (
    <>
      <p className="mb-2 text-sm text-ink-700" data-testid="turn-kinds-summary">
        {kinds.length} kinds of turn
        {merged > 0 ? ` (${merged} identical rows of the duty cycle merged)` : ""}, costliest first
        {infeasible > 0 ? `; ${infeasible} could not be steered that tight and add no wear` : ""}.
        {sample && common.length > 0
          ? ` Shared by every kind: ${common.map((c) => c.show(sample, system)).join(" · ")}.`
          : ""}
        {straight.energyShare !== null && straight.energyShare >= 0.001
          ? ` Straight travel (axle wind-up) makes ${percent(straight.energyShare)} of the scrub energy.`
          : ""}{" "}
        The CSV download has every wheel of every turn.
      </p>
      <div className="overflow-x-auto">
        <table className="min-w-full divide-y divide-ink-200 text-sm" data-testid="turns-table">
          <caption className="sr-only">Kinds of turn of the duty cycle and their scrub</caption>
          <thead className="bg-ink-100 text-left text-xs font-medium uppercase tracking-wide text-ink-700">
            <tr>
              <th scope="col" className={cell}>
                Turn
              </th>
              {columns.map((c) => (
                <th key={c.key} scope="col" className={cell}>
                  {c.header}
                </th>
              ))}
              <th scope="col" className={`${cell} text-right`}>
                Per hour
              </th>
              <th scope="col" className={`${cell} text-right`}>
                Radius
              </th>
              <th scope="col" className={`${cell} text-right`}>
                Turning diameter
              </th>
              <th scope="col" className={cell}>
                Steered
              </th>
              <th scope="col" className={`${cell} text-right`}>
                Scrub energy
              </th>
              <th scope="col" className={`${cell} text-right`}>
                Scrub wear
              </th>
              <th scope="col" className={`${cell} text-right`}>
                Scrub cost per hour ({currency})
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-ink-100">
            {kinds.slice(0, SHOWN).map((k: TTurnKindRow, i) => (
              <tr key={i}>
                <th scope="row" className={`${cell} text-left font-normal`}>
                  {k.label}
                  {k.rows > 1 ? (
                    <span className="ml-1 text-xs text-ink-600">× {k.rows} rows</span>
                  ) : null}
                </th>
                {columns.map((c) => (
                  <td key={c.key} className={cell}>
                    {k.trait ? c.show(k.trait, system) : "—"}
                  </td>
                ))}
                <td className={`${cell} text-right`}>{formatPerHour(k.perHour)}</td>
                <td className={`${cell} text-right`}>
                  {formatQuantity(system, "distance-m", k.radius, 1)}
                </td>
                <td className={`${cell} text-right`}>
                  {k.turningDiameter === null
                    ? "—"
                    : formatQuantity(system, "distance-m", k.turningDiameter, 1)}
                </td>
                <td className={cell}>{k.feasible ? "yes" : "too tight"}</td>
                <td className={`${cell} text-right`}>{percent(k.energyShare)}</td>
                <td className={`${cell} text-right`}>{percent(k.wearShare)}</td>
                <td className={`${cell} text-right`}>
                  {k.costPerHour === null ? "—" : formatMoney(k.costPerHour, currency)}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {kinds.length > SHOWN ? (
        <p className="mt-2 text-xs text-ink-600">
          The {SHOWN} costliest of {kinds.length} kinds are shown.
        </p>
      ) : null}
    </>
  );
}
