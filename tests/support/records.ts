import { getDb } from "@/db/client";
import type { TMachineInput } from "@/lib/scrub";
import { createTestMember, requestAs } from "@/tests/support/session";
import { documentedProblems as responseProblems } from "@/tests/support/openapi";

export const db = getDb();
export const BASE = "http://localhost:3000";

type THandler = (
  req: Request,
  ctx: { params: Promise<Record<string, string>> },
) => Promise<Response>;

/** Calls a route handler the way Next does: a real Request and the route's params. */
export async function call(
  handler: THandler,
  cookie: string | null,
  path: string,
  init: { method?: string; body?: unknown; params?: Record<string, string> } = {},
) {
  const res = await handler(requestAs(cookie, `${BASE}/${path.replace(/^\//, "")}`, init), {
    params: Promise.resolve(init.params ?? {}),
  });
  const text = await res.text();
  let body: any = text; // eslint-disable-line @typescript-eslint/no-explicit-any
  try {
    body = JSON.parse(text);
  } catch {
    // CSV and other text bodies stay as text
  }
  // Every answer an integration test sees must be as the OpenAPI document describes it (tests
  // that call a handler under a made-up path like "/x" are about the handler, not the path).
  const problems = responseProblems(
    init.method ?? "GET",
    `/${path.replace(/^\//, "")}`,
    res.status,
    res.headers.get("content-type"),
    body,
  );
  if (problems.length) throw new Error(`Answer not as documented:\n${problems.join("\n")}`);
  return { status: res.status, body, headers: res.headers };
}

/** A dealership with a dealer admin, an estimator, a billing admin and (later) customers. */
export async function makeDealership() {
  const admin = await createTestMember({ db, roles: ["dealer_admin"] });
  const dealershipId = admin.dealership.id;
  const estimator = await createTestMember({ db, roles: ["estimator"], dealershipId });
  const billing = await createTestMember({ db, roles: ["billing_admin"], dealershipId });
  return { admin, estimator, billing, dealershipId };
}

/** An invented front-wheel-assist tractor with a trapezoid linkage (test data, not a real model). */
export function testTractorSpec(overrides: Partial<TMachineInput> = {}): TMachineInput {
  return {
    name: "Test row-crop tractor",
    wheelbase: 2.8,
    axles: {
      front: {
        track: 1.9,
        pivotTrack: 1.7,
        load: 3000,
        tyre: { designation: "480/70R28", treadDepthNew: 40, treadDepthReplace: 10, price: 1500 },
      },
      rear: {
        track: 1.9,
        load: 4500,
        tyre: { designation: "580/70R38", treadDepthNew: 50, treadDepthReplace: 12, price: 2400 },
      },
    },
    steering: { layout: "trapezoid", maxLock: 55, armLength: 0.2, armAngle: 17, tieRod: "behind" },
    drive: { type: "front-assist", gearRatio: 1.32 },
    ...overrides,
  };
}

/** A ready duty cycle stored as the duty-cycle import would leave it (test data, invented). */
export async function insertReadyDutyCycle(opts: {
  dealershipId: string;
  customerId: string;
  name?: string;
  status?: "ready" | "pending" | "failed";
  turns?: {
    label?: string;
    radius: number;
    headingChange: number;
    perHour: number;
    surface: string;
    direction?: "left" | "right";
  }[];
}) {
  const { dutyCycles, dutyCycleTurns } = await import("@/db/schema");
  const [cycle] = await db
    .insert(dutyCycles)
    .values({
      dealershipId: opts.dealershipId,
      customerId: opts.customerId,
      name: opts.name ?? "Test yard work",
      source: "schedule",
      status: opts.status ?? "ready",
      operatingHours: 1,
      straight: {
        distancePerHour: 3000,
        speed: 3,
        surfaceShares: { "firm-soil": 1 },
        ladenShare: 0.5,
      },
    })
    .returning();
  const turns = opts.turns ?? [
    { label: "Headland turn", radius: 6, headingChange: 180, perHour: 20, surface: "firm-soil" },
    {
      label: "Yard turn",
      radius: 8,
      headingChange: 90,
      perHour: 12,
      surface: "concrete-asphalt",
      direction: "right" as const,
    },
  ];
  await db.insert(dutyCycleTurns).values(
    turns.map((t, i) => ({
      dutyCycleId: cycle!.id,
      seq: i,
      label: t.label ?? null,
      direction: t.direction ?? "left",
      radius: t.radius,
      headingChange: t.headingChange,
      speed: 1.5,
      perHour: t.perHour,
      surface: t.surface,
      loadState: "laden",
    })),
  );
  return cycle!;
}
