/**
 * Authorization matrix. Finds every route handler (app/**\/route.ts) and every server-action
 * file ("use server") on disk, calls each exported verb as: anonymous, each role of a "home"
 * dealership, and a dealer admin of a rival dealership, and checks that
 *   - forbidden access is answered 401/403/404 (or, for actions, a refusal), and
 *   - no response carries data the caller may not see (the other dealership's names and ids;
 *     for a customer account, other customers' records).
 * A new route is picked up automatically. When its dynamic params cannot be resolved by the
 * defaults below, or a server action has no fixture, the test fails and says what to add.
 */
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative, sep } from "node:path";
import { pathToFileURL } from "node:url";
import { eq, inArray } from "drizzle-orm";

const state = vi.hoisted(() => ({ cookie: "" }));

// Server actions read the session through next/headers, which only exists inside a Next
// request. Stand in for the request scope with the caller's real session cookie; the actor
// is still resolved from the real database.
vi.mock("next/headers", () => {
  const jar = () =>
    new Map(
      state.cookie
        .split(";")
        .map((p) => p.trim())
        .filter(Boolean)
        .map((p) => [p.slice(0, p.indexOf("=")), p.slice(p.indexOf("=") + 1)] as const),
    );
  return {
    cookies: async () => ({
      get: (name: string) => (jar().has(name) ? { name, value: jar().get(name)! } : undefined),
      getAll: () => [...jar()].map(([name, value]) => ({ name, value })),
      has: (name: string) => jar().has(name),
      set: () => undefined,
      delete: () => undefined,
    }),
    headers: async () => new Headers({ cookie: state.cookie, "x-forwarded-for": "198.51.100.77" }),
  };
});
// Cache revalidation needs Next's render store; outside it, it is a no-op here.
vi.mock("next/cache", async (importOriginal) => ({
  ...(await importOriginal<Record<string, unknown>>()),
  revalidatePath: () => undefined,
  revalidateTag: () => undefined,
  updateTag: () => undefined,
  refresh: () => undefined,
}));

const { getDb, getPool } = await import("@/db/client");
const schema = await import("@/db/schema");
const { createTestDealership, createTestMember, uniqueTag } =
  await import("@/tests/support/session");
const { makeApiToken } = await import("@/tests/support/api-tokens");

type TRoleName = "dealer_admin" | "estimator" | "billing_admin" | "customer";
/**
 * API tokens made by the home dealership's dealer admin, one per scope, plus a revoked and an
 * expired one: extra principals that must stay within their scopes (lib/authz/api-scopes.ts).
 */
type TTokenName =
  "token_read" | "token_write" | "token_reports" | "token_revoked" | "token_expired";
const TOKEN_CALLERS: TTokenName[] = [
  "token_read",
  "token_write",
  "token_reports",
  "token_revoked",
  "token_expired",
];
type TCallerName = "anonymous" | TRoleName | "rival" | TTokenName;
const HOME_ROLES: TRoleName[] = ["dealer_admin", "estimator", "billing_admin", "customer"];
const MUTATING = new Set(["POST", "PUT", "PATCH", "DELETE"]);
const METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"] as const;
const DENIED = [401, 403, 404];

const db = getDb();
const tag = uniqueTag();

// ── The world: two dealerships, each with customers, sites, machines, duty cycles, estimates ──

type TRecords = {
  customer: { id: string; name: string };
  site: { id: string; name: string };
  machine: { id: string; name: string };
  dutyCycle: { id: string; name: string };
  estimate: { id: string; title: string };
  report: { id: string; title: string };
  reading: { id: string; photoId: string };
  comparison: { id: string; title: string };
  sweep: { id: string; title: string };
};

