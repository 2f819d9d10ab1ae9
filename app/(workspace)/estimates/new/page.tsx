import { redirect } from "next/navigation";
import { getDb } from "@/db/client";
import { getActor } from "@/features/auth/server/get-actor";
import { NewEstimateForm } from "@/features/estimates/components/new-estimate-form";
import { listCustomerChoices } from "@/features/customers/server/list-customer-choices";
import { can } from "@/lib/authz/policy";
import { EstimateSafetyCaution } from "@/lib/ui/caution";

export const metadata = { title: "New estimate" };

export default async function NewEstimatePage({
  searchParams,
}: {
  searchParams: Promise<{ customerId?: string; machineId?: string }>;
}) {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  if (!can(actor, "estimate:run")) redirect("/estimates");
  const { customerId, machineId } = await searchParams;
  const customers = await listCustomerChoices({ db: getDb(), actor });
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold text-ink-900">New estimate</h1>
      <NewEstimateForm
        customers={customers}
        defaultCustomerId={customerId}
        defaultMachineId={machineId}
      />
      <EstimateSafetyCaution />
    </div>
  );
}
