import "server-only";
import { eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { dealershipBrandings, dealerships, type TDealershipBranding } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TBrandingDto } from "@/features/reports/schemas/report";

/** The dealership's report branding, with defaults when none was saved yet. */
export async function loadBranding(
  db: DbOrTx,
  dealershipId: string,
): Promise<{ dealershipName: string; branding: TDealershipBranding | null }> {
  const [row] = await db
    .select({ name: dealerships.name, branding: dealershipBrandings })
    .from(dealerships)
    .leftJoin(dealershipBrandings, eq(dealershipBrandings.dealershipId, dealerships.id))
    .where(eq(dealerships.id, dealershipId));
  return { dealershipName: row?.name ?? "", branding: row?.branding ?? null };
}

/** Any member may read what the dealership's reports carry; only the logo bytes are apart. */
export async function getBranding({
  db,
  actor,
}: {
  db: DbOrTx;
  actor: TActor;
}): Promise<TBrandingDto> {
  const { dealershipName, branding: b } = await loadBranding(db, actor.dealershipId);
  return {
    displayName: b?.displayName || dealershipName,
    contactLine: b?.contactLine ?? "",
    currency: b?.currency ?? "EUR",
    hasLogo: Boolean(b?.logo),
    logoWidth: b?.logoWidth ?? null,
    logoHeight: b?.logoHeight ?? null,
    updatedAt: b?.updatedAt.toISOString() ?? null,
  };
}
