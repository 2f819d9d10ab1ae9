import { z } from "zod";
import type { TReportContent, TReportStatus } from "@/lib/reports";
import { REPORT_STATUSES } from "@/lib/reports";

/** Body of POST /api/v1/reports: a draft from one estimate or from one stored comparison. */
export const ZReportCreate = z
  .object({
    estimateId: z.uuid("estimateId must be the id of one of your estimates.").optional(),
    comparisonId: z.uuid("comparisonId must be the id of one of your comparisons.").optional(),
    title: z.string().trim().max(160, "Title must be at most 160 characters.").optional(),
  })
  .superRefine((v, ctx) => {
    if (v.estimateId && v.comparisonId)
      ctx.addIssue({
        code: "custom",
        path: ["comparisonId"],
        message: "Give either estimateId or comparisonId, not both: a report has one source.",
      });
    if (!v.estimateId && !v.comparisonId)
      for (const field of ["estimateId", "comparisonId"])
        ctx.addIssue({
          code: "custom",
          path: [field],
          message: "Give the estimateId or the comparisonId the report is built from.",
        });
  });
export type TReportCreate = z.input<typeof ZReportCreate>;

/** What may change on a report before (re-)issuing; issued versions never change. */
export const ZReportDraftPatch = z.strictObject(
  {
    title: z
      .string()
      .trim()
      .min(1, "Give the report a title.")
      .max(160, "Title must be at most 160 characters.")
      .optional(),
    recommendations: z
      .string()
      .max(4000, "Recommendations must be at most 4,000 characters.")
      .optional(),
    customerNote: z.string().max(2000, "The note must be at most 2,000 characters.").optional(),
  },
  {
    error: (issue) =>
      issue.code === "unrecognized_keys"
        ? "Only the title, recommendations and note of a report can change."
        : undefined,
  },
);
export type TReportDraftPatch = z.input<typeof ZReportDraftPatch>;

export const ZReportListQuery = z.object({
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
  status: z.enum(REPORT_STATUSES).optional(),
  customerId: z.uuid("customerId must be a customer id.").optional(),
  q: z.string().trim().max(100).optional(),
});
export type TReportListQuery = z.output<typeof ZReportListQuery>;

export const ZReportShare = z.object({
  /** Needed only when the customer has no account and no contact e-mail on record. */
  email: z.email("Give a valid e-mail address.").optional(),
});
export type TReportShareInput = z.input<typeof ZReportShare>;

export const ZReportMessage = z.object({
  body: z
    .string()
    .trim()
    .min(1, "Write your question first.")
    .max(4000, "A message must be at most 4,000 characters."),
});
export type TReportMessageInput = z.input<typeof ZReportMessage>;

export const ZBrandingPatch = z.strictObject({
  displayName: z.string().trim().max(120, "At most 120 characters.").optional(),
  contactLine: z.string().trim().max(240, "At most 240 characters.").optional(),
  currency: z
    .string()
    .trim()
    .toUpperCase()
    .regex(/^[A-Z]{3}$/, "Use a three-letter ISO 4217 currency code, e.g. GBP or EUR.")
    .refine(
      (c) => Intl.supportedValuesOf("currency").includes(c),
      "Unknown ISO 4217 currency code.",
    )
    .optional(),
});
export type TBrandingPatch = z.input<typeof ZBrandingPatch>;

export type TBrandingDto = {
  displayName: string;
  contactLine: string;
  currency: string;
  hasLogo: boolean;
  logoWidth: number | null;
  logoHeight: number | null;
  updatedAt: string | null;
};

/** One row of the reports list: a draft, or one issued version. */
export type TReportRow = {
  reportId: string;
  version: number | null;
  title: string;
  customerId: string;
  customerName: string;
  machineName: string;
  status: TReportStatus;
  issuedAt: string | null;
  firstOpenedAt: string | null;
  lastOpenedAt: string | null;
  updatedAt: string;
};

export type TReportShareDto = {
  id: string;
  email: string;
  toAccount: boolean;
  sharedAt: string;
  withdrawnAt: string | null;
  firstOpenedAt: string | null;
  lastOpenedAt: string | null;
  openCount: number;
};

export type TReportDto = {
  id: string;
  title: string;
  customerId: string;
  customerName: string;
  machineName: string;
  sourceKind: "estimate" | "comparison";
  estimateId: string | null;
  /** The stored comparison a report was built from (staff only). */
  comparisonId: string | null;
  recommendations: string;
  customerNote: string;
  latestVersion: number;
  status: TReportStatus;
  versions: { version: number; issuedAt: string; supersededAt: string | null }[];
  /** Staff only; empty for a customer. */
  shares: TReportShareDto[];
  createdAt: string;
  updatedAt: string;
};

export type TReportVersionDto = {
  reportId: string;
  version: number;
  latestVersion: number;
  issuedAt: string;
  supersededAt: string | null;
  /** data: URL of the frozen logo, or null. */
  logo: string | null;
  content: TReportContent;
};

export type TReportMessageDto = {
  id: string;
  authorName: string;
  fromCustomer: boolean;
  body: string;
  createdAt: string;
};
