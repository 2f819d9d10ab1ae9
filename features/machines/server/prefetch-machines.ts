import "server-only";
import type { QueryClient } from "@tanstack/react-query";
import { getDb } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { listParams, type TListState } from "@/lib/query/list-state";
import { found } from "@/features/platform";
import { ZMachineListQuery } from "@/features/machines/schemas/machine-list-query";
import { machineKeys } from "@/features/machines/api/machines";
import { listMachines } from "@/features/machines/server/list-machines";
import { getMachine } from "@/features/machines/server/get-machine";

// Fill the page's query cache on the server with exactly what the client hooks would fetch (same
// keys), so the first paint has the data and the client does not fetch it again.

export const prefetchMachineList = async (qc: QueryClient, actor: TActor, state: TListState) =>
  qc.setQueryData(
    machineKeys.list(state),
    await listMachines({
      db: getDb(),
      actor,
      query: ZMachineListQuery.parse({ ...listParams(state), q: state.q || undefined }),
    }),
  );

/** False when the record is not there for this actor (the page shows a 404). */
export const prefetchMachine = async (qc: QueryClient, actor: TActor, id: string) =>
  found(async () =>
    qc.setQueryData(machineKeys.detail(id), await getMachine({ db: getDb(), actor, id })),
  );
