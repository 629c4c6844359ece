#!/usr/bin/env bash
# Runs the built jar the way the image and the Deployment run it, on a machine without a container
# engine: the Dockerfile's ENTRYPOINT and CMD, as user and group 10001, with no capabilities and no
# new privileges, on a read-only root filesystem with a fresh 64 MiB /tmp (the Deployment's
# securityContext and emptyDir). Then it probes both health endpoints, solves a bundled example,
# scrapes /metrics, sends SIGTERM and expects exit 0. What it cannot show: the base images
# themselves, and the memory limit that -XX:MaxRAMPercentage reads (the JVM sees the machine's).
#
#   src/container/run-as-pod.sh      (as root, for the mount namespace; needs util-linux, python3, curl)
#
# Environment: DWELLWISE_POD_PORT (18190). Exits 0 when every step passed, 1 naming the first that
# failed, 2 when it cannot set the run up.
set -euo pipefail

PORT=${DWELLWISE_POD_PORT:-18190}
ROOT=$(cd "$(dirname "$0")/../.." && pwd)
JAR="$ROOT/target/dwellwise.jar"
BASE="http://127.0.0.1:$PORT"
INSIDE=/run/dwellwise-pod
WORK=$(mktemp -d)
# the mount point is made on the machine's own /run (the tmpfs on it lives in the namespace only)
trap 'rm -rf "$WORK"; rmdir "$INSIDE" 2>/dev/null || true' EXIT

for tool in unshare setpriv python3 curl; do
  command -v "$tool" >/dev/null || { echo "run-as-pod.sh needs $tool" >&2; exit 2; }
done
[ -f "$JAR" ] || { echo "build the jar first: mvn -q package -DskipTests" >&2; exit 2; }
unshare --mount --fork true 2>/dev/null || { echo "run-as-pod.sh needs root for a mount namespace" >&2; exit 2; }

# The image's command line, from the Dockerfile itself, with the jar where this run mounts it.
python3 - "$ROOT/Dockerfile" "$INSIDE/dwellwise.jar" > "$WORK/command" <<'PY'
import json, sys
lines = open(sys.argv[1]).read().splitlines()
def form(word):
    found = [line[len(word):].strip() for line in lines if line.startswith(word + " ")]
    return json.loads(found[-1]) if found else []
for arg in form("ENTRYPOINT") + form("CMD"):
    print(arg.replace("/app/dwellwise.jar", sys.argv[2]))
PY
echo "command: $(tr '\n' ' ' < "$WORK/command")"

# Inside a private mount namespace: the jar on a read-only tmpfs of its own, /tmp a fresh tmpfs, the
# root remounted read-only, then the command as 10001 with every capability gone. What it needs
# from $WORK is read before the fresh /tmp can hide it.
cat > "$WORK/inside.sh" <<INSIDE_SCRIPT
set -eu
mapfile -t command < "$WORK/command"
mount --make-rprivate /
mkdir -p $INSIDE
mount -t tmpfs -o size=64m tmpfs $INSIDE
cp "$JAR" $INSIDE/dwellwise.jar
chmod 644 $INSIDE/dwellwise.jar
mount -o remount,ro $INSIDE
mount -t tmpfs -o size=64m,mode=1777 tmpfs /tmp
mount -o remount,bind,ro /
cd /
exec setpriv --reuid=10001 --regid=10001 --clear-groups --no-new-privs --inh-caps=-all --bounding-set=-all \\
  env -i PATH=/usr/local/bin:/usr/bin:/bin HOME=/nonexistent PORT=$PORT DWELLWISE_HOST=127.0.0.1 "\${command[@]}"
INSIDE_SCRIPT

unshare --mount --fork bash "$WORK/inside.sh" > "$WORK/server.log" 2>&1 &
SHELL_PID=$!
fail() {
  echo "FAILED: $1" >&2
  sed -n '1,40p' "$WORK/server.log" >&2
  pkill -TERM -f "$INSIDE/dwellwise.jar" 2>/dev/null || true
  wait "$SHELL_PID" 2>/dev/null || true
  exit 1
}
for _ in $(seq 300); do
  curl -sf "$BASE/health/ready" >/dev/null && break
  kill -0 "$SHELL_PID" 2>/dev/null || fail "the service did not start"
  sleep 0.1
done

JAVA_PID=$(pgrep -f "$INSIDE/dwellwise.jar") || fail "no java process"
[ "$(ps -o uid= -p "$JAVA_PID" | tr -d ' ')" = 10001 ] || fail "the service does not run as user 10001"
[ "$(awk '/^CapEff/ {print $2}' "/proc/$JAVA_PID/status")" = 0000000000000000 ] || fail "the service holds capabilities"
# the mount options of / and /tmp as the service sees them (mountinfo: field 5 the point, 6 the options)
[[ "$(awk '$5 == "/" {o = $6} END {print o}' "/proc/$JAVA_PID/mountinfo")" == ro* ]] || fail "the root filesystem is writable"
[[ "$(awk '$5 == "/tmp" {o = $6} END {print o}' "/proc/$JAVA_PID/mountinfo")" == rw* ]] || fail "/tmp is not writable"
echo "running as user 10001 with no capabilities, on a read-only root with a fresh /tmp"

for path in /health/live /health/ready; do
  [ "$(curl -s -o /dev/null -w '%{http_code}' "$BASE$path")" = 200 ] || fail "GET $path"
  echo "GET $path: 200"
done
curl -sf "$BASE/v1/examples/powder-coat-steel-panel" \
  | python3 -c 'import json, sys; json.dump(json.load(sys.stdin)["job"], sys.stdout)' > "$WORK/job.json" \
  || fail "GET /v1/examples/powder-coat-steel-panel"
VERDICT=$(curl -sf -H 'Content-Type: application/json' --data @"$WORK/job.json" "$BASE/v1/simulations" \
  | python3 -c 'import json, sys; print(json.load(sys.stdin)["verdict"])') || fail "POST /v1/simulations"
echo "POST /v1/simulations: verdict $VERDICT"
# into a file first: grep -q stops at the first match, and under pipefail curl's broken pipe would fail the step
curl -sf "$BASE/metrics" > "$WORK/metrics.txt" || fail "GET /metrics"
grep -q '^http_server_requests_seconds_count' "$WORK/metrics.txt" || fail "GET /metrics: no request counts"
echo "GET /metrics: request counts present"

kill -TERM "$JAVA_PID"
set +e
wait "$SHELL_PID"
STATUS=$?
set -e
[ "$STATUS" = 0 ] || fail "exit status $STATUS after SIGTERM"
grep -q 'dev.dwellwise.Main stopped' "$WORK/server.log" || fail "no 'stopped' line after SIGTERM"
grep -E ' (WARN|ERROR) ' "$WORK/server.log" && fail "WARN or ERROR lines in the log"
echo "SIGTERM: stopped, exit 0, no WARN or ERROR lines"
