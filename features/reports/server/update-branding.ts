import "server-only";
import type { DbOrTx } from "@/db/client";
import { dealershipBrandings } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import { ZBrandingPatch, type TBrandingDto } from "@/features/reports/schemas/report";
import { getBranding } from "@/features/reports/server/get-branding";
import { forbidden, parseOrThrow } from "@/features/platform";

/** The dealer admin sets the name, contact line and currency printed on new reports. */
export async function updateBranding({
  db,
  actor,
  input,
}: {
  db: DbOrTx;
  actor: TActor;
  input: unknown;
}): Promise<TBrandingDto> {
  if (!can(actor, "staff:manage")) throw forbidden("the dealership's report branding");
  const values = parseOrThrow(ZBrandingPatch, input);
  await db
    .insert(dealershipBrandings)
    .values({ dealershipId: actor.dealershipId, ...values, updatedById: actor.userId })
    .onConflictDoUpdate({
      target: dealershipBrandings.dealershipId,
      set: { ...values, updatedById: actor.userId, updatedAt: new Date() },
    });
  return getBranding({ db, actor });
}
