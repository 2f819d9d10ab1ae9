import "server-only";
import { sql, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { can, readScope } from "@/lib/authz/policy";
import type { TReportStatus } from "@/lib/reports";
import type { TPage } from "@/lib/query/list-query";
import {
  ZReportListQuery,
  type TReportListQuery,
  type TReportRow,
} from "@/features/reports/schemas/report";
import { forbidden, parseOrThrow } from "@/features/platform";
import { likePattern, toPage } from "@/features/platform";

type TRaw = {
  report_id: string;
  version: number | null;
  title: string;
  customer_id: string;
  customer_name: string;
  machine_name: string;
  status: TReportStatus;
  issued_at: Date | null;
  first_opened: Date | null;
  last_opened: Date | null;
  updated_at: Date;
  total: number;
};

const iso = (d: Date | string | null) => (d ? new Date(d).toISOString() : null);

/**
 * One row per issued version plus one per draft, newest first, with the status a dealer reads:
 * draft, issued, shared, opened or superseded. A customer account sees only the versions of its
 * own reports that are shared with it.
 */
export async function listReports({
  db,
  actor,
  query: raw,
}: {
  db: DbOrTx;
  actor: TActor;
  query: unknown;
}): Promise<TPage<TReportRow>> {
  if (!can(actor, "report:read")) throw forbidden("reports");
  const query: TReportListQuery = parseOrThrow(ZReportListQuery, raw);
  const scope = readScope(actor);
  const filters: SQL[] = [sql`r.dealership_id = ${scope.dealershipId}`];
  if (scope.customerId)
    filters.push(
      sql`r.customer_id = ${scope.customerId}`,
      sql`v.version is not null`,
      sql`s.active > 0`,
    );
  if (query.customerId) filters.push(sql`r.customer_id = ${query.customerId}`);
  if (query.q) {
    const like = likePattern(query.q);
    filters.push(
      sql`(r.title ilike ${like} or r.customer_name ilike ${like} or r.machine_name ilike ${like})`,
    );
  }
  const where = sql.join(filters, sql` and `);
  const statusFilter = query.status ? sql`where status = ${query.status}` : sql``;
  const offset = (query.page - 1) * query.pageSize;
  const result = await db.execute<TRaw>(sql`
    with rows as (
      select r.id as report_id, v.version, r.title, r.customer_id, r.customer_name, r.machine_name,
        v.issued_at, r.updated_at,
        case when v.version = r.latest_version then s.first_opened end as first_opened,
        case when v.version = r.latest_version then s.last_opened end as last_opened,
        case
          when v.version is null then 'draft'
          when v.version < r.latest_version then 'superseded'
          when s.active > 0 and s.first_opened is not null then 'opened'
          when s.active > 0 then 'shared'
          else 'issued'
        end as status
      from reports r
      left join report_versions v on v.report_id = r.id
      left join lateral (
        select count(*) filter (where withdrawn_at is null)::int as active,
          min(first_opened_at) filter (where withdrawn_at is null) as first_opened,
          max(last_opened_at) filter (where withdrawn_at is null) as last_opened
        from report_shares where report_id = r.id
      ) s on true
      where ${where}
    ),
    filtered as (select * from rows ${statusFilter})
    -- The count comes back even past the last page (the lateral page is then empty).
    select f.*, t.total from (select count(*)::int as total from filtered) t
    left join lateral (
      select * from filtered
      order by coalesce(issued_at, updated_at) desc, report_id, version desc nulls first
      limit ${query.pageSize} offset ${offset}
    ) f on true
  `);
  const total = result.rows[0]?.total ?? 0;
  return toPage(
    result.rows
      .filter((r) => r.report_id !== null)
      .map((r) => ({
        reportId: r.report_id,
        version: r.version,
        title: r.title,
        customerId: r.customer_id,
        customerName: r.customer_name,
        machineName: r.machine_name,
        status: r.status,
        issuedAt: iso(r.issued_at),
        firstOpenedAt: iso(r.first_opened),
        lastOpenedAt: iso(r.last_opened),
        updatedAt: iso(r.updated_at)!,
      })),
    total,
    query.page,
    query.pageSize,
  );
}
