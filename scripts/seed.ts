// Seeds the invented demo scenario. Idempotent: every step upserts by a stable key.
import { getDb, getPool } from "@/db/client";
import { seedTenancy } from "@/scripts/seed/tenancy";
import { seedAccounts } from "@/scripts/seed/accounts";
import { seedWorkspace } from "@/scripts/seed/workspace";
import { seedDutyCycles } from "@/scripts/seed/duty-cycles";
import { seedBilling, seedBillingPlans } from "@/scripts/seed/billing";
import { seedReportBranding } from "@/scripts/seed/reports";
import { seedReadings } from "@/scripts/seed/readings";
import { seedOptions } from "@/scripts/seed/options";
import { seedDemoReports } from "@/scripts/seed/demo-reports";

const db = getDb();
// Plans first: a new dealership starts its trial from them.
await seedBillingPlans(db);
const tenancy = await seedTenancy(db);
console.log(`[seed] dealership "${tenancy.dealership.name}" ready`);
const accounts = await seedAccounts(db, { customers: tenancy.customers });
console.log(`[seed] ${accounts.count} demo sign-ins ready`);
const dutyCycleIds = await seedDutyCycles(db, { dealership: tenancy.dealership });
const workspace = await seedWorkspace(db, {
  dealership: tenancy.dealership,
  dutyCycleIds,
  adminEmail: "admin@brackenridge.test",
});
console.log(
  `[seed] workspace: ${workspace.machines} demo machines, ${workspace.templates} templates, ${workspace.estimatesAdded} new estimates`,
);
const plans = await seedBilling(db, {
  dealerships: [tenancy.dealership, tenancy.rival],
  billingEmail: "billing@brackenridge.test",
});
console.log(`[seed] billing: ${plans} plans, trial accounts ready`);
await seedReportBranding(db, [tenancy.dealership, tenancy.rival]);
console.log("[seed] report branding ready");
const readings = await seedReadings(db, { dealership: tenancy.dealership });
console.log(`[seed] tread readings: ${readings.added} new`);
const options = await seedOptions(db, {
  dealership: tenancy.dealership,
  adminEmail: "admin@brackenridge.test",
});
console.log(`[seed] comparisons: ${options.added} new`);
const demoReports = await seedDemoReports(db, {
  dealership: tenancy.dealership,
  estimatorEmail: "estimator@brackenridge.test",
});
console.log(`[seed] shared quote reports: ${demoReports.added} new`);
await getPool().end();
