import "server-only";
import { and, desc, eq, sql, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, estimates, machines } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { customerScope } from "@/features/platform";
import { iso } from "@/features/platform";

/** Counts and the most recently touched customers for the landing page. */
export async function getDashboard({ db, actor }: { db: DbOrTx; actor: TActor }) {
  const scope = customerScope(actor);
  const cf: SQL[] = [eq(customers.dealershipId, actor.dealershipId)];
  const mf: SQL[] = [eq(machines.dealershipId, actor.dealershipId)];
  const ef: SQL[] = [eq(estimates.dealershipId, actor.dealershipId)];
  if (scope) {
    cf.push(eq(customers.id, scope));
    mf.push(eq(machines.customerId, scope));
    ef.push(eq(estimates.customerId, scope));
  }
  const count = sql<number>`count(*)::int`;
  const [[c], [m], [e], recentCustomers] = await Promise.all([
    db
      .select({ n: count })
      .from(customers)
      .where(and(...cf)),
    db
      .select({ n: count })
      .from(machines)
      .where(and(...mf)),
    db
      .select({ n: count })
      .from(estimates)
      .where(and(...ef)),
    db
      .select({
        id: customers.id,
        name: customers.name,
        kind: customers.kind,
        updatedAt: customers.updatedAt,
      })
      .from(customers)
      .where(and(...cf))
      .orderBy(desc(customers.updatedAt))
      .limit(6),
  ]);
  return {
    counts: { customers: c?.n ?? 0, machines: m?.n ?? 0, estimates: e?.n ?? 0 },
    recentCustomers: recentCustomers.map((r) => ({ ...r, updatedAt: iso(r.updatedAt) })),
  };
}
