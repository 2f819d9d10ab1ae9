import { redirect } from "next/navigation";
import { getActor } from "@/features/auth/server/get-actor";
import { CustomerForm } from "@/features/customers/components/customer-form";
import { can } from "@/lib/authz/policy";

export const metadata = { title: "New customer" };

export default async function NewCustomerPage() {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  if (!can(actor, "customer:write")) redirect("/customers");
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold text-ink-900">New customer</h1>
      <CustomerForm />
    </div>
  );
}
