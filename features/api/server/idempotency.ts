import "server-only";
import { createHash } from "node:crypto";
import { and, eq, lt, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { idempotencyKeys } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";

/** How long a key is remembered: a client retrying later than this is making a new request. */
export const IDEMPOTENCY_TTL_HOURS = 24;
const KEY_SHAPE = /^[\x21-\x7e]{1,255}$/;

function jsonAnswer(status: number, body: unknown, headers: Record<string, string> = {}) {
  return Response.json(body, { status, headers: { "cache-control": "no-store", ...headers } });
}

function problem(status: number, code: string, message: string, headers?: Record<string, string>) {
  return jsonAnswer(status, { error: { code, message } }, headers);
}

function principalOf(actor: TActor): string {
  return actor.apiToken
    ? `token:${actor.apiToken.id}`
    : `user:${actor.userId}:${actor.dealershipId}`;
}

/**
 * What the request is, for telling a true retry from a different request under the same key.
 * A JSON body is hashed whole; any other body (a streamed CSV upload, an image) is not read
 * here (it may be hundreds of megabytes), so it is known by its name, type and length.
 */
async function fingerprint(req: Request): Promise<string> {
  const url = new URL(req.url);
  const type = req.headers.get("content-type") ?? "";
  const hash = createHash("sha256").update(`${req.method} ${url.pathname}${url.search}\n`);
  if (type.includes("json") || !req.body) {
    hash.update(await req.clone().text());
  } else {
    hash.update(
      `file:${req.headers.get("x-file-name") ?? ""}:${type}:${req.headers.get("content-length") ?? ""}`,
    );
  }
  return hash.digest("hex");
}

/**
 * Runs a creating POST at most once per Idempotency-Key and caller: the first successful answer
 * is stored and every repeat gets it again (with `Idempotent-Replayed: true`). The same key with
 * another body is refused (422), as is a repeat while the first is still running (409). Only
 * successful answers are kept, so a request refused for bad input can be corrected and resent.
 */
export async function withIdempotency(
  db: DbOrTx,
  req: Request,
  actor: TActor,
  run: () => Promise<Response>,
): Promise<Response> {
  const key = req.headers.get("idempotency-key");
  if (key === null || req.method !== "POST") return run();
  if (!KEY_SHAPE.test(key))
    return problem(
      400,
      "invalid_input",
      "The Idempotency-Key header must be 1 to 255 printable characters without spaces (a UUID is ideal).",
    );
  if (Math.random() < 0.01) await pruneIdempotencyKeys(db);
  const principal = principalOf(actor);
  const requestHash = await fingerprint(req);
  const path = new URL(req.url).pathname;
  const where = and(eq(idempotencyKeys.principal, principal), eq(idempotencyKeys.key, key));
  // A key older than the retention window no longer binds anything.
  await db
    .delete(idempotencyKeys)
    .where(
      and(
        where,
        lt(
          idempotencyKeys.createdAt,
          sql`now() - make_interval(hours => ${IDEMPOTENCY_TTL_HOURS})`,
        ),
      ),
    );
  const reserved = await db
    .insert(idempotencyKeys)
    .values({
      principal,
      key,
      dealershipId: actor.dealershipId,
      method: req.method,
      path,
      requestHash,
    })
    .onConflictDoNothing()
    .returning({ key: idempotencyKeys.key });
  if (reserved.length === 0) {
    const [first] = await db.select().from(idempotencyKeys).where(where);
    if (!first) return run();
    if (first.requestHash !== requestHash || first.path !== path)
      return problem(
        422,
        "idempotency_key_reused",
        `This Idempotency-Key was already used for a different request (${first.method} ${first.path} with another body). Use a new key for a new request.`,
      );
    if (first.status === null)
      return problem(
        409,
        "idempotency_in_progress",
        "A request with this Idempotency-Key is still running. Retry in a moment to get its answer.",
        { "retry-after": "1" },
      );
    return jsonAnswer(first.status, first.responseBody, { "idempotent-replayed": "true" });
  }
  let response: Response;
  try {
    response = await run();
  } catch (error) {
    await db.delete(idempotencyKeys).where(where);
    throw error;
  }
  const text = response.ok ? await response.clone().text() : null;
  let body: unknown = undefined;
  try {
    body = text === null ? undefined : (JSON.parse(text) as unknown);
  } catch {
    body = undefined;
  }
  if (body === undefined) {
    // Not kept (a refusal, or not JSON): let the caller try again with the same key.
    await db.delete(idempotencyKeys).where(where);
  } else {
    await db
      .update(idempotencyKeys)
      .set({ status: response.status, responseBody: body })
      .where(where);
  }
  return response;
}

/** Drops keys past the retention window (now and then, like the rate-limit counters). */
async function pruneIdempotencyKeys(db: DbOrTx): Promise<void> {
  await db
    .delete(idempotencyKeys)
    .where(
      lt(idempotencyKeys.createdAt, sql`now() - make_interval(hours => ${IDEMPOTENCY_TTL_HOURS})`),
    );
}
