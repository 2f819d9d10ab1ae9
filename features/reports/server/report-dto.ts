import "server-only";
import type { TReport, TReportShare } from "@/db/schema";
import { reportStatus } from "@/lib/reports";
import type { TReportDto, TReportShareDto } from "@/features/reports/schemas/report";

const iso = (d: Date | null) => (d ? d.toISOString() : null);

export function toShareDto(s: TReportShare): TReportShareDto {
  return {
    id: s.id,
    email: s.email,
    toAccount: s.userId !== null,
    sharedAt: s.sharedAt.toISOString(),
    withdrawnAt: iso(s.withdrawnAt),
    firstOpenedAt: iso(s.firstOpenedAt),
    lastOpenedAt: iso(s.lastOpenedAt),
    openCount: s.openCount,
  };
}

export function toReportDto(
  r: TReport,
  versions: { version: number; issuedAt: Date; supersededAt: Date | null }[],
  shares: TReportShare[],
  staff: boolean,
): TReportDto {
  const live = shares.filter((s) => !s.withdrawnAt);
  return {
    id: r.id,
    title: r.title,
    customerId: r.customerId,
    customerName: r.customerName,
    machineName: r.machineName,
    sourceKind: r.sourceKind === "comparison" ? "comparison" : "estimate",
    estimateId: staff ? r.estimateId : null,
    comparisonId: staff ? r.comparisonId : null,
    recommendations: staff ? r.recommendations : "",
    customerNote: staff ? r.customerNote : "",
    latestVersion: r.latestVersion,
    status: reportStatus({
      version: r.latestVersion === 0 ? null : r.latestVersion,
      latestVersion: r.latestVersion,
      activeShares: live.length,
      opened: live.some((s) => s.firstOpenedAt !== null),
    }),
    versions: versions.map((v) => ({
      version: v.version,
      issuedAt: v.issuedAt.toISOString(),
      supersededAt: iso(v.supersededAt),
    })),
    shares: staff ? shares.map(toShareDto) : [],
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
  };
}
