#!/usr/bin/env bash
# Pre-release only: rebuild the single initial migration from db/tables/*.ts.
source "$(dirname "$0")/lib/common.sh"
exec 9>/tmp/treadcast-migrations.lock
flock 9
rm -rf drizzle
node_modules/.bin/drizzle-kit generate --name init
