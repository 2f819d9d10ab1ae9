// One prepared comparison per demo machine in the invented scenario: the dealership's own
// (invented) proposals against the machine's latest estimate, stored through the same server
// verb as the API. Idempotent: a machine that has a comparison already is left alone.
import { and, desc, eq, inArray, isNotNull } from "drizzle-orm";
import type { Db } from "@/db/client";
import { estimates, machines, optionStudies, type TDealership } from "@/db/schema";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import {
  parameterValue,
  ZMachine,
  type TMachine,
  type TMachineChange,
  type TMachineInput,
  type TOptionSpec,
} from "@/lib/scrub";
import { createStudy } from "@/features/options/server/create-study";
import { seedActor } from "@/scripts/seed/seed-actor";

/** Same sizes with a deeper tread at a higher price on both axles, and what fitting four costs. */
function deeperTread(m: TMachine): TOptionSpec {
  const changes: TMachineChange[] = (["front", "rear"] as const).map((axle) => {
    const t = m.axles[axle].tyre;
    return {
      kind: "tyres",
      axle,
      tyre: {
        ...t,
        treadDepthNew: Math.round(t.treadDepthNew * 1.3),
        price: Math.round(t.price * 1.2),
      },
    };
  });
  // Fitted at the next change: the one-off cost is the extra over a standard set of four.
  const extra = (["front", "rear"] as const).reduce(
    (sum, axle) =>
      sum + 2 * (Math.round(m.axles[axle].tyre.price * 1.2) - m.axles[axle].tyre.price),
    0,
  );
  return { name: "Deeper-tread tyres", changes, oneOffCost: extra };
}

const param = (
  parameter: Extract<TMachineChange, { kind: "parameter" }>["parameter"],
  value: number,
): TMachineChange => ({ kind: "parameter", parameter, value });

/** The layout-specific proposal the dealership's fitters would make for each demo machine. */
function layoutOption(demoId: string, m: TMachine): TOptionSpec | null {
  switch (demoId) {
    case "row-crop-tractor":
      // Less lead, and the operators leave the assist off through headland turns.
      return {
        name: "Less lead, assist off in turns",
        changes: [param("lead", 1), { kind: "front-assist-in-turns", engaged: false }],
        oneOffCost: 350,
      };
    case "articulated-loader":
      // A different frame on the next machine: the price difference the customer would pay.
      return {
        name: "Hinge at mid-wheelbase",
        changes: [param("hingePosition", 0.5)],
        oneOffCost: 2400,
      };
    case "wheeled-skid-steer":
      return {
        name: "Wider wheel offset",
        changes: [
          param("frontTrack", parameterValue(m, "frontTrack") + 0.1),
          param("rearTrack", parameterValue(m, "rearTrack") + 0.1),
        ],
        oneOffCost: 360,
      };
    case "telehandler":
      return {
        name: "Softer rear steer",
        changes: [param("rearSteerRatio", 0.8)],
        oneOffCost: 150,
      };
    case "rear-steer-combine": {
      const s = m.steering;
      if (s.layout !== "rear") return null;
      return {
        name: "Extra steering lock",
        changes: [{ kind: "steering", steering: { ...s, maxLock: Math.min(89, s.maxLock + 5) } }],
        oneOffCost: 620,
      };
    }
    case "turntable-wagon":
      return {
        name: "Wider front axle",
        changes: [param("frontTrack", parameterValue(m, "frontTrack") + 0.15)],
        oneOffCost: 540,
      };
    default:
      return null;
  }
}

export async function seedOptions(
  db: Db,
  { dealership, adminEmail }: { dealership: TDealership; adminEmail: string },
) {
  const actor = await seedActor(db, { email: adminEmail, role: "dealer_admin", dealership });
  const byName = new Map(DEMO_MACHINES.map((d) => [d.machine.name, d.id]));
  const rows = await db
    .select({ id: machines.id, name: machines.name })
    .from(machines)
    .where(
      and(
        eq(machines.dealershipId, dealership.id),
        isNotNull(machines.customerId),
        inArray(machines.name, [...byName.keys()]),
      ),
    );
  let added = 0;
  for (const machine of rows) {
    const demoId = byName.get(machine.name)!;
    const [done] = await db
      .select({ id: optionStudies.id })
      .from(optionStudies)
      .where(and(eq(optionStudies.machineId, machine.id), eq(optionStudies.kind, "comparison")))
      .limit(1);
    if (done) continue;
    const [latest] = await db
      .select({ id: estimates.id, inputs: estimates.inputs })
      .from(estimates)
      .where(eq(estimates.machineId, machine.id))
      .orderBy(desc(estimates.createdAt))
      .limit(1);
    if (!latest) continue;
    const frozen = ZMachine.parse((latest.inputs as { machine: TMachineInput }).machine);
    const options = [layoutOption(demoId, frozen), deeperTread(frozen)].filter(
      (o): o is TOptionSpec => o !== null,
    );
    await createStudy({
      db,
      actor,
      kind: "comparison",
      input: {
        estimateId: latest.id,
        title: `${machine.name}: the workshop's proposals`,
        options,
        hours: 2000,
      },
    });
    added++;
  }
  return { added };
}
