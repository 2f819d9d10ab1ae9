import { redirect } from "next/navigation";
import { getDb } from "@/db/client";
import { getActor } from "@/features/auth/server/get-actor";
import { MachineForm } from "@/features/machines/components/machine-form/machine-form";
import { listCustomerChoices } from "@/features/customers/server/list-customer-choices";
import { can } from "@/lib/authz/policy";

export const metadata = { title: "New machine" };

export default async function NewMachinePage({
  searchParams,
}: {
  searchParams: Promise<{ customerId?: string }>;
}) {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  if (!can(actor, "machine:write")) redirect("/machines");
  const { customerId } = await searchParams;
  const customers = await listCustomerChoices({ db: getDb(), actor });
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold text-ink-900">New machine</h1>
      <MachineForm customers={customers} system={actor.unitSystem} defaultCustomerId={customerId} />
    </div>
  );
}
