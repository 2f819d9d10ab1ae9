import { fitWear } from "./fit-wear";
import type { TFitResult, TMultipliers, TWearInterval } from "./types";

export type TMachineCalibrationInput = {
  machineId: string;
  /** Machines sharing a key (tyre sizes and surface mix) pool their readings. */
  poolKey: string;
  intervals: TWearInterval[];
};

export type TCalibration =
  | {
      source: "machine" | "pooled";
      multipliers: TMultipliers;
      fit: Extract<TFitResult, { ok: true }>;
      /** Why the machine's own fit was not used (pooled only). */
      ownRefusal?: Extract<TFitResult, { ok: false }>;
      /** Other machines whose readings the pooled fit used (pooled only). */
      pooledMachines?: number;
    }
  | {
      source: "none";
      own: Extract<TFitResult, { ok: false }>;
      pooled: Extract<TFitResult, { ok: false }> | null;
    };

/**
 * Calibrates every machine of a dealership: each machine's own fit when its readings allow,
 * else the pooled fit of machines with the same tyre sizes and surface mix, else a refusal.
 */
export function calibrateFleet(
  machines: readonly TMachineCalibrationInput[],
): Map<string, TCalibration> {
  const pools = new Map<string, TMachineCalibrationInput[]>();
  for (const m of machines) {
    const list = pools.get(m.poolKey) ?? [];
    list.push(m);
    pools.set(m.poolKey, list);
  }
  const pooledFits = new Map<string, TFitResult>();
  const pooledFit = (key: string) => {
    let fit = pooledFits.get(key);
    if (!fit) {
      fit = fitWear((pools.get(key) ?? []).flatMap((m) => m.intervals));
      pooledFits.set(key, fit);
    }
    return fit;
  };
  const out = new Map<string, TCalibration>();
  for (const m of machines) {
    const own = fitWear(m.intervals);
    if (own.ok) {
      out.set(m.machineId, { source: "machine", multipliers: own.multipliers, fit: own });
      continue;
    }
    const members = pools.get(m.poolKey) ?? [];
    const pooled = members.length > 1 ? pooledFit(m.poolKey) : null;
    if (pooled?.ok) {
      out.set(m.machineId, {
        source: "pooled",
        multipliers: pooled.multipliers,
        fit: pooled,
        ownRefusal: own,
        pooledMachines: members.filter((o) => o !== m && o.intervals.length > 0).length,
      });
    } else {
      out.set(m.machineId, { source: "none", own, pooled: pooled && !pooled.ok ? pooled : null });
    }
  }
  return out;
}

/** Surface mix as a coarse class so that machines on similar ground pool together. */
export function surfaceClass(shares: Partial<Record<string, number>>): string {
  const entries = Object.entries(shares).filter(([, v]) => (v ?? 0) > 0);
  const total = entries.reduce((s, [, v]) => s + (v ?? 0), 0);
  if (total <= 0) return "unknown";
  const [top, share] = entries.sort((a, b) => (b[1] ?? 0) - (a[1] ?? 0))[0]!;
  // A dominant surface names the class; an even mix is its own class.
  return (share ?? 0) / total >= 0.6 ? `mostly-${top}` : "mixed";
}

export function poolKeyOf(
  designations: readonly string[],
  shares: Partial<Record<string, number>>,
) {
  const sizes = [...new Set(designations.map((d) => d.trim().toUpperCase()))].sort().join("+");
  return `${sizes}|${surfaceClass(shares)}`;
}
