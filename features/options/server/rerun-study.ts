import "server-only";
import { desc, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { optionStudies } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TStudyKind } from "../schemas/study";
import { assertMayRun } from "./access";
import { getStudy } from "./get-study";
import { runStudy, type TStudyInputs } from "./run-study";

/**
 * Reruns a stored study's frozen inputs with today's engine and stores the result as the next
 * version of its series; earlier versions stay as they were.
 */
export async function rerunStudy({
  db,
  actor,
  kind,
  id,
}: {
  db: DbOrTx;
  actor: TActor;
  kind: TStudyKind;
  id: string;
}) {
  const source = await getStudy({ db, actor, kind, id });
  assertMayRun(actor);
  const run = runStudy(source.inputs as TStudyInputs);
  return db.transaction(async (tx) => {
    const [last] = await tx
      .select({ version: optionStudies.version })
      .from(optionStudies)
      .where(eq(optionStudies.seriesId, source.seriesId))
      .orderBy(desc(optionStudies.version))
      .limit(1)
      .for("update");
    const [row] = await tx
      .insert(optionStudies)
      .values({
        ...source,
        id: undefined,
        createdAt: undefined,
        version: (last?.version ?? source.version) + 1,
        ...run,
        createdById: actor.userId,
      })
      .returning();
    if (!row) throw new Error("insert returned no study");
    return row;
  });
}
