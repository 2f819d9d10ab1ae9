import "server-only";
import { sql } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";

/** Used until the dealership records its currency (ISO 4217). */
export const FALLBACK_CURRENCY = "GBP";

/**
 * The dealership's currency: its `currency` column when the schema has one (read through
 * to_jsonb so this works before and after that column exists), else the fallback.
 */
export async function dealershipCurrency(db: DbOrTx, dealershipId: string): Promise<string> {
  const { rows } = await db.execute(
    sql`select to_jsonb(d)->>'currency' as currency from dealerships d where d.id = ${dealershipId}`,
  );
  const value = (rows[0] as { currency?: string | null } | undefined)?.currency;
  return value && /^[A-Z]{3}$/.test(value) ? value : FALLBACK_CURRENCY;
}
