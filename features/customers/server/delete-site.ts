import "server-only";
import { eq, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { estimates, sites } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ApiError } from "@/features/platform";
import { loadSite } from "@/features/customers/server/get-site";

/**
 * Deletes a site. Estimates that used its surface mix keep their frozen inputs and lose only the
 * link (set null), so nothing is left pointing at a missing row.
 */
export async function deleteSite({
  db,
  actor,
  id,
  confirm,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
  confirm: boolean;
}): Promise<{ deleted: true; impact: Record<string, number> }> {
  const { site } = await loadSite(db, actor, id, "write");
  const [used] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(estimates)
    .where(eq(estimates.siteId, id));
  const impact = { estimatesUnlinked: used?.n ?? 0 };
  if (!confirm)
    throw new ApiError(
      409,
      "confirm_required",
      `Deleting site ${site.name} unlinks it from ${impact.estimatesUnlinked} estimates (their results stay). Repeat the request with ?confirm=true to go ahead.`,
      undefined,
      { impact },
    );
  await db.delete(sites).where(eq(sites.id, id));
  return { deleted: true, impact };
}
