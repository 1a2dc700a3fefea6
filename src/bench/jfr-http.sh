#!/usr/bin/env bash
# Profiles the service under wrk load with JDK Flight Recorder and prints where the CPU goes:
# the hottest methods by own samples and by samples anywhere on the stack (inclusive).
#
#   src/bench/jfr-http.sh [path] [body-json]        # default: POST /api/quantization-assessments
#   DURATION=30s src/bench/jfr-http.sh /api/materials/water ''
#
# The recording stays in target/jfr/ for JDK Mission Control (jmc) or `jfr print`.
set -euo pipefail
cd "$(dirname "$0")/../.."
PATH_="${1:-/api/quantization-assessments}"
BODY="${2-{\"bit_depth\": 12, \"signal_height_percent_fsh\": 80, \"amplitude_tolerance_db\": 1, \"reference_height_percent_fsh\": 80, \"evaluation_level_db\": -6, \"averaging\": 4\}}"
DURATION="${DURATION:-30s}"
PORT="$(python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1",0)); print(s.getsockname()[1])')"
JAR="$(ls target/ut-digitization-service-*.jar | grep -v plain | head -1)"
mkdir -p target/jfr
NAME="$(echo "$PATH_" | tr -c 'a-z0-9\n' '-' | sed 's/^-*//')"
JFR="target/jfr/$NAME.jfr"
WORK="$(mktemp -d)"
java -XX:FlightRecorderOptions=stackdepth=512 -XX:StartFlightRecording=settings=profile,filename="$JFR",dumponexit=true \
  -jar "$JAR" --server.port="$PORT" --server.address=127.0.0.1 >"$WORK/log" 2>&1 &
SERVICE=$!
cleanup() { local rc=$?; kill "$SERVICE" 2>/dev/null || true; wait "$SERVICE" 2>/dev/null || true; rm -rf "$WORK"; exit "$rc"; }
trap cleanup EXIT
for _ in $(seq 1 240); do
  curl -fsS -o /dev/null "http://127.0.0.1:$PORT/actuator/health/readiness" 2>/dev/null && break
  sleep 0.5
done
if [[ -n "$BODY" ]]; then
  printf '%s' "$BODY" >"$WORK/body.json"
  BENCH_METHOD=POST BENCH_BODY_FILE="$WORK/body.json" wrk -t2 -c32 -d10s -s src/bench/wrk-report.lua "http://127.0.0.1:$PORT$PATH_" >/dev/null
  BENCH_METHOD=POST BENCH_BODY_FILE="$WORK/body.json" wrk -t2 -c32 -d"$DURATION" -s src/bench/wrk-report.lua "http://127.0.0.1:$PORT$PATH_" | grep RESULT
else
  wrk -t2 -c32 -d"$DURATION" -s src/bench/wrk-report.lua "http://127.0.0.1:$PORT$PATH_" | grep RESULT
fi
kill "$SERVICE"; wait "$SERVICE" 2>/dev/null || true
jfr print --json --stack-depth 512 --events jdk.ExecutionSample "$JFR" >"$WORK/samples.json"
python3 src/bench/jfr-top.py "$WORK/samples.json"
echo "recording: $JFR"
