import { and, eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { dealerships, memberships, users, type TCustomer, type TMembershipRole } from "@/db/schema";
import { hashPassword } from "@/lib/authz/password";
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from "@/scripts/seed/demo-accounts";

/**
 * Creates the demo sign-ins (one per role, plus a member of the rival dealership). Idempotent:
 * users are matched by address, memberships by (dealership, user, role); a password someone
 * changed is left alone.
 */
export async function seedAccounts(db: Db, opts: { customers: Record<string, TCustomer> }) {
  const demoHash = await hashPassword(DEMO_PASSWORD);
  for (const account of DEMO_ACCOUNTS) {
    const [dealership] = await db
      .select()
      .from(dealerships)
      .where(eq(dealerships.slug, account.dealership));
    if (!dealership) throw new Error(`demo dealership ${account.dealership} is not seeded`);
    const customerId = account.customerKey ? opts.customers[account.customerKey]?.id : null;
    if (account.customerKey && !customerId)
      throw new Error(`demo customer ${account.customerKey} is not seeded`);

    const [existing] = await db.select().from(users).where(eq(users.email, account.email));
    const user =
      existing ??
      (
        await db
          .insert(users)
          .values({
            email: account.email,
            name: account.name,
            passwordHash: demoHash,
            emailVerified: new Date(),
            activeDealershipId: dealership.id,
          })
          .returning()
      )[0]!;
    if (!user.passwordHash) {
      await db.update(users).set({ passwordHash: demoHash }).where(eq(users.id, user.id));
    }
    const role = account.role as TMembershipRole;
    const [membership] = await db
      .select()
      .from(memberships)
      .where(
        and(
          eq(memberships.dealershipId, dealership.id),
          eq(memberships.userId, user.id),
          eq(memberships.role, role),
        ),
      );
    if (!membership) {
      await db.insert(memberships).values({
        dealershipId: dealership.id,
        userId: user.id,
        role,
        customerId: role === "customer" ? customerId : null,
      });
    }
  }
  return { count: DEMO_ACCOUNTS.length };
}
