// Machines API: real route handlers, real PostgreSQL, real session cookies.
import { beforeAll, describe, expect, it } from "vitest";
import { POST as createCustomer } from "@/app/api/v1/customers/route";
import { GET as list, POST as create } from "@/app/api/v1/machines/route";
import { GET as getOne, PATCH as patch, DELETE as remove } from "@/app/api/v1/machines/[id]/route";
import { POST as copy } from "@/app/api/v1/machines/[id]/copy/route";
import { createTestMember } from "@/tests/support/session";
import { call, db, makeDealership, testTractorSpec } from "@/tests/support/records";

let team: Awaited<ReturnType<typeof makeDealership>>;
let customerId: string;
beforeAll(async () => {
  team = await makeDealership();
  customerId = (
    await call(createCustomer, team.admin.cookie, "/api/v1/customers", {
      method: "POST",
      body: { name: "Amberlow Farm" },
    })
  ).body.id;
});

const machineBody = (spec = testTractorSpec()) => ({ customerId, kind: "tractor", spec });

describe("machines API", () => {
  it("creates a machine, stores the layout and applies the engine's defaults", async () => {
    const res = await call(create, team.estimator.cookie, "/api/v1/machines", {
      method: "POST",
      body: machineBody(),
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      name: "Test row-crop tractor",
      layout: "trapezoid",
      version: 1,
      customerName: "Amberlow Farm",
    });
    // otherSteeringModes defaults to [] in the engine schema.
    expect(res.body.spec.otherSteeringModes).toEqual([]);
  });

  it.each([
    ["kind", { kind: "hovercraft" }, "kind"],
    ["customerId", { customerId: "nope" }, "customerId"],
    ["spec.name", { spec: testTractorSpec({ name: "" }) }, "spec.name"],
    ["spec.wheelbase zero", { spec: testTractorSpec({ wheelbase: 0 }) }, "spec.wheelbase"],
    ["spec.wheelbase too long", { spec: testTractorSpec({ wheelbase: 40 }) }, "spec.wheelbase"],
    [
      "front track",
      {
        spec: {
          ...testTractorSpec(),
          axles: {
            ...testTractorSpec().axles,
            front: { ...testTractorSpec().axles.front, track: -1 },
          },
        },
      },
      "spec.axles.front.track",
    ],
    [
      "front tyre designation",
      {
        spec: {
          ...testTractorSpec(),
          axles: {
            ...testTractorSpec().axles,
            front: {
              ...testTractorSpec().axles.front,
              tyre: { ...testTractorSpec().axles.front.tyre, designation: "" },
            },
          },
        },
      },
      "spec.axles.front.tyre.designation",
    ],
    [
      "trapezoid without an arm length",
      {
        spec: testTractorSpec({
          steering: { layout: "trapezoid", maxLock: 50, armAngle: 15, tieRod: "behind" } as never,
        }),
      },
      "spec.steering.armLength",
    ],
    [
      "unknown steering layout",
      { spec: testTractorSpec({ steering: { layout: "hover", maxLock: 50 } as never }) },
      "spec.steering.layout",
    ],
    [
      "max lock over 89°",
      { spec: testTractorSpec({ steering: { layout: "parallel", maxLock: 95 } }) },
      "spec.steering.maxLock",
    ],
    [
      "drive gear ratio",
      { spec: testTractorSpec({ drive: { type: "front-assist", gearRatio: -1 } }) },
      "spec.drive.gearRatio",
    ],
  ])("rejects a bad %s with a field error", async (_label, change, field) => {
    const res = await call(create, team.admin.cookie, "/api/v1/machines", {
      method: "POST",
      body: { ...machineBody(), ...change },
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fieldErrors)).toContain(field);
  });

  it("a changed spec bumps the version; a bad one leaves the stored machine as it was", async () => {
    const m = await call(create, team.admin.cookie, "/api/v1/machines", {
      method: "POST",
      body: machineBody(),
    });
    const id = m.body.id;
    const bad = await call(patch, team.admin.cookie, "x", {
      method: "PATCH",
      params: { id },
      body: { spec: testTractorSpec({ wheelbase: -2 }) },
    });
    expect(bad.status).toBe(400);
    expect((await call(getOne, team.admin.cookie, "x", { params: { id } })).body).toMatchObject({
      version: 1,
      spec: { wheelbase: 2.8 },
    });
    const good = await call(patch, team.admin.cookie, "x", {
      method: "PATCH",
      params: { id },
      body: {
        spec: testTractorSpec({
          name: "Renamed tractor",
          steering: { layout: "parallel", maxLock: 45 },
        }),
      },
    });
    expect(good.status).toBe(200);
    expect(good.body).toMatchObject({ version: 2, name: "Renamed tractor", layout: "parallel" });
  });

  it("keeps dealership templates from customer accounts and copies them to a customer", async () => {
    const template = await call(create, team.admin.cookie, "/api/v1/machines", {
      method: "POST",
      body: {
        customerId: null,
        kind: "tractor",
        spec: testTractorSpec({ name: "Template 140 hp tractor" }),
      },
    });
    expect(template.status).toBe(201);
    const tid = template.body.id;

    const templates = await call(list, team.admin.cookie, "/api/v1/machines?template=true");
    expect(templates.body.items.map((m: { id: string }) => m.id)).toEqual([tid]);

    const copied = await call(copy, team.estimator.cookie, "x", {
      method: "POST",
      params: { id: tid },
      body: { customerId, name: "Amberlow's tractor" },
    });
    expect(copied.status).toBe(201);
    expect(copied.body).toMatchObject({
      customerId,
      templateId: tid,
      name: "Amberlow's tractor",
      layout: "trapezoid",
    });

    const badCopy = await call(copy, team.estimator.cookie, "x", {
      method: "POST",
      params: { id: tid },
      body: { customerId: "x" },
    });
    expect(badCopy.status).toBe(400);
    expect(badCopy.body.error.fieldErrors.customerId).toBeDefined();

    const me = await createTestMember({
      db,
      roles: ["customer"],
      dealershipId: team.dealershipId,
      customerId,
    });
    expect((await call(getOne, me.cookie, "x", { params: { id: tid } })).status).toBe(404);
    const mine = await call(list, me.cookie, "/api/v1/machines?pageSize=100");
    expect(mine.body.items.length).toBeGreaterThan(0);
    expect(mine.body.items.every((m: { customerId: string }) => m.customerId === customerId)).toBe(
      true,
    );
    expect(
      (
        await call(copy, me.cookie, "x", {
          method: "POST",
          params: { id: mine.body.items[0].id },
          body: { customerId },
        })
      ).status,
    ).toBe(403);
  });

  it("filters by layout and text and pages within the limit", async () => {
    const own = await makeDealership();
    const cid = (
      await call(createCustomer, own.admin.cookie, "/api/v1/customers", {
        method: "POST",
        body: { name: "Filter Farm" },
      })
    ).body.id;
    for (let i = 0; i < 7; i++) {
      const spec =
        i % 2
          ? testTractorSpec({
              name: `Parallel ${i}`,
              steering: { layout: "parallel", maxLock: 40 },
            })
          : testTractorSpec({ name: `Linkage ${i}` });
      await call(create, own.admin.cookie, "/api/v1/machines", {
        method: "POST",
        body: { customerId: cid, kind: "tractor", spec },
      });
    }
    const parallel = await call(
      list,
      own.admin.cookie,
      "/api/v1/machines?layout=parallel&sort=name",
    );
    expect(parallel.body.items.map((m: { name: string }) => m.name)).toEqual([
      "Parallel 1",
      "Parallel 3",
      "Parallel 5",
    ]);
    const page = await call(list, own.admin.cookie, "/api/v1/machines?pageSize=3&page=3&sort=name");
    expect(page.body).toMatchObject({ total: 7, pageCount: 3 });
    expect(page.body.items).toHaveLength(1);
    const text = await call(list, own.admin.cookie, "/api/v1/machines?q=linkage%206");
    expect(text.body.total).toBe(1);
    expect((await call(list, own.admin.cookie, "/api/v1/machines?pageSize=1000")).status).toBe(400);
    expect((await call(list, own.admin.cookie, "/api/v1/machines?template=maybe")).status).toBe(
      400,
    );
    expect(
      (await call(list, own.admin.cookie, "/api/v1/machines?customerId=42")).body.error.fieldErrors
        .customerId,
    ).toBeDefined();
  });

  it("delete asks first, then removes the machine", async () => {
    const m = await call(create, team.admin.cookie, "/api/v1/machines", {
      method: "POST",
      body: machineBody(),
    });
    const id = m.body.id;
    const first = await call(remove, team.admin.cookie, "x", { method: "DELETE", params: { id } });
    expect(first.status).toBe(409);
    expect(first.body.error.impact).toEqual({ estimates: 0, dutyCyclesUnlinked: 0 });
    expect(
      (
        await call(remove, team.billing.cookie, "x?confirm=true", {
          method: "DELETE",
          params: { id },
        })
      ).status,
    ).toBe(403);
    expect(
      (
        await call(remove, team.admin.cookie, "x?confirm=true", {
          method: "DELETE",
          params: { id },
        })
      ).status,
    ).toBe(200);
    expect((await call(getOne, team.admin.cookie, "x", { params: { id } })).status).toBe(404);
  });
});
