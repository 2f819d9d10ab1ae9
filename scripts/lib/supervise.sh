# Process supervision for scripts/start.sh (plain bash, sourced after common.sh).
#
# supervise NAME COMMAND...  runs COMMAND in the background and restarts it whenever it exits,
# crashed or killed (an out-of-memory kill is a SIGKILL), after a backoff of 1, 2, 4 … 30 s that
# starts over once the process has stayed up for 60 s. Each start and exit is logged with the
# pid. The loop ends, stopping its process, on SIGTERM or SIGINT (Ctrl-C).

SUPERVISOR_PIDS=()

supervise() {
  local name="$1"; shift
  (
    child=""
    stop() { [ -n "$child" ] && kill -TERM "$child" 2>/dev/null && wait "$child" 2>/dev/null; exit 0; }
    trap stop TERM INT
    delay=1
    while true; do
      started=$SECONDS
      "$@" &
      child=$!
      log "$name started (pid $child)"
      code=0
      wait "$child" || code=$?
      child=""
      if [ "$code" -gt 128 ]; then how="killed by signal $((code - 128))"; else how="exit code $code"; fi
      [ $((SECONDS - started)) -ge 60 ] && delay=1
      log "$name stopped ($how); restarting in $delay s"
      sleep "$delay" & wait $!
      delay=$((delay * 2 > 30 ? 30 : delay * 2))
    done
  ) &
  SUPERVISOR_PIDS+=($!)
}

stop_supervised() {
  for pid in "${SUPERVISOR_PIDS[@]}"; do kill -TERM "$pid" 2>/dev/null || true; done
  for pid in "${SUPERVISOR_PIDS[@]}"; do wait "$pid" 2>/dev/null || true; done
}

# Blocks while PostgreSQL answers; returns once it has failed 3 checks in a row (about 6 s), so a
# restart of the database (a second or two) is ridden out but a database that is gone is not.
watch_database() {
  local url="$1" misses=0
  while [ "$misses" -lt 3 ]; do
    sleep 2 & wait $!
    if "$PGBIN/pg_isready" -q -d "$url"; then misses=0; else misses=$((misses + 1)); fi
  done
}
