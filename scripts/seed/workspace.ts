// Demo workspace: customers' sites, machines of every steering layout, dealership templates and
// one stored estimate per machine. Idempotent: rows are matched by name within the dealership.
import { and, asc, eq, isNull } from "drizzle-orm";
import type { Db } from "@/db/client";
import {
  customers,
  dutyCycles,
  dutyCycleTurns,
  estimates,
  machines,
  sites,
  users,
  type TCustomer,
  type TDealership,
} from "@/db/schema";
import { ENGINE_VERSION, estimate, type TMachineInput } from "@/lib/scrub";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { DEMO_DUTY_CYCLES } from "@/lib/demo/duty-cycles";
import type { TStraight } from "@/lib/duty-cycles/stored-duty-cycle";
import { buildEstimateRecord, toStoredTurn } from "@/features/estimates/lib/estimate-record";

type TKind = "tractor" | "loader" | "skid-steer" | "telehandler" | "combine" | "wagon";

/** Who runs each demo machine (invented businesses) and the ground they work. */
const OWNERS: Record<string, { customer: string; kind: TKind; customerKind: string }> = {
  "row-crop-tractor": { customer: "Hollin Vale Farm", kind: "tractor", customerKind: "farm" },
  "articulated-loader": {
    customer: "Brackenridge Quarry",
    kind: "loader",
    customerKind: "contractor",
  },
  "wheeled-skid-steer": {
    customer: "Copper Lane Contracting",
    kind: "skid-steer",
    customerKind: "contractor",
  },
  telehandler: { customer: "Fallowmere Estate", kind: "telehandler", customerKind: "estate" },
  "rear-steer-combine": {
    customer: "Millbrook Grain Co-op",
    kind: "combine",
    customerKind: "farm",
  },
  "turntable-wagon": { customer: "Ashgrove Dairy", kind: "wagon", customerKind: "farm" },
};

const SITES: Record<string, { name: string; surfaceMix: Record<string, number> }[]> = {
  "Hollin Vale Farm": [
    {
      name: "Home farm and yard",
      surfaceMix: { "concrete-asphalt": 0.15, gravel: 0.1, "firm-soil": 0.55, grass: 0.2 },
    },
    { name: "Low meadows", surfaceMix: { "firm-soil": 0.3, "loose-soil": 0.2, grass: 0.5 } },
  ],
  "Brackenridge Quarry": [
    { name: "Pit and stockyard", surfaceMix: { gravel: 0.7, "concrete-asphalt": 0.3 } },
  ],
  "Copper Lane Contracting": [
    { name: "Depot", surfaceMix: { "concrete-asphalt": 0.8, gravel: 0.2 } },
  ],
  "Fallowmere Estate": [
    { name: "Estate yard", surfaceMix: { "concrete-asphalt": 0.4, gravel: 0.3, grass: 0.3 } },
  ],
  "Millbrook Grain Co-op": [
    { name: "Arable blocks", surfaceMix: { "firm-soil": 0.6, "loose-soil": 0.4 } },
  ],
  "Ashgrove Dairy": [
    { name: "Dairy unit", surfaceMix: { "concrete-asphalt": 0.85, gravel: 0.15 } },
  ],
  "Eastmere Contracting": [
    { name: "Main depot", surfaceMix: { "concrete-asphalt": 0.6, gravel: 0.4 } },
  ],
  "Sorrel Parish Council depot": [
    { name: "Parks and verges", surfaceMix: { grass: 0.7, "concrete-asphalt": 0.3 } },
  ],
};

/** Dealership templates: configurations of models the dealership sells, to copy to customers. */
const TEMPLATES = [
  { from: "row-crop-tractor", name: "Template: 140 hp row-crop tractor" },
  { from: "telehandler", name: "Template: 4 m telehandler" },
  { from: "wheeled-skid-steer", name: "Template: compact skid steer" },
];

async function upsertCustomer(
  db: Db,
  dealershipId: string,
  name: string,
  kind: string,
): Promise<TCustomer> {
  const [found] = await db
    .select()
    .from(customers)
    .where(and(eq(customers.dealershipId, dealershipId), eq(customers.name, name)));
  if (found) return found;
  const [row] = await db.insert(customers).values({ dealershipId, name, kind }).returning();
  return row!;
}

