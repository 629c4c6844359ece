#!/usr/bin/env bash
# Load run against the built jar on loopback: throughput and latency percentiles of
# POST /v1/simulations (a bundled example, series off: a summary-sized answer) next to
# GET /health/live at the same connection count, errors of both, and the heap after a GC
# before and after the run.
#
#   src/load/run-load.sh [SECONDS_PER_ENDPOINT] [CONNECTIONS]    (defaults: 60 and 64)
#
# Environment: DWELLWISE_LOAD_PORT (18180), DWELLWISE_LOAD_EXAMPLE (powder-coat-steel-panel),
# DWELLWISE_LOAD_THREADS (wrk threads, 2), JAVA_OPTS (-Xmx768m, the heap of a 1 GiB container, with
# the image's collector and out-of-memory exit: see the Dockerfile's ENTRYPOINT).
# Before measuring, the JIT compiler must settle: both endpoints warm for 10 s, then simulations
# in 10 s rounds until a round spends under 0.2 s compiling (at most 8 rounds). The figures are
# those of a service that has run for a while, not of its first minute.
# Needs wrk (installed with apt-get when missing), python3 and the JDK's jcmd.
# Targets: simulations at least half the health endpoint's throughput; zero errors; heap after
# within 64 MiB of before. Exits 1 when a target is missed.
set -euo pipefail

SECONDS_EACH=${1:-60}
CONNECTIONS=${2:-64}
PORT=${DWELLWISE_LOAD_PORT:-18180}
EXAMPLE=${DWELLWISE_LOAD_EXAMPLE:-powder-coat-steel-panel}
THREADS=${DWELLWISE_LOAD_THREADS:-2}
JAVA_OPTS=${JAVA_OPTS:--Xmx768m -XX:+UseParallelGC -XX:+ExitOnOutOfMemoryError}
BASE="http://127.0.0.1:${PORT}"
ROOT=$(cd "$(dirname "$0")/../.." && pwd)
JAR="$ROOT/target/dwellwise.jar"
WORK=$(mktemp -d)
SERVER_PID=""

stop_server() {
  if [ -n "$SERVER_PID" ] && kill -0 "$SERVER_PID" 2>/dev/null; then
    kill -TERM "$SERVER_PID"
    for _ in $(seq 100); do kill -0 "$SERVER_PID" 2>/dev/null || break; sleep 0.1; done
    kill -0 "$SERVER_PID" 2>/dev/null && kill -KILL "$SERVER_PID"
  fi
  SERVER_PID=""
}
trap 'stop_server; rm -rf "$WORK"' EXIT

if ! command -v wrk >/dev/null; then
  echo "installing wrk" >&2
  apt-get install -y -qq wrk >/dev/null || { apt-get update -qq && apt-get install -y -qq wrk >/dev/null; }
fi
for tool in python3 jcmd curl; do
  command -v "$tool" >/dev/null || { echo "run-load.sh needs $tool" >&2; exit 2; }
done
if [ ! -f "$JAR" ]; then
  echo "building $JAR" >&2
  (cd "$ROOT" && mvn -B -q -DskipTests package)
fi

# shellcheck disable=SC2086
PORT=$PORT DWELLWISE_HOST=127.0.0.1 java $JAVA_OPTS -jar "$JAR" serve > "$WORK/server.log" 2>&1 &
SERVER_PID=$!
for _ in $(seq 300); do
  curl -sf "$BASE/health/ready" >/dev/null && break
  kill -0 "$SERVER_PID" 2>/dev/null || { cat "$WORK/server.log" >&2; exit 2; }
  sleep 0.1
done
curl -sf "$BASE/health/ready" >/dev/null || { echo "the service did not get ready" >&2; exit 2; }

curl -sf "$BASE/v1/examples/$EXAMPLE" | python3 -c '
import json, sys
job = json.load(sys.stdin)["job"]
job.setdefault("output", {})["series"] = False
json.dump(job, sys.stdout)' > "$WORK/job.json"

