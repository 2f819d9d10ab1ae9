import "server-only";
import { cache } from "react";
import { cookies } from "next/headers";
import { getDb } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { loadActor } from "@/features/auth/server/load-actor";
import { parseCookieHeader, readSessionClaims } from "@/features/auth/server/session-cookie";

/** The actor behind a route handler's Request, or null when signed out or no longer a member. */
export async function getActorFromRequest(req: Request): Promise<TActor | null> {
  const claims = await readSessionClaims(parseCookieHeader(req.headers.get("cookie")));
  return claims ? loadActor(getDb(), claims) : null;
}

/** The actor for server components and server actions; resolved once per request. */
export const getActor = cache(async (): Promise<TActor | null> => {
  const jar = await cookies();
  const claims = await readSessionClaims(new Map(jar.getAll().map((c) => [c.name, c.value])));
  return claims ? loadActor(getDb(), claims) : null;
});

/** Whether the request carries a valid session, even one whose user is no longer a member. */
export async function hasValidSession(): Promise<boolean> {
  const jar = await cookies();
  return Boolean(await readSessionClaims(new Map(jar.getAll().map((c) => [c.name, c.value]))));
}
