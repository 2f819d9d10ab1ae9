import "server-only";
import { and, count, eq, gte, lt, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { billingPlans, reportAllowanceUses, type TBillingStatus } from "@/db/schema";

/** Reports counted against the included allowance in `period` (pack credits are a balance instead). */
export async function countUsedInPeriod(
  db: DbOrTx,
  opts: {
    dealershipId: string;
    status: TBillingStatus;
    planKey: string | null;
    period: { start: Date; end: Date };
  },
): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(reportAllowanceUses)
    .where(
      and(
        eq(reportAllowanceUses.dealershipId, opts.dealershipId),
        gte(reportAllowanceUses.countedAt, opts.period.start),
        lt(reportAllowanceUses.countedAt, opts.period.end),
        sql`${reportAllowanceUses.source} <> 'pack'`,
        // Trial reports count against the trial only, never against the first paid month.
        opts.status === "trialing"
          ? eq(reportAllowanceUses.planKey, opts.planKey ?? "")
          : sql`coalesce(${reportAllowanceUses.planKey}, '') not in (select ${billingPlans.key} from ${billingPlans} where ${billingPlans.kind} = 'trial')`,
      ),
    );
  return row?.n ?? 0;
}
