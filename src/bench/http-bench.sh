#!/usr/bin/env bash
# HTTP benchmark: a calculation endpoint against a trivial JSON endpoint of the same service,
# side by side in one run with wrk on 127.0.0.1 (README "Performance": a calculation
# at 80 % or more of the trivial endpoint; p99 under 50 ms at 32 connections).
#
#   src/bench/http-bench.sh               # builds the jar if missing, about 3 minutes
#   DURATION=20s WARMUP=10s CONNECTIONS=32 THREADS=2 JAVA_OPTS='-Xmx512m' src/bench/http-bench.sh
#
# Needs wrk (Debian: apt-get install wrk), curl, Java 17. The service runs on a free port of
# 127.0.0.1 and is stopped at the end. Each endpoint is warmed up, then measured in turn.
set -euo pipefail
cd "$(dirname "$0")/../.."
BENCH=src/bench
DURATION="${DURATION:-20s}"
WARMUP="${WARMUP:-20s}"
CONNECTIONS="${CONNECTIONS:-32}"
THREADS="${THREADS:-2}"
PORT="${PORT:-$(python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1",0)); print(s.getsockname()[1])')}"
JAR="$(ls target/ut-digitization-service-*.jar 2>/dev/null | grep -v plain | head -1 || true)"
if [[ -z "$JAR" || "${REBUILD:-0}" == 1 ]]; then
  mvn -B -q -DskipTests package
  JAR="$(ls target/ut-digitization-service-*.jar | grep -v plain | head -1)"
fi
BASE="http://127.0.0.1:$PORT"
WORK="$(mktemp -d)"
LOG="$WORK/service.log"

# shellcheck disable=SC2086
java ${JAVA_OPTS:-} -jar "$JAR" --server.port="$PORT" --server.address=127.0.0.1 >"$LOG" 2>&1 &
SERVICE=$!
cleanup() { local rc=$?; kill "$SERVICE" 2>/dev/null || true; wait "$SERVICE" 2>/dev/null || true; rm -rf "$WORK"; exit "$rc"; }
trap cleanup EXIT
for _ in $(seq 1 240); do
  curl -fsS -o /dev/null "$BASE/actuator/health/readiness" 2>/dev/null && break
  kill -0 "$SERVICE" 2>/dev/null || { cat "$LOG"; echo "the service did not start" >&2; exit 1; }
  sleep 0.5
done

# Request bodies: our own example numbers.
cat >"$WORK/quantization.json" <<'JSON'
{"bit_depth": 12, "signal_height_percent_fsh": 80, "amplitude_tolerance_db": 1,
 "reference_height_percent_fsh": 80, "evaluation_level_db": -6, "averaging": 4}
JSON
cat >"$WORK/sampling.json" <<'JSON'
{"sampling_frequency_mhz": 100, "frequency_mhz": 5, "bandwidth_percent": 60}
JSON
cat >"$WORK/pulse.json" <<'JSON'
{"frequency_mhz": 5, "material": "carbon-steel", "bandwidth_percent": 60, "element_diameter_mm": 10}
JSON

# label | method | path | body file ; the first line is the trivial endpoint the others are compared to
ENDPOINTS=("trivial GET /api/materials/water|GET|/api/materials/water|"
           "trivial GET /actuator/health|GET|/actuator/health|"
           "POST /api/quantization-assessments|POST|/api/quantization-assessments|$WORK/quantization.json")
status=$(curl -s -o /dev/null -w '%{http_code}' -H 'Content-Type: application/json' \
  --data @"$WORK/sampling.json" "$BASE/api/sampling-assessments")
if [[ "$status" == 200 ]]; then
  ENDPOINTS+=("POST /api/sampling-assessments|POST|/api/sampling-assessments|$WORK/sampling.json")
else
  echo "(POST /api/sampling-assessments answers $status here: measuring pulse-parameters instead)"
  ENDPOINTS+=("POST /api/pulse-parameters|POST|/api/pulse-parameters|$WORK/pulse.json")
fi

