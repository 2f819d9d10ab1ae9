#!/usr/bin/env bash
# Development helper: make sure the dev cluster runs; with a name, (re)create that database and migrate it.
source "$(dirname "$0")/lib/common.sh"
PGPORT="${PGPORT:-54329}"
"$PGBIN/pg_isready" -q -h 127.0.0.1 -p "$PGPORT" || pg_up .pgdata "$PGPORT" treadcast PGPORT
if [ $# -ge 1 ]; then
  "$PGBIN/dropdb" -h 127.0.0.1 -p "$PGPORT" -U postgres --if-exists --force "$1"
  "$PGBIN/createdb" -h 127.0.0.1 -p "$PGPORT" -U postgres "$1"
  DATABASE_URL="postgres://postgres@127.0.0.1:$PGPORT/$1" node_modules/.bin/tsx scripts/migrate.ts
  log "database $1 ready: export DATABASE_URL=postgres://postgres@127.0.0.1:$PGPORT/$1"
fi
