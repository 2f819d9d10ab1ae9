// Every /api/v1 route, registered once. A new route.ts must be added here: the contract test
// (tests/integration/api/openapi-contract.test.ts) lists every route file missing from the document.
import type { OpenAPIRegistry, RouteConfig } from "@asteasolutions/zod-to-openapi";
import {
  ZCopyTemplateInput,
  ZMachineListQuery,
  ZMachineRecordInput,
  ZMachineRecordPatch,
} from "@/features/machines";
import {
  ZCustomerInput,
  ZCustomerListQuery,
  ZCustomerPatch,
  ZSiteInput,
  ZSiteListQuery,
  ZSitePatch,
} from "@/features/customers";
import {
  ZCreateDutyCycle,
  ZCreateMappingTemplate,
  ZDutyCycleListQuery,
  ZMappingTemplateListQuery,
  ZUpdateDutyCycle,
  ZUpdateMappingTemplate,
} from "@/features/duty-cycles";
import { ZEstimateCreate, ZEstimateListQuery, ZEstimatePatch } from "@/features/estimates";
import { ZSearchQuery } from "@/features/search";
import { ZComparisonCreate, ZStudyListQuery, ZSweepCreate } from "@/features/options";
import {
  ZBrandingPatch,
  ZReportCreate,
  ZReportDraftPatch,
  ZReportListQuery,
  ZReportMessage as ZReportMessageInput,
  ZReportShare,
} from "@/features/reports";
import { ZReadingCreate, ZReadingsImport } from "@/features/calibration";
import type { TApiScope } from "@/lib/authz/api-scopes";
import {
  COMMON_ERRORS,
  CONFIRM,
  CONFLICT,
  IDEMPOTENCY,
  INPUT_ERRORS,
  NOT_FOUND,
  ZDeleted,
  ZDeleteQuery,
  ZIdempotencyHeaders,
  ZIdParams,
  file,
  json,
  z,
} from "@/features/api/openapi/common";
import * as R from "@/features/api/openapi/responses";
import { EXAMPLES } from "@/features/api/openapi/examples";

type TMethod = "get" | "post" | "put" | "patch" | "delete";

/** What a route needs from a token, or that no token may call it. */
type TAccess = TApiScope | "dealer-admin" | "public";

type TOp = Omit<RouteConfig, "method" | "path" | "tags"> & { access: TAccess };

const ACCESS_NOTE: Record<TAccess, string> = {
  read: "Token scope: `read` (or `read_write`).",
  read_write: "Token scope: `read_write`.",
  reports: "Token scope: `reports`.",
  "dealer-admin":
    "Dealer admin only (session or token of a dealer admin; no token scope grants it).",
  public: "No authentication.",
};

function body<T extends z.ZodType>(schema: T, example?: unknown) {
  return {
    required: true,
    content: { "application/json": { schema, ...(example === undefined ? {} : { example }) } },
  };
}

/** Collects the operations per path, so callers read like the route tree. */
export function makeRouteRegistrar(registry: OpenAPIRegistry) {
  return (path: string, tag: string, ops: Partial<Record<TMethod, TOp>>) => {
    for (const [method, op] of Object.entries(ops) as [TMethod, TOp][]) {
      const { access, description, ...rest } = op;
      const isPublic = access === "public";
      registry.registerPath({
        method,
        path,
        tags: [tag],
        description: [description, ACCESS_NOTE[access]].filter(Boolean).join("\n\n"),
        ...(isPublic ? { security: [] } : {}),
        ...rest,
        responses: isPublic ? rest.responses : { ...COMMON_ERRORS, ...rest.responses },
        "x-token-scope": access,
      } as RouteConfig);
    }
  };
}

const creating = (schema: z.ZodType, example?: unknown) => ({
  body: body(schema, example),
  headers: ZIdempotencyHeaders,
});

