// Prints the demo sign-ins for the start banner. The accounts feature fills DEMO_ACCOUNTS.
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from "@/scripts/seed/demo-accounts";

for (const a of DEMO_ACCOUNTS) {
  console.log(`    ${a.email.padEnd(34)} ${a.role.padEnd(14)} ${a.dealership}`);
}
console.log(`    password for every demo account: ${DEMO_PASSWORD}`);
