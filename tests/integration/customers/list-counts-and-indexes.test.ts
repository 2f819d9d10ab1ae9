// The customers and machines lists' per-row counts through the real route handlers, and the
// trigram indexes that serve their "contains" text filters, in the real PostgreSQL.
import { beforeAll, describe, expect, it } from "vitest";
import { sql } from "drizzle-orm";
import { GET as listCustomers, POST as createCustomer } from "@/app/api/v1/customers/route";
import { POST as createSite } from "@/app/api/v1/sites/route";
import { GET as listMachines, POST as createMachine } from "@/app/api/v1/machines/route";
import { call, db, makeDealership, testTractorSpec } from "@/tests/support/records";

let team: Awaited<ReturnType<typeof makeDealership>>;
const ids: Record<string, string> = {};

beforeAll(async () => {
  team = await makeDealership();
  const cookie = team.admin.cookie;
  // Three customers with different numbers of sites and machines, so a count that reads another
  // row's figure (or 0 for every row) cannot pass.
  for (const [name, siteCount, machineCount] of [
    ["Count Farm A", 2, 3],
    ["Count Farm B", 1, 0],
    ["Count Farm C", 0, 1],
  ] as const) {
    const c = await call(createCustomer, cookie, "/api/v1/customers", {
      method: "POST",
      body: { name },
    });
    expect(c.status).toBe(201);
    ids[name] = c.body.id;
    for (let i = 0; i < siteCount; i++) {
      const s = await call(createSite, cookie, "/api/v1/sites", {
        method: "POST",
        body: {
          customerId: c.body.id,
          name: `${name} yard ${i}`,
          surfaceMix: { "firm-soil": 0.6, grass: 0.4 },
        },
      });
      expect(s.status).toBe(201);
    }
    for (let i = 0; i < machineCount; i++) {
      const m = await call(createMachine, cookie, "/api/v1/machines", {
        method: "POST",
        body: {
          customerId: c.body.id,
          kind: "tractor",
          spec: testTractorSpec({ name: `${name} tractor ${i}` }),
        },
      });
      expect(m.status).toBe(201);
    }
  }
});

describe("customers list", () => {
  it("shows each customer's own site and machine counts", async () => {
    const res = await call(listCustomers, team.admin.cookie, "/api/v1/customers?sort=name");
    expect(res.status).toBe(200);
    const counts = res.body.items.map(
      (c: { name: string; siteCount: number; machineCount: number }) => [
        c.name,
        c.siteCount,
        c.machineCount,
      ],
    );
    expect(counts).toEqual([
      ["Count Farm A", 2, 3],
      ["Count Farm B", 1, 0],
      ["Count Farm C", 0, 1],
    ]);
  });

  it("keeps the counts right on a later page and with a text filter", async () => {
    const page = await call(
      listCustomers,
      team.admin.cookie,
      "/api/v1/customers?sort=name&dir=desc&pageSize=1&page=3",
    );
    expect(page.body).toMatchObject({ total: 3, pageCount: 3 });
    expect(page.body.items).toMatchObject([
      { name: "Count Farm A", siteCount: 2, machineCount: 3 },
    ]);
    const filtered = await call(listCustomers, team.admin.cookie, "/api/v1/customers?q=farm%20b");
    expect(filtered.body.items).toMatchObject([
      { name: "Count Farm B", siteCount: 1, machineCount: 0 },
    ]);
  });
});

describe("machines list", () => {
  it("pages deep with the customer's name on every row, sorted by that name", async () => {
    const res = await call(
      listMachines,
      team.admin.cookie,
      "/api/v1/machines?sort=customerName&dir=desc&pageSize=2&page=2",
    );
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ total: 4, pageCount: 2 });
    expect(res.body.items.map((m: { customerName: string }) => m.customerName)).toEqual([
      "Count Farm A",
      "Count Farm A",
    ]);
    expect(res.body.items.every((m: { estimateCount: number }) => m.estimateCount === 0)).toBe(
      true,
    );
  });
});

describe("text filter indexes", () => {
  it.each([
    ["customers", "name"],
    ["customers", "contact_name"],
    ["sites", "name"],
    ["machines", "name"],
    ["machines", "kind"],
    ["estimates", "title"],
    ["estimates", "machine_name"],
    ["duty_cycles", "name"],
  ])("%s.%s has a trigram index that a contains-filter can use", async (table, column) => {
    // A b-tree cannot answer ILIKE '%…%'; a GIN index with pg_trgm's gin_trgm_ops can
    // (PostgreSQL 15 manual, F.35 pg_trgm, "Index Support"). On the tests' small tables the
    // planner may still prefer a scan, so the check reads the catalog, not a plan.
    const r = await db.execute(
      sql`select indexdef from pg_indexes where schemaname = 'public' and tablename = ${table}`,
    );
    const defs = r.rows.map((row) => String(row.indexdef));
    expect(defs).toContainEqual(
      expect.stringMatching(new RegExp(`USING gin \\(${column} gin_trgm_ops\\)`)),
    );
  });
});