# One wrk phase: prints its RESULT line (see report.lua), bounded by timeout.
phase() {
  local url=$1 body=$2 seconds=$3
  DWELLWISE_LOAD_BODY=$body timeout $((seconds + 30)) \
    wrk -t"$THREADS" -c"$CONNECTIONS" -d"${seconds}s" --timeout 10s -s "$ROOT/src/load/report.lua" "$url" \
    | grep '^RESULT'
}
field() { sed -n "s/.* $2=\([^ ]*\).*/\1/p" <<<"$1"; }
heap_after_gc_kib() {
  jcmd "$SERVER_PID" GC.run >/dev/null
  # the heap's generations (G1: one line; parallel: young and old), not metaspace
  jcmd "$SERVER_PID" GC.heap_info | grep -v -E 'Metaspace|class space' \
    | sed -n 's/.*total [0-9]*K, used \([0-9]*\)K.*/\1/p' | awk '{s += $1} END {print s + 0}'
}
errors() {
  echo $(( $(field "$1" errors_status) + $(field "$1" errors_connect) + $(field "$1" errors_read) \
    + $(field "$1" errors_write) + $(field "$1" errors_timeout) ))
}

# Seconds the JIT compiler has spent so far (HotSpot's performance counters).
jit_seconds() {
  jcmd "$SERVER_PID" PerfCounter.print | python3 -c '
import sys
c = dict(line.strip().split("=", 1) for line in sys.stdin if "=" in line)
print((int(c["sun.ci.standardTime"]) + int(c["sun.ci.osrTime"])) / int(c["sun.os.hrt.frequency"]))'
}

echo "warming up: 10 s per endpoint, then simulations until the JIT compiler settles" >&2
phase "$BASE/health/live" "" 10 >/dev/null
phase "$BASE/v1/simulations" "$WORK/job.json" 10 >/dev/null
for round in 1 2 3 4 5 6 7 8; do
  JIT_BEFORE=$(jit_seconds)
  phase "$BASE/v1/simulations" "$WORK/job.json" 10 >/dev/null
  JIT_AFTER=$(jit_seconds)  # on a line of its own, so that a failed jcmd stops the script
  COMPILING=$(python3 -c "print(f'{$JIT_AFTER - $JIT_BEFORE:.2f}')")
  echo "  round $round: ${COMPILING} s compiling" >&2
  python3 -c "import sys; sys.exit(0 if $COMPILING < 0.2 else 1)" && break
done
HEAP_BEFORE=$(heap_after_gc_kib)

echo "measuring ${SECONDS_EACH} s per endpoint at ${CONNECTIONS} connections" >&2
HEALTH=$(phase "$BASE/health/live" "" "$SECONDS_EACH")
SIMULATIONS=$(phase "$BASE/v1/simulations" "$WORK/job.json" "$SECONDS_EACH")
HEAP_AFTER=$(heap_after_gc_kib)

RATIO=$(python3 -c "print(f'{$(field "$SIMULATIONS" rps) / $(field "$HEALTH" rps):.2f}')")
HEAP_DELTA_MIB=$(python3 -c "print(f'{($HEAP_AFTER - $HEAP_BEFORE) / 1024:.1f}')")
printf '\n%-22s %10s %9s %9s %9s %9s %8s\n' endpoint "req/s" "p50 ms" "p90 ms" "p99 ms" "max ms" errors
for row in "GET /health/live|$HEALTH" "POST /v1/simulations|$SIMULATIONS"; do
  name=${row%%|*}; r=${row#*|}
  printf '%-22s %10s %9s %9s %9s %9s %8s\n' "$name" "$(field "$r" rps)" "$(field "$r" p50_ms)" \
    "$(field "$r" p90_ms)" "$(field "$r" p99_ms)" "$(field "$r" max_ms)" "$(errors "$r")"
done
echo
echo "simulations / health throughput: $RATIO (target >= 0.5)"
echo "heap after GC: before $((HEAP_BEFORE / 1024)) MiB, after $((HEAP_AFTER / 1024)) MiB, change $HEAP_DELTA_MIB MiB (target <= 64)"
echo "requests: health $(field "$HEALTH" requests), simulations $(field "$SIMULATIONS" requests); errors: $(( $(errors "$HEALTH") + $(errors "$SIMULATIONS") )) (target 0)"
echo "server log lines: $(wc -l < "$WORK/server.log"); WARN/ERROR lines: $(grep -cE ' (WARN|ERROR) ' "$WORK/server.log" || true)"

missed=0
python3 -c "import sys; sys.exit(0 if $RATIO >= 0.5 else 1)" || { echo "MISSED: throughput ratio"; missed=1; }
[ $(( $(errors "$HEALTH") + $(errors "$SIMULATIONS") )) -eq 0 ] || { echo "MISSED: errors"; missed=1; }
python3 -c "import sys; sys.exit(0 if $HEAP_DELTA_MIB <= 64 else 1)" || { echo "MISSED: heap"; missed=1; }
exit $missed
