import "server-only";
import type { TReportVersion } from "@/db/schema";
import type { TReportContent } from "@/lib/reports";
import type { TReportVersionDto } from "@/features/reports/schemas/report";

export function toVersionDto(v: TReportVersion, latestVersion: number): TReportVersionDto {
  return {
    reportId: v.reportId,
    version: v.version,
    latestVersion,
    issuedAt: v.issuedAt.toISOString(),
    supersededAt: v.supersededAt?.toISOString() ?? null,
    logo: v.logo && v.logoMime ? `data:${v.logoMime};base64,${v.logo.toString("base64")}` : null,
    content: v.content as TReportContent,
  };
}
