import { notFound, redirect } from "next/navigation";
import { getDb } from "@/db/client";
import { getActor } from "@/features/auth/server/get-actor";
import { BuilderForm } from "@/features/duty-cycles/components/builder-form";
import { ZBuilderInput } from "@/features/duty-cycles/schemas/builder";
import { DutyCycleError } from "@/features/duty-cycles/server/errors";
import { getDutyCycle } from "@/features/duty-cycles/server/get-duty-cycle";
import { can } from "@/lib/authz/policy";
import { listCustomerChoices } from "@/features/customers";

export const metadata = { title: "Edit a built duty cycle" };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Changes the work a builder duty cycle was made from; imported cycles keep their file. */
export default async function EditBuiltDutyCyclePage({
  params,
}: {
  params: Promise<{ id: string }>;
}) {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const { id } = await params;
  if (!UUID.test(id)) notFound();
  if (!can(actor, "duty-cycle:write")) redirect(`/duty-cycles/${id}`);
  let cycle;
  try {
    cycle = await getDutyCycle({ db: getDb(), actor, id });
  } catch (e) {
    if (e instanceof DutyCycleError && e.status === 404) notFound();
    throw e;
  }
  const builder = ZBuilderInput.safeParse(cycle.builderInput);
  if (cycle.source !== "builder" || !builder.success) redirect(`/duty-cycles/${id}`);
  const customers = await listCustomerChoices({ db: getDb(), actor });
  return (
    <div className="flex flex-col gap-4">
      <div>
        <h1 className="text-2xl font-bold text-ink-900">Edit {cycle.name}</h1>
        <p className="text-sm text-ink-700">
          Change the work; the turns per operating hour are rebuilt when you save.
        </p>
      </div>
      <BuilderForm
        customers={customers}
        editing={{
          id: cycle.id,
          version: cycle.version,
          name: cycle.name,
          customerId: cycle.customerId,
          builder: builder.data,
        }}
      />
    </div>
  );
}
