import "server-only";
import type { QueryClient } from "@tanstack/react-query";
import { getDb } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { found } from "@/features/platform";
import { studyKeys } from "@/features/options/api/studies";
import { readComparison, readSweep } from "./read-study";

// Fill the page's query cache on the server under the keys the client hooks use, so the first
// paint has the study and the client does not fetch it again.

/** False when the comparison is not there for this actor (the page shows a 404). */
export const prefetchComparison = (qc: QueryClient, actor: TActor, id: string) =>
  found(async () =>
    qc.setQueryData(
      studyKeys.detail("comparison", id),
      await readComparison({ db: getDb(), actor, id }),
    ),
  );

export const prefetchSweep = (qc: QueryClient, actor: TActor, id: string) =>
  found(async () =>
    qc.setQueryData(studyKeys.detail("sweep", id), await readSweep({ db: getDb(), actor, id })),
  );
