// Checks real answers of the route handlers against the OpenAPI document (JSON Schema 2020-12,
// as OpenAPI 3.1 uses), so the document and the code cannot drift apart unnoticed.
import Ajv2020, { type ValidateFunction } from "ajv/dist/2020";
import addFormats from "ajv-formats";
import { getOpenApiDocument } from "@/features/api/openapi/document";

const doc = getOpenApiDocument();
const ajv = new Ajv2020({ strict: false, allErrors: true });
addFormats(ajv);
ajv.addFormat("binary", true);

type TOperation = {
  responses?: Record<string, { content?: Record<string, { schema?: object }> }>;
  requestBody?: { content?: Record<string, { schema?: object; example?: unknown }> };
};

const templates = Object.keys(doc.paths ?? {}).map((template) => ({
  template,
  pattern: new RegExp(`^${template.replace(/\{[^}]+\}/g, "[^/]+")}$`),
}));

/** The document's path template for a concrete path ("/api/v1/customers/…" → "/api/v1/customers/{id}"). */
export function templateOf(path: string): string | undefined {
  const bare = path.split("?")[0]!;
  // Literal segments win over parameters (…/readings/import before …/readings/{id}).
  const hits = templates.filter((t) => t.pattern.test(bare));
  hits.sort(
    (a, b) => (a.template.match(/\{/g)?.length ?? 0) - (b.template.match(/\{/g)?.length ?? 0),
  );
  return hits[0]?.template;
}

export function operationOf(method: string, template: string): TOperation | undefined {
  const item = (doc.paths as Record<string, Record<string, TOperation>>)[template];
  return item?.[method.toLowerCase()];
}

const cache = new Map<string, ValidateFunction>();
function compile(key: string, schema: object): ValidateFunction {
  let fn = cache.get(key);
  if (!fn) {
    fn = ajv.compile({ ...schema, components: doc.components });
    cache.set(key, fn);
  }
  return fn;
}

/**
 * Problems with one answer: an undocumented path, method or status, or a JSON body that does
 * not match the documented schema. Empty when the answer is as documented.
 */
export function responseProblems(
  method: string,
  path: string,
  status: number,
  contentType: string | null,
  body: unknown,
): string[] {
  const template = templateOf(path);
  if (!template) return [`${method} ${path}: no such path in the OpenAPI document`];
  const op = operationOf(method, template);
  if (!op) return [`${method} ${template}: method not in the OpenAPI document`];
  const response = op.responses?.[String(status)];
  if (!response) return [`${method} ${template}: status ${status} not documented`];
  if (!contentType?.includes("json")) return [];
  const schema = response.content?.["application/json"]?.schema;
  if (!schema) return [`${method} ${template} ${status}: JSON answer where none is documented`];
  const validate = compile(`${method} ${template} ${status}`, schema);
  if (validate(body)) return [];
  return (validate.errors ?? []).map(
    (e) => `${method} ${template} ${status}: ${e.instancePath || "/"} ${e.message ?? ""}`,
  );
}

/** As `responseProblems`, but a path the document has no template for is not checked. */
export function documentedProblems(
  method: string,
  path: string,
  status: number,
  contentType: string | null,
  body: unknown,
): string[] {
  if (!templateOf(path)) return [];
  return responseProblems(method, path, status, contentType, body);
}

/** Problems with a documented request example against its own request schema. */
export function exampleProblems(): string[] {
  const out: string[] = [];
  for (const [template, item] of Object.entries(doc.paths ?? {})) {
    for (const [method, op] of Object.entries(item as Record<string, TOperation>)) {
      const json = op.requestBody?.content?.["application/json"];
      if (!json?.schema || json.example === undefined) continue;
      const validate = compile(`example ${method} ${template}`, json.schema);
      if (!validate(json.example))
        out.push(`${method} ${template} example: ${ajv.errorsText(validate.errors)}`);
    }
  }
  return out;
}

export { doc as openApiDocument };
