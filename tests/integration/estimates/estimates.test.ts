// Estimates API: runs the real engine through real route handlers on the real PostgreSQL.
import { beforeAll, describe, expect, it } from "vitest";
import { estimate, ENGINE_VERSION, type TDutyCycleInput, type TMachineInput } from "@/lib/scrub";
import { POST as createCustomer } from "@/app/api/v1/customers/route";
import { POST as createSite } from "@/app/api/v1/sites/route";
import { POST as createMachine } from "@/app/api/v1/machines/route";
import { DELETE as deleteMachine, PATCH as patchMachine } from "@/app/api/v1/machines/[id]/route";
import { GET as list, POST as create } from "@/app/api/v1/estimates/route";
import { GET as getOne, PATCH as patch, DELETE as remove } from "@/app/api/v1/estimates/[id]/route";
import { GET as csv } from "@/app/api/v1/estimates/[id]/csv/route";
import { createTestMember } from "@/tests/support/session";
import {
  call,
  db,
  insertReadyDutyCycle,
  makeDealership,
  testTractorSpec,
} from "@/tests/support/records";

let team: Awaited<ReturnType<typeof makeDealership>>;
let customerId: string;
let otherCustomerId: string;
let machineId: string;
let dutyCycleId: string;
beforeAll(async () => {
  team = await makeDealership();
  const post = (handler: typeof createCustomer, path: string, body: unknown) =>
    call(handler, team.admin.cookie, path, { method: "POST", body });
  customerId = (await post(createCustomer, "/api/v1/customers", { name: "Wychwood Farm" })).body.id;
  otherCustomerId = (await post(createCustomer, "/api/v1/customers", { name: "Coldharbour Farm" }))
    .body.id;
  machineId = (
    await post(createMachine, "/api/v1/machines", {
      customerId,
      kind: "tractor",
      spec: testTractorSpec(),
    })
  ).body.id;
  dutyCycleId = (await insertReadyDutyCycle({ dealershipId: team.dealershipId, customerId })).id;
});