/** Registers every /api/v1 route. Paths use OpenAPI's `{param}` for Next's `[param]`. */
export function registerPaths(registry: OpenAPIRegistry) {
  const route = makeRouteRegistrar(registry);

  route("/api/v1/openapi.json", "Meta", {
    get: {
      access: "public",
      summary: "This document",
      responses: { 200: json(z.record(z.string(), z.unknown()), "The OpenAPI 3.1 document.") },
    },
  });

  // ── Customers and sites ──
  route("/api/v1/customers", "Customers", {
    get: {
      access: "read",
      summary: "List customers",
      request: { query: ZCustomerListQuery },
      responses: { 200: json(R.ZCustomerPage, "One page of customers."), ...INPUT_ERRORS },
    },
    post: {
      access: "read_write",
      summary: "Create a customer",
      request: creating(ZCustomerInput, EXAMPLES.customer),
      responses: {
        201: json(R.ZCustomer, "The new customer."),
        ...INPUT_ERRORS,
        ...IDEMPOTENCY,
      },
    },
  });
  route("/api/v1/customers/{id}", "Customers", {
    get: {
      access: "read",
      summary: "Get a customer",
      request: { params: ZIdParams },
      responses: { 200: json(R.ZCustomer, "The customer."), ...NOT_FOUND },
    },
    patch: {
      access: "read_write",
      summary: "Change a customer",
      request: { params: ZIdParams, body: body(ZCustomerPatch) },
      responses: { 200: json(R.ZCustomer, "The customer."), ...INPUT_ERRORS, ...NOT_FOUND },
    },
    delete: {
      access: "read_write",
      summary: "Delete a customer and everything of theirs",
      request: { params: ZIdParams, query: ZDeleteQuery },
      responses: { 200: json(ZDeleted, "Deleted."), ...CONFIRM, ...NOT_FOUND, ...CONFLICT },
    },
  });
  route("/api/v1/sites", "Customers", {
    get: {
      access: "read",
      summary: "List sites",
      request: { query: ZSiteListQuery },
      responses: { 200: json(R.ZSitePage, "One page of sites."), ...INPUT_ERRORS },
    },
    post: {
      access: "read_write",
      summary: "Create a site with its surface mix",
      request: creating(ZSiteInput, EXAMPLES.site),
      responses: { 201: json(R.ZSite, "The new site."), ...INPUT_ERRORS, ...IDEMPOTENCY },
    },
  });
  route("/api/v1/sites/{id}", "Customers", {
    get: {
      access: "read",
      summary: "Get a site",
      request: { params: ZIdParams },
      responses: { 200: json(R.ZSite, "The site."), ...NOT_FOUND },
    },
    patch: {
      access: "read_write",
      summary: "Change a site",
      request: { params: ZIdParams, body: body(ZSitePatch) },
      responses: { 200: json(R.ZSite, "The site."), ...INPUT_ERRORS, ...NOT_FOUND },
    },
    delete: {
      access: "read_write",
      summary: "Delete a site",
      request: { params: ZIdParams, query: ZDeleteQuery },
      responses: { 200: json(ZDeleted, "Deleted."), ...CONFIRM, ...NOT_FOUND, ...CONFLICT },
    },
  });

  // ── Machines ──
  route("/api/v1/machines", "Machines", {
    get: {
      access: "read",
      summary: "List machines and dealership templates",
      request: { query: ZMachineListQuery },
      responses: { 200: json(R.ZMachinePage, "One page of machines."), ...INPUT_ERRORS },
    },
    post: {
      access: "read_write",
      summary: "Create a machine (customerId null: a dealership template)",
      request: creating(ZMachineRecordInput, EXAMPLES.machine),
      responses: { 201: json(R.ZMachine, "The new machine."), ...INPUT_ERRORS, ...IDEMPOTENCY },
    },
  });
  route("/api/v1/machines/{id}", "Machines", {
    get: {
      access: "read",
      summary: "Get a machine",
      request: { params: ZIdParams },
      responses: { 200: json(R.ZMachine, "The machine."), ...NOT_FOUND },
    },
    patch: {
      access: "read_write",
      summary: "Change a machine (a new version; estimates keep theirs)",
      request: { params: ZIdParams, body: body(ZMachineRecordPatch) },
      responses: { 200: json(R.ZMachine, "The machine."), ...INPUT_ERRORS, ...NOT_FOUND },
    },
    delete: {
      access: "read_write",
      summary: "Delete a machine",
      request: { params: ZIdParams, query: ZDeleteQuery },
      responses: { 200: json(ZDeleted, "Deleted."), ...CONFIRM, ...NOT_FOUND, ...CONFLICT },
    },
  });
  route("/api/v1/machines/{id}/copy", "Machines", {
    post: {
      access: "read_write",
      summary: "Copy a template (or any machine) to a customer",
      request: { params: ZIdParams, ...creating(ZCopyTemplateInput) },
      responses: {
        201: json(R.ZMachine, "The copy."),
        ...INPUT_ERRORS,
        ...NOT_FOUND,
        ...IDEMPOTENCY,
      },
    },
  });
  route("/api/v1/machines/{id}/readings", "Tread readings", {
    get: {
      access: "read",
      summary: "List a machine's tread readings",
      request: { params: ZIdParams },
      responses: { 200: json(z.array(R.ZReading), "Readings, oldest first."), ...NOT_FOUND },
    },
    post: {
      access: "read_write",
      summary: "Record a tread reading (JSON, or multipart with a `reading` field and `photos`)",
      request: { params: ZIdParams, ...creating(ZReadingCreate, EXAMPLES.reading) },
      responses: {
        201: json(R.ZReading, "The reading."),
        ...INPUT_ERRORS,
        ...NOT_FOUND,
        ...IDEMPOTENCY,
      },
    },
  });
  route("/api/v1/machines/{id}/readings/import", "Tread readings", {
    post: {
      access: "read_write",
      summary: "Import readings from CSV text, all or nothing",
      request: { params: ZIdParams, ...creating(ZReadingsImport) },
      responses: {
        201: json(z.object({ imported: z.number().int() }), "How many readings were stored."),
        ...INPUT_ERRORS,
        ...NOT_FOUND,
        ...IDEMPOTENCY,
      },
    },
  });
  route("/api/v1/machines/{id}/calibration", "Tread readings", {
    get: {
      access: "read",
      summary: "The machine's readings and its calibrated wear",
      request: { params: ZIdParams },
      responses: { 200: json(R.ZMachineCalibration, "Calibration state."), ...NOT_FOUND },
    },
    post: {
      access: "read_write",
      summary: "Store a calibrated run of the machine's latest estimate",
      request: { params: ZIdParams, headers: ZIdempotencyHeaders },
      responses: {
        201: json(R.ZCalibratedEstimate, "The calibrated estimate."),
        ...NOT_FOUND,
        ...CONFLICT,
        ...IDEMPOTENCY,
      },
    },
  });
  route("/api/v1/readings/{id}", "Tread readings", {
    delete: {
      access: "read_write",
      summary: "Delete a tread reading",
      request: { params: ZIdParams },
      responses: {
        200: json(z.object({ deleted: z.literal(true) }).loose(), "Deleted."),
        ...NOT_FOUND,
      },
    },
  });
  route("/api/v1/reading-photos/{id}", "Tread readings", {
    get: {
      access: "read",
      summary: "A reading's photo (JPEG or PNG)",
      request: { params: ZIdParams },
      responses: { 200: file("image/*", "The photo's bytes."), ...NOT_FOUND },
    },
  });
  route("/api/v1/tyre-plan", "Tread readings", {
    get: {
      access: "read",
      summary: "Tyre replacement plan and orders",
      request: {
        query: z.object({
          customerId: z.uuid().optional(),
          months: z.coerce.number().int().min(1).max(36).optional(),
        }),
      },
      responses: { 200: json(R.ZTyrePlan, "The plan."), ...INPUT_ERRORS },
    },
  });
  route("/api/v1/tyre-plan/csv", "Tread readings", {
    get: {
      access: "read",
      summary: "The tyre plan as CSV",
      request: {
        query: z.object({
          customerId: z.uuid().optional(),
          months: z.coerce.number().int().min(1).max(36).optional(),
        }),
      },
      responses: { 200: file("text/csv", "The plan, one row per tyre."), ...INPUT_ERRORS },
    },
  });

  // ── Duty cycles ──
  route("/api/v1/uploads", "Duty cycles", {
    post: {
      access: "read_write",
      summary: "Upload a telematics log or turn schedule (raw CSV bytes as the body)",
      description:
        'Streams the file to storage and answers its id and SHA-256. Then create a duty cycle with `source: "upload"`, the `uploadId` and a column mapping to import it.',
      request: {
        headers: ZIdempotencyHeaders.extend({
          "X-File-Name": z.string().openapi({ example: "hollin-vale-loader-2026-11.csv" }),
        }),
        body: {
          required: true,
          content: {
            "text/csv": {
              schema: z.string().openapi({ format: "binary" }),
              example: EXAMPLES.telematicsCsv,
            },
          },
        },
      },
      responses: {
        201: json(R.ZUpload, "The stored file."),
        ...INPUT_ERRORS,
        413: json(
          z.object({ error: z.object({ code: z.string(), message: z.string() }) }),
          "Over the upload limit.",
        ),
        ...IDEMPOTENCY,
      },
    },
  });
  route("/api/v1/duty-cycles", "Duty cycles", {
    get: {
      access: "read",
      summary: "List duty cycles",
      request: { query: ZDutyCycleListQuery },
      responses: { 200: json(R.ZDutyCyclePage, "One page of duty cycles."), ...INPUT_ERRORS },
    },
    post: {
      access: "read_write",
      summary: "Import an upload, or build a duty cycle from the work done",
      description:
        '`source: "upload"` queues the import and answers at once with status `pending`; poll GET /api/v1/duty-cycles/{id} until `ready`.',
      request: creating(ZCreateDutyCycle, EXAMPLES.dutyCycleFromUpload),
      responses: {
        201: json(R.ZDutyCycleRow, "The duty cycle (pending while an upload imports)."),
        ...INPUT_ERRORS,
        ...IDEMPOTENCY,
      },
    },
  });
  route("/api/v1/duty-cycles/{id}", "Duty cycles", {
    get: {
      access: "read",
      summary: "Get a duty cycle with its turns and import state",
      request: { params: ZIdParams },
      responses: { 200: json(R.ZDutyCycle, "The duty cycle."), ...NOT_FOUND },
    },
    patch: {
      access: "read_write",
      summary: "Rename, reassign or rebuild a duty cycle",
      request: { params: ZIdParams, body: body(ZUpdateDutyCycle) },
      responses: {
        200: json(R.ZDutyCycleRow, "The duty cycle."),
        ...INPUT_ERRORS,
        ...NOT_FOUND,
        ...CONFLICT,
      },
    },
    delete: {
      access: "read_write",
      summary: "Delete a duty cycle",
      request: { params: ZIdParams, query: ZDeleteQuery },
      responses: { 200: json(ZDeleted, "Deleted."), ...CONFIRM, ...NOT_FOUND, ...CONFLICT },
    },
  });
  route("/api/v1/duty-cycles/{id}/retry", "Duty cycles", {
    post: {
      access: "read_write",
      summary: "Queue a failed import again",
      request: { params: ZIdParams },
      responses: {
        202: json(R.ZDutyCycleRow, "Queued."),
        ...NOT_FOUND,
        ...CONFLICT,
      },
    },
  });
  route("/api/v1/duty-cycles/{id}/bad-rows", "Duty cycles", {
    get: {
      access: "read",
      summary: "Rows the import skipped, as CSV (line, column, reason)",
      request: { params: ZIdParams },
      responses: { 200: file("text/csv", "Skipped rows."), ...NOT_FOUND },
    },
  });
  route("/api/v1/mapping-templates", "Duty cycles", {
    get: {
      access: "read",
      summary: "List column-mapping templates",
      request: { query: ZMappingTemplateListQuery },
      responses: { 200: json(R.ZMappingTemplatePage, "One page of templates."), ...INPUT_ERRORS },
    },
    post: {
      access: "read_write",
      summary: "Save a column mapping as a named template",
      request: creating(ZCreateMappingTemplate),
      responses: {
        201: json(R.ZMappingTemplate, "The template."),
        ...INPUT_ERRORS,
        ...IDEMPOTENCY,
      },
    },
  });
  route("/api/v1/mapping-templates/{id}", "Duty cycles", {
    get: {
      access: "read",
      summary: "Get a mapping template",
      request: { params: ZIdParams },
      responses: { 200: json(R.ZMappingTemplate, "The template."), ...NOT_FOUND },
    },
    patch: {
      access: "read_write",
      summary: "Rename or change a mapping template",
      request: { params: ZIdParams, body: body(ZUpdateMappingTemplate) },
      responses: { 200: json(R.ZMappingTemplate, "The template."), ...INPUT_ERRORS, ...NOT_FOUND },
    },
    delete: {
      access: "read_write",
      summary: "Delete a mapping template",
      request: { params: ZIdParams, query: ZDeleteQuery },
      responses: { 200: json(ZDeleted, "Deleted."), ...CONFIRM, ...NOT_FOUND, ...CONFLICT },
    },
  });

  // ── Estimates ──
  route("/api/v1/estimates", "Estimates", {
    get: {
      access: "read",
      summary: "List estimates",
      request: { query: ZEstimateListQuery },
      responses: { 200: json(R.ZEstimatePage, "One page of estimates."), ...INPUT_ERRORS },
    },
    post: {
      access: "read_write",
      summary: "Run the engine for a machine on a duty cycle and store the estimate",
      request: creating(ZEstimateCreate, EXAMPLES.estimate),
      responses: {
        201: json(R.ZEstimate, "The estimate with the engine's result."),
        ...INPUT_ERRORS,
        ...IDEMPOTENCY,
      },
    },
  });
  route("/api/v1/estimates/{id}", "Estimates", {
    get: {
      access: "read",
      summary: "Get an estimate with its result",
      request: { params: ZIdParams },
      responses: { 200: json(R.ZEstimate, "The estimate."), ...NOT_FOUND },
    },
    patch: {
      access: "read_write",
      summary: "Rename an estimate (its result never changes)",
      request: { params: ZIdParams, body: body(ZEstimatePatch) },
      responses: { 200: json(R.ZEstimate, "The estimate."), ...INPUT_ERRORS, ...NOT_FOUND },
    },
    delete: {
      access: "read_write",
      summary: "Delete an estimate",
      request: { params: ZIdParams, query: ZDeleteQuery },
      responses: { 200: json(ZDeleted, "Deleted."), ...CONFIRM, ...NOT_FOUND, ...CONFLICT },
    },
  });
  route("/api/v1/estimates/{id}/csv", "Estimates", {
    get: {
      access: "read",
      summary: "Per-turn CSV of an estimate",
      request: { params: ZIdParams },
      responses: { 200: file("text/csv", "One row per turn kind and position."), ...NOT_FOUND },
    },
  });
  route("/api/v1/search", "Estimates", {
    get: {
      access: "read",
      summary: "Search customers and machines",
      request: { query: ZSearchQuery },
      responses: { 200: json(R.ZSearchResult, "Matches."), ...INPUT_ERRORS },
    },
  });

  // ── Comparisons and sweeps ──
  for (const [plural, label, create, dto] of [
    ["comparisons", "comparison", ZComparisonCreate, R.ZComparison],
    ["sweeps", "sweep", ZSweepCreate, R.ZSweep],
  ] as const) {
    route(`/api/v1/${plural}`, "Options", {
      get: {
        access: "read",
        summary: `List ${plural}`,
        request: { query: ZStudyListQuery },
        responses: {
          200: json(R.ZStudyPage, `One page of ${plural}.`),
          ...INPUT_ERRORS,
          // A customer account reads studies only as quote reports shared with it.
          ...NOT_FOUND,
        },
      },
      post: {
        access: "read_write",
        summary: `Run a ${label} on an estimate's machine and duty cycle`,
        request: creating(create),
        responses: { 201: json(dto, `The ${label}.`), ...INPUT_ERRORS, ...IDEMPOTENCY },
      },
    });
    route(`/api/v1/${plural}/{id}`, "Options", {
      get: {
        access: "read",
        summary: `Get a ${label}`,
        request: { params: ZIdParams },
        responses: { 200: json(dto, `The ${label}.`), ...NOT_FOUND },
      },
    });
    route(`/api/v1/${plural}/{id}/rerun`, "Options", {
      post: {
        access: "read_write",
        summary: `Rerun a ${label} with today's engine as its next version`,
        request: { params: ZIdParams, headers: ZIdempotencyHeaders },
        responses: { 201: json(dto, `The new version.`), ...NOT_FOUND, ...IDEMPOTENCY },
      },
    });
  }

  // ── Reports ──
  const ZVersionParams = z.object({
    id: ZIdParams.shape.id,
    version: z
      .string()
      .regex(/^(\d+|latest)$/)
      .openapi({ example: "1", description: "A version number, or `latest`." }),
  });
  route("/api/v1/reports", "Reports", {
    get: {
      access: "reports",
      summary: "List reports (drafts and issued versions)",
      request: { query: ZReportListQuery },
      responses: { 200: json(R.ZReportPage, "One page of reports."), ...INPUT_ERRORS },
    },
    post: {
      access: "reports",
      summary: "Start a draft report from an estimate or a stored comparison",
      request: creating(ZReportCreate),
      responses: {
        201: json(R.ZReport, "The draft."),
        ...INPUT_ERRORS,
        ...NOT_FOUND,
        ...IDEMPOTENCY,
      },
    },
  });
  route("/api/v1/reports/{id}", "Reports", {
    get: {
      access: "reports",
      summary: "Get a report with its versions and shares",
      request: { params: ZIdParams },
      responses: { 200: json(R.ZReport, "The report."), ...NOT_FOUND },
    },
    patch: {
      access: "reports",
      summary: "Edit the draft (title, recommendations, customer note)",
      request: { params: ZIdParams, body: body(ZReportDraftPatch) },
      responses: { 200: json(R.ZReport, "The report."), ...INPUT_ERRORS, ...NOT_FOUND },
    },
  });
  route("/api/v1/reports/{id}/issue", "Reports", {
    post: {
      access: "reports",
      summary: "Issue the next immutable version (counts against the report plan)",
      request: { params: ZIdParams, headers: ZIdempotencyHeaders },
      responses: {
        201: json(R.ZReportVersion, "The issued version."),
        402: json(
          R.ZReport.pick({ id: true }).partial(),
          "The report plan's allowance is used up.",
        ),
        ...NOT_FOUND,
        ...IDEMPOTENCY,
      },
    },
  });
  route("/api/v1/reports/{id}/shares", "Reports", {
    post: {
      access: "reports",
      summary: "Share the issued report with its customer",
      request: { params: ZIdParams, ...creating(ZReportShare) },
      responses: {
        200: json(R.ZReportShared, "The report, with what was sent."),
        ...INPUT_ERRORS,
        ...NOT_FOUND,
        ...IDEMPOTENCY,
      },
    },
    delete: {
      access: "reports",
      summary: "Withdraw the report from the customer",
      request: { params: ZIdParams },
      responses: { 200: json(R.ZReport, "The report."), ...NOT_FOUND },
    },
  });
  route("/api/v1/reports/{id}/messages", "Reports", {
    get: {
      access: "reports",
      summary: "The report's message thread with the customer",
      request: { params: ZIdParams },
      responses: { 200: json(z.array(R.ZReportMessage), "Messages, oldest first."), ...NOT_FOUND },
    },
    post: {
      access: "reports",
      summary: "Reply to the customer (e-mailed to them)",
      request: { params: ZIdParams, ...creating(ZReportMessageInput) },
      responses: {
        201: json(R.ZReportMessage, "The message."),
        ...INPUT_ERRORS,
        ...NOT_FOUND,
        ...IDEMPOTENCY,
      },
    },
  });
  route("/api/v1/reports/{id}/versions/{version}", "Reports", {
    get: {
      access: "reports",
      summary: "One issued version, as frozen",
      request: { params: ZVersionParams },
      responses: { 200: json(R.ZReportVersion, "The version."), ...NOT_FOUND },
    },
  });
  route("/api/v1/reports/{id}/versions/{version}/pdf", "Reports", {
    get: {
      access: "reports",
      summary: "One issued version as PDF",
      request: { params: ZVersionParams },
      responses: { 200: file("application/pdf", "The report PDF."), ...NOT_FOUND },
    },
  });
  route("/api/v1/reports/{id}/versions/{version}/csv", "Reports", {
    get: {
      access: "reports",
      summary: "One issued version's per-turn CSV annex",
      request: { params: ZVersionParams },
      responses: { 200: file("text/csv", "The annex."), ...NOT_FOUND },
    },
  });
  route("/api/v1/branding", "Reports", {
    get: {
      access: "read",
      summary: "The dealership's report branding",
      responses: { 200: json(R.ZBranding, "Branding.") },
    },
    put: {
      access: "dealer-admin",
      summary: "Set the report name, contact line and currency",
      request: { body: body(ZBrandingPatch) },
      responses: { 200: json(R.ZBranding, "Branding."), ...INPUT_ERRORS },
    },
  });
  route("/api/v1/branding/logo", "Reports", {
    get: {
      access: "read",
      summary: "The report logo",
      responses: { 200: file("image/png", "The logo."), ...NOT_FOUND },
    },
    post: {
      access: "dealer-admin",
      summary: "Upload a report logo (raw image bytes, or multipart with a `logo` file)",
      request: {
        body: {
          required: true,
          content: { "image/png": { schema: z.string().openapi({ format: "binary" }) } },
        },
      },
      responses: { 200: json(R.ZBranding, "Branding."), ...INPUT_ERRORS },
    },
  });

  // ── Billing ──
  route("/api/v1/billing/webhook", "Billing", {
    post: {
      access: "public",
      summary: "Payment provider events (signed; not for dealers' systems)",
      description: "Authenticated by the `Stripe-Signature` HMAC over the raw body.",
      request: {
        headers: z.object({ "Stripe-Signature": z.string() }),
        body: body(z.record(z.string(), z.unknown())),
      },
      responses: {
        200: json(z.object({ received: z.literal(true), duplicate: z.boolean() }), "Received."),
        400: json(
          z.object({ error: z.object({ code: z.string(), message: z.string() }) }),
          "Bad or missing signature.",
        ),
      },
    },
  });
}
