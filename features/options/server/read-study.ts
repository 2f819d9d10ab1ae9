import "server-only";
import type { DbOrTx } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import type { TComparisonDto, TSweepDto } from "../schemas/study";
import { getStudy } from "./get-study";
import { toComparisonDto, toSweepDto } from "./study-dto";

/** A stored comparison the actor may read, as the DTO reports and the API use (404 otherwise). */
export async function readComparison(o: {
  db: DbOrTx;
  actor: TActor;
  id: string;
}): Promise<TComparisonDto> {
  return toComparisonDto(await getStudy({ ...o, kind: "comparison" }));
}

/** A stored sweep the actor may read (404 otherwise). */
export async function readSweep(o: { db: DbOrTx; actor: TActor; id: string }): Promise<TSweepDto> {
  return toSweepDto(await getStudy({ ...o, kind: "sweep" }));
}
