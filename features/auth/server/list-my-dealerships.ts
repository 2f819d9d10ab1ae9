import "server-only";
import { asc, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { dealerships, memberships } from "@/db/schema";

/** The dealerships a user belongs to, for the switcher. */
export async function listMyDealerships(db: DbOrTx, userId: string) {
  const rows = await db
    .selectDistinct({ id: dealerships.id, name: dealerships.name })
    .from(memberships)
    .innerJoin(dealerships, eq(dealerships.id, memberships.dealershipId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(dealerships.name));
  return rows;
}