async function upsertMachine(
  db: Db,
  dealershipId: string,
  customerId: string | null,
  kind: string,
  spec: TMachineInput,
) {
  const owner = customerId ? eq(machines.customerId, customerId) : isNull(machines.customerId);
  const [found] = await db
    .select()
    .from(machines)
    .where(and(eq(machines.dealershipId, dealershipId), owner, eq(machines.name, spec.name)));
  if (found) return found;
  const [row] = await db
    .insert(machines)
    .values({ dealershipId, customerId, name: spec.name, kind, layout: spec.steering.layout, spec })
    .returning();
  return row!;
}

export async function seedWorkspace(
  db: Db,
  opts: {
    dealership: TDealership;
    /** Ids of the seeded duty cycles by demo key (from the duty-cycle seed), when it ran. */
    dutyCycleIds?: Record<string, string>;
    adminEmail: string;
  },
) {
  const dealershipId = opts.dealership.id;
  const [admin] = await db.select().from(users).where(eq(users.email, opts.adminEmail));
  if (!admin) throw new Error(`seed the demo accounts first: ${opts.adminEmail} is missing`);

  const kindOf = (name: string) =>
    Object.values(OWNERS).find((o) => o.customer === name)?.customerKind ?? "farm";
  for (const [customerName, list] of Object.entries(SITES)) {
    const customer = await upsertCustomer(db, dealershipId, customerName, kindOf(customerName));
    for (const s of list) {
      const [found] = await db
        .select()
        .from(sites)
        .where(and(eq(sites.customerId, customer.id), eq(sites.name, s.name)));
      if (!found) await db.insert(sites).values({ dealershipId, customerId: customer.id, ...s });
    }
  }

  let machineCount = 0;
  let estimateCount = 0;
  for (const demo of DEMO_MACHINES) {
    const owner = OWNERS[demo.id];
    if (!owner) continue;
    // A seeded duty cycle decides the customer, so machine and duty cycle always match.
    const cycleId = opts.dutyCycleIds?.[demo.id];
    const [cycle] = cycleId
      ? await db.select().from(dutyCycles).where(eq(dutyCycles.id, cycleId))
      : [];
    const customer = cycle
      ? (await db.select().from(customers).where(eq(customers.id, cycle.customerId)))[0]!
      : await upsertCustomer(db, dealershipId, owner.customer, owner.customerKind);
    const machine = await upsertMachine(db, dealershipId, customer.id, owner.kind, demo.machine);
    machineCount++;

    const [existing] = await db
      .select({ id: estimates.id })
      .from(estimates)
      .where(eq(estimates.machineId, machine.id));
    if (existing) continue;
    if (cycle && cycle.status === "ready") {
      const rows = await db
        .select()
        .from(dutyCycleTurns)
        .where(eq(dutyCycleTurns.dutyCycleId, cycle.id))
        .orderBy(asc(dutyCycleTurns.seq));
      const record = buildEstimateRecord({
        machine,
        cycle,
        turns: rows.map(toStoredTurn),
        straight: cycle.straight as TStraight | null,
        site: null,
      });
      await db.insert(estimates).values({ ...record, dealershipId, createdById: admin.id });
    } else {
      // No stored duty cycle yet: run the demo duty cycle itself and freeze it as the input.
      const dutyCycle = DEMO_DUTY_CYCLES[demo.id]!;
      const result = estimate(demo.machine, dutyCycle);
      const first = result.positions.find((p) => p.wearsFirst);
      await db.insert(estimates).values({
        dealershipId,
        customerId: customer.id,
        machineId: machine.id,
        dutyCycleId: null,
        title: `${machine.name} · ${dutyCycle.name}`,
        machineName: machine.name,
        dutyCycleName: dutyCycle.name,
        machineVersion: machine.version,
        engineVersion: ENGINE_VERSION,
        inputs: { machine: demo.machine, dutyCycle, options: {}, surfaceMix: null },
        result,
        costPerHour: result.costPerHour,
        hoursToFirstReplacement: first?.hoursToReplacement ?? null,
        firstToWear: result.firstToWear,
        warningCount: result.warnings.length,
        createdById: admin.id,
      });
    }
    estimateCount++;
  }

  for (const t of TEMPLATES) {
    const demo = DEMO_MACHINES.find((m) => m.id === t.from);
    if (!demo) continue;
    await upsertMachine(db, dealershipId, null, OWNERS[t.from]!.kind, {
      ...demo.machine,
      name: t.name,
    });
  }
  return { machines: machineCount, estimatesAdded: estimateCount, templates: TEMPLATES.length };
}