run() { # method path body duration -> RESULT line; wrk's own CPU seconds in $WORK/wrk-cpu
  BENCH_METHOD="$1" BENCH_BODY_FILE="$3" /usr/bin/time -f '%U %S' -o "$WORK/wrk-cpu" \
    wrk -t"$THREADS" -c"$CONNECTIONS" -d"$4" --timeout 5s -s "$BENCH/wrk-report.lua" "$BASE$2" | grep '^RESULT'
}
service_cpu_ticks() { awk '{print $14 + $15}' "/proc/$SERVICE/stat"; }  # user + system, 1/100 s
worker_cpu_ticks() { # the same over Tomcat's request threads only (no JIT compiler, GC or other threads)
  local total=0 t
  for t in /proc/"$SERVICE"/task/*; do
    if grep -q '^http-nio' "$t/comm" 2>/dev/null; then
      total=$((total + $(awk '{print $14 + $15}' "$t/stat")))
    fi
  done
  echo "$total"
}

for e in "${ENDPOINTS[@]}"; do
  IFS='|' read -r _ method path body <<<"$e"
  curl -fsS -o /dev/null -X "$method" ${body:+-H 'Content-Type: application/json' --data @"$body"} "$BASE$path" \
    || { echo "$method $path does not answer 200" >&2; exit 1; }
  run "$method" "$path" "$body" "$WARMUP" >/dev/null
done

echo "wrk -t$THREADS -c$CONNECTIONS -d$DURATION on $BASE ($(nproc) cores, load before: $(cut -d' ' -f1-3 /proc/loadavg))"
printf '%-36s %7s %7s %7s %6s %6s %9s %9s %8s\n' endpoint 'req/s' 'p50 ms' 'p99 ms' ratio errors 'svc us/r' 'req us/r' 'wrk us/r'
trivial=""; trivial_cpu=""
for e in "${ENDPOINTS[@]}"; do
  IFS='|' read -r label method path body <<<"$e"
  before=$(service_cpu_ticks); wbefore=$(worker_cpu_ticks)
  read -r _ rps p50 p99 requests sock status <<<"$(run "$method" "$path" "$body" "$DURATION")"
  after=$(service_cpu_ticks); wafter=$(worker_cpu_ticks)
  req=$(python3 -c "print(f'{($wafter - $wbefore) * 1e4 / $requests:.0f}')")
  read -r wu ws <"$WORK/wrk-cpu"
  svc=$(python3 -c "print(f'{($after - $before) * 1e4 / $requests:.0f}')")
  wrk_us=$(python3 -c "print(f'{($wu + $ws) * 1e6 / $requests:.0f}')")
  [[ -z "$trivial" ]] && trivial="$rps"
  ratio=$(python3 -c "print(f'{100 * $rps / $trivial:.0f} %')")
  printf '%-36s %7.0f %7.2f %7.2f %6s %6s %9s %9s %8s\n' "$label" "$rps" "$p50" "$p99" "$ratio" \
    "$((sock + status))" "$svc" "$req" "$wrk_us"
  echo "$label|$rps|$svc|$req" >>"$WORK/summary"
done
echo "load after: $(cut -d' ' -f1-3 /proc/loadavg)"
python3 - "$WORK/summary" <<'PY'
import sys
rows = [l.strip().split("|") for l in open(sys.argv[1])]
label0, cpu0, req0 = rows[0][0], float(rows[0][2]), float(rows[0][3])
print(f"ratio: throughput to the first line ({label0}). svc us/r: the service's CPU (user + system, every")
print("thread) per request; req us/r: the same on Tomcat's request threads only; wrk us/r: the load")
print("generator's CPU. CPU figures are not inflated by a loaded machine as wall-clock ones are.")
for label, rps, cpu, req in rows[1:]:
    print(f"  {label}: {100 * cpu0 / float(cpu):.0f} % of the trivial endpoint's requests per service CPU-second, "
          f"{100 * req0 / float(req):.0f} % per request-thread CPU-second")
print("targets: a calculation at >= 80 % of the trivial endpoint; p99 < 50 ms at 32 connections")
PY
