// Demo tread readings for the invented scenario: each demo machine read every six weeks by the
// dealership's own (invented) fitters, wearing somewhat faster than the model predicts, so the
// calibration, the plan and the alerts have something to show. Idempotent: a machine that has
// readings already is left alone.
import { and, desc, eq, isNotNull, sql } from "drizzle-orm";
import type { Db } from "@/db/client";
import { estimates, machines, treadReadings, type TDealership } from "@/db/schema";
import { TYRE_POSITIONS, type TTyrePosition } from "@/lib/calibration";
import type { TEstimateResult, TMachineInput } from "@/lib/scrub";

/** How each demo machine really wears, against the model (invented). */
const TRUTH: Record<
  string,
  { base: number; scrub: number; hoursPerWeek: number; uneven?: TTyrePosition }
> = {
  "Hollin Vale Farm": { base: 1.15, scrub: 1.5, hoursPerWeek: 22 },
  "Brackenridge Quarry": { base: 1.3, scrub: 1.1, hoursPerWeek: 38 },
  "Copper Lane Contracting": { base: 1.1, scrub: 2.4, hoursPerWeek: 7, uneven: "front-left" },
  "Fallowmere Estate": { base: 0.9, scrub: 1.2, hoursPerWeek: 18 },
  "Millbrook Grain Co-op": { base: 1.0, scrub: 1.0, hoursPerWeek: 12 },
  "Ashgrove Dairy": { base: 1.2, scrub: 1.6, hoursPerWeek: 26 },
};
const FITTERS = ["Ines Calloway", "Tobiah Marsh", "Wren Okafor"];
const READINGS = 8;
const WEEKS_APART = 6;

/** Small repeatable gauge scatter (±0.3 mm) so the demo fit is not perfect. */
const scatter = (k: number) =>
  (Math.round(((Math.sin(k * 12.9898) * 43758.5453) % 1) * 6) / 10) * 0.5;

export async function seedReadings(db: Db, { dealership }: { dealership: TDealership }) {
  const rows = await db
    .select({
      id: machines.id,
      name: machines.name,
      spec: machines.spec,
      customer: sql<string>`(select name from customers c where c.id = ${machines.customerId})`,
    })
    .from(machines)
    .where(and(eq(machines.dealershipId, dealership.id), isNotNull(machines.customerId)));
  let added = 0;
  const today = new Date();
  for (const m of rows) {
    const truth = TRUTH[m.customer];
    if (!truth) continue;
    const [has] = await db
      .select({ id: treadReadings.id })
      .from(treadReadings)
      .where(eq(treadReadings.machineId, m.id))
      .limit(1);
    if (has) continue;
    const [est] = await db
      .select({ result: estimates.result })
      .from(estimates)
      .where(and(eq(estimates.machineId, m.id), sql`${estimates.inputs}->'calibration' is null`))
      .orderBy(desc(estimates.createdAt))
      .limit(1);
    if (!est) continue;
    const result = est.result as TEstimateResult;
    const spec = m.spec as TMachineInput;
    const values: (typeof treadReadings.$inferInsert)[] = [];
    TYRE_POSITIONS.forEach((position, pi) => {
      const p = result.positions.find((x) => x.position === position);
      if (!p) return;
      const tyre = position.startsWith("front") ? spec.axles.front.tyre : spec.axles.rear.tyre;
      const rate = (truth.base * p.wearPer100h.base + truth.scrub * p.wearPer100h.scrub) / 100;
      const usable = tyre.treadDepthNew - tyre.treadDepthReplace;
      // Start part-worn so that some tyres come due within the demo's planning horizon.
      const startDepth = tyre.treadDepthNew - usable * (0.25 + 0.1 * pi);
      let fittedAt = 1200;
      let fittedDepth = startDepth;
      for (let k = 0; k < READINGS; k++) {
        const weeksAgo = WEEKS_APART * (READINGS - 1 - k) + 2;
        const day = new Date(today.getTime() - weeksAgo * 7 * 86_400_000)
          .toISOString()
          .slice(0, 10);
        const hourMeter = 1200 + truth.hoursPerWeek * WEEKS_APART * k;
        let depth = fittedDepth - rate * (hourMeter - fittedAt);
        const base = {
          dealershipId: dealership.id,
          machineId: m.id,
          position,
          measuredOn: day,
          hourMeter,
          note: "",
        };
        if (depth < tyre.treadDepthReplace + 1) {
          // Worn out between visits: the fitter changed the tyre at this visit.
          fittedAt = hourMeter;
          fittedDepth = tyre.treadDepthNew;
          depth = fittedDepth;
          values.push({
            ...base,
            kind: "fitted",
            designation: tyre.designation,
            depthCentre: depth,
            depthInner: depth,
            depthOuter: depth,
            measuredBy: FITTERS[(k + pi) % FITTERS.length]!,
            note: "New tyre fitted",
          });
          continue;
        }
        const uneven =
          truth.uneven === position ? Math.min(0.6 * k, (0.3 * (hourMeter - fittedAt)) / 50) : 0;
        values.push({
          ...base,
          depthCentre: Math.round((depth + scatter(k + pi * 10)) * 10) / 10,
          depthInner: Math.round((depth - uneven + scatter(k + pi * 10 + 3)) * 10) / 10,
          depthOuter: Math.round((depth + scatter(k + pi * 10 + 7)) * 10) / 10,
          measuredBy: FITTERS[(k + pi) % FITTERS.length]!,
        });
      }
    });
    if (values.length) {
      await db.insert(treadReadings).values(values);
      added += values.length;
    }
  }
  return { added };
}
