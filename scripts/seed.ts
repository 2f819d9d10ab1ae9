// Seeds the invented demo scenario. Idempotent: every step upserts by a stable key.
import { getDb, getPool } from "@/db/client";
import { seedTenancy } from "@/scripts/seed/tenancy";

const db = getDb();
const tenancy = await seedTenancy(db);
console.log(`[seed] dealership "${tenancy.dealership.name}" ready`);
await getPool().end();
