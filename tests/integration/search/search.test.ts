// Global search API: real route handler, real PostgreSQL, real session cookies.
import { beforeAll, describe, expect, it } from "vitest";
import { POST as createCustomer } from "@/app/api/v1/customers/route";
import { POST as createMachine } from "@/app/api/v1/machines/route";
import { GET as search } from "@/app/api/v1/search/route";
import { createTestMember } from "@/tests/support/session";
import { call, db, makeDealership, testTractorSpec } from "@/tests/support/records";

let team: Awaited<ReturnType<typeof makeDealership>>;
let quillId: string;
beforeAll(async () => {
  team = await makeDealership();
  quillId = (
    await call(createCustomer, team.admin.cookie, "/api/v1/customers", {
      method: "POST",
      body: { name: "Quillbrook Farm", contactName: "Ottoline Verey" },
    })
  ).body.id;
  const other = (
    await call(createCustomer, team.admin.cookie, "/api/v1/customers", {
      method: "POST",
      body: { name: "Fernlow Quarry" },
    })
  ).body.id;
  await call(createMachine, team.admin.cookie, "/api/v1/machines", {
    method: "POST",
    body: {
      customerId: quillId,
      kind: "loader",
      spec: testTractorSpec({ name: "Quillbrook yard loader" }),
    },
  });
  await call(createMachine, team.admin.cookie, "/api/v1/machines", {
    method: "POST",
    body: { customerId: other, kind: "loader", spec: testTractorSpec({ name: "Fernlow loader" }) },
  });
});

describe("search API", () => {
  it("finds customers by name or contact and machines by name or kind", async () => {
    const byName = await call(search, team.admin.cookie, "/api/v1/search?q=quill");
    expect(byName.status).toBe(200);
    expect(byName.body.customers.map((h: { title: string }) => h.title)).toEqual([
      "Quillbrook Farm",
    ]);
    expect(byName.body.machines.map((h: { title: string }) => h.title)).toEqual([
      "Quillbrook yard loader",
    ]);
    expect(byName.body.customers[0].href).toBe(`/customers/${quillId}`);

    const byContact = await call(search, team.admin.cookie, "/api/v1/search?q=ottoline");
    expect(byContact.body.customers).toHaveLength(1);
    const byKind = await call(search, team.admin.cookie, "/api/v1/search?q=loader");
    expect(byKind.body.machines).toHaveLength(2);
  });

  it.each([
    ["", "q"],
    ["q=a", "q"],
    [`q=${"z".repeat(101)}`, "q"],
    ["q=farm&limit=50", "limit"],
  ])("refuses %s with a field error", async (qs, field) => {
    const res = await call(search, team.admin.cookie, `/api/v1/search?${qs}`);
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors[field]).toBeDefined();
  });

  it("stays inside the dealership and the customer's own records", async () => {
    const rival = await createTestMember({ db, roles: ["dealer_admin"] });
    const outside = await call(search, rival.cookie, "/api/v1/search?q=quill");
    expect(outside.body.customers).toEqual([]);
    expect(outside.body.machines).toEqual([]);
    const me = await createTestMember({
      db,
      roles: ["customer"],
      dealershipId: team.dealershipId,
      customerId: quillId,
    });
    const mine = await call(search, me.cookie, "/api/v1/search?q=loader");
    expect(mine.body.machines.map((h: { title: string }) => h.title)).toEqual([
      "Quillbrook yard loader",
    ]);
    expect((await call(search, null, "/api/v1/search?q=loader")).status).toBe(401);
  });
});
