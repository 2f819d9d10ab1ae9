#!/usr/bin/env bash
# npm start: everything needed to serve Treadcast on http://localhost:3000 from a fresh clone.
source "$(dirname "$0")/lib/common.sh"
source "$(dirname "$0")/lib/supervise.sh"

APP_PORT="${PORT:-3000}"
PGPORT="${PGPORT:-54329}"
DB_NAME="treadcast"
export SMTP_PORT="${SMTP_PORT:-2525}"
export STRIPE_FAKE_PORT="${STRIPE_FAKE_PORT:-12111}"
export STRIPE_API_BASE="http://127.0.0.1:$STRIPE_FAKE_PORT"

port_busy "$APP_PORT" && fail "port $APP_PORT is already in use (is Treadcast already running?). Stop that process or run PORT=3001 npm start."
port_busy "$STRIPE_FAKE_PORT" && fail "port $STRIPE_FAKE_PORT (payments fake) is already in use. Stop that process or set STRIPE_FAKE_PORT."
port_busy "$SMTP_PORT" && fail "port $SMTP_PORT (mail fake) is already in use. Stop that process or set SMTP_PORT."

ensure_node_modules
ensure_postgres

STARTED_PG=0
cleanup() {
  trap - INT TERM EXIT
  log "stopping"
  stop_supervised
  if [ "$STARTED_PG" = 1 ]; then pg_down .pgdata; fi
  log "stopped"
}
trap cleanup INT TERM EXIT

# TREADCAST_DATABASE_URL points npm start at a database that is already running (the test tier
# uses it to try the supervisor); otherwise it runs its own cluster in .pgdata.
if [ -n "${TREADCAST_DATABASE_URL:-}" ]; then
  log "using the database at TREADCAST_DATABASE_URL"
  export DATABASE_URL="$TREADCAST_DATABASE_URL"
else
  "$PGBIN/pg_isready" -q -h 127.0.0.1 -p "$PGPORT" || STARTED_PG=1
  pg_up .pgdata "$PGPORT" "$DB_NAME" PGPORT
  export DATABASE_URL="postgres://postgres@127.0.0.1:$PGPORT/$DB_NAME"
fi
export APP_URL="http://localhost:$APP_PORT"
export AUTH_URL="$APP_URL"
export MAILBOX_ENABLED="${MAILBOX_ENABLED:-true}"
export NEXT_TELEMETRY_DISABLED=1

log "migrating database"
node_modules/.bin/tsx scripts/migrate.ts
log "seeding demo data"
node --conditions=react-server --import tsx scripts/seed.ts

# Rebuild only when a source file is newer than the last build.
if build_is_stale "${NEXT_DIST_DIR:-.next}"; then
  log "building the production app (next build)"
  node_modules/.bin/next build >/tmp/treadcast-build.log 2>&1 || { tail -40 /tmp/treadcast-build.log; fail "next build failed"; }
fi

# Each process is restarted when it crashes or is killed (see scripts/lib/supervise.sh); one
# process's crash never stops the others. `node --import tsx` keeps each one a single process, so
# its pid is the one a kill (or the kernel's out-of-memory killer) reaches.
log "starting local fakes (mail, payments), the background worker and the app"
supervise fakes node --import tsx mocks/run-fakes.ts
supervise worker node --conditions=react-server --import tsx scripts/worker.ts
supervise app node node_modules/next/dist/bin/next start -H 127.0.0.1 -p "$APP_PORT"

for _ in $(seq 1 100); do port_busy "$APP_PORT" && break; sleep 0.2; done

cat <<MSG

  Treadcast is running at  http://localhost:$APP_PORT
  (use localhost, not 127.0.0.1: sign-in cookies are bound to it)

  Demo sign-ins:
$(node_modules/.bin/tsx scripts/print-demo-accounts.ts 2>/dev/null || echo "    see README")

  Mailbox of the mail fake:  http://localhost:$APP_PORT/dev/mailbox
  Press Ctrl-C to stop everything.

MSG

# Everything stops on Ctrl-C (the trap above) or when the database itself is gone: without it
# nothing can work, and restarting the others would only hide that.
watch_database "$DATABASE_URL"
log "PostgreSQL is not answering at $DATABASE_URL; stopping everything"
