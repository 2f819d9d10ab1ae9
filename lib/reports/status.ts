export const REPORT_STATUSES = ["draft", "issued", "shared", "opened", "superseded"] as const;
export type TReportStatus = (typeof REPORT_STATUSES)[number];

/**
 * Status of one row of the reports list: a draft has no version; an older version is
 * superseded; the latest is opened, shared or just issued depending on its live share.
 */
export function reportStatus(row: {
  version: number | null;
  latestVersion: number;
  activeShares: number;
  opened: boolean;
}): TReportStatus {
  if (row.version === null) return "draft";
  if (row.version < row.latestVersion) return "superseded";
  if (row.activeShares > 0) return row.opened ? "opened" : "shared";
  return "issued";
}

export const STATUS_LABELS: Record<TReportStatus, string> = {
  draft: "Draft",
  issued: "Issued",
  shared: "Shared",
  opened: "Opened",
  superseded: "Superseded",
};