describe("estimates API", () => {
  it("runs the engine, stores inputs and versions, and the stored inputs reproduce the result", async () => {
    const res = await call(create, team.estimator.cookie, "/api/v1/estimates", {
      method: "POST",
      body: { machineId, dutyCycleId },
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      title: "Test row-crop tractor · Test yard work",
      engineVersion: ENGINE_VERSION,
      machineVersion: 1,
      dutyCycleVersion: 1,
      customerId,
    });
    expect(res.body.result.positions).toHaveLength(4);
    expect(res.body.costPerHour).toBeCloseTo(res.body.result.costPerHour, 9);

    const { estimates } = await import("@/db/schema");
    const { eq } = await import("drizzle-orm");
    const [row] = await db.select().from(estimates).where(eq(estimates.id, res.body.id));
    const inputs = row!.inputs as {
      machine: TMachineInput;
      dutyCycle: TDutyCycleInput;
      options: object;
    };
    // Compared through JSON, as stored (JSON has no negative zero).
    const rerun = JSON.parse(
      JSON.stringify(estimate(inputs.machine, inputs.dutyCycle, inputs.options)),
    );
    expect(rerun).toEqual(row!.result);

    // Each turn kind carries what the duty cycle said about it, for the estimate page's turns
    // table (direction, surface, speed, load, steering), read from the frozen inputs.
    const one = await call(getOne, team.estimator.cookie, `/api/v1/estimates/${res.body.id}`, {
      params: { id: res.body.id },
    });
    expect(one.body.turnTraits).toHaveLength(res.body.result.turns.length);
    inputs.dutyCycle.turns.forEach((kind, i) => {
      expect(one.body.turnTraits[i]).toMatchObject({
        direction: kind.turn.direction,
        surface: kind.turn.surface,
        speed: kind.turn.speed,
        loadState: kind.turn.loadState,
        steeringMode: kind.turn.steeringMode ?? inputs.machine.steering.layout,
        headingChange: kind.turn.headingChange,
        abrasion: expect.any(Number),
      });
    });
  });

  it.each([
    ["machineId not a uuid", { machineId: "tractor-1" }, "machineId"],
    ["dutyCycleId missing", { dutyCycleId: undefined }, "dutyCycleId"],
    ["siteId not a uuid", { siteId: "yard" }, "siteId"],
    ["title too long", { title: "t".repeat(161) }, "title"],
    ["unknown machine", { machineId: "00000000-0000-4000-8000-000000000001" }, "machineId"],
    ["unknown duty cycle", { dutyCycleId: "00000000-0000-4000-8000-000000000002" }, "dutyCycleId"],
    ["unknown site", { siteId: "00000000-0000-4000-8000-000000000003" }, "siteId"],
  ])("rejects %s with a field error and stores nothing", async (_label, change, field) => {
    const before = (await call(list, team.admin.cookie, "/api/v1/estimates?pageSize=1")).body.total;
    const res = await call(create, team.admin.cookie, "/api/v1/estimates", {
      method: "POST",
      body: { machineId, dutyCycleId, ...change },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors[field]?.[0]).toEqual(expect.any(String));
    expect((await call(list, team.admin.cookie, "/api/v1/estimates?pageSize=1")).body.total).toBe(
      before,
    );
  });

  it("renames an estimate but refuses any other change, keeping the stored result", async () => {
    const e = await call(create, team.admin.cookie, "/api/v1/estimates", {
      method: "POST",
      body: { machineId, dutyCycleId },
    });
    const id = e.body.id;
    const renamed = await call(patch, team.estimator.cookie, "x", {
      method: "PATCH",
      params: { id },
      body: { title: "Spring quote" },
    });
    expect(renamed.status).toBe(200);
    expect(renamed.body.title).toBe("Spring quote");
    expect(renamed.body.result).toEqual(e.body.result);
    const empty = await call(patch, team.admin.cookie, "x", {
      method: "PATCH",
      params: { id },
      body: { title: " " },
    });
    expect(empty.status).toBe(400);
    expect(empty.body.error.fieldErrors.title).toBeDefined();
    const other = await call(patch, team.admin.cookie, "x", {
      method: "PATCH",
      params: { id },
      body: { title: "X", costPerHour: 0 },
    });
    expect(other.status).toBe(400);
    expect((await call(getOne, team.admin.cookie, "x", { params: { id } })).body.title).toBe(
      "Spring quote",
    );
    expect(
      (
        await call(patch, team.billing.cookie, "x", {
          method: "PATCH",
          params: { id },
          body: { title: "No" },
        })
      ).status,
    ).toBe(403);
  });

  it("refuses a duty cycle that is not ready, or belongs to another customer", async () => {
    const pending = await insertReadyDutyCycle({
      dealershipId: team.dealershipId,
      customerId,
      status: "pending",
    });
    const res = await call(create, team.admin.cookie, "/api/v1/estimates", {
      method: "POST",
      body: { machineId, dutyCycleId: pending.id },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors.dutyCycleId[0]).toMatch(/pending/);
    const others = await insertReadyDutyCycle({
      dealershipId: team.dealershipId,
      customerId: otherCustomerId,
    });
    const res2 = await call(create, team.admin.cookie, "/api/v1/estimates", {
      method: "POST",
      body: { machineId, dutyCycleId: others.id },
    });
    expect(res2.status).toBe(400);
    expect(res2.body.error.fieldErrors.dutyCycleId[0]).toMatch(/own customer/);
  });

  it("fills turns logged without a surface from the chosen site's mix, and asks for a site otherwise", async () => {
    const noSurface = await insertReadyDutyCycle({
      dealershipId: team.dealershipId,
      customerId,
      turns: [
        { label: "Field end", radius: 7, headingChange: 180, perHour: 10, surface: "unknown" },
      ],
    });
    const without = await call(create, team.admin.cookie, "/api/v1/estimates", {
      method: "POST",
      body: { machineId, dutyCycleId: noSurface.id },
    });
    expect(without.status).toBe(400);
    expect(without.body.error.fieldErrors.siteId[0]).toMatch(/surface/);

    const site = await call(createSite, team.admin.cookie, "/api/v1/sites", {
      method: "POST",
      body: { customerId, name: "Clay fields", surfaceMix: { "firm-soil": 0.75, grass: 0.25 } },
    });
    const withSite = await call(create, team.admin.cookie, "/api/v1/estimates", {
      method: "POST",
      body: { machineId, dutyCycleId: noSurface.id, siteId: site.body.id },
    });
    expect(withSite.status).toBe(201);
    expect(withSite.body.siteId).toBe(site.body.id);
    // The one turn kind became one per surface, sharing its 10 turns per hour 3:1.
    const perHour = withSite.body.result.turns
      .map((t: { perHour: number }) => t.perHour)
      .sort((a: number, b: number) => a - b);
    expect(perHour).toEqual([2.5, 7.5]);
  });

  it("exports a per-turn CSV with formula injection neutralised", async () => {
    const risky = await insertReadyDutyCycle({
      dealershipId: team.dealershipId,
      customerId,
      turns: [
        {
          label: '=HYPERLINK("http://x.test","go")',
          radius: 9,
          headingChange: 90,
          perHour: 4,
          surface: "gravel",
        },
      ],
    });
    const e = await call(create, team.admin.cookie, "/api/v1/estimates", {
      method: "POST",
      body: { machineId, dutyCycleId: risky.id, title: "+Risky, title" },
    });
    expect(e.status).toBe(201);
    const res = await call(csv, team.billing.cookie, "x", { params: { id: e.body.id } });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/^text\/csv/);
    expect(res.headers.get("content-disposition")).toBe(
      'attachment; filename="risky-title-turns.csv"',
    );
    const lines = (res.body as string).trimEnd().split("\r\n");
    expect(lines[0]).toMatch(/^turn,label,per_hour,feasible,steering_mode,radius_m/);
    expect(lines).toHaveLength(1 + 4); // one row per wheel of the one turn
    expect(lines[1]).toContain(`"'=HYPERLINK(""http://x.test"",""go"")"`);
    expect(lines[1]).not.toMatch(/,=HYPERLINK/);
  });

  it("pages within the limit, filters by machine and sorts by cost", async () => {
    const all = await call(
      list,
      team.admin.cookie,
      `/api/v1/estimates?machineId=${machineId}&sort=costPerHour&dir=desc&pageSize=2`,
    );
    expect(all.status).toBe(200);
    expect(all.body.total).toBeGreaterThanOrEqual(3);
    expect(all.body.items).toHaveLength(2);
    expect(all.body.items[0].costPerHour).toBeGreaterThanOrEqual(all.body.items[1].costPerHour);
    expect(all.body.items[0]).not.toHaveProperty("result");
    for (const qs of ["pageSize=101", "page=-1", "sort=result", "machineId=7"]) {
      const bad = await call(list, team.admin.cookie, `/api/v1/estimates?${qs}`);
      expect(bad.status, qs).toBe(400);
    }
  });

  it("a customer account reads no estimates, not even its own (reports are what is shared), and cannot run them", async () => {
    const mine = await createTestMember({
      db,
      roles: ["customer"],
      dealershipId: team.dealershipId,
      customerId,
    });
    const staffList = await call(
      list,
      team.admin.cookie,
      `/api/v1/estimates?customerId=${customerId}`,
    );
    const id = staffList.body.items[0].id;
    const listed = await call(list, mine.cookie, "/api/v1/estimates?pageSize=100");
    expect(listed.status).toBe(403);
    expect(listed.body.error.message).toContain("Reports");
    expect((await call(getOne, mine.cookie, "x", { params: { id } })).status).toBe(404);
    expect((await call(csv, mine.cookie, "x", { params: { id } })).status).toBe(404);
    expect(
      (
        await call(create, mine.cookie, "/api/v1/estimates", {
          method: "POST",
          body: { machineId, dutyCycleId },
        })
      ).status,
    ).toBe(403);
  });

  it("a machine moved to another customer takes its estimates along", async () => {
    const m = await call(createMachine, team.admin.cookie, "/api/v1/machines", {
      method: "POST",
      body: { customerId, kind: "tractor", spec: testTractorSpec({ name: "Sold on" }) },
    });
    const e = await call(create, team.admin.cookie, "/api/v1/estimates", {
      method: "POST",
      body: { machineId: m.body.id, dutyCycleId },
    });
    const moved = await call(patchMachine, team.admin.cookie, "x", {
      method: "PATCH",
      params: { id: m.body.id },
      body: { customerId: otherCustomerId },
    });
    expect(moved.status).toBe(200);
    const got = await call(getOne, team.admin.cookie, "x", { params: { id: e.body.id } });
    expect(got.body).toMatchObject({
      customerId: otherCustomerId,
      customerName: "Coldharbour Farm",
    });
  });

  it("deleting asks first; deleting the machine removes its estimates too", async () => {
    const m = await call(createMachine, team.admin.cookie, "/api/v1/machines", {
      method: "POST",
      body: { customerId, kind: "tractor", spec: testTractorSpec({ name: "Short-lived" }) },
    });
    const e1 = await call(create, team.admin.cookie, "/api/v1/estimates", {
      method: "POST",
      body: { machineId: m.body.id, dutyCycleId },
    });
    const e2 = await call(create, team.admin.cookie, "/api/v1/estimates", {
      method: "POST",
      body: { machineId: m.body.id, dutyCycleId },
    });
    expect(
      (await call(remove, team.admin.cookie, "x", { method: "DELETE", params: { id: e1.body.id } }))
        .status,
    ).toBe(409);
    expect(
      (
        await call(remove, team.admin.cookie, "x?confirm=true", {
          method: "DELETE",
          params: { id: e1.body.id },
        })
      ).status,
    ).toBe(200);
    expect(
      (await call(getOne, team.admin.cookie, "x", { params: { id: e1.body.id } })).status,
    ).toBe(404);

    const ask = await call(deleteMachine, team.admin.cookie, "x", {
      method: "DELETE",
      params: { id: m.body.id },
    });
    expect(ask.body.error.impact.estimates).toBe(1);
    expect(
      (
        await call(deleteMachine, team.admin.cookie, "x?confirm=true", {
          method: "DELETE",
          params: { id: m.body.id },
        })
      ).status,
    ).toBe(200);
    expect(
      (await call(getOne, team.admin.cookie, "x", { params: { id: e2.body.id } })).status,
    ).toBe(404);
  });
});
