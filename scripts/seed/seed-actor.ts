import { eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { users, type TDealership } from "@/db/schema";
import type { TActor, TRole } from "@/lib/authz/actor";

/** A demo account acting in the seed, as the screens' server code expects its caller. */
export async function seedActor(
  db: Db,
  { email, role, dealership }: { email: string; role: TRole; dealership: TDealership },
): Promise<TActor> {
  const [user] = await db.select().from(users).where(eq(users.email, email));
  if (!user) throw new Error(`seed the demo accounts first: ${email} is missing`);
  return {
    userId: user.id,
    email: user.email,
    name: user.name,
    dealershipId: dealership.id,
    roles: [role],
    customerId: null,
    unitSystem: user.unitSystem,
    currency: dealership.currency,
  };
}
