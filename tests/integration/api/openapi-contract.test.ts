// Contract between the route files, the OpenAPI document and what the routes really answer:
// every app/api/v1 route.ts and method is in the document, nothing in the document is stale,
// the documented examples are valid, and a whole integration journey made with an API token
// (upload a telematics CSV, import it, run an estimate, issue a report, fetch its PDF) answers
// exactly as documented. Other integration tests check their answers through the same
// validator (tests/support/records.ts `call`).
import { mkdtempSync, readdirSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import path, { join, relative, sep } from "node:path";
import { pathToFileURL } from "node:url";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { getEnv } from "@/lib/env";
import { getDb } from "@/db/client";
import { GET as getDocument } from "@/app/api/v1/openapi.json/route";
import { POST as createCustomer } from "@/app/api/v1/customers/route";
import { POST as createMachine } from "@/app/api/v1/machines/route";
import { POST as upload } from "@/app/api/v1/uploads/route";
import { POST as createDutyCycle } from "@/app/api/v1/duty-cycles/route";
import { GET as getDutyCycle } from "@/app/api/v1/duty-cycles/[id]/route";
import { GET as listEstimates, POST as createEstimate } from "@/app/api/v1/estimates/route";
import { GET as getEstimate } from "@/app/api/v1/estimates/[id]/route";
import { POST as createReport } from "@/app/api/v1/reports/route";
import { POST as issueReport } from "@/app/api/v1/reports/[id]/issue/route";
import { GET as getPdf } from "@/app/api/v1/reports/[id]/versions/[version]/pdf/route";
import { startImportWorker } from "@/features/duty-cycles/server/import-worker";
import { getImportSender } from "@/features/duty-cycles/server/import-queue";
import { makeApiToken } from "@/tests/support/api-tokens";
import {
  exampleProblems,
  openApiDocument,
  operationOf,
  responseProblems,
} from "@/tests/support/openapi";
import { makeDealership, testTractorSpec } from "@/tests/support/records";
import {
  TELEMATICS_MAPPING,
  knownTelematicsCsv,
  streamOf,
  waitFor,
} from "@/tests/integration/duty-cycles/support";

process.env.UPLOAD_DIR = mkdtempSync(path.join(tmpdir(), "treadcast-api-uploads-"));

const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;
const root = process.cwd();

function walk(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const full = join(dir, name);
    if (statSync(full).isDirectory()) walk(full, out);
    else out.push(full);
  }
  return out;
}

/** Every route file under app/api/v1 with its OpenAPI path ("[id]" → "{id}"). */
const routeFiles = walk(join(root, "app", "api", "v1"))
  .filter((f) => /[\\/]route\.tsx?$/.test(f))
  .map((file) => ({
    file,
    template: `/${relative(join(root, "app"), file).split(sep).slice(0, -1).join("/")}`.replace(
      /\[(?:\.\.\.)?([^\]]+)\]/g,
      "{$1}",
    ),
  }));

describe("OpenAPI document", () => {
  it("lists every app/api/v1 route.ts and every method it exports", async () => {
    expect(routeFiles.length).toBeGreaterThan(30);
    const missing: string[] = [];
    for (const route of routeFiles) {
      const mod = (await import(pathToFileURL(route.file).href)) as Record<string, unknown>;
      for (const method of METHODS) {
        if (typeof mod[method] !== "function") continue;
        if (!operationOf(method, route.template))
          missing.push(`${method} ${route.template} (${relative(root, route.file)})`);
      }
    }
    expect(
      missing,
      `Routes missing from the OpenAPI document: register them in features/api/openapi/paths.ts`,
    ).toEqual([]);
  });

  it("documents no path that has no route file", () => {
    const onDisk = new Set(routeFiles.map((r) => r.template));
    expect(Object.keys(openApiDocument.paths ?? {}).filter((p) => !onDisk.has(p))).toEqual([]);
  });

  it("is OpenAPI 3.1 with the error shape, both ways in, and valid examples", async () => {
    const res = getDocument();
    expect(res.status).toBe(200);
    const served = (await res.json()) as typeof openApiDocument;
    expect(served.openapi).toBe("3.1.0");
    expect(served.paths).toEqual(JSON.parse(JSON.stringify(openApiDocument.paths)));
    expect(Object.keys(served.components?.securitySchemes ?? {}).sort()).toEqual([
      "bearerToken",
      "sessionCookie",
    ]);
    expect(served.components?.schemas?.Error).toBeDefined();
    // Every operation documents the error shape for refusals, and every id parameter.
    for (const [template, item] of Object.entries(served.paths ?? {})) {
      for (const [method, op] of Object.entries(
        item as Record<
          string,
          { parameters?: { name: string; in: string }[]; security?: unknown[] }
        >,
      )) {
        for (const name of [...template.matchAll(/\{([^}]+)\}/g)].map((m) => m[1]))
          expect(
            op.parameters?.some((p) => p.in === "path" && p.name === name),
            `${method} ${template} documents its {${name}}`,
          ).toBe(true);
        if (op.security?.length === 0) continue;
        expect(
          responseProblems(method, template.replace(/\{[^}]+\}/g, "x"), 401, "application/json", {
            error: { code: "unauthenticated", message: "Sign in to continue." },
          }),
        ).toEqual([]);
      }
    }
    expect(exampleProblems()).toEqual([]);
  });
});

// ── A journey with a token, every answer checked against the document ────────────────────

type THandler = (
  req: Request,
  ctx: { params: Promise<Record<string, string>> },
) => Promise<Response>;

