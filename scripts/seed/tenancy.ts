import { eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { dealerships, customers } from "@/db/schema";

/** The invented dealership and its customers. Names are fictional. */
export const DEMO_DEALERSHIP = {
  name: "Brackenridge Machinery",
  slug: "brackenridge",
  currency: "GBP",
} as const;
export const DEMO_RIVAL_DEALERSHIP = {
  name: "Copperfold Tractor & Plant",
  slug: "copperfold",
  currency: "EUR",
} as const;

export const DEMO_CUSTOMERS = [
  { key: "hollin-vale", name: "Hollin Vale Farm", kind: "farm", contactName: "Morwenna Tisdale" },
  {
    key: "eastmere",
    name: "Eastmere Contracting",
    kind: "contractor",
    contactName: "Idris Pennock",
  },
  {
    key: "sorrel-parish",
    name: "Sorrel Parish Council depot",
    kind: "council",
    contactName: "Agnes Fairleigh",
  },
] as const;

// The currency is set only when the dealership is first made: a re-seed keeps the admin's choice.
async function upsertDealership(db: Db, d: { name: string; slug: string; currency: string }) {
  const [row] = await db
    .insert(dealerships)
    .values(d)
    .onConflictDoUpdate({ target: dealerships.slug, set: { name: d.name } })
    .returning();
  if (!row) throw new Error(`could not upsert dealership ${d.slug}`);
  return row;
}

export async function seedTenancy(db: Db) {
  const dealership = await upsertDealership(db, DEMO_DEALERSHIP);
  const rival = await upsertDealership(db, DEMO_RIVAL_DEALERSHIP);
  const existing = await db
    .select()
    .from(customers)
    .where(eq(customers.dealershipId, dealership.id));
  const byName = new Map(existing.map((c) => [c.name, c]));
  const customerRows: Record<string, (typeof existing)[number]> = {};
  for (const c of DEMO_CUSTOMERS) {
    let row = byName.get(c.name);
    if (!row) {
      [row] = await db
        .insert(customers)
        .values({
          dealershipId: dealership.id,
          name: c.name,
          kind: c.kind,
          contactName: c.contactName,
        })
        .returning();
    }
    if (!row) throw new Error(`could not seed customer ${c.name}`);
    customerRows[c.key] = row;
  }
  return { dealership, rival, customers: customerRows };
}
