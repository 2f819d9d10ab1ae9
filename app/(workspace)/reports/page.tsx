import { redirect } from "next/navigation";
import { getActor } from "@/features/auth/server/get-actor";
import { listCustomerChoices } from "@/features/customers";
import { ReportsTable } from "@/features/reports/components/reports-table";
import { getDb } from "@/db/client";
import { isStaff } from "@/lib/authz/policy";

export const metadata = { title: "Reports" };

export default async function ReportsPage() {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const staff = isStaff(actor);
  const customers = staff ? await listCustomerChoices({ db: getDb(), actor }) : [];
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold text-ink-900">
        {staff ? "Quote reports" : "Your reports"}
      </h1>
      <ReportsTable asCustomer={!staff} customers={customers} />
    </div>
  );
}
