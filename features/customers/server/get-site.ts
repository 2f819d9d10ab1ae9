import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, sites } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TSiteDto } from "@/features/customers/schemas/site";
import { assertAccess } from "@/features/platform";
import { toSiteDto } from "@/features/customers/server/site-dto";

export async function loadSite(db: DbOrTx, actor: TActor, id: string, action: "read" | "write") {
  const [row] = await db
    .select({ site: sites, customerName: customers.name })
    .from(sites)
    .innerJoin(customers, eq(customers.id, sites.customerId))
    .where(and(eq(sites.id, id), eq(sites.dealershipId, actor.dealershipId)));
  assertAccess(actor, action, row?.site, "site");
  return row!;
}

export async function getSite({
  db,
  actor,
  id,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
}): Promise<TSiteDto> {
  const row = await loadSite(db, actor, id, "read");
  return toSiteDto(row.site, row.customerName);
}
