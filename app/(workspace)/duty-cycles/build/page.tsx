import { getDb } from "@/db/client";
import { redirect } from "next/navigation";
import { getActor } from "@/features/auth/server/get-actor";
import { BuilderForm } from "@/features/duty-cycles/components/builder-form";
import { can } from "@/lib/authz/policy";
import { EmptyState } from "@/lib/ui/empty-state";
import { listCustomerChoices } from "@/features/customers";

export const metadata = { title: "Build a duty cycle" };

export default async function BuildDutyCyclePage({
  searchParams,
}: {
  searchParams: Promise<{ customerId?: string | string[] }>;
}) {
  const { customerId } = await searchParams;
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  if (!can(actor, "duty-cycle:write")) redirect("/duty-cycles");
  const customers = await listCustomerChoices({ db: getDb(), actor });
  return (
    <div className="flex flex-col gap-4">
      <div>
        <h1 className="text-2xl font-bold text-ink-900">Build a duty cycle without a file</h1>
        <p className="text-sm text-ink-700">
          Describe the work; headland turns, yard cycles and road bends per operating hour follow
          from it.
        </p>
      </div>
      {customers.length === 0 ? (
        <EmptyState title="Add a customer first">A duty cycle belongs to a customer.</EmptyState>
      ) : (
        <BuilderForm
          customers={customers}
          initialCustomerId={typeof customerId === "string" ? customerId : undefined}
        />
      )}
    </div>
  );
}
