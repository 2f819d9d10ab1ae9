import "server-only";
import { and, asc, eq, ilike, or, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, machines } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TSearchQuery } from "@/features/search/schemas/search";
import type { TSearchResult } from "@/features/search/schemas/search";
import { assertMayRead, customerScope } from "@/features/platform";
import { likePattern } from "@/features/platform";

/** Customers (name, contact) and machines (name, kind) matching the text, within what the actor sees. */
export async function searchWorkspace({
  db,
  actor,
  query,
}: {
  db: DbOrTx;
  actor: TActor;
  query: TSearchQuery;
}): Promise<TSearchResult> {
  const pattern = likePattern(query.q);
  assertMayRead(actor, "customer");
  assertMayRead(actor, "machine");
  const scope = customerScope(actor);
  const customerFilters: SQL[] = [
    eq(customers.dealershipId, actor.dealershipId),
    or(ilike(customers.name, pattern), ilike(customers.contactName, pattern))!,
  ];
  const machineFilters: SQL[] = [
    eq(machines.dealershipId, actor.dealershipId),
    or(ilike(machines.name, pattern), ilike(machines.kind, pattern))!,
  ];
  if (scope) {
    customerFilters.push(eq(customers.id, scope));
    machineFilters.push(eq(machines.customerId, scope));
  }
  const [cs, ms] = await Promise.all([
    db
      .select({
        id: customers.id,
        name: customers.name,
        kind: customers.kind,
        contact: customers.contactName,
      })
      .from(customers)
      .where(and(...customerFilters))
      .orderBy(asc(customers.name))
      .limit(query.limit),
    db
      .select({
        id: machines.id,
        name: machines.name,
        kind: machines.kind,
        customerName: customers.name,
      })
      .from(machines)
      .leftJoin(customers, eq(customers.id, machines.customerId))
      .where(and(...machineFilters))
      .orderBy(asc(machines.name))
      .limit(query.limit),
  ]);
  return {
    q: query.q,
    customers: cs.map((c) => ({
      type: "customer",
      id: c.id,
      title: c.name,
      subtitle: [c.kind, c.contact].filter(Boolean).join(" · "),
      href: `/customers/${c.id}`,
    })),
    machines: ms.map((m) => ({
      type: "machine",
      id: m.id,
      title: m.name,
      subtitle: [m.kind, m.customerName ?? "Dealership template"].join(" · "),
      href: `/machines/${m.id}`,
    })),
  };
}
