import { samplePath, type TPathLeg } from "@/lib/duty-cycles/synthetic-path";
import type { TColumnMapping } from "@/lib/duty-cycles/column-mapping";
import { documentedProblems as responseProblems } from "@/tests/support/openapi";

type THandler = (
  req: Request,
  ctx: { params: Promise<Record<string, string>> },
) => Promise<Response>;

/** Calls a route handler the way Next does: a real Request (JSON, text or a stream) and params. */
export async function callRoute(
  handler: THandler,
  cookie: string | null,
  path: string,
  init: {
    method?: string;
    json?: unknown;
    body?: ReadableStream<Uint8Array> | string;
    headers?: Record<string, string>;
    params?: Record<string, string>;
  } = {},
) {
  const headers: Record<string, string> = { ...(init.headers ?? {}) };
  if (cookie) headers.cookie = cookie;
  let body: BodyInit | undefined = init.body;
  if (init.json !== undefined) {
    headers["content-type"] = "application/json";
    body = JSON.stringify(init.json);
  }
  const req = new Request(new URL(path, "http://localhost:3000"), {
    method: init.method ?? "GET",
    headers,
    body,
    // A streamed request body must be sent half-duplex (fetch standard).
    ...(body instanceof ReadableStream ? { duplex: "half" } : {}),
  } as RequestInit);
  const res = await handler(req, { params: Promise.resolve(init.params ?? {}) });
  const text = await res.text();
  let parsed: any = text; // eslint-disable-line @typescript-eslint/no-explicit-any
  try {
    parsed = JSON.parse(text);
  } catch {
    // CSV stays text
  }
  // Every answer an integration test sees must be as the OpenAPI document describes it (tests
  // that call a handler under a made-up path like "/x" are about the handler, not the path).
  const problems = responseProblems(
    init.method ?? "GET",
    new URL(path, "http://localhost:3000").pathname,
    res.status,
    res.headers.get("content-type"),
    parsed,
  );
  if (problems.length) throw new Error(`Answer not as documented:\n${problems.join("\n")}`);
  return { status: res.status, body: parsed, headers: res.headers };
}

/** A body that arrives in small pieces, like a browser upload. */
export function streamOf(text: string, pieceSize = 4096): ReadableStream<Uint8Array> {
  const bytes = new TextEncoder().encode(text);
  let offset = 0;
  return new ReadableStream({
    pull(controller) {
      if (offset >= bytes.length) return controller.close();
      controller.enqueue(bytes.slice(offset, offset + pieceSize));
      offset += pieceSize;
    },
  });
}

/** Four headland U-turns (two left, two right) of 6 m, then a 90° turn of 15 m: five turns. */
export const KNOWN_LEGS: TPathLeg[] = [
  { kind: "straight", distance: 80, speed: 3 },
  { kind: "arc", radius: 6, headingChange: 180, speed: 2 },
  { kind: "straight", distance: 80, speed: 3 },
  { kind: "arc", radius: 6, headingChange: -180, speed: 2 },
  { kind: "straight", distance: 80, speed: 3 },
  { kind: "arc", radius: 6, headingChange: 180, speed: 2 },
  { kind: "straight", distance: 80, speed: 3 },
  { kind: "arc", radius: 6, headingChange: -180, speed: 2 },
  { kind: "straight", distance: 80, speed: 3 },
  { kind: "arc", radius: 15, headingChange: 90, speed: 3 },
  { kind: "straight", distance: 300, speed: 4 },
];
export const KNOWN_TURNS = 5;

/** A telematics CSV (time s, speed km/h, yaw rate deg/s) of the known path, plus `extra` lines. */
export function knownTelematicsCsv(extra: string[] = []): { csv: string; rows: number } {
  const samples = samplePath({ legs: KNOWN_LEGS, noise: { yawRate: 0.3 }, seed: 21 });
  const lines = ["time_s,speed_kmh,yaw_dps,ground"];
  for (const s of samples)
    lines.push(`${s.t.toFixed(1)},${(s.speed * 3.6).toFixed(2)},${s.yawRate.toFixed(3)},field`);
  lines.push(...extra);
  return { csv: lines.join("\n") + "\n", rows: samples.length };
}

export const TELEMATICS_MAPPING: TColumnMapping = {
  kind: "telematics",
  delimiter: ",",
  decimal: ".",
  hasHeader: true,
  encoding: "utf-8",
  columns: {
    time: { index: 0, header: "time_s", unit: "s" },
    speed: { index: 1, header: "speed_kmh", unit: "km/h" },
    yawRate: { index: 2, header: "yaw_dps", unit: "deg/s" },
    surface: { index: 3, header: "ground", unit: "text" },
  },
  defaults: { surface: "firm-soil", loadState: "unladen", shiftHours: 8, maxSpeed: 25 },
};

export async function waitFor<T>(
  read: () => Promise<T>,
  done: (value: T) => boolean,
  timeoutMs = 20_000,
): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (done(value)) return value;
    if (Date.now() > deadline) throw new Error(`timed out; last value ${JSON.stringify(value)}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}
