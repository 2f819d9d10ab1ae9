import { redirect } from "next/navigation";
import { getDb } from "@/db/client";
import { getActor } from "@/features/auth/server/get-actor";
import { listCustomerChoices } from "@/features/customers";
import { TyrePlanView } from "@/features/calibration/components/tyre-plan-view";
import { isStaff } from "@/lib/authz/policy";

export const metadata = { title: "Tyre plan" };

/** Staff see the dealership's plan (or one customer's); a customer account sees its own, read-only. */
export default async function TyrePlanPage({
  searchParams,
}: {
  searchParams: Promise<{ customerId?: string }>;
}) {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const { customerId } = await searchParams;
  const staff = isStaff(actor);
  const customers = staff ? await listCustomerChoices({ db: getDb(), actor }) : null;
  const fixed = staff ? customers?.find((c) => c.id === customerId)?.id : undefined;
  return <TyrePlanView system={actor.unitSystem} customers={customers} fixedCustomerId={fixed} />;
}
