/**
 * Traction slip of a tyre in soil: the Brixius (1987) mobility-number equations as adopted in
 * ASABE D497 [M: constants from memory of ASAE paper 87-1622 / D497; verify before relying on
 * them]. All forces are per tyre; the equations are dimensionless ratios of the wheel load W.
 *
 *   B_n = (CI·b·d / W)·(1 + 5δ/h)/(1 + 3b/d)
 *   GT  = 0.88·(1 − e^(−0.1·B_n))·(1 − e^(−7.5·s)) + 0.04
 *   MRR = 1/B_n + 0.04 + 0.5·s/√B_n
 *   NT  = GT − MRR
 */

export interface TBrixiusTyre {
  /** Cone index (kPa). */
  coneIndex: number;
  /** Section width b and overall diameter d (m). */
  width: number;
  diameter: number;
  /** Deflection over section height δ/h (dimensionless). */
  deflectionRatio: number;
  /** Wheel load (N). */
  load: number;
}

/** Brixius mobility number B_n (CI in kPa = kN/m², load converted to kN). */
export function mobilityNumber(t: TBrixiusTyre): number {
  const loadKn = t.load / 1000;
  return (
    ((t.coneIndex * t.width * t.diameter) / loadKn) *
    ((1 + 5 * t.deflectionRatio) / (1 + (3 * t.width) / t.diameter))
  );
}

/** Gross traction, motion resistance and net traction ratios at slip s (0..1). */
export function brixiusRatios(bn: number, slip: number): { gt: number; mrr: number; nt: number } {
  const gt = 0.88 * (1 - Math.exp(-0.1 * bn)) * (1 - Math.exp(-7.5 * slip)) + 0.04;
  const mrr = 1 / bn + 0.04 + (0.5 * slip) / Math.sqrt(bn);
  return { gt, mrr, nt: gt - mrr };
}

export interface TDriveAxle {
  /** Mobility number of the axle's tyres. */
  bn: number;
  /** Axle load (N). */
  load: number;
  driven: boolean;
}

export interface TTractionSolution {
  /** Common travel-reduction slip of the driven axles (0..1). */
  slip: number;
  /** Gross traction force per axle (N); 0 for undriven axles. */
  grossForce: number[];
  /** False when the driven tyres cannot deliver the pull (slip held at the peak of NT). */
  withinTraction: boolean;
}

/**
 * Slip s at which the driven axles pull `pull` (N) plus the rolling resistance of the undriven
 * axles: Σ_driven W·NT(s) = pull + Σ_undriven W·MRR(0). Coupled driven axles share one slip
 * (lead is handled as wind-up elsewhere). Bisection on the rising branch of NT(s).
 */
export function solveTractionSlip(axles: TDriveAxle[], pull: number): TTractionSolution {
  let demand = pull;
  for (const a of axles) if (!a.driven) demand += a.load * brixiusRatios(a.bn, 0).mrr;
  const supply = (s: number) => {
    let f = 0;
    for (const a of axles) if (a.driven) f += a.load * brixiusRatios(a.bn, s).nt;
    return f;
  };
  // NT(s) rises to a peak and then falls slowly; find the peak on a coarse grid first.
  let peak = 0;
  let peakValue = supply(0);
  for (let s = 0.01; s <= 0.9 + 1e-9; s += 0.01) {
    const v = supply(s);
    if (v > peakValue) {
      peakValue = v;
      peak = s;
    }
  }
  let slip: number;
  let withinTraction = true;
  if (supply(0) >= demand) slip = 0;
  else if (peakValue < demand) {
    slip = peak;
    withinTraction = false;
  } else {
    let lo = 0;
    let hi = peak;
    for (let i = 0; i < 50; i++) {
      const mid = (lo + hi) / 2;
      if (supply(mid) < demand) lo = mid;
      else hi = mid;
    }
    slip = (lo + hi) / 2;
  }
  return {
    slip,
    grossForce: axles.map((a) => (a.driven ? a.load * brixiusRatios(a.bn, slip).gt : 0)),
    withinTraction,
  };
}
