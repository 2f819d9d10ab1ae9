// Loads the report plans (seeded data, not code) without the demo scenario: the integration tier
// runs on an empty database, and a new dealership's trial trigger needs the trial plan to exist.
import { getDb, getPool } from "@/db/client";
import { seedBillingPlans } from "@/scripts/seed/billing";

const count = await seedBillingPlans(getDb());
console.log(`report plans loaded: ${count}`);
await getPool().end();
