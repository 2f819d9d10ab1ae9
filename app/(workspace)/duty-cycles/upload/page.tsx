import { getDb } from "@/db/client";
import { redirect } from "next/navigation";
import { getActor } from "@/features/auth/server/get-actor";
import { UploadWizard } from "@/features/duty-cycles/components/upload-wizard";
import { MappingTemplatesPanel } from "@/features/duty-cycles/components/mapping-templates-panel";
import { can } from "@/lib/authz/policy";
import { getEnv } from "@/lib/env";
import { EmptyState } from "@/lib/ui/empty-state";
import { listCustomerChoices } from "@/features/customers";

export const metadata = { title: "Upload a duty cycle" };

export default async function UploadDutyCyclePage() {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  if (!can(actor, "duty-cycle:write")) redirect("/duty-cycles");
  const customers = await listCustomerChoices({ db: getDb(), actor });
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold text-ink-900">Upload a duty cycle</h1>
      {customers.length === 0 ? (
        <EmptyState title="Add a customer first">A duty cycle belongs to a customer.</EmptyState>
      ) : (
        <>
          <UploadWizard customers={customers} uploadLimitBytes={getEnv().UPLOAD_LIMIT_BYTES} />
          <MappingTemplatesPanel />
        </>
      )}
    </div>
  );
}
