#!/usr/bin/env bash
# Prints the warm start-to-ready time of `npm start` (dependencies installed, app already built):
# from launch until /api/health answers 200 on the app port. Stops everything afterwards.
source "$(dirname "$0")/../lib/common.sh"
PORT="${PORT:-3000}"
log=$(mktemp)
# Warm state is the target: build first (untimed) when sources changed since the last build.
if build_is_stale .next; then
  NEXT_TELEMETRY_DISABLED=1 node_modules/.bin/next build >/dev/null
fi
t0=$(date +%s.%N)
setsid bash scripts/start.sh >"$log" 2>&1 &
pid=$!
ready=""
for _ in $(seq 1 600); do
  if curl -fs -o /dev/null "http://localhost:$PORT/api/health"; then ready=1; break; fi
  sleep 0.1
done
t1=$(date +%s.%N)
kill -INT -- "-$pid" 2>/dev/null || true
wait "$pid" 2>/dev/null || true
[ -n "$ready" ] || { cat "$log"; echo "not ready within 60 s" >&2; exit 1; }
printf 'start-to-ready: %.1f s (%s cores, node %s)\n' "$(echo "$t1 - $t0" | bc)" "$(nproc)" "$(node --version)"