async function seedRecords(dealershipId: string, label: string): Promise<TRecords> {
  const [customer] = await db
    .insert(schema.customers)
    .values({
      dealershipId,
      name: `${label} Customer ${tag}`,
      contactName: `${label} Contact ${tag}`,
    })
    .returning();
  const [site] = await db
    .insert(schema.sites)
    .values({
      dealershipId,
      customerId: customer!.id,
      name: `${label} Site ${tag}`,
      surfaceMix: { grass: 1 },
    })
    .returning();
  const [machine] = await db
    .insert(schema.machines)
    .values({
      dealershipId,
      customerId: customer!.id,
      name: `${label} Machine ${tag}`,
      kind: "tractor",
      spec: {},
    })
    .returning();
  const [dutyCycle] = await db
    .insert(schema.dutyCycles)
    .values({
      dealershipId,
      customerId: customer!.id,
      machineId: machine!.id,
      name: `${label} Duty ${tag}`,
      source: "builder",
      status: "ready",
    })
    .returning();
  const [estimate] = await db
    .insert(schema.estimates)
    .values({
      dealershipId,
      customerId: customer!.id,
      machineId: machine!.id,
      dutyCycleId: dutyCycle!.id,
      title: `${label} Estimate ${tag}`,
      machineVersion: 1,
      engineVersion: "0.0.0",
      inputs: {},
      // The shape of the engine's result, empty: enough for lists, detail and CSV export.
      result: {
        engineVersion: "0.0.0",
        machineName: machine!.name,
        dutyCycleName: dutyCycle!.name,
        lead: null,
        positions: [],
        turns: [],
        firstToWear: null,
        rotation: [],
        costPerHour: 0,
        warnings: [],
        cautions: [],
        coefficients: {},
      },
    })
    .returning();
  const [report] = await db
    .insert(schema.reports)
    .values({
      dealershipId,
      customerId: customer!.id,
      machineId: machine!.id,
      estimateId: estimate!.id,
      title: `${label} Report ${tag}`,
      customerName: customer!.name,
      machineName: machine!.name,
      latestVersion: 1,
    })
    .returning();
  const { buildReportContent } = await import("@/lib/reports");
  const emptyResult = estimate!.result as import("@/lib/scrub").TEstimateResult;
  await db.insert(schema.reportVersions).values({
    reportId: report!.id,
    dealershipId,
    customerId: customer!.id,
    version: 1,
    engineVersion: "0.0.0",
    content: buildReportContent({
      kind: "estimate",
      title: report!.title,
      currency: "EUR",
      dealership: { name: label, contactLine: "" },
      customer: { name: customer!.name, contactName: null },
      dutyCycle: {
        name: dutyCycle!.name,
        turns: [],
        straight: { distancePerHour: 0, speed: 1, surfaceShares: {} },
      },
      options: [
        {
          key: "current",
          label: "As fitted",
          baseline: true,
          estimateId: estimate!.id,
          oneOffCost: 0,
          machine: MATRIX_MACHINE_SPEC,
          result: emptyResult,
        },
      ],
      recommendations: "",
      customerNote: "",
      issuedAt: new Date(),
      issuedBy: label,
    }),
  });
  const [reading] = await db
    .insert(schema.treadReadings)
    .values({
      dealershipId,
      machineId: machine!.id,
      position: "front-left",
      measuredOn: "2026-01-05",
      hourMeter: 100,
      depthCentre: 30,
      measuredBy: `${label} Measurer ${tag}`,
    })
    .returning();
  const [photo] = await db
    .insert(schema.treadReadingPhotos)
    .values({
      dealershipId,
      readingId: reading!.id,
      contentType: "image/png",
      byteSize: 8,
      bytes: Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    })
    .returning();
  const [comparison, sweep] = await db
    .insert(schema.optionStudies)
    .values(
      (["comparison", "sweep"] as const).map((kind) => {
        const id = crypto.randomUUID();
        return {
          id,
          seriesId: id,
          kind,
          dealershipId,
          customerId: customer!.id,
          machineId: machine!.id,
          estimateId: estimate!.id,
          title: `${label} ${kind} ${tag}`,
          engineVersion: "0.0.0",
          inputs: {},
          result: { hours: 1, current: null, options: [], points: [] },
        };
      }),
    )
    .returning();
  return {
    comparison: { id: comparison!.id, title: comparison!.title },
    sweep: { id: sweep!.id, title: sweep!.title },
    customer: { id: customer!.id, name: customer!.name },
    site: { id: site!.id, name: site!.name },
    machine: { id: machine!.id, name: machine!.name },
    dutyCycle: { id: dutyCycle!.id, name: dutyCycle!.name },
    estimate: { id: estimate!.id, title: estimate!.title },
    report: { id: report!.id, title: report!.title },
    reading: { id: reading!.id, photoId: photo!.id },
  };
}

/** Enough of a machine for a report's fitment table (the matrix checks access, not figures). */
const MATRIX_MACHINE_SPEC: import("@/lib/scrub").TMachineInput = {
  name: "Matrix machine",
  wheelbase: 2.5,
  axles: {
    front: {
      track: 1.8,
      load: 2000,
      tyre: { designation: "380/70R24", treadDepthNew: 35, treadDepthReplace: 8, price: 800 },
    },
    rear: {
      track: 1.8,
      load: 3000,
      tyre: { designation: "480/70R34", treadDepthNew: 45, treadDepthReplace: 10, price: 1400 },
    },
  },
  steering: { layout: "ideal", maxLock: 50 },
  drive: { type: "2wd", drivenAxle: "rear" },
};

