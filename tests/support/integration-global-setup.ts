import { execFileSync } from "node:child_process";

// The test command starts PostgreSQL and exports DATABASE_URL; apply migrations and load the report plans once per run.
export default function setup() {
  if (!process.env.DATABASE_URL) {
    throw new Error("DATABASE_URL is not set: run integration tests through `npm test`.");
  }
  execFileSync("node_modules/.bin/tsx", ["scripts/migrate.ts"], { stdio: "inherit" });
  // Plans are data a deployment seeds; without them no new dealership starts a trial.
  execFileSync("node_modules/.bin/tsx", ["scripts/seed-plans.ts"], { stdio: "inherit" });
}
