// Customers API: real route handlers, real PostgreSQL, real session cookies.
import { beforeAll, describe, expect, it } from "vitest";
import { GET as list, POST as create } from "@/app/api/v1/customers/route";
import { GET as getOne, PATCH as patch, DELETE as remove } from "@/app/api/v1/customers/[id]/route";
import { POST as createSite } from "@/app/api/v1/sites/route";
import { GET as getSite } from "@/app/api/v1/sites/[id]/route";
import { createTestMember } from "@/tests/support/session";
import { call, makeDealership } from "@/tests/support/records";

let team: Awaited<ReturnType<typeof makeDealership>>;
beforeAll(async () => {
  team = await makeDealership();
});

const newCustomer = (name: string) => ({ name, kind: "farm", contactName: "Test Contact" });

describe("customers API", () => {
  it("refuses a request without a session (401)", async () => {
    const res = await call(list, null, "/api/v1/customers");
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe("unauthenticated");
  });

  it("creates, reads and updates a customer", async () => {
    const created = await call(create, team.estimator.cookie, "/api/v1/customers", {
      method: "POST",
      body: {
        ...newCustomer("Linden Rise Farm"),
        contacts: [{ name: "Yard foreman", phone: "01234" }],
      },
    });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ name: "Linden Rise Farm", kind: "farm", notes: "" });
    const id = created.body.id as string;

    const got = await call(getOne, team.billing.cookie, `/api/v1/customers/${id}`, {
      params: { id },
    });
    expect(got.status).toBe(200);
    expect(got.body.contacts).toEqual([{ name: "Yard foreman", phone: "01234" }]);

    const changed = await call(patch, team.admin.cookie, `/api/v1/customers/${id}`, {
      method: "PATCH",
      params: { id },
      body: { notes: "Prefers quotes by post." },
    });
    expect(changed.status).toBe(200);
    expect(changed.body).toMatchObject({
      name: "Linden Rise Farm",
      notes: "Prefers quotes by post.",
    });
  });

  it.each([
    ["name", { name: "" }, "name"],
    ["name too long", { name: "x".repeat(121) }, "name"],
    ["kind", { name: "A", kind: "spaceport" }, "kind"],
    ["contactEmail", { name: "A", contactEmail: "not-an-address" }, "contactEmail"],
    ["contacts[0].name", { name: "A", contacts: [{ name: "" }] }, "contacts.0.name"],
    [
      "contacts[0].email",
      { name: "A", contacts: [{ name: "B", email: "nope" }] },
      "contacts.0.email",
    ],
    ["notes", { name: "A", notes: "n".repeat(5001) }, "notes"],
  ])("rejects a bad %s with a field error and stores nothing", async (_label, body, field) => {
    const before = await call(list, team.admin.cookie, "/api/v1/customers?pageSize=1");
    const res = await call(create, team.admin.cookie, "/api/v1/customers", {
      method: "POST",
      body,
    });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("invalid_input");
    expect(res.body.error.fieldErrors[field]?.[0]).toEqual(expect.any(String));
    const after = await call(list, team.admin.cookie, "/api/v1/customers?pageSize=1");
    expect(after.body.total).toBe(before.body.total);
  });

  it("rejects a body that is not JSON", async () => {
    const res = await call(create, team.admin.cookie, "/api/v1/customers", {
      method: "POST",
      body: "{oops",
    });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("invalid_json");
  });

  it("a bad update changes nothing already stored", async () => {
    const c = await call(create, team.admin.cookie, "/api/v1/customers", {
      method: "POST",
      body: newCustomer("Steadfold Estate"),
    });
    const id = c.body.id as string;
    const bad = await call(patch, team.admin.cookie, `/api/v1/customers/${id}`, {
      method: "PATCH",
      params: { id },
      body: { name: "", notes: "lost?" },
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fieldErrors.name).toBeDefined();
    const got = await call(getOne, team.admin.cookie, `/api/v1/customers/${id}`, {
      params: { id },
    });
    expect(got.body).toMatchObject({ name: "Steadfold Estate", notes: "" });
  });

  describe("paging, sorting and filtering", () => {
    let cookie: string;
    beforeAll(async () => {
      const own = await makeDealership();
      cookie = own.admin.cookie;
      for (let i = 0; i < 23; i++) {
        await call(create, cookie, "/api/v1/customers", {
          method: "POST",
          body: newCustomer(`Paging Farm ${String(i).padStart(2, "0")}`),
        });
      }
      await call(create, cookie, "/api/v1/customers", {
        method: "POST",
        body: newCustomer("Odd 50%_name"),
      });
    });

    it("pages with totals", async () => {
      const res = await call(list, cookie, "/api/v1/customers?pageSize=10&page=3&sort=name");
      expect(res.status).toBe(200);
      expect(res.body).toMatchObject({ page: 3, pageSize: 10, total: 24, pageCount: 3 });
      expect(res.body.items).toHaveLength(4);
    });

    it("past the last page answers no rows with the right total", async () => {
      const res = await call(list, cookie, "/api/v1/customers?pageSize=10&page=9");
      expect(res.status).toBe(200);
      expect(res.body).toMatchObject({ items: [], total: 24, pageCount: 3 });
    });

    it("filters by kind and refuses an unknown kind", async () => {
      const none = await call(list, cookie, "/api/v1/customers?kind=council");
      expect(none.body.total).toBe(0);
      const farms = await call(list, cookie, "/api/v1/customers?kind=farm&pageSize=100");
      expect(farms.body.total).toBe(24);
      const bad = await call(list, cookie, "/api/v1/customers?kind=spaceport");
      expect(bad.status).toBe(400);
      expect(bad.body.error.fieldErrors.kind).toBeDefined();
    });

    it("sorts both ways", async () => {
      const asc = await call(
        list,
        cookie,
        "/api/v1/customers?pageSize=2&sort=name&dir=asc&q=paging",
      );
      const desc = await call(
        list,
        cookie,
        "/api/v1/customers?pageSize=2&sort=name&dir=desc&q=paging",
      );
      expect(asc.body.items.map((c: { name: string }) => c.name)).toEqual([
        "Paging Farm 00",
        "Paging Farm 01",
      ]);
      expect(desc.body.items.map((c: { name: string }) => c.name)).toEqual([
        "Paging Farm 22",
        "Paging Farm 21",
      ]);
    });

    it("filters by text, treating % and _ literally", async () => {
      const res = await call(list, cookie, `/api/v1/customers?q=${encodeURIComponent("50%_")}`);
      expect(res.body.total).toBe(1);
      expect(res.body.items[0].name).toBe("Odd 50%_name");
    });

    it.each([
      ["pageSize=101", "pageSize"],
      ["pageSize=0", "pageSize"],
      ["pageSize=ten", "pageSize"],
      ["page=0", "page"],
      ["page=1.5", "page"],
      ["sort=password", "sort"],
      ["dir=sideways", "dir"],
    ])("refuses %s with a field error", async (qs, field) => {
      const res = await call(list, cookie, `/api/v1/customers?${qs}`);
      expect(res.status).toBe(400);
      expect(res.body.error.fieldErrors[field]).toBeDefined();
    });

    it("accepts the largest page size", async () => {
      const res = await call(list, cookie, "/api/v1/customers?pageSize=100");
      expect(res.status).toBe(200);
      expect(res.body.items).toHaveLength(24);
    });
  });

  describe("who may see and change what", () => {
    let customerId: string;
    let otherCustomerId: string;
    beforeAll(async () => {
      customerId = (
        await call(create, team.admin.cookie, "/api/v1/customers", {
          method: "POST",
          body: newCustomer("Brookhollow Farm"),
        })
      ).body.id;
      otherCustomerId = (
        await call(create, team.admin.cookie, "/api/v1/customers", {
          method: "POST",
          body: newCustomer("Nettlecombe Farm"),
        })
      ).body.id;
    });

    it("another dealership sees 404, not the record", async () => {
      const rival = await createTestMember({
        db: (await import("@/tests/support/records")).db,
        roles: ["dealer_admin"],
      });
      const res = await call(getOne, rival.cookie, `/api/v1/customers/${customerId}`, {
        params: { id: customerId },
      });
      expect(res.status).toBe(404);
      const del = await call(remove, rival.cookie, `/api/v1/customers/${customerId}?confirm=true`, {
        method: "DELETE",
        params: { id: customerId },
      });
      expect(del.status).toBe(404);
    });

    it("a customer account sees only its own record, read-only", async () => {
      const me = await createTestMember({
        db: (await import("@/tests/support/records")).db,
        roles: ["customer"],
        dealershipId: team.dealershipId,
        customerId,
      });
      const mine = await call(list, me.cookie, "/api/v1/customers?pageSize=100");
      expect(mine.body.items.map((c: { id: string }) => c.id)).toEqual([customerId]);
      expect((await call(getOne, me.cookie, "x", { params: { id: otherCustomerId } })).status).toBe(
        404,
      );
      const edit = await call(patch, me.cookie, "x", {
        method: "PATCH",
        params: { id: customerId },
        body: { notes: "x" },
      });
      expect(edit.status).toBe(403);
      const add = await call(create, me.cookie, "/api/v1/customers", {
        method: "POST",
        body: newCustomer("Mine"),
      });
      expect(add.status).toBe(403);
    });

    it("a billing admin reads but may not write", async () => {
      expect(
        (await call(getOne, team.billing.cookie, "x", { params: { id: customerId } })).status,
      ).toBe(200);
      const add = await call(create, team.billing.cookie, "/api/v1/customers", {
        method: "POST",
        body: newCustomer("No"),
      });
      expect(add.status).toBe(403);
    });

    it("an id that is not a UUID is a 404", async () => {
      const res = await call(getOne, team.admin.cookie, "/api/v1/customers/abc", {
        params: { id: "abc" },
      });
      expect(res.status).toBe(404);
    });
  });

  it("delete asks for confirmation, then removes the customer and its sites", async () => {
    const c = await call(create, team.admin.cookie, "/api/v1/customers", {
      method: "POST",
      body: newCustomer("Gorsebank Farm"),
    });
    const id = c.body.id as string;
    const site = await call(createSite, team.admin.cookie, "/api/v1/sites", {
      method: "POST",
      body: {
        customerId: id,
        name: "Home yard",
        surfaceMix: { "concrete-asphalt": 0.4, grass: 0.6 },
      },
    });
    expect(site.status).toBe(201);

    const unconfirmed = await call(remove, team.admin.cookie, `/api/v1/customers/${id}`, {
      method: "DELETE",
      params: { id },
    });
    expect(unconfirmed.status).toBe(409);
    expect(unconfirmed.body.error).toMatchObject({
      code: "confirm_required",
      impact: { sites: 1, machines: 0 },
    });
    expect((await call(getOne, team.admin.cookie, "x", { params: { id } })).status).toBe(200);

    const estimatorDelete = await call(
      remove,
      team.estimator.cookie,
      `/api/v1/customers/${id}?confirm=true`,
      { method: "DELETE", params: { id } },
    );
    expect(estimatorDelete.status).toBe(200);
    expect((await call(getOne, team.admin.cookie, "x", { params: { id } })).status).toBe(404);
    expect(
      (await call(getSite, team.admin.cookie, "x", { params: { id: site.body.id } })).status,
    ).toBe(404);
  });
});
