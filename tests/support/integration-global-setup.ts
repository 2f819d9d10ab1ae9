import { execFileSync } from "node:child_process";

// The test command starts PostgreSQL and exports DATABASE_URL; apply migrations once per run.
export default function setup() {
  if (!process.env.DATABASE_URL) {
    throw new Error("DATABASE_URL is not set: run integration tests through `npm test`.");
  }
  execFileSync("node_modules/.bin/tsx", ["scripts/migrate.ts"], { stdio: "inherit" });
}
