import { redirect } from "next/navigation";
import { getDb } from "@/db/client";
import { getActor } from "@/features/auth/server/get-actor";
import { TemplatesPanel } from "@/features/machines/components/templates-panel";
import { listCustomerChoices } from "@/features/customers/server/list-customer-choices";
import { can, isStaff } from "@/lib/authz/policy";

export const metadata = { title: "Dealership templates" };

export default async function TemplatesPage() {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  if (!isStaff(actor)) redirect("/machines");
  const customers = await listCustomerChoices({ db: getDb(), actor });
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold text-ink-900">Dealership templates</h1>
      <p className="max-w-prose text-ink-700">
        Configurations of the models you sell. Copy one to a customer and adjust it to the machine
        in their yard.
      </p>
      <TemplatesPanel customers={customers} canWrite={can(actor, "machine:write")} />
    </div>
  );
}
