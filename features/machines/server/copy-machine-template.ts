import "server-only";
import type { DbOrTx } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import type { TMachineInput } from "@/lib/scrub";
import { ZCopyTemplateInput, type TMachineDto } from "@/features/machines/schemas/machine";
import { parseOrThrow, ApiError } from "@/features/platform";
import { loadMachine } from "@/features/machines/server/get-machine";
import { assertMayWrite } from "@/features/platform";
import { createMachine } from "@/features/machines/server/create-machine";

/** Copies a dealership template (or any machine) to a customer, remembering where it came from. */
export async function copyMachineTemplate({
  db,
  actor,
  id,
  input,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
  input: unknown;
}): Promise<TMachineDto> {
  const { machine } = await loadMachine(db, actor, id, "read");
  // The role decides before the body: a read-only account gets 403, not a field error.
  assertMayWrite(actor, "machine");
  const values = parseOrThrow(ZCopyTemplateInput, input);
  const spec = machine.spec as TMachineInput;
  if (!spec || typeof spec !== "object")
    throw new ApiError(
      422,
      "invalid_template",
      "This machine has no usable specification to copy.",
    );
  return createMachine({
    db,
    actor,
    input: {
      customerId: values.customerId,
      kind: machine.kind,
      spec: { ...spec, name: values.name ?? spec.name },
    },
    templateId: machine.id,
  });
}
