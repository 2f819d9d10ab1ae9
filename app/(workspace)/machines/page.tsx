import Link from "next/link";
import { redirect } from "next/navigation";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { getActor } from "@/features/auth/server/get-actor";
import { MachinesTable } from "@/features/machines/components/machines-table";
import { prefetchMachineList } from "@/features/machines/server/prefetch-machines";
import { can, isStaff } from "@/lib/authz/policy";
import { makeQueryClient } from "@/lib/query/query-client";
import { DEFAULT_MACHINE_LIST } from "@/features/machines/api/machines";

export const metadata = { title: "Machines" };

export default async function MachinesPage() {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const qc = makeQueryClient();
  await prefetchMachineList(qc, actor, DEFAULT_MACHINE_LIST);
  const canWrite = can(actor, "machine:write");
  return (
    <div className="flex flex-col gap-4">
      <header className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-bold text-ink-900">Machines</h1>
        <div className="flex flex-wrap gap-2">
          {isStaff(actor) ? (
            <Link
              href="/machines/templates"
              className="inline-flex h-11 items-center rounded-md border border-ink-300 bg-white px-4 font-medium text-ink-800 hover:bg-ink-100"
            >
              Dealership templates
            </Link>
          ) : null}
          {canWrite ? (
            <Link
              href="/machines/new"
              className="inline-flex h-11 items-center rounded-md bg-furrow-600 px-4 font-medium text-white hover:bg-furrow-700"
            >
              Add a machine
            </Link>
          ) : null}
        </div>
      </header>
      <HydrationBoundary state={dehydrate(qc)}>
        <MachinesTable canWrite={canWrite} />
      </HydrationBoundary>
    </div>
  );
}
