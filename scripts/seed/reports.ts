import type { Db } from "@/db/client";
import { dealershipBrandings } from "@/db/schema";

/** Report branding of the invented dealerships (no logo: the dealer admin uploads one). */
export async function seedReportBranding(db: Db, dealerships: { id: string; name: string }[]) {
  for (const d of dealerships) {
    await db
      .insert(dealershipBrandings)
      .values({
        dealershipId: d.id,
        displayName: d.name,
        contactLine: "Unit 4, Fenwick Yard · tyres@example.test",
        currency: "GBP",
      })
      .onConflictDoNothing();
  }
}
