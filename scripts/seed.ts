// Seeds the invented demo scenario. Idempotent: every step upserts by a stable key.
import { getDb, getPool } from "@/db/client";
import { seedTenancy } from "@/scripts/seed/tenancy";
import { seedAccounts } from "@/scripts/seed/accounts";

const db = getDb();
const tenancy = await seedTenancy(db);
console.log(`[seed] dealership "${tenancy.dealership.name}" ready`);
const accounts = await seedAccounts(db, { customers: tenancy.customers });
console.log(`[seed] ${accounts.count} demo sign-ins ready`);
await getPool().end();
