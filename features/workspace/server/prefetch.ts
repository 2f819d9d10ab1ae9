import "server-only";
import type { QueryClient } from "@tanstack/react-query";
import { getDb } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import {
  ZCustomerListQuery,
  ZEstimateListQuery,
  ZMachineListQuery,
} from "@/features/workspace/schemas/list-query";
import { listParams, type TListState } from "@/features/workspace/api/list-state";
import { customerKeys } from "@/features/workspace/api/customers";
import { machineKeys } from "@/features/workspace/api/machines";
import { estimateKeys } from "@/features/workspace/api/estimates";
import { listCustomers } from "@/features/workspace/server/list-customers";
import { listMachines } from "@/features/workspace/server/list-machines";
import { listEstimates } from "@/features/workspace/server/list-estimates";
import { getCustomer } from "@/features/workspace/server/get-customer";
import { getMachine } from "@/features/workspace/server/get-machine";
import { getEstimate } from "@/features/workspace/server/get-estimate";
import { WorkspaceError } from "@/features/workspace/server/errors";

const query = (state: TListState) => ({ ...listParams(state), q: state.q || undefined });

/**
 * Fills the page's query cache on the server with exactly what the client hooks would fetch
 * (same keys), so the first paint has the data and the client does not fetch it again.
 */
export const prefetch = {
  customers: async (qc: QueryClient, actor: TActor, state: TListState) =>
    qc.setQueryData(
      customerKeys.list(state),
      await listCustomers({ db: getDb(), actor, query: ZCustomerListQuery.parse(query(state)) }),
    ),
  machines: async (qc: QueryClient, actor: TActor, state: TListState) =>
    qc.setQueryData(
      machineKeys.list(state),
      await listMachines({ db: getDb(), actor, query: ZMachineListQuery.parse(query(state)) }),
    ),
  estimates: async (qc: QueryClient, actor: TActor, state: TListState) =>
    qc.setQueryData(
      estimateKeys.list(state),
      await listEstimates({ db: getDb(), actor, query: ZEstimateListQuery.parse(query(state)) }),
    ),
  /** Returns false when the record is not there for this actor (the page shows a 404). */
  customer: async (qc: QueryClient, actor: TActor, id: string) =>
    found(async () =>
      qc.setQueryData(customerKeys.detail(id), await getCustomer({ db: getDb(), actor, id })),
    ),
  machine: async (qc: QueryClient, actor: TActor, id: string) =>
    found(async () =>
      qc.setQueryData(machineKeys.detail(id), await getMachine({ db: getDb(), actor, id })),
    ),
  estimate: async (qc: QueryClient, actor: TActor, id: string) =>
    found(async () =>
      qc.setQueryData(estimateKeys.detail(id), await getEstimate({ db: getDb(), actor, id })),
    ),
};

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

async function found(run: () => Promise<unknown>): Promise<boolean> {
  try {
    await run();
    return true;
  } catch (e) {
    if (e instanceof WorkspaceError && e.status === 404) return false;
    throw e;
  }
}

export const isUuid = (v: string) => UUID.test(v);
