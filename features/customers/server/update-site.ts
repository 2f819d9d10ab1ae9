import "server-only";
import { eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { sites } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ZSitePatch, type TSiteDto } from "@/features/customers/schemas/site";
import { parseOrThrow } from "@/features/platform";
import { loadSite } from "@/features/customers/server/get-site";
import { toSiteDto } from "@/features/customers/server/site-dto";

export async function updateSite({
  db,
  actor,
  id,
  input,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
  input: unknown;
}): Promise<TSiteDto> {
  const current = await loadSite(db, actor, id, "write");
  const patch = parseOrThrow(ZSitePatch, input);
  const [row] = await db
    .update(sites)
    .set({ ...patch, updatedAt: new Date() })
    .where(eq(sites.id, id))
    .returning();
  if (!row) throw new Error("update returned no site");
  return toSiteDto(row, current.customerName);
}