function markersOf(r: TRecords): string[] {
  return [
    r.customer.id,
    r.customer.name,
    r.site.id,
    r.site.name,
    r.machine.id,
    r.machine.name,
    r.dutyCycle.id,
    r.dutyCycle.name,
    r.estimate.id,
    r.estimate.title,
    r.report.id,
    r.report.title,
    r.reading.id,
    r.comparison.id,
    r.comparison.title,
    r.sweep.id,
    r.sweep.title,
  ];
}

type TMember = Awaited<ReturnType<typeof createTestMember>>;
type TWorld = {
  home: {
    dealershipId: string;
    dealershipName: string;
    own: TRecords;
    other: TRecords;
    templateId: string;
    templateName: string;
    invitationId: string;
  };
  rival: { dealershipId: string; dealershipName: string; records: TRecords };
  members: Record<TRoleName | "rival", TMember>;
  /** `Authorization` header values of the home dealership's tokens. */
  tokens: Record<TTokenName, string>;
  readTokenId: string;
};

let world: TWorld;

async function seedWorld(): Promise<TWorld> {
  const home = await createTestDealership(db, `Home Dealership ${tag}`);
  const rival = await createTestDealership(db, `Rival Dealership ${tag}`);
  const own = await seedRecords(home.id, "HomeOwn");
  const other = await seedRecords(home.id, "HomeOther");
  const rivalRecords = await seedRecords(rival.id, "Rival");
  const [template] = await db
    .insert(schema.mappingTemplates)
    .values({
      dealershipId: home.id,
      name: `Home Template ${tag}`,
      kind: "telematics",
      mapping: {},
    })
    .returning();
  const members = {} as TWorld["members"];
  for (const role of HOME_ROLES) {
    members[role] = await createTestMember({
      db,
      roles: [role],
      dealershipId: home.id,
      customerId: role === "customer" ? own.customer.id : undefined,
      name: `Home ${role} ${tag}`,
    });
  }
  members.rival = await createTestMember({
    db,
    roles: ["dealer_admin"],
    dealershipId: rival.id,
    name: `Rival Admin ${tag}`,
  });
  const [invitation] = await db
    .insert(schema.invitations)
    .values({
      dealershipId: home.id,
      email: `pending-${tag}@example.test`,
      role: "estimator",
      tokenHash: `matrix-${tag}`,
      expiresAt: new Date(Date.now() + 86_400_000),
    })
    .returning();
  const admin = members.dealer_admin.actor;
  const readToken = await makeApiToken(db, admin, ["read"]);
  const tokens: TWorld["tokens"] = {
    token_read: readToken.authorization,
    token_write: (await makeApiToken(db, admin, ["read_write"])).authorization,
    token_reports: (await makeApiToken(db, admin, ["reports"])).authorization,
    token_revoked: (await makeApiToken(db, admin, ["read_write", "reports"], { revoked: true }))
      .authorization,
    token_expired: (await makeApiToken(db, admin, ["read_write", "reports"], { expired: true }))
      .authorization,
  };
  return {
    tokens,
    readTokenId: readToken.id,
    home: {
      dealershipId: home.id,
      dealershipName: home.name,
      own,
      other,
      templateId: template!.id,
      templateName: template!.name,
      invitationId: invitation!.id,
    },
    rival: { dealershipId: rival.id, dealershipName: rival.name, records: rivalRecords },
    members,
  };
}

/** Strings a caller must never see in any answer. */
function forbiddenMarkers(caller: TCallerName): string[] {
  const w = world;
  const rival = [
    w.rival.dealershipId,
    w.rival.dealershipName,
    w.members.rival.user.email,
    w.members.rival.user.name ?? "",
    ...markersOf(w.rival.records),
  ];
  const home = [
    w.home.dealershipId,
    w.home.dealershipName,
    w.home.templateName,
    ...markersOf(w.home.own),
    ...markersOf(w.home.other),
    ...HOME_ROLES.map((r) => w.members[r].user.email),
  ];
  if (caller === "anonymous") return [...home, ...rival];
  if (caller === "rival") return home;
  if (caller === "customer") return [...rival, ...markersOf(w.home.other), w.home.templateName];
  // A refused token learns nothing about the dealership either.
  if (caller === "token_revoked" || caller === "token_expired") return [...home, ...rival];
  return rival;
}

// ── Routes ──────────────────────────────────────────────────────────────────────────────

