// Demo duty cycles for the invented customers, one per demo machine, keyed like the demo
// machines so the workspace seed can attach machines and estimates to them. Idempotent:
// a duty cycle is matched by name within the dealership and left alone when it exists.
import { and, eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { customers, dutyCycles, dutyCycleTurns, type TDealership } from "@/db/schema";
import type { TColumnMapping } from "@/lib/duty-cycles/column-mapping";
import { buildDutyCycle, type TBuilderInput } from "@/lib/duty-cycles/builder";
import { BUILDER_PRESETS } from "@/lib/duty-cycles/builder-presets";
import { summariseDutyCycle } from "@/lib/duty-cycles/summarise";
import { createTelematicsImporter } from "@/lib/duty-cycles/telematics-import";
import { samplePath, type TPathLeg } from "@/lib/duty-cycles/synthetic-path";
import type { TStoredTurn, TStraight } from "@/lib/duty-cycles/stored-duty-cycle";
import { toTurnRow } from "@/features/duty-cycles/server/turn-rows";

const preset = (key: string): TBuilderInput =>
  structuredClone(BUILDER_PRESETS.find((p) => p.key === key)!.input);

type TDemo = {
  customer: string;
  customerKind: string;
  name: string;
} & ({ builder: TBuilderInput } | { telematics: () => string[][] });

/** A skid steer clearing a yard: short runs, pivots on the spot, reversing out (invented). */
function skidSteerLog(): string[][] {
  const legs: TPathLeg[] = [];
  for (let i = 0; i < 40; i++) {
    legs.push({ kind: "straight", distance: 12, speed: 2.5 });
    legs.push({ kind: "stop", duration: 1 });
    legs.push({ kind: "pivot", headingChange: i % 2 ? 90 : -90, yawRate: i % 2 ? 40 : -40 });
    legs.push({ kind: "straight", distance: 6, speed: 1.5, reverse: true });
    legs.push({ kind: "arc", radius: 3, headingChange: i % 3 ? 120 : -120, speed: 1.5 });
  }
  return samplePath({ legs, hz: 5, noise: { yawRate: 0.4, speed: 0.03 }, seed: 2026 }).map((s) => [
    s.t.toFixed(1),
    (s.speed * 3.6).toFixed(2),
    s.yawRate.toFixed(2),
    "concrete",
  ]);
}

const SKID_MAPPING: TColumnMapping = {
  kind: "telematics",
  delimiter: ",",
  decimal: ".",
  hasHeader: true,
  encoding: "utf-8",
  columns: {
    time: { index: 0, header: "time_s", unit: "s" },
    speed: { index: 1, header: "speed_kmh", unit: "km/h" },
    yawRate: { index: 2, header: "yaw_dps", unit: "deg/s" },
    surface: { index: 3, header: "surface", unit: "text" },
  },
  defaults: { surface: "concrete-asphalt", loadState: "unladen", shiftHours: 8, maxSpeed: 6 },
};

/** Keyed by demo machine (lib/demo/machines.ts ids). Every business and figure is invented. */
const DEMOS: Record<string, TDemo> = {
  "row-crop-tractor": {
    customer: "Hollin Vale Farm",
    customerKind: "farm",
    name: "Spring cultivating, 6 m, with road moves",
    builder: preset("row-crop-cultivating"),
  },
  "articulated-loader": {
    customer: "Brackenridge Quarry",
    customerKind: "contractor",
    name: "Stockyard loading, 40 cycles an hour",
    builder: (() => {
      const input = preset("yard-loader");
      input.blocks[0]!.surface = "gravel";
      return input;
    })(),
  },
  "wheeled-skid-steer": {
    customer: "Copper Lane Contracting",
    customerKind: "contractor",
    name: "Depot clearing, logged by the machine",
    telematics: skidSteerLog,
  },
  telehandler: {
    customer: "Fallowmere Estate",
    customerKind: "estate",
    name: "Estate mix: mowing, yard and haulage",
    builder: preset("estate-mixed"),
  },
  "rear-steer-combine": {
    customer: "Millbrook Grain Co-op",
    customerKind: "farm",
    name: "Harvest, 9 m header, three-point headlands",
    builder: {
      minTurningRadius: 6.5,
      blocks: [
        {
          kind: "field",
          label: "Combining",
          share: 0.9,
          surface: "firm-soil",
          runLength: 350,
          workingWidth: 9,
          workingSpeed: 6 / 3.6,
          turnSpeed: 5 / 3.6,
          headlandTurn: "three-point",
          laden: true,
        },
        {
          kind: "road",
          label: "Between blocks",
          share: 0.1,
          surface: "concrete-asphalt",
          speed: 20 / 3.6,
          bendShare: 0.15,
          bendRadius: 30,
          bendAngle: 80,
          laden: false,
        },
      ],
    },
  },
  "turntable-wagon": {
    customer: "Ashgrove Dairy",
    customerKind: "farm",
    name: "Feed wagon rounds in the yard",
    builder: {
      minTurningRadius: 5,
      blocks: [
        {
          kind: "yard",
          label: "Feeding round",
          share: 0.7,
          surface: "concrete-asphalt",
          cyclesPerHour: 6,
          turns: [
            { headingChange: 90, radius: 7, reverse: false, laden: true },
            { headingChange: 180, radius: 8, reverse: false, laden: true },
            { headingChange: 90, radius: 7, reverse: false, laden: false },
          ],
          travelPerCycle: 400,
          speed: 8 / 3.6,
        },
        {
          kind: "road",
          label: "Farm track",
          share: 0.3,
          surface: "gravel",
          speed: 15 / 3.6,
          bendShare: 0.2,
          bendRadius: 25,
          bendAngle: 90,
          laden: true,
        },
      ],
    },
  },
};

async function upsertCustomer(db: Db, dealershipId: string, name: string, kind: string) {
  const [found] = await db
    .select()
    .from(customers)
    .where(and(eq(customers.dealershipId, dealershipId), eq(customers.name, name)));
  if (found) return found;
  const [row] = await db.insert(customers).values({ dealershipId, name, kind }).returning();
  return row!;
}

function contentOf(demo: TDemo) {
  if ("builder" in demo) {
    const built = buildDutyCycle(demo.builder);
    const summary = summariseDutyCycle({
      turns: built.turns,
      straight: built.straight,
      operatingHours: null,
    });
    return {
      source: "builder" as const,
      turns: built.turns,
      straight: built.straight as TStraight,
      summary: { ...summary, notes: built.notes },
      operatingHours: null,
      builderInput: demo.builder,
      mapping: null,
      rowsUsed: 0,
    };
  }
  // The same row-by-row path an uploaded log takes, minus the file.
  const importer = createTelematicsImporter(SKID_MAPPING);
  demo.telematics().forEach((row, i) => importer.pushRow(row, i + 2));
  const r = importer.finish();
  return {
    source: "telematics" as const,
    turns: r.turns as TStoredTurn[],
    straight: r.straight,
    summary: summariseDutyCycle({ ...r, speedHistogram: r.speedHistogram }),
    operatingHours: r.operatingHours,
    builderInput: null,
    mapping: SKID_MAPPING,
    rowsUsed: r.rowsUsed,
  };
}

/** Seeds the demo duty cycles; returns their ids keyed by demo machine id. */
export async function seedDutyCycles(
  db: Db,
  opts: { dealership: TDealership },
): Promise<Record<string, string>> {
  const dealershipId = opts.dealership.id;
  const ids: Record<string, string> = {};
  for (const [key, demo] of Object.entries(DEMOS)) {
    const customer = await upsertCustomer(db, dealershipId, demo.customer, demo.customerKind);
    const [found] = await db
      .select({ id: dutyCycles.id })
      .from(dutyCycles)
      .where(and(eq(dutyCycles.dealershipId, dealershipId), eq(dutyCycles.name, demo.name)));
    if (found) {
      ids[key] = found.id;
      continue;
    }
    const c = contentOf(demo);
    ids[key] = await db.transaction(async (tx) => {
      const [row] = await tx
        .insert(dutyCycles)
        .values({
          dealershipId,
          customerId: customer.id,
          name: demo.name,
          source: c.source,
          status: "ready",
          progress: 1,
          operatingHours: c.operatingHours,
          summary: c.summary,
          straight: c.straight,
          builderInput: c.builderInput,
          mapping: c.mapping,
          rowsUsed: c.rowsUsed,
          processedAt: new Date(),
        })
        .returning({ id: dutyCycles.id });
      await tx.insert(dutyCycleTurns).values(c.turns.map((t) => toTurnRow(row!.id, t)));
      return row!.id;
    });
  }
  return ids;
}
