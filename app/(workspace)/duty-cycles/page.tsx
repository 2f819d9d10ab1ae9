import Link from "next/link";
import { redirect } from "next/navigation";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { getActor } from "@/features/auth/server/get-actor";
import { DutyCyclesTable } from "@/features/duty-cycles/components/duty-cycles-table";
import {
  DEFAULT_DUTY_CYCLE_LIST,
  dutyCycleKeys,
  listQueryOf,
} from "@/features/duty-cycles/api/duty-cycles";
import { listDutyCycles } from "@/features/duty-cycles/server/list-duty-cycles";
import { getDb } from "@/db/client";
import { can } from "@/lib/authz/policy";
import { makeQueryClient } from "@/lib/query/query-client";

export const metadata = { title: "Duty cycles" };

const action = "inline-flex h-11 items-center rounded-md px-4 font-medium";

export default async function DutyCyclesPage() {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const qc = makeQueryClient();
  await qc.prefetchQuery({
    queryKey: dutyCycleKeys.list(DEFAULT_DUTY_CYCLE_LIST),
    queryFn: () =>
      listDutyCycles({ db: getDb(), actor, query: listQueryOf(DEFAULT_DUTY_CYCLE_LIST) }),
  });
  const canWrite = can(actor, "duty-cycle:write");
  return (
    <div className="flex flex-col gap-4">
      <header className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <h1 className="text-2xl font-bold text-ink-900">Duty cycles</h1>
          <p className="text-sm text-ink-700">
            What an operating hour of each customer&apos;s work looks like: the turns and the travel
            between them.
          </p>
        </div>
        {canWrite ? (
          <div className="flex flex-wrap gap-2">
            <Link
              href="/duty-cycles/build"
              className={`${action} border border-ink-300 bg-white text-ink-800 hover:bg-ink-100`}
            >
              Build without a file
            </Link>
            <Link
              href="/duty-cycles/upload"
              className={`${action} bg-furrow-600 text-white hover:bg-furrow-700`}
            >
              Upload a CSV
            </Link>
          </div>
        ) : null}
      </header>
      <HydrationBoundary state={dehydrate(qc)}>
        <DutyCyclesTable canWrite={canWrite} />
      </HydrationBoundary>
    </div>
  );
}