type TRouteFixture = {
  /** Public by design (health, Auth.js endpoints): not checked for 401. */
  public?: true;
  /**
   * Public, but the caller proves itself with a signature over the body (payment webhooks):
   * every caller without a valid signature must get 400 and see nothing.
   */
  signed?: true;
  /** Values for the dynamic segments; defaults cover `[id]` after a known collection. */
  params?: (w: TWorld) => Record<string, string | string[]>;
  query?: string;
  /** JSON bodies per method, valid enough that a refusal cannot hide behind a 400. */
  body?: (w: TWorld) => Partial<Record<(typeof METHODS)[number], unknown>>;
  /** Roles allowed to change things through this route, when not the usual staff writers. */
  writers?: TRoleName[];
};

/** Per-route fixtures, keyed by the route's path pattern. */
const ROUTE_FIXTURES: Record<string, TRouteFixture> = {
  "/api/health": { public: true },
  "/api/v1/billing/webhook": { public: true, signed: true },
  "/api/v1/openapi.json": { public: true },
  // A valid query, so a refusal cannot hide behind a 400.
  "/api/v1/search": { query: "q=Matrix" },
  "/api/auth/[...nextauth]": { public: true, params: () => ({ nextauth: ["session"] }) },
  "/api/v1/sites": {
    body: (w) => ({
      POST: { customerId: w.home.own.customer.id, name: `Matrix Site`, surfaceMix: { grass: 1 } },
    }),
  },
  "/api/v1/reports": { body: (w) => ({ POST: { estimateId: w.home.own.estimate.id } }) },
  "/api/v1/reports/[id]/versions/[version]": {
    params: (w) => ({ id: w.home.other.report.id, version: "1" }),
  },
  "/api/v1/reports/[id]/versions/[version]/pdf": {
    params: (w) => ({ id: w.home.other.report.id, version: "1" }),
  },
  "/api/v1/reports/[id]/versions/[version]/csv": {
    params: (w) => ({ id: w.home.other.report.id, version: "1" }),
  },
  // Branding is a dealership setting: only the dealer admin changes it.
  "/api/v1/branding": { writers: ["dealer_admin"], body: () => ({ PUT: { currency: "GBP" } }) },
  "/api/v1/branding/logo": { writers: ["dealer_admin"] },
  "/api/v1/machines/[id]/copy": {
    body: (w) => ({ POST: { customerId: w.home.own.customer.id } }),
  },
};

/** Which record a `[id]` after each collection names: always the home dealership's "other" customer's. */
const COLLECTION_IDS: Record<string, (w: TWorld) => string> = {
  customers: (w) => w.home.other.customer.id,
  sites: (w) => w.home.other.site.id,
  machines: (w) => w.home.other.machine.id,
  "duty-cycles": (w) => w.home.other.dutyCycle.id,
  estimates: (w) => w.home.other.estimate.id,
  reports: (w) => w.home.other.report.id,
  comparisons: (w) => w.home.other.comparison.id,
  sweeps: (w) => w.home.other.sweep.id,
  "mapping-templates": (w) => w.home.templateId,
  readings: (w) => w.home.other.reading.id,
  "reading-photos": (w) => w.home.other.reading.photoId,
  invitations: (w) => w.home.invitationId,
};
const NAMED_IDS: Record<string, (w: TWorld) => string> = {
  customerId: (w) => w.home.other.customer.id,
  siteId: (w) => w.home.other.site.id,
  machineId: (w) => w.home.other.machine.id,
  dutyCycleId: (w) => w.home.other.dutyCycle.id,
  estimateId: (w) => w.home.other.estimate.id,
  templateId: (w) => w.home.templateId,
};

type TRoute = { file: string; pattern: string; segments: string[] };

function walk(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const full = join(dir, name);
    if (statSync(full).isDirectory()) walk(full, out);
    else out.push(full);
  }
  return out;
}

const root = process.cwd();
const routes: TRoute[] = walk(join(root, "app"))
  .filter((f) => /[\\/]route\.(ts|tsx|js)$/.test(f))
  .map((file) => {
    const segments = relative(join(root, "app"), file)
      .split(sep)
      .slice(0, -1)
      .filter((s) => !(s.startsWith("(") && s.endsWith(")")) && !s.startsWith("@"));
    return { file, pattern: `/${segments.join("/")}`, segments };
  })
  .sort((a, b) => a.pattern.localeCompare(b.pattern));

