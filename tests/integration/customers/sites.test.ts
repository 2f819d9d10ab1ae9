// Sites API: real route handlers, real PostgreSQL, real session cookies.
import { beforeAll, describe, expect, it } from "vitest";
import { POST as createCustomer } from "@/app/api/v1/customers/route";
import { GET as list, POST as create } from "@/app/api/v1/sites/route";
import { GET as getOne, PATCH as patch, DELETE as remove } from "@/app/api/v1/sites/[id]/route";
import { createTestMember } from "@/tests/support/session";
import { call, db, makeDealership } from "@/tests/support/records";

let team: Awaited<ReturnType<typeof makeDealership>>;
let customerId: string;
let otherCustomerId: string;
beforeAll(async () => {
  team = await makeDealership();
  customerId = (
    await call(createCustomer, team.admin.cookie, "/api/v1/customers", {
      method: "POST",
      body: { name: "Rowanlea Farm" },
    })
  ).body.id;
  otherCustomerId = (
    await call(createCustomer, team.admin.cookie, "/api/v1/customers", {
      method: "POST",
      body: { name: "Harrowby Contracting" },
    })
  ).body.id;
});

const goodSite = () => ({
  customerId,
  name: "Top fields",
  surfaceMix: { "concrete-asphalt": 0.1, gravel: 0.2, "firm-soil": 0.5, grass: 0.2 },
});

describe("sites API", () => {
  it("creates, lists by customer, updates and reads a site", async () => {
    const created = await call(create, team.estimator.cookie, "/api/v1/sites", {
      method: "POST",
      body: goodSite(),
    });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ name: "Top fields", customerName: "Rowanlea Farm" });
    const id = created.body.id as string;
    await call(create, team.admin.cookie, "/api/v1/sites", {
      method: "POST",
      body: { ...goodSite(), customerId: otherCustomerId, name: "Depot" },
    });

    const listed = await call(list, team.admin.cookie, `/api/v1/sites?customerId=${customerId}`);
    expect(listed.body.items.map((s: { name: string }) => s.name)).toEqual(["Top fields"]);

    const changed = await call(patch, team.admin.cookie, "x", {
      method: "PATCH",
      params: { id },
      body: { surfaceMix: { "loose-soil": 1 } },
    });
    expect(changed.status).toBe(200);
    expect(
      (await call(getOne, team.billing.cookie, "x", { params: { id } })).body.surfaceMix,
    ).toEqual({ "loose-soil": 1 });
  });

  it.each([
    ["customerId not a uuid", { customerId: "farm-1" }, "customerId"],
    ["name", { name: " " }, "name"],
    ["surfaceMix not adding to 100 %", { surfaceMix: { gravel: 0.5, grass: 0.4 } }, "surfaceMix"],
    ["surfaceMix share above 1", { surfaceMix: { gravel: 1.5 } }, "surfaceMix.gravel"],
    [
      "surfaceMix negative share",
      { surfaceMix: { gravel: -0.5, grass: 1.5 } },
      "surfaceMix.gravel",
    ],
    ["surfaceMix unknown surface", { surfaceMix: { lava: 1 } }, "surfaceMix"],
    ["surfaceMix all zero", { surfaceMix: { gravel: 0 } }, "surfaceMix"],
    ["notes", { notes: "n".repeat(5001) }, "notes"],
  ])("rejects a bad %s with a field error", async (_label, change, field) => {
    const res = await call(create, team.admin.cookie, "/api/v1/sites", {
      method: "POST",
      body: { ...goodSite(), ...change },
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fieldErrors)).toContain(field);
  });

  it("a customer of another dealership is a field error on customerId", async () => {
    const rival = await createTestMember({ db, roles: ["dealer_admin"] });
    const res = await call(create, rival.cookie, "/api/v1/sites", {
      method: "POST",
      body: goodSite(),
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors.customerId).toBeDefined();
  });

  it("a read-only role is refused before its body is read: 403, not a field error", async () => {
    const res = await call(create, team.billing.cookie, "/api/v1/sites", {
      method: "POST",
      body: {},
    });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("forbidden");
  });

  it("refuses page sizes above 100", async () => {
    const res = await call(list, team.admin.cookie, "/api/v1/sites?pageSize=500");
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors.pageSize[0]).toMatch(/at most 100/);
  });

  it("a customer account lists only its own sites and cannot change them", async () => {
    const me = await createTestMember({
      db,
      roles: ["customer"],
      dealershipId: team.dealershipId,
      customerId: otherCustomerId,
    });
    const res = await call(list, me.cookie, "/api/v1/sites");
    expect(
      res.body.items.every((s: { customerId: string }) => s.customerId === otherCustomerId),
    ).toBe(true);
    expect(res.body.total).toBe(1);
    const id = res.body.items[0].id;
    expect(
      (
        await call(patch, me.cookie, "x", {
          method: "PATCH",
          params: { id },
          body: { name: "Mine" },
        })
      ).status,
    ).toBe(403);
    expect(
      (
        await call(create, me.cookie, "/api/v1/sites", {
          method: "POST",
          body: { ...goodSite(), customerId: otherCustomerId },
        })
      ).status,
    ).toBe(403);
  });

  it("delete needs ?confirm=true", async () => {
    const s = await call(create, team.admin.cookie, "/api/v1/sites", {
      method: "POST",
      body: { ...goodSite(), name: "Spare paddock" },
    });
    const id = s.body.id;
    const first = await call(remove, team.admin.cookie, "x", { method: "DELETE", params: { id } });
    expect(first.status).toBe(409);
    expect((await call(getOne, team.admin.cookie, "x", { params: { id } })).status).toBe(200);
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
