import "server-only";
import { eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { dealershipBrandings } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { notFound } from "@/features/platform";

/** The dealership's current logo (re-encoded PNG), for the branding page. */
export async function getLogo({ db, actor }: { db: DbOrTx; actor: TActor }) {
  const [row] = await db
    .select({ logo: dealershipBrandings.logo, mime: dealershipBrandings.logoMime })
    .from(dealershipBrandings)
    .where(eq(dealershipBrandings.dealershipId, actor.dealershipId));
  if (!row?.logo || !row.mime) throw notFound("logo");
  return { bytes: row.logo, mime: row.mime };
}
