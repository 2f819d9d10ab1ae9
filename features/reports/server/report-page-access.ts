import "server-only";
import type { DbOrTx } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { loadReport } from "@/features/reports/server/report-access";
import { ApiError } from "@/features/platform";

/** For pages: the report's title when the actor may see it, null when it answers 404. */
export async function reportTitleFor(
  db: DbOrTx,
  actor: TActor,
  id: string,
): Promise<string | null> {
  try {
    return (await loadReport(db, actor, id, "read")).title;
  } catch (e) {
    if (e instanceof ApiError && e.status === 404) return null;
    throw e;
  }
}
