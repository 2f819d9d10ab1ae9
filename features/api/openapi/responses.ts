// Response bodies as the routes answer them. The DTO types live with their features as plain
// TypeScript; tests/integration/api/openapi-contract.test.ts validates real answers against these
// schemas, so a DTO that drifts from the document fails a test.
import { REPORT_STATUSES } from "@/lib/reports";
import { z, ZId, ZTimestamp, page } from "@/features/api/openapi/common";

const nullableString = z.string().nullable();

// ── Customers and sites ──────────────────────────────────────────────────────────────────
const ZContactOut = z.object({
  name: z.string(),
  role: z.string().optional(),
  email: z.string().optional(),
  phone: z.string().optional(),
});

export const ZCustomer = z
  .object({
    id: ZId,
    name: z.string().openapi({ example: "Hollin Vale Farm" }),
    kind: z.string().openapi({ example: "farm" }),
    contactName: nullableString.openapi({ example: "Morwenna Tregarthen" }),
    contactEmail: nullableString.openapi({ example: "morwenna@hollinvale.test" }),
    contactPhone: nullableString,
    contacts: z.array(ZContactOut),
    notes: z.string(),
    createdAt: ZTimestamp,
    updatedAt: ZTimestamp,
  })
  .openapi("Customer");

export const ZCustomerRow = z
  .object({
    id: ZId,
    name: z.string().openapi({ example: "Eastmere Contracting" }),
    kind: z.string(),
    contactName: nullableString,
    updatedAt: ZTimestamp,
    machineCount: z.number().int(),
    siteCount: z.number().int(),
  })
  .openapi("CustomerRow");
export const ZCustomerPage = page(ZCustomerRow, "CustomerPage");

export const ZSite = z
  .object({
    id: ZId,
    customerId: ZId,
    customerName: z.string(),
    name: z.string().openapi({ example: "Hollin Vale home farm" }),
    surfaceMix: z.record(z.string(), z.number()).openapi({ example: { grass: 0.6, gravel: 0.4 } }),
    notes: z.string(),
    createdAt: ZTimestamp,
    updatedAt: ZTimestamp,
  })
  .openapi("Site");
export const ZSitePage = page(ZSite, "SitePage");

// ── Machines ─────────────────────────────────────────────────────────────────────────────
export const ZMachine = z
  .object({
    id: ZId,
    customerId: ZId.nullable(),
    customerName: nullableString,
    name: z.string().openapi({ example: "Hollin Vale loader tractor" }),
    kind: z.string().openapi({ example: "tractor" }),
    layout: z.string(),
    spec: z
      .record(z.string(), z.unknown())
      .openapi({ description: "The engine input (wheelbase, axles, steering, drive), SI units." }),
    templateId: ZId.nullable(),
    version: z.number().int(),
    createdAt: ZTimestamp,
    updatedAt: ZTimestamp,
  })
  .openapi("Machine");

export const ZMachineRow = z
  .object({
    id: ZId,
    customerId: ZId.nullable(),
    customerName: nullableString,
    name: z.string(),
    kind: z.string(),
    layout: z.string(),
    version: z.number().int(),
    updatedAt: ZTimestamp,
    estimateCount: z.number().int(),
  })
  .openapi("MachineRow");
export const ZMachinePage = page(ZMachineRow, "MachinePage");

// ── Duty cycles, uploads and mapping templates ──────────────────────────────────────────
export const ZUpload = z
  .object({
    id: ZId,
    originalName: z.string().openapi({ example: "hollin-vale-loader-2026-11.csv" }),
    sizeBytes: z.number().int(),
    sha256: z.string().openapi({ pattern: "^[0-9a-f]{64}$" }),
    uploadedAt: ZTimestamp,
  })
  .openapi("Upload");

const dutyCycleRowShape = {
  id: ZId,
  name: z.string().openapi({ example: "Yard loading, November" }),
  customerId: ZId,
  customerName: z.string(),
  machineId: ZId.nullable(),
  source: z.enum(["telematics", "schedule", "builder"]),
  status: z.enum(["pending", "processing", "ready", "failed"]).openapi({
    description: "An upload is imported in the background: poll until `ready` or `failed`.",
  }),
  progress: z.number(),
  operatingHours: z.number().nullable(),
  turnsPerHour: z.number().nullable(),
  createdAt: ZTimestamp,
  updatedAt: ZTimestamp,
};
export const ZDutyCycleRow = z.object(dutyCycleRowShape).openapi("DutyCycleRow");
export const ZDutyCyclePage = page(ZDutyCycleRow, "DutyCyclePage");

