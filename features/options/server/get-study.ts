import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { optionStudies, type TOptionStudy } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TStudyKind } from "../schemas/study";
import { assertMayRead } from "./access";

/** One stored study of the given kind the actor may read (404 otherwise). */
export async function getStudy({
  db,
  actor,
  kind,
  id,
}: {
  db: DbOrTx;
  actor: TActor;
  kind: TStudyKind;
  id: string;
}): Promise<TOptionStudy> {
  const [row] = await db
    .select()
    .from(optionStudies)
    .where(
      and(
        eq(optionStudies.id, id),
        eq(optionStudies.kind, kind),
        eq(optionStudies.dealershipId, actor.dealershipId),
      ),
    );
  assertMayRead(actor, row, kind);
  return row;
}
