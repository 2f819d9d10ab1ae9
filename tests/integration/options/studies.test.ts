// Comparisons and sweeps API: the real engine through real route handlers on real PostgreSQL.
import { beforeAll, describe, expect, it } from "vitest";
import {
  compareOptions,
  ENGINE_COEFFICIENTS,
  type TDutyCycleInput,
  type TMachineInput,
} from "@/lib/scrub";
import { POST as createCustomer } from "@/app/api/v1/customers/route";
import { POST as createMachine } from "@/app/api/v1/machines/route";
import { POST as createEstimate } from "@/app/api/v1/estimates/route";
import { GET as listComparisons, POST as createComparison } from "@/app/api/v1/comparisons/route";
import { GET as getComparison } from "@/app/api/v1/comparisons/[id]/route";
import { POST as rerunComparison } from "@/app/api/v1/comparisons/[id]/rerun/route";
import { GET as listSweeps, POST as createSweep } from "@/app/api/v1/sweeps/route";
import { GET as getSweep } from "@/app/api/v1/sweeps/[id]/route";
import { createTestMember } from "@/tests/support/session";
import {
  call,
  db,
  insertReadyDutyCycle,
  makeDealership,
  testTractorSpec,
} from "@/tests/support/records";

let team: Awaited<ReturnType<typeof makeDealership>>;
let estimateId: string;
let customerId: string;

const options = [
  {
    name: "Parallel linkage",
    changes: [{ kind: "steering", steering: { layout: "parallel", maxLock: 50 } }],
    oneOffCost: 0,
  },
  {
    name: "Wider front track",
    changes: [{ kind: "parameter", parameter: "frontTrack", value: 2 }],
    oneOffCost: 650,
  },
];

beforeAll(async () => {
  team = await makeDealership();
  const post = (handler: typeof createCustomer, path: string, body: unknown) =>
    call(handler, team.admin.cookie, path, { method: "POST", body });
  const setup = async (name: string) => {
    const customer = (await post(createCustomer, "/api/v1/customers", { name })).body.id;
    const machine = (
      await post(createMachine, "/api/v1/machines", {
        customerId: customer,
        kind: "tractor",
        spec: testTractorSpec(),
      })
    ).body.id;
    const dutyCycle = (
      await insertReadyDutyCycle({ dealershipId: team.dealershipId, customerId: customer })
    ).id;
    const est = await post(createEstimate, "/api/v1/estimates", {
      machineId: machine,
      dutyCycleId: dutyCycle,
    });
    return { customer, estimate: est.body.id as string };
  };
  const a = await setup("Tarnbeck Farm");
  customerId = a.customer;
  estimateId = a.estimate;
});