export const ZDutyCycle = z
  .object({
    ...dutyCycleRowShape,
    failureReason: nullableString,
    summary: z.record(z.string(), z.unknown()).nullable(),
    straight: z.record(z.string(), z.unknown()).nullable(),
    rowsUsed: z.number().int(),
    rowsSkipped: z.number().int(),
    attempts: z.number().int(),
    interruptions: z.number().int(),
    version: z.number().int(),
    builderInput: z.unknown(),
    notes: z.array(z.string()),
    upload: z
      .object({
        originalName: z.string(),
        sizeBytes: z.number(),
        sha256: z.string(),
        uploadedAt: ZTimestamp,
      })
      .nullable(),
    turns: z.array(z.record(z.string(), z.unknown())),
    turnCount: z.number().int(),
  })
  .openapi("DutyCycle");

export const ZMappingTemplate = z
  .object({
    id: ZId,
    name: z.string().openapi({ example: "Yard loader telematics export" }),
    kind: z.enum(["telematics", "schedule"]),
    mapping: z.record(z.string(), z.unknown()),
    updatedAt: ZTimestamp,
  })
  .openapi("MappingTemplate");
export const ZMappingTemplatePage = page(ZMappingTemplate, "MappingTemplatePage");

// ── Estimates ────────────────────────────────────────────────────────────────────────────
const estimateRowShape = {
  id: ZId,
  title: z.string().openapi({ example: "Loader tractor on the yard, current tyres" }),
  customerId: ZId.nullable(),
  customerName: nullableString,
  machineId: ZId,
  machineName: z.string(),
  dutyCycleName: z.string(),
  costPerHour: z
    .number()
    .nullable()
    .openapi({ description: "Tyre cost per operating hour, in the dealership's currency." }),
  hoursToFirstReplacement: z.number().nullable(),
  firstToWear: nullableString,
  warningCount: z.number().int(),
  createdAt: ZTimestamp,
};
export const ZEstimateRow = z.object(estimateRowShape).openapi("EstimateRow");
export const ZEstimatePage = page(ZEstimateRow, "EstimatePage");

export const ZEstimateResult = z
  .object({
    engineVersion: z.string(),
    costPerHour: z.number(),
    positions: z.array(z.record(z.string(), z.unknown())),
    turns: z.array(z.record(z.string(), z.unknown())),
    warnings: z.array(z.unknown()),
    cautions: z.array(z.unknown()),
  })
  .loose()
  .openapi("EstimateResult", {
    description:
      "The engine's result: per tyre position slip, scrub energy, wear rate, hours to replacement and cost per hour; per turn kind the same split. SI units; money in the dealership's currency.",
  });

export const ZEstimate = z
  .object({
    ...estimateRowShape,
    dutyCycleId: ZId.nullable(),
    dutyCycleVersion: z.number().int(),
    siteId: ZId.nullable(),
    machineVersion: z.number().int(),
    engineVersion: z.string(),
    result: ZEstimateResult,
  })
  .openapi("Estimate");

// ── Comparisons and sweeps ───────────────────────────────────────────────────────────────
const studyRowShape = {
  id: ZId,
  kind: z.enum(["comparison", "sweep"]),
  seriesId: ZId,
  version: z.number().int(),
  title: z.string(),
  customerId: ZId.nullable(),
  machineId: ZId,
  machineName: z.string(),
  estimateId: ZId.nullable(),
  engineVersion: z.string(),
  currentCostPerHour: z.number().nullable(),
  bestCostPerHour: z.number().nullable(),
  createdAt: ZTimestamp,
};
export const ZStudyRow = z.object(studyRowShape).openapi("StudyRow");
export const ZStudyPage = page(ZStudyRow, "StudyPage");
export const ZComparison = z
  .object({
    ...studyRowShape,
    kind: z.literal("comparison"),
    hours: z.number(),
    result: z.record(z.string(), z.unknown()),
  })
  .openapi("Comparison");
export const ZSweep = z
  .object({ ...studyRowShape, kind: z.literal("sweep"), result: z.record(z.string(), z.unknown()) })
  .openapi("Sweep");

// ── Reports ──────────────────────────────────────────────────────────────────────────────
const ZReportStatus = z.enum(REPORT_STATUSES);
export const ZReportRow = z
  .object({
    reportId: ZId,
    version: z.number().int().nullable(),
    title: z.string(),
    customerId: ZId,
    customerName: z.string(),
    machineName: z.string(),
    status: ZReportStatus,
    issuedAt: ZTimestamp.nullable(),
    firstOpenedAt: ZTimestamp.nullable(),
    lastOpenedAt: ZTimestamp.nullable(),
    updatedAt: ZTimestamp,
  })
  .openapi("ReportRow");
