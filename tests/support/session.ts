import { randomUUID } from "node:crypto";
import type { Db } from "@/db/client";
import {
  customers,
  dealerships,
  memberships,
  users,
  type TDealership,
  type TUser,
} from "@/db/schema";
import type { TActor, TRole } from "@/lib/authz/actor";
import { mintSessionToken } from "@/features/auth/server/session-cookie";

/** A short unique tag so parallel test files never collide on names or addresses. */
export function uniqueTag(): string {
  return randomUUID().slice(0, 8);
}

/** Creates a dealership with a unique slug (and an invented name). */
export async function createTestDealership(db: Db, name?: string): Promise<TDealership> {
  const tag = uniqueTag();
  const [row] = await db
    .insert(dealerships)
    .values({ name: name ?? `Test Dealership ${tag}`, slug: `test-${tag}` })
    .returning();
  return row!;
}

/** Mints the Cookie header value a browser would send after signing in as this user. */
export async function sessionCookieFor(user: { id: string; email: string }): Promise<string> {
  const { name, value } = await mintSessionToken({ userId: user.id, email: user.email });
  return `${name}=${value}`;
}

/**
 * Creates a user holding `roles` in a dealership (a new one unless given), with a customer
 * record for the "customer" role when none is given, and returns a valid session cookie.
 */
export async function createTestMember(opts: {
  db: Db;
  roles: TRole[];
  dealershipId?: string;
  customerId?: string;
  email?: string;
  name?: string;
}): Promise<{ user: TUser; dealership: TDealership; cookie: string; actor: TActor }> {
  const { db, roles } = opts;
  const dealership = opts.dealershipId
    ? (await db.query.dealerships.findFirst({
        where: (d, { eq }) => eq(d.id, opts.dealershipId!),
      }))!
    : await createTestDealership(db);
  let customerId = opts.customerId ?? null;
  if (roles.includes("customer") && !customerId) {
    const [c] = await db
      .insert(customers)
      .values({ dealershipId: dealership.id, name: `Test Customer ${uniqueTag()}` })
      .returning();
    customerId = c!.id;
  }
  const tag = uniqueTag();
  const [user] = await db
    .insert(users)
    .values({
      email: opts.email ?? `member-${tag}@example.test`,
      name: opts.name ?? `Test Member ${tag}`,
      activeDealershipId: dealership.id,
    })
    .returning();
  for (const role of roles) {
    await db.insert(memberships).values({
      dealershipId: dealership.id,
      userId: user!.id,
      role,
      customerId: role === "customer" ? customerId : null,
    });
  }
  const actor: TActor = {
    userId: user!.id,
    email: user!.email,
    name: user!.name,
    dealershipId: dealership.id,
    roles: [...roles],
    customerId: roles.includes("customer") ? customerId : null,
    unitSystem: user!.unitSystem,
    currency: dealership.currency,
  };
  return { user: user!, dealership, cookie: await sessionCookieFor(user!), actor };
}

/** A Request carrying the member's session cookie, for calling route handlers directly. */
export function requestAs(
  cookie: string | null,
  url: string,
  init: { method?: string; body?: unknown; headers?: Record<string, string> } = {},
): Request {
  const headers: Record<string, string> = { ...(init.headers ?? {}) };
  if (cookie) headers.cookie = cookie;
  let body: string | undefined;
  if (init.body !== undefined) {
    headers["content-type"] ??= "application/json";
    body = typeof init.body === "string" ? init.body : JSON.stringify(init.body);
  }
  return new Request(new URL(url, "http://localhost:3000"), {
    method: init.method ?? "GET",
    headers,
    body,
  });
}