function resolveParams(route: TRoute): {
  params: Record<string, string | string[]>;
  missing: string[];
} {
  const fixture = ROUTE_FIXTURES[route.pattern];
  if (fixture?.params) return { params: fixture.params(world), missing: [] };
  const params: Record<string, string | string[]> = {};
  const missing: string[] = [];
  route.segments.forEach((seg, i) => {
    const m = /^\[(\.\.\.)?(.+)\]$/.exec(seg);
    if (!m) return;
    const name = m[2]!;
    const byName = NAMED_IDS[name];
    const byCollection = name === "id" ? COLLECTION_IDS[route.segments[i - 1] ?? ""] : undefined;
    const resolver = byName ?? byCollection;
    if (!resolver) missing.push(name);
    else params[name] = m[1] ? [resolver(world)] : resolver(world);
  });
  return { params, missing };
}

function urlFor(route: TRoute, params: Record<string, string | string[]>, method: string): string {
  const path = route.segments
    .map((seg) => {
      const m = /^\[(?:\.\.\.)?(.+)\]$/.exec(seg);
      if (!m) return seg;
      const v = params[m[1]!];
      return Array.isArray(v) ? v.join("/") : v;
    })
    .join("/");
  const fixtureQuery = ROUTE_FIXTURES[route.pattern]?.query;
  const query = fixtureQuery ?? (method === "DELETE" ? "confirm=true" : "");
  return `http://localhost:3000/${path}${query ? `?${query}` : ""}`;
}

function isToken(caller: TCallerName): caller is TTokenName {
  return (TOKEN_CALLERS as string[]).includes(caller);
}

function cookieOf(caller: TCallerName): string {
  return caller === "anonymous" || isToken(caller) ? "" : world.members[caller].cookie;
}

type TOutcome = { status: number; body: string };

async function callRoute(
  route: TRoute,
  handler: (req: Request, ctx: unknown) => Promise<Response>,
  method: string,
  caller: TCallerName,
): Promise<TOutcome> {
  const { params } = resolveParams(route);
  const fixtureBody =
    ROUTE_FIXTURES[route.pattern]?.body?.(world)[method as (typeof METHODS)[number]];
  const headers: Record<string, string> = { "x-forwarded-for": "198.51.100.77" };
  const cookie = cookieOf(caller);
  if (cookie) headers.cookie = cookie;
  if (isToken(caller)) headers.authorization = world.tokens[caller];
  let body: string | undefined;
  if (MUTATING.has(method)) {
    headers["content-type"] = "application/json";
    body = JSON.stringify(fixtureBody ?? {});
  }
  const { NextRequest } = await import("next/server");
  const req = new NextRequest(urlFor(route, params, method), { method, headers, body });
  try {
    const res = await handler(req, { params: Promise.resolve(params) });
    return { status: res.status, body: await res.text() };
  } catch (error) {
    // Next answers an uncaught error with a 500; report it with its message.
    return { status: 500, body: `threw: ${String(error)}` };
  }
}

/** What each caller must get from a route and method: a refusal, or anything that does not leak. */
function mustBeDenied(route: TRoute, method: string, caller: TCallerName): boolean {
  const fixture = ROUTE_FIXTURES[route.pattern];
  if (fixture?.public) return false;
  if (caller === "anonymous") return true;
  if (isToken(caller)) return tokenMustBeDenied(route, method, caller);
  const dynamic = route.segments.some((s) => s.startsWith("["));
  // The params always name the home dealership's records, of a customer other than the
  // customer account's own.
  if (caller === "rival" || caller === "customer") {
    if (dynamic) return true;
  }
  if (MUTATING.has(method)) {
    // On its own dealership's collections the rival is a dealer admin like any other.
    const role: TRoleName = caller === "rival" ? "dealer_admin" : caller;
    const writers = fixture?.writers ?? ["dealer_admin", "estimator"];
    return !writers.includes(role);
  }
  return false;
}

/**
 * What each token may do: read → every read; read_write → plus the workspace writes (not
 * reports, not dealer-admin settings); reports → reports only (and the dealership's branding,
 * which any member reads). Revoked and expired tokens are refused everywhere (401, checked below).
 */
function tokenMustBeDenied(route: TRoute, method: string, caller: TTokenName): boolean {
  const isReport = route.pattern.startsWith("/api/v1/reports");
  const writers = ROUTE_FIXTURES[route.pattern]?.writers;
  switch (caller) {
    case "token_read":
      return MUTATING.has(method);
    case "token_write":
      return MUTATING.has(method) && (isReport || writers !== undefined);
    case "token_reports":
      if (MUTATING.has(method)) return !isReport;
      return !isReport && !route.pattern.startsWith("/api/v1/branding");
    default:
      return true;
  }
}

