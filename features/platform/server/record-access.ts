import "server-only";
import type { TActor } from "@/lib/authz/actor";
import { can, readScope, type TAction } from "@/lib/authz/policy";
import { ApiError, forbidden, notFound } from "@/features/platform/server/api-error";

export type TRecordKind = "customer" | "site" | "machine" | "estimate" | "duty-cycle";
type TOwnedRow = { dealershipId: string; customerId?: string | null };

/**
 * Throws 404 when the actor may not even see the record (another dealership, another customer:
 * its existence does not leak) and 403 when they may see it but their role may not change it.
 */
export function assertAccess(
  actor: TActor,
  action: "read" | "write",
  resource: TOwnedRow | undefined,
  kind: TRecordKind,
): asserts resource {
  if (!resource || !can(actor, `${kind}:read` as TAction, ownership(resource)))
    throw notFound(kind);
  if (action === "write" && !can(actor, `${kind}:write` as TAction, ownership(resource)))
    throw forbidden(`this ${kind}`);
}

/**
 * Throws 403 unless the actor may list this kind of record at all. Every role may, so this
 * bites only for an API token whose scopes leave the kind out.
 */
export function assertMayRead(actor: TActor, kind: TRecordKind) {
  if (!can(actor, `${kind}:read` as TAction))
    throw new ApiError(403, "forbidden", `Your role or API token may not read ${kind}s.`);
}

/** Throws 403 unless the actor's role may create this kind of record. */
export function assertMayWrite(actor: TActor, kind: TRecordKind) {
  if (!can(actor, `${kind}:write` as TAction)) throw forbidden(`${kind}s`);
}

/** Throws 403 unless the actor may run the engine. */
export function assertMayRunEstimates(actor: TActor) {
  if (!can(actor, "estimate:run")) throw forbidden("estimates");
}

/** The customer a list must be narrowed to; null for staff, who see the whole dealership. */
export function customerScope(actor: TActor): string | null {
  return readScope(actor).customerId;
}

function ownership(row: TOwnedRow) {
  return { dealershipId: row.dealershipId, customerId: row.customerId ?? null };
}