describe("comparisons API", () => {
  it("stores a comparison whose frozen inputs reproduce the engine result, and reruns as version 2", async () => {
    const res = await call(createComparison, team.estimator.cookie, "/api/v1/comparisons", {
      method: "POST",
      body: { estimateId, options, hours: 1500 },
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ kind: "comparison", version: 1, hours: 1500, customerId });
    expect(res.body.result.options.map((o: { name: string }) => o.name)).toEqual([
      "Parallel linkage",
      "Wider front track",
    ]);
    const { optionStudies, estimates } = await import("@/db/schema");
    const { eq } = await import("drizzle-orm");
    const [est] = await db.select().from(estimates).where(eq(estimates.id, estimateId));
    const frozen = est!.inputs as { machine: TMachineInput; dutyCycle: TDutyCycleInput };
    const direct = JSON.parse(
      JSON.stringify(
        compareOptions(frozen.machine, frozen.dutyCycle, options as never, { hours: 1500 }),
      ),
    );
    expect(res.body.result).toEqual(direct);
    expect(res.body.result.options[1].cautions.map((c: { code: string }) => c.code)).toContain(
      "option-track",
    );

    const again = await call(
      rerunComparison,
      team.estimator.cookie,
      `/api/v1/comparisons/${res.body.id}/rerun`,
      { method: "POST", params: { id: res.body.id } },
    );
    expect(again.status).toBe(201);
    expect(again.body).toMatchObject({ version: 2, seriesId: res.body.id });
    const [first] = await db.select().from(optionStudies).where(eq(optionStudies.id, res.body.id));
    expect(first!.version).toBe(1);

    const listed = await call(
      listComparisons,
      team.admin.cookie,
      `/api/v1/comparisons?estimateId=${estimateId}&pageSize=1`,
    );
    expect(listed.body).toMatchObject({ total: 2, pageSize: 1, pageCount: 2 });
    expect(listed.body.items).toHaveLength(1);

    // The comparison page lists every version of its series, newest first; another series on
    // the same estimate stays out.
    const other = await call(createComparison, team.estimator.cookie, "/api/v1/comparisons", {
      method: "POST",
      body: { estimateId, options: options.slice(1), hours: 1500 },
    });
    expect(other.status).toBe(201);
    const series = await call(
      listComparisons,
      team.admin.cookie,
      `/api/v1/comparisons?seriesId=${res.body.id}`,
    );
    expect(series.status).toBe(200);
    expect(
      series.body.items.map((r: { id: string; version: number }) => [r.id, r.version]),
    ).toEqual([
      [again.body.id, 2],
      [res.body.id, 1],
    ]);
    const badSeries = await call(
      listComparisons,
      team.admin.cookie,
      "/api/v1/comparisons?seriesId=7",
    );
    expect(badSeries.status).toBe(400);
  });

  it("rejects bad options with a field error and stores nothing", async () => {
    const before = (await call(listComparisons, team.admin.cookie, "/api/v1/comparisons")).body
      .total;
    for (const body of [
      { estimateId, options: [] },
      { estimateId, options: [{ name: "", changes: [], oneOffCost: -1 }] },
      { estimateId: "00000000-0000-4000-8000-000000000009", options },
    ]) {
      const res = await call(createComparison, team.admin.cookie, "/api/v1/comparisons", {
        method: "POST",
        body,
      });
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe("invalid_input");
      expect(Object.keys(res.body.error.fieldErrors).length).toBeGreaterThan(0);
    }
    const bad = await call(createComparison, team.admin.cookie, "/api/v1/comparisons", {
      method: "POST",
      body: {
        estimateId,
        options: [
          {
            name: "Hinge",
            changes: [{ kind: "parameter", parameter: "hingePosition", value: 0.5 }],
            oneOffCost: 0,
          },
        ],
      },
    });
    expect(bad.status).toBe(422);
    expect(bad.body.error.message).toMatch(/hingePosition does not apply/);
    const after = (await call(listComparisons, team.admin.cookie, "/api/v1/comparisons")).body
      .total;
    expect(after).toBe(before);
  });

  it("runs with the source estimate's engine options, so a calibrated estimate's study is calibrated", async () => {
    const { estimates } = await import("@/db/schema");
    const { eq } = await import("drizzle-orm");
    const [est] = await db.select().from(estimates).where(eq(estimates.id, estimateId));
    const frozen = est!.inputs as { machine: TMachineInput; dutyCycle: TDutyCycleInput };
    // As a calibration stores it: base wear scaled by a fitted multiplier of 2.
    const engineOptions = { baseWearPerKm: ENGINE_COEFFICIENTS.BASE_WEAR_MM_PER_KM * 2 };
    const { id: _id, createdAt: _c, ...copy } = est!;
    const [scaled] = await db
      .insert(estimates)
      .values({ ...copy, title: "scaled", inputs: { ...frozen, options: engineOptions } })
      .returning({ id: estimates.id });
    const res = await call(createComparison, team.estimator.cookie, "/api/v1/comparisons", {
      method: "POST",
      body: { estimateId: scaled!.id, options, hours: 1500 },
    });
    expect(res.status).toBe(201);
    const withOptions = compareOptions(frozen.machine, frozen.dutyCycle, options as never, {
      ...engineOptions,
      hours: 1500,
    });
    const without = compareOptions(frozen.machine, frozen.dutyCycle, options as never, {
      hours: 1500,
    });
    expect(res.body.result.current.costPerHour).toBeCloseTo(withOptions.current.costPerHour, 9);
    expect(res.body.result.current.costPerHour).not.toBeCloseTo(without.current.costPerHour, 6);
  });

  it("a customer account reads no comparison directly: the dealer shares it as a quote report", async () => {
    const mine = await call(createComparison, team.admin.cookie, "/api/v1/comparisons", {
      method: "POST",
      body: { estimateId, options },
    });
    expect(mine.status).toBe(201);
    const me = await createTestMember({
      db,
      roles: ["customer"],
      dealershipId: team.dealershipId,
      customerId,
    });
    // Even the customer's own comparison is the dealer's working material until shared.
    const own = await call(getComparison, me.cookie, `/api/v1/comparisons/${mine.body.id}`, {
      params: { id: mine.body.id },
    });
    expect(own.status).toBe(404);
    const listed = await call(listComparisons, me.cookie, "/api/v1/comparisons?pageSize=100");
    expect(listed.status).toBe(404);
    const create = await call(createComparison, me.cookie, "/api/v1/comparisons", {
      method: "POST",
      body: { estimateId, options },
    });
    expect(create.status).toBe(403);
  });
});

describe("sweeps API", () => {
  it("stores a sweep with points in the order of the values and a best within limits", async () => {
    const values = [1.6, 1.7, 1.8, 1.9, 2.0, 2.1];
    const res = await call(createSweep, team.estimator.cookie, "/api/v1/sweeps", {
      method: "POST",
      body: { estimateId, sweep: { parameter: "frontTrack", values, limits: { max: 2.0 } } },
    });
    expect(res.status).toBe(201);
    expect(res.body.result.points.map((p: { value: number }) => p.value)).toEqual(values);
    expect(res.body.result.points[5].feasible).toBe(false);
    expect(res.body.result.best.value).toBeLessThanOrEqual(2.0);
    const got = await call(getSweep, team.admin.cookie, `/api/v1/sweeps/${res.body.id}`, {
      params: { id: res.body.id },
    });
    expect(got.body.result).toEqual(res.body.result);
    const listed = await call(
      listSweeps,
      team.admin.cookie,
      `/api/v1/sweeps?estimateId=${estimateId}`,
    );
    expect(listed.body.total).toBe(1);
  });
});