let worker: Awaited<ReturnType<typeof startImportWorker>>;
let team: Awaited<ReturnType<typeof makeDealership>>;
beforeAll(async () => {
  team = await makeDealership();
  worker = await startImportWorker({
    db: getDb(),
    connectionString: getEnv().DATABASE_URL,
    log: () => undefined,
  });
});
afterAll(async () => {
  await worker?.stop();
  await (await getImportSender()).stop({ graceful: false, wait: true });
});

/** A request as a dealer's own system sends it, checked against the document. */
async function api(
  handler: THandler,
  authorization: string,
  method: string,
  urlPath: string,
  init: {
    json?: unknown;
    body?: ReadableStream<Uint8Array>;
    headers?: Record<string, string>;
    params?: Record<string, string>;
  } = {},
) {
  const headers: Record<string, string> = { authorization, ...(init.headers ?? {}) };
  let body: BodyInit | undefined = init.body;
  if (init.json !== undefined) {
    headers["content-type"] = "application/json";
    body = JSON.stringify(init.json);
  }
  const res = await handler(
    new Request(`http://localhost:3000${urlPath}`, {
      method,
      headers,
      body,
      ...(body instanceof ReadableStream ? { duplex: "half" } : {}),
    } as RequestInit),
    { params: Promise.resolve(init.params ?? {}) },
  );
  const type = res.headers.get("content-type");
  const raw = type?.includes("json") ? await res.json() : new Uint8Array(await res.arrayBuffer());
  expect(responseProblems(method, urlPath, res.status, type, raw)).toEqual([]);
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  return { status: res.status, body: raw as any, type };
}

describe("a token journey answers as documented", () => {
  it("uploads and imports a telematics CSV, runs an estimate, issues a report and fetches its PDF", async () => {
    const rw = await makeApiToken(getDb(), team.admin.actor, ["read_write", "reports"]);
    const readOnly = await makeApiToken(getDb(), team.admin.actor, ["read"]);
    const auth = rw.authorization;

    const customer = await api(createCustomer, auth, "POST", "/api/v1/customers", {
      json: { name: "Contract Vale Farm", kind: "farm" },
    });
    expect(customer.status).toBe(201);
    const machine = await api(createMachine, auth, "POST", "/api/v1/machines", {
      json: { customerId: customer.body.id, kind: "tractor", spec: testTractorSpec() },
    });
    expect(machine.status).toBe(201);

    const { csv } = knownTelematicsCsv();
    const uploaded = await api(upload, auth, "POST", "/api/v1/uploads", {
      body: streamOf(csv),
      headers: { "x-file-name": "contract-log.csv", "content-type": "text/csv" },
    });
    expect(uploaded.status).toBe(201);

    const created = await api(createDutyCycle, auth, "POST", "/api/v1/duty-cycles", {
      json: {
        source: "upload",
        name: "Contract log",
        customerId: customer.body.id,
        machineId: machine.body.id,
        uploadId: uploaded.body.id,
        mapping: TELEMATICS_MAPPING,
      },
      headers: { "idempotency-key": "contract-import-1" },
    });
    expect(created.status).toBe(201);
    const dutyCycleId = created.body.id as string;
    const ready = await waitFor(
      () =>
        api(getDutyCycle, readOnly.authorization, "GET", `/api/v1/duty-cycles/${dutyCycleId}`, {
          params: { id: dutyCycleId },
        }),
      (got) => got.body.status === "ready" || got.body.status === "failed",
    );
    expect(ready.body.status).toBe("ready");
    expect(ready.body.turnCount).toBeGreaterThan(0);

    const estimate = await api(createEstimate, auth, "POST", "/api/v1/estimates", {
      json: { machineId: machine.body.id, dutyCycleId, title: "Contract estimate" },
    });
    expect(estimate.status).toBe(201);
    const fetched = await api(
      getEstimate,
      readOnly.authorization,
      "GET",
      `/api/v1/estimates/${estimate.body.id}`,
      {
        params: { id: estimate.body.id },
      },
    );
    expect(fetched.body.result.costPerHour).toBeGreaterThan(0);
    const listed = await api(listEstimates, readOnly.authorization, "GET", "/api/v1/estimates");
    expect(listed.body.items.some((e: { id: string }) => e.id === estimate.body.id)).toBe(true);

    const report = await api(createReport, auth, "POST", "/api/v1/reports", {
      json: { estimateId: estimate.body.id },
    });
    expect(report.status).toBe(201);
    const issued = await api(issueReport, auth, "POST", `/api/v1/reports/${report.body.id}/issue`, {
      params: { id: report.body.id },
    });
    expect(issued.status).toBe(201);
    const pdf = await api(getPdf, auth, "GET", `/api/v1/reports/${report.body.id}/versions/1/pdf`, {
      params: { id: report.body.id, version: "1" },
    });
    expect(pdf.status).toBe(200);
    expect(pdf.type).toBe("application/pdf");
    expect(new TextDecoder().decode((pdf.body as Uint8Array).slice(0, 5))).toBe("%PDF-");

    // Refusals are documented too: a read token may not write, and no token may be guessed.
    const refused = await api(createCustomer, readOnly.authorization, "POST", "/api/v1/customers", {
      json: { name: "Nope Farm", kind: "farm" },
    });
    expect(refused.status).toBe(403);
    const bogus = await api(
      getEstimate,
      "Bearer tcapi_guess",
      "GET",
      `/api/v1/estimates/${estimate.body.id}`,
      {
        params: { id: estimate.body.id },
      },
    );
    expect(bogus.status).toBe(401);
  });
});
