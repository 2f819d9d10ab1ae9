#!/usr/bin/env bash
# npm test: every tier against a separate test cluster, so it can run beside `npm start`.
source "$(dirname "$0")/lib/common.sh"

PGPORT="${TEST_PGPORT:-54339}"
DB_NAME="treadcast_test"
export NODE_ENV=test
export NEXT_TELEMETRY_DISABLED=1
export E2E_PORT="${E2E_PORT:-3100}"
export SMTP_PORT="${TEST_SMTP_PORT:-2526}"
export STRIPE_FAKE_PORT="${TEST_STRIPE_FAKE_PORT:-12112}"
export STRIPE_API_BASE="http://127.0.0.1:$STRIPE_FAKE_PORT"
export NEXT_DIST_DIR=".next-test"

ensure_node_modules
ensure_postgres
ensure_chromium
ensure_poppler

STARTED_PG=0
cleanup() {
  trap - INT TERM EXIT
  # A cluster that was already running is left running; the run keeps its own exit status.
  if [ "$STARTED_PG" = 1 ]; then pg_down .pgdata-test; fi
}
trap cleanup INT TERM EXIT
"$PGBIN/pg_isready" -q -h 127.0.0.1 -p "$PGPORT" || STARTED_PG=1
pg_up .pgdata-test "$PGPORT" "$DB_NAME" TEST_PGPORT
# Every run starts from an empty database, so rate-limit counters and rows left by an earlier run
# cannot change the outcome.
"$PGBIN/dropdb" -h 127.0.0.1 -p "$PGPORT" -U postgres --if-exists --force "$DB_NAME"
"$PGBIN/createdb" -h 127.0.0.1 -p "$PGPORT" -U postgres "$DB_NAME"
export DATABASE_URL="postgres://postgres@127.0.0.1:$PGPORT/$DB_NAME"
export APP_URL="http://localhost:$E2E_PORT"
export AUTH_URL="$APP_URL"

step() { local name="$1"; shift; log "── $name"; local t0=$SECONDS; "$@"; log "   $name passed in $((SECONDS - t0)) s"; }

step "typecheck" node_modules/.bin/tsc --noEmit
step "lint" node_modules/.bin/eslint --max-warnings=0 .
step "format" node_modules/.bin/prettier --check . --log-level warn
step "migrate" node_modules/.bin/tsx scripts/migrate.ts
REPORTS="$(mktemp -d)"
vitest_tier() { node_modules/.bin/vitest run --project "$1" --reporter=default --reporter=json --outputFile="$REPORTS/$1.json"; }
step "unit tests" vitest_tier unit
step "integration tests" vitest_tier integration
step "production build" env MAILBOX_ENABLED=true node_modules/.bin/next build
step "end-to-end tests" vitest_tier e2e
log "all tiers passed"
# One closing line over every tier, in the plain "N passed, N failed" form.
node -e '
const fs = require("fs"); let p = 0, f = 0, s = 0;
for (const file of fs.readdirSync(process.argv[1])) {
  const r = JSON.parse(fs.readFileSync(process.argv[1] + "/" + file, "utf8"));
  p += r.numPassedTests; f += r.numFailedTests; s += r.numPendingTests + (r.numTodoTests || 0);
}
console.log(`${p} passed, ${f} failed, ${s} skipped`);
' "$REPORTS"