// ── Server actions ──────────────────────────────────────────────────────────────────────

type TActionFixture =
  | { public: true }
  | {
      args: (w: TWorld) => unknown[];
      /** Roles of the home dealership allowed to run it; everyone else must be refused. */
      allowed: TRoleName[];
      /** The action only touches the caller's own account, so the rival may run it too. */
      selfOnly?: true;
    };

function form(values: Record<string, string | string[]>): FormData {
  const f = new FormData();
  for (const [k, v] of Object.entries(values)) {
    for (const item of Array.isArray(v) ? v : [v]) f.append(k, item);
  }
  return f;
}

/** Per-action fixtures, keyed "<file relative to the project>#<export>". */
const ACTION_FIXTURES: Record<string, TActionFixture> = {
  "features/auth/server/actions/sign-in-actions.ts#signInWithPasswordAction": { public: true },
  "features/auth/server/actions/sign-in-actions.ts#requestMagicLinkAction": { public: true },
  "features/auth/server/actions/sign-in-actions.ts#requestPasswordResetAction": { public: true },
  "features/auth/server/actions/reset-password-actions.ts#resetPasswordAction": { public: true },
  "features/auth/server/actions/invite-actions.ts#acceptInvitationAction": { public: true },
  "features/auth/server/actions/session-actions.ts#signOutAction": { public: true },
  "features/auth/server/actions/session-actions.ts#switchDealershipAction": {
    args: (w) => [undefined, form({ dealershipId: w.home.dealershipId })],
    allowed: HOME_ROLES,
  },
  "features/auth/server/actions/session-actions.ts#setUnitSystemAction": {
    args: () => [undefined, form({ unitSystem: "imperial" })],
    allowed: HOME_ROLES,
    selfOnly: true,
  },
  "features/auth/server/actions/team-actions.ts#inviteMemberAction": {
    args: (w) => [
      undefined,
      form({
        email: `matrix-invite-${uniqueTag()}@example.test`,
        role: "customer",
        customerId: w.home.other.customer.id,
      }),
    ],
    allowed: ["dealer_admin"],
  },
  "features/auth/server/actions/team-actions.ts#revokeInvitationAction": {
    args: (w) => [undefined, form({ invitationId: w.home.invitationId })],
    allowed: ["dealer_admin"],
  },
  "features/auth/server/actions/team-actions.ts#setMemberRolesAction": {
    args: (w) => [
      undefined,
      form({ userId: w.members.estimator.user.id, roles: ["dealer_admin", "estimator"] }),
    ],
    allowed: ["dealer_admin"],
  },
  "app/(workspace)/billing/actions.ts#startCheckoutAction": {
    args: () => [undefined, form({ planKey: "tc-yard-monthly" })],
    allowed: ["dealer_admin", "billing_admin"],
    // Acts only on the caller's own dealership (no ids in the input), so a rival may too.
    selfOnly: true,
  },
  "app/(workspace)/billing/actions.ts#openPortalAction": {
    args: () => [undefined],
    allowed: ["dealer_admin", "billing_admin"],
    // Acts only on the caller's own dealership (no ids in the input), so a rival may too.
    selfOnly: true,
  },
  "app/(workspace)/billing/actions.ts#switchPlanAction": {
    args: () => [undefined, form({ planKey: "tc-yard-annual" })],
    allowed: ["dealer_admin", "billing_admin"],
    // Acts only on the caller's own dealership (no ids in the input), so a rival may too.
    selfOnly: true,
  },
  "app/(workspace)/billing/actions.ts#cancelPlanAction": {
    args: () => [undefined, new FormData()],
    allowed: ["dealer_admin", "billing_admin"],
    // Acts only on the caller's own dealership (no ids in the input), so a rival may too.
    selfOnly: true,
  },
  "app/(workspace)/billing/actions.ts#resumePlanAction": {
    args: () => [undefined, new FormData()],
    allowed: ["dealer_admin", "billing_admin"],
    // Acts only on the caller's own dealership (no ids in the input), so a rival may too.
    selfOnly: true,
  },
  "app/(workspace)/billing/actions.ts#setBillingEmailAction": {
    args: () => [undefined, form({ email: "accounts@home.example.test" })],
    allowed: ["dealer_admin", "billing_admin"],
    // Acts only on the caller's own dealership (no ids in the input), so a rival may too.
    selfOnly: true,
  },
  "features/auth/server/actions/session-actions.ts#setDealershipCurrencyAction": {
    args: () => [undefined, form({ currency: "EUR" })],
    allowed: ["dealer_admin"],
    // Changes only the caller's own dealership (no ids in the input), so a rival may too.
    selfOnly: true,
  },
  "features/api/server/actions/api-token-actions.ts#createApiTokenAction": {
    args: () => [undefined, form({ name: "Matrix token", scopes: ["read"] })],
    allowed: ["dealer_admin"],
    // Makes a token for the caller's own dealership (no ids in the input), so a rival may too.
    selfOnly: true,
  },
  "features/api/server/actions/api-token-actions.ts#revokeApiTokenAction": {
    args: (w) => [undefined, form({ tokenId: w.readTokenId })],
    allowed: ["dealer_admin"],
  },
  "features/auth/server/actions/team-actions.ts#removeMemberAction": {
    args: (w) => [undefined, form({ userId: w.members.estimator.user.id })],
    allowed: ["dealer_admin"],
  },
};

