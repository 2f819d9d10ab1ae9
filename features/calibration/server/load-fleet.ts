import "server-only";
import { and, eq, isNotNull, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, machines, treadReadings } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { readScope } from "@/lib/authz/policy";
import type { TMachineInput } from "@/lib/scrub";
import {
  computeFleet,
  TYRE_POSITIONS,
  type TFleetMachine,
  type TFleetMachineInput,
  type TPositionBasis,
  type TReadingPoint,
  type TTyrePosition,
} from "@/lib/calibration";

/** A position due within this many operating hours raises an alert. */
export const DEFAULT_ALERT_HOURS = 150;

type TBasisRow = {
  machine_id: string;
  estimate_id: string;
  created_at: Date;
  positions: {
    position: TTyrePosition;
    designation: string;
    wearPer100h: { base: number; scrub: number };
  }[];
  shares: Record<string, number> | null;
};

const tyreOf = (spec: TMachineInput, position: TTyrePosition) =>
  position.startsWith("front") ? spec.axles.front.tyre : spec.axles.rear.tyre;

export type TFleetBasis = { estimateId: string; createdAt: string };

/**
 * Loads every customer machine of the actor's dealership with its readings and the latest
 * uncalibrated estimate (the model's split of wear per position), and computes the fleet. Pools
 * use the whole dealership; what is returned is limited to what the actor may read.
 */
export async function loadFleet(
  db: DbOrTx,
  actor: TActor,
  {
    alertWithinHours = DEFAULT_ALERT_HOURS,
    customerId,
  }: { alertWithinHours?: number; customerId?: string } = {},
): Promise<{ fleet: TFleetMachine[]; basis: Map<string, TFleetBasis> }> {
  const scope = readScope(actor);
  const rows = await db
    .select({
      id: machines.id,
      name: machines.name,
      spec: machines.spec,
      customerId: machines.customerId,
      customerName: customers.name,
    })
    .from(machines)
    .innerJoin(customers, eq(customers.id, machines.customerId))
    .where(and(eq(machines.dealershipId, scope.dealershipId), isNotNull(machines.customerId)));
  const ids = rows.map((r) => r.id);
  const readings = ids.length
    ? await db
        .select()
        .from(treadReadings)
        .where(eq(treadReadings.dealershipId, scope.dealershipId))
    : [];
  // Latest estimate per machine that was not itself a calibrated run.
  const bases = ids.length
    ? ((
        await db.execute(sql`
          select distinct on (machine_id) machine_id, id as estimate_id, created_at,
            (select jsonb_agg(jsonb_build_object('position', p->'position', 'designation', p->'designation', 'wearPer100h', p->'wearPer100h'))
               from jsonb_array_elements(result->'positions') p) as positions,
            inputs->'dutyCycle'->'straight'->'surfaceShares' as shares
          from estimates
          where dealership_id = ${scope.dealershipId} and inputs->'calibration' is null
          order by machine_id, created_at desc`)
      ).rows as TBasisRow[])
    : [];
  const basisById = new Map(bases.map((b) => [b.machine_id, b]));
  const readingsById = new Map<string, TReadingPoint[]>();
  for (const r of readings) {
    const list = readingsById.get(r.machineId) ?? [];
    list.push({
      position: r.position as TTyrePosition,
      kind: r.kind === "fitted" ? "fitted" : "reading",
      measuredOn: r.measuredOn,
      hourMeter: r.hourMeter,
      depthCentre: r.depthCentre,
      depthInner: r.depthInner,
      depthOuter: r.depthOuter,
      designation: r.designation,
    });
    readingsById.set(r.machineId, list);
  }
  // A machine whose spec lacks tyres (never stored by the app, but possible in old rows) is left out.
  const usable = rows.filter((m) => {
    const axles = (m.spec as Partial<TMachineInput> | null)?.axles;
    return Boolean(axles?.front?.tyre && axles?.rear?.tyre);
  });
  const inputs: TFleetMachineInput[] = usable.map((m) => {
    const spec = m.spec as TMachineInput;
    const basis = basisById.get(m.id);
    const positions: TPositionBasis[] | null =
      basis?.positions?.map((p) => {
        const tyre = tyreOf(spec, p.position);
        return {
          position: p.position,
          designation: p.designation,
          components: { base: p.wearPer100h.base, scrub: p.wearPer100h.scrub },
          treadDepthNew: tyre.treadDepthNew,
          treadDepthReplace: tyre.treadDepthReplace,
          price: tyre.price,
        };
      }) ?? null;
    return {
      machineId: m.id,
      machineName: m.name,
      customerId: m.customerId,
      customerName: m.customerName,
      positions,
      designations: Object.fromEntries(
        TYRE_POSITIONS.map((p) => {
          const t = tyreOf(spec, p);
          return [
            p,
            { designation: t.designation, price: t.price, treadDepthReplace: t.treadDepthReplace },
          ];
        }),
      ) as TFleetMachineInput["designations"],
      surfaceShares: basis?.shares ?? {},
      readings: readingsById.get(m.id) ?? [],
    };
  });
  const fleet = computeFleet(inputs, { alertWithinHours }).filter(
    (m) =>
      (scope.customerId === null || m.customerId === scope.customerId) &&
      (customerId === undefined || m.customerId === customerId),
  );
  return {
    fleet,
    basis: new Map(
      bases.map((b) => [
        b.machine_id,
        { estimateId: b.estimate_id, createdAt: new Date(b.created_at).toISOString() },
      ]),
    ),
  };
}