export const ZReportPage = page(ZReportRow, "ReportPage");

const ZReportShareOut = z.object({
  id: ZId,
  email: z.string(),
  toAccount: z.boolean(),
  sharedAt: ZTimestamp,
  withdrawnAt: ZTimestamp.nullable(),
  firstOpenedAt: ZTimestamp.nullable(),
  lastOpenedAt: ZTimestamp.nullable(),
  openCount: z.number().int(),
});

const reportShape = {
  id: ZId,
  title: z.string().openapi({ example: "Hollin Vale loader tractor: tyre cost per hour" }),
  customerId: ZId,
  customerName: z.string(),
  machineName: z.string(),
  sourceKind: z.string(),
  estimateId: ZId.nullable(),
  recommendations: z.string(),
  customerNote: z.string(),
  latestVersion: z.number().int(),
  status: ZReportStatus,
  versions: z.array(
    z.object({
      version: z.number().int(),
      issuedAt: ZTimestamp,
      supersededAt: ZTimestamp.nullable(),
    }),
  ),
  shares: z.array(ZReportShareOut),
  createdAt: ZTimestamp,
  updatedAt: ZTimestamp,
};
export const ZReport = z.object(reportShape).loose().openapi("Report");
export const ZReportShared = z
  .object({ ...reportShape, message: z.string() })
  .loose()
  .openapi("ReportShared");

export const ZReportVersion = z
  .object({
    reportId: ZId,
    version: z.number().int(),
    latestVersion: z.number().int(),
    issuedAt: ZTimestamp,
    supersededAt: ZTimestamp.nullable(),
    logo: nullableString,
    content: z.record(z.string(), z.unknown()),
  })
  .openapi("ReportVersion");

export const ZReportMessage = z
  .object({
    id: ZId,
    authorName: z.string(),
    fromCustomer: z.boolean(),
    body: z.string(),
    createdAt: ZTimestamp,
  })
  .openapi("ReportMessage");

export const ZBranding = z
  .object({
    displayName: z.string().openapi({ example: "Brackenridge Machinery" }),
    contactLine: z.string(),
    currency: z.string().openapi({ example: "GBP" }),
    hasLogo: z.boolean(),
    logoWidth: z.number().nullable(),
    logoHeight: z.number().nullable(),
    updatedAt: ZTimestamp.nullable(),
  })
  .openapi("Branding");

// ── Search, readings, calibration, tyre plan ─────────────────────────────────────────────
const ZSearchHit = z.object({
  type: z.enum(["customer", "machine"]),
  id: ZId,
  title: z.string(),
  subtitle: z.string(),
  href: z.string(),
});
export const ZSearchResult = z
  .object({ q: z.string(), customers: z.array(ZSearchHit), machines: z.array(ZSearchHit) })
  .openapi("SearchResult");

export const ZReading = z
  .object({
    id: ZId,
    machineId: ZId,
    position: z.string().openapi({ example: "front-left" }),
    kind: z.enum(["reading", "fitted"]),
    measuredOn: z.string().openapi({ format: "date", example: "2026-10-14" }),
    hourMeter: z.number(),
    depthCentre: z.number().openapi({ description: "mm" }),
    depthInner: z.number().nullable(),
    depthOuter: z.number().nullable(),
    designation: nullableString,
    measuredBy: z.string(),
    note: z.string(),
    photoIds: z.array(ZId),
    createdAt: ZTimestamp,
  })
  .openapi("TreadReading");

export const ZMachineCalibration = z
  .object({
    machine: z.object({ id: ZId, name: z.string(), customerId: ZId.nullable() }),
    canWrite: z.boolean(),
    currency: z.string(),
    tyres: z.record(z.string(), z.unknown()).nullable(),
    readings: z.array(ZReading),
    basis: z.object({ estimateId: ZId, createdAt: ZTimestamp }).nullable(),
    fleet: z.record(z.string(), z.unknown()).nullable(),
  })
  .openapi("MachineCalibration");

export const ZCalibratedEstimate = z
  .object({ id: ZId, calibration: z.record(z.string(), z.unknown()) })
  .openapi("CalibratedEstimate");

export const ZTyrePlan = z
  .object({
    currency: z.string(),
    today: z.string(),
    until: z.string(),
    items: z.array(z.record(z.string(), z.unknown())),
    orders: z.array(z.record(z.string(), z.unknown())),
    dueSoon: z.array(z.record(z.string(), z.unknown())),
    machines: z.array(
      z.object({
        machineId: ZId,
        machineName: z.string(),
        customerName: nullableString,
        calibrated: z.boolean(),
        hoursPerWeek: z.number().nullable(),
      }),
    ),
  })
  .openapi("TyrePlan");