const actionFiles = [...walk(join(root, "app")), ...walk(join(root, "features"))]
  .filter((f) => /\.(ts|tsx)$/.test(f) && !/\.test\.tsx?$/.test(f))
  .filter((f) =>
    /^\s*(\/\/[^\n]*\n\s*|\/\*[\s\S]*?\*\/\s*)*["']use server["']/.test(readFileSync(f, "utf8")),
  )
  .map((f) => relative(root, f).split(sep).join("/"))
  .sort();

type TActionOutcome = { refused: boolean; text: string };

/** Runs an action as a caller; a refusal is a thrown error or a result with ok=false / error. */
async function callAction(
  fn: (...args: unknown[]) => unknown,
  args: unknown[],
  caller: TCallerName,
) {
  state.cookie = cookieOf(caller);
  try {
    const result = await fn(...args);
    const text = JSON.stringify(result ?? null);
    const r = result as { ok?: unknown; error?: unknown } | null | undefined;
    return { refused: Boolean(r && (r.ok === false || r.error)), text } satisfies TActionOutcome;
  } catch (error) {
    const digest = String((error as { digest?: unknown })?.digest ?? "");
    const text = `${String(error)} ${digest}`;
    // A redirect counts as a refusal only when it sends the caller to sign in.
    if (digest.startsWith("NEXT_REDIRECT")) return { refused: digest.includes("/sign-in"), text };
    return { refused: true, text };
  } finally {
    state.cookie = "";
  }
}

function leaks(text: string, caller: TCallerName): string[] {
  return forbiddenMarkers(caller).filter((m) => m && text.includes(m));
}

// ── The tests ──────────────────────────────────────────────────────────────────────────

beforeAll(async () => {
  world = await seedWorld();
});
afterAll(async () => {
  await getPool().end();
});

describe("authorization matrix: route handlers", () => {
  it("finds the route handlers on disk", () => {
    expect(routes.length).toBeGreaterThan(2);
    expect(routes.map((r) => r.pattern)).toContain("/api/health");
  });

  it.each(routes.map((r) => [r.pattern, r] as const))("%s", async (_pattern, route) => {
    const { missing } = resolveParams(route);
    expect(
      missing,
      `Route ${route.pattern} has dynamic params the matrix cannot fill (${missing.join(", ")}). ` +
        `Add "${route.pattern}": { params: (w) => ({ ... }) } to ROUTE_FIXTURES in tests/integration/authz-matrix.test.ts.`,
    ).toEqual([]);
    const mod = (await import(pathToFileURL(route.file).href)) as Record<string, unknown>;
    // Public routes are only read, to check they reveal nothing about other dealerships.
    const isPublic = ROUTE_FIXTURES[route.pattern]?.public;
    const isSigned = ROUTE_FIXTURES[route.pattern]?.signed;
    const methods = METHODS.filter(
      (m) =>
        typeof mod[m] === "function" && (!isPublic || m === "GET" || (isSigned && m === "POST")),
    );
    expect(methods.length, `${route.pattern} exports no HTTP method`).toBeGreaterThan(0);
    const callers: TCallerName[] = [
      "anonymous",
      "rival",
      "customer",
      "billing_admin",
      "estimator",
      "dealer_admin",
      ...TOKEN_CALLERS,
    ];
    const problems: string[] = [];
    for (const method of methods) {
      const handler = mod[method] as (req: Request, ctx: unknown) => Promise<Response>;
      for (const caller of callers) {
        const denied = mustBeDenied(route, method, caller);
        if (isSigned) {
          // No caller holds the signing secret, so every one must be turned away with 400.
          const out = await callRoute(route, handler, method, caller);
          if (out.status !== 400)
            problems.push(
              `${method} as ${caller} without a signature: expected 400, got ${out.status}`,
            );
          const leaked = leaks(out.body, caller);
          if (leaked.length) problems.push(`${method} as ${caller} leaked: ${leaked.join(", ")}`);
          continue;
        }
        // Allowed writes are not exercised: this test proves refusals and the absence of leaks.
        if (!denied && MUTATING.has(method)) continue;
        const out = await callRoute(route, handler, method, caller);
        if (denied && !DENIED.includes(out.status)) {
          const hint =
            out.status === 400 || out.status === 422
              ? " (the input was checked before authorization: check the role first, or give a valid body in ROUTE_FIXTURES)"
              : "";
          problems.push(`${method} as ${caller}: expected 401/403/404, got ${out.status}${hint}`);
        }
        if (caller === "anonymous" && denied && out.status !== 401 && out.status !== 404) {
          problems.push(`${method} as anonymous: expected 401, got ${out.status}`);
        }
        const refusedToken = caller === "token_revoked" || caller === "token_expired";
        if (refusedToken && !isPublic && out.status !== 401) {
          problems.push(`${method} as ${caller}: expected 401, got ${out.status}`);
        }
        const leaked = leaks(out.body, caller);
        if (leaked.length)
          problems.push(`${method} as ${caller} (${out.status}) leaked: ${leaked.join(", ")}`);
        if (out.status >= 500)
          problems.push(
            `${method} as ${caller}: server error ${out.status}: ${out.body.slice(0, 200)}`,
          );
      }
    }
    expect(problems).toEqual([]);
  });
});

describe("authorization matrix: server actions", () => {
  it("finds the server-action files on disk", () => {
    expect(actionFiles).toContain("features/auth/server/actions/team-actions.ts");
  });

  it.each(actionFiles.map((f) => [f] as const))("%s", async (file) => {
    const mod = (await import(pathToFileURL(join(root, file)).href)) as Record<string, unknown>;
    const problems: string[] = [];
    for (const [name, value] of Object.entries(mod)) {
      if (typeof value !== "function") continue;
      const fn = value as (...args: unknown[]) => unknown;
      const key = `${file}#${name}`;
      const fixture = ACTION_FIXTURES[key];
      if (fixture && "public" in fixture) continue;
      // Anonymous callers are refused whatever the arguments.
      const anon = await callAction(
        fn,
        fixture ? fixture.args(world) : [undefined, new FormData()],
        "anonymous",
      );
      if (!anon.refused)
        problems.push(`${name} as anonymous: not refused (${anon.text.slice(0, 120)})`);
      if (leaks(anon.text, "anonymous").length) problems.push(`${name} as anonymous leaked data`);
      if (!fixture) {
        problems.push(
          `${name}: no fixture. Add "${key}": { args: (w) => [...], allowed: [roles] } (or { public: true }) to ACTION_FIXTURES in tests/integration/authz-matrix.test.ts.`,
        );
        continue;
      }
      const callers: TCallerName[] = [...HOME_ROLES.filter((r) => !fixture.allowed.includes(r))];
      if (!fixture.selfOnly) callers.push("rival");
      for (const caller of callers) {
        const out = await callAction(fn, fixture.args(world), caller);
        if (!out.refused)
          problems.push(`${name} as ${caller}: not refused (${out.text.slice(0, 120)})`);
        const leaked = leaks(out.text, caller);
        if (leaked.length) problems.push(`${name} as ${caller} leaked: ${leaked.join(", ")}`);
      }
    }
    expect(problems).toEqual([]);
  });

  it("refused calls changed nothing: the home dealership's records, roles and invitation are intact", async () => {
    const w = world;
    const ids = [w.home.own, w.home.other].map((r) => r.customer.id);
    expect(
      await db.select().from(schema.customers).where(inArray(schema.customers.id, ids)),
    ).toHaveLength(2);
    const est = await db
      .select()
      .from(schema.estimates)
      .where(eq(schema.estimates.id, w.home.other.estimate.id));
    expect(est).toHaveLength(1);
    const roles = await db
      .select({ role: schema.memberships.role })
      .from(schema.memberships)
      .where(eq(schema.memberships.userId, w.members.estimator.user.id));
    expect(roles.map((r) => r.role)).toEqual(["estimator"]);
    const [inv] = await db
      .select()
      .from(schema.invitations)
      .where(eq(schema.invitations.id, w.home.invitationId));
    expect(inv?.revokedAt).toBeNull();
  });
});
