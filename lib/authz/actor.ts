import type { TAction } from "@/lib/authz/policy";

/** Who is asking, resolved on the server from the session and the database (never from the request body). */
export type TRole = "dealer_admin" | "estimator" | "billing_admin" | "customer";

export type TActor = {
  userId: string;
  email: string;
  name: string | null;
  /** The active dealership; every query filters by it. */
  dealershipId: string;
  /** Roles held in the active dealership (a dealer admin may also be the billing admin). */
  roles: TRole[];
  /** For a customer account: the one customer record it may see. Null for staff. */
  customerId: string | null;
  unitSystem: "metric" | "imperial";
  /** ISO 4217 code of the active dealership: every amount is shown in it. */
  currency: string;
  /**
   * Set when the request came with an API token instead of a session: the token acts for the
   * person who made it, but only within these actions (its scopes), whatever their roles allow.
   */
  apiToken?: { id: string; name: string; grants: ReadonlySet<TAction> };
};

/** A resource as authorization sees it: which dealership owns it, and which customer it belongs to. */
export type TOwned = { dealershipId: string; customerId?: string | null };
