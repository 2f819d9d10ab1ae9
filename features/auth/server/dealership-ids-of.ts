import "server-only";
import { eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { memberships } from "@/db/schema";

/** The dealerships a user belongs to: where their security events are logged. */
export async function dealershipIdsOf(db: DbOrTx, userId: string): Promise<string[]> {
  const rows = await db
    .selectDistinct({ id: memberships.dealershipId })
    .from(memberships)
    .where(eq(memberships.userId, userId));
  return rows.map((r) => r.id);
}
