#!/usr/bin/env bash
# HTTP benchmark: every endpoint of the service against the bare stack, side by side in one run.
#
# The bare-stack baseline (src/bench/baseline/: the same Spring Boot parent, the webmvc starter
# only, one trivial POST JSON endpoint) and the service run at the same time on two free ports of
# 127.0.0.1 with the same JVM options. wrk measures, in one run:
#   - the baseline's POST /baseline (src/bench/baseline/request.json);
#   - every POST /api/<name> of the service that has a committed example request
#     api-examples/<name>.json (every calculation, the technique sheet, the stamp verification);
#     the examples ask for every optional result, the most work one request of each kind asks for;
#   - POST /api/sampling-assessments with three inputs (the lightest calculation request);
#   - GET /api/materials/water.
# Each is warmed up once, then measured in ROUNDS rounds. In a round every endpoint is measured
# back to back with the baseline (baseline first in odd rounds, second in even ones; endpoints in
# forward order in odd rounds, backward in even ones), and its ratio is its throughput over the
# baseline's of that pair: a drift of the machine's load hits both.
# Targets (src/docs/performance.md): a calculation endpoint at >= 0.8x the bare stack's throughput
# in the same run, p99 < 50 ms at 32 connections.
#
#   src/bench/http-bench.sh        # builds both jars if missing; about 17 minutes with the defaults
#   DURATION=10s WARMUP=5s ROUNDS=2 src/bench/http-bench.sh
#   ONLY='sampling|technique' src/bench/http-bench.sh      # a subset (an extended regex on the labels)
#   CONNECTIONS=32 THREADS=2 JAVA_OPTS='-Xmx512m' src/bench/http-bench.sh
#
# Run time: start-up (about 20 s) + (endpoints + 1) x WARMUP + 2 x ROUNDS x endpoints x DURATION,
# 16 endpoints with the baseline; the script prints its estimate first. The warm-up is long because on a
# loaded machine the JIT compiler needs it: with WARMUP=5s the baseline was still getting faster
# (1,200 to 21,000 requests/s) over the first five pairs of round 1.
# Needs wrk (Debian: apt-get install wrk), curl, python3, Java 17, Maven (offline is enough).
set -euo pipefail
cd "$(dirname "$0")/../.."
BENCH=src/bench
DURATION="${DURATION:-10s}"
WARMUP="${WARMUP:-20s}"
ROUNDS="${ROUNDS:-2}"
CONNECTIONS="${CONNECTIONS:-32}"
THREADS="${THREADS:-2}"
ONLY="${ONLY:-.}"
free_port() { python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1",0)); print(s.getsockname()[1])'; }
PORT="${PORT:-$(free_port)}"
BASELINE_PORT="$(free_port)"
while [[ "$BASELINE_PORT" == "$PORT" ]]; do BASELINE_PORT="$(free_port)"; done

JAR="$(ls target/ut-digitization-service-*.jar 2>/dev/null | grep -v plain | head -1 || true)"
if [[ -z "$JAR" || "${REBUILD:-0}" == 1 ]]; then
  mvn -B -q -DskipTests package
  JAR="$(ls target/ut-digitization-service-*.jar | grep -v plain | head -1)"
fi
BASELINE_JAR="$BENCH/baseline/target/bench-baseline.jar"
if [[ ! -f "$BASELINE_JAR" || "${REBUILD:-0}" == 1 ]]; then
  mvn -B -q -f "$BENCH/baseline/pom.xml" package
fi
BASE="http://127.0.0.1:$PORT"
BASELINE_URL="http://127.0.0.1:$BASELINE_PORT"
WORK="$(mktemp -d)"
SERVICE=""; BASELINE=""
cleanup() {
  local rc=$?
  for p in $SERVICE $BASELINE; do kill "$p" 2>/dev/null || true; wait "$p" 2>/dev/null || true; done
  rm -rf "$WORK"; exit "$rc"
}
trap cleanup EXIT

ms_now() { echo $(($(date +%s%N) / 1000000)); }
wait_ready() { # pid log url [curl args...] -> ms from now to the first 200
  local pid="$1" log="$2" url="$3"; shift 3
  local start; start=$(ms_now)
  until curl -fsS -o /dev/null "$@" "$url" 2>/dev/null; do
    kill -0 "$pid" 2>/dev/null || { cat "$log" >&2; echo "did not start: $url" >&2; exit 1; }
    sleep 0.05
  done
  echo $(($(ms_now) - start))
}

# Started one after the other (so each start-up has the machine to itself), then measured together.
# shellcheck disable=SC2086
java ${JAVA_OPTS:-} -jar "$BASELINE_JAR" --server.port="$BASELINE_PORT" --server.address=127.0.0.1 \
  >"$WORK/baseline.log" 2>&1 &
BASELINE=$!
baseline_start_ms=$(wait_ready "$BASELINE" "$WORK/baseline.log" "$BASELINE_URL/baseline" \
  -H 'Content-Type: application/json' --data @"$BENCH/baseline/request.json")
# shellcheck disable=SC2086
java ${JAVA_OPTS:-} -jar "$JAR" --server.port="$PORT" --server.address=127.0.0.1 >"$WORK/service.log" 2>&1 &
SERVICE=$!
service_start_ms=$(wait_ready "$SERVICE" "$WORK/service.log" "$BASE/actuator/health/readiness")

# label | pid of the JVM that answers | method | url | body file. The first line is the baseline.
ENDPOINTS=("baseline POST /baseline|$BASELINE|POST|$BASELINE_URL/baseline|$BENCH/baseline/request.json")
for example in api-examples/*.json; do
  name="$(basename "$example" .json)"
  [[ "$name" == *.answer || "$name" == openapi ]] && continue
  grep -q "/api/$name\"" "api-examples/$name.sh" 2>/dev/null || continue   # a POST example of its own path
  ENDPOINTS+=("POST /api/$name|$SERVICE|POST|$BASE/api/$name|$example")
done
# The examples ask for every optional result; this is the lightest calculation request (three inputs).
printf '{"sampling_frequency_mhz": 100, "frequency_mhz": 5, "bandwidth_percent": 60}\n' >"$WORK/sampling-light.json"
ENDPOINTS+=("POST /api/sampling-assessments, 3 inputs|$SERVICE|POST|$BASE/api/sampling-assessments|$WORK/sampling-light.json")
ENDPOINTS+=("GET /api/materials/water|$SERVICE|GET|$BASE/api/materials/water|")
selected=("${ENDPOINTS[0]}")
for e in "${ENDPOINTS[@]:1}"; do
  IFS='|' read -r label pid method url body <<<"$e"
  [[ "$label" =~ $ONLY ]] || continue
  status=$(curl -s -o /dev/null -w '%{http_code}' -X "$method" -H 'Accept: application/json' \
    ${body:+-H 'Content-Type: application/json' --data-binary @"$body"} "$url")
  if [[ "$status" == 200 ]]; then selected+=("$e"); else echo "left out: $label answers $status"; fi
done
ENDPOINTS=("${selected[@]}")
n=$((${#ENDPOINTS[@]} - 1))
seconds() { python3 -c "import re,sys; v,u=re.fullmatch(r'([\d.]+)([smh]?)', sys.argv[1]).groups(); print(float(v)*{'':1,'s':1,'m':60,'h':3600}[u])" "$1"; }
estimate=$(python3 -c "print(round(($n + 1) * $(seconds "$WARMUP") + 2 * $ROUNDS * $n * $(seconds "$DURATION")))")

run() { # method url body duration -> RESULT <req/s> <p50 ms> <p99 ms> <requests> <socket errors> <non-2xx/3xx>
  BENCH_METHOD="$1" BENCH_BODY_FILE="$3" \
    wrk -t"$THREADS" -c"$CONNECTIONS" -d"$4" --timeout 5s -s "$BENCH/wrk-report.lua" "$2" | grep '^RESULT'
}
cpu_ticks() { awk '{print $14 + $15}' "/proc/$1/stat"; }  # user + system of a JVM, 1/100 s
measure() { # round index-in-ENDPOINTS pair-index -> one line of $WORK/results
  IFS='|' read -r label pid method url body <<<"${ENDPOINTS[$2]}"
  local before after
  before=$(cpu_ticks "$pid")
  read -r _ rps p50 p99 requests sock status <<<"$(run "$method" "$url" "$body" "$DURATION")"
  after=$(cpu_ticks "$pid")
  printf '%s\t%s\t%s\t%s\t%s\t%s\t%s\t%s\t%s\n' "$1" "$3" "$label" "$rps" "$p50" "$p99" "$requests" \
    "$((sock + status))" "$((after - before))" >>"$WORK/results"
  printf '  round %s  %-42s %8.0f req/s  p50 %6.2f ms  p99 %6.2f ms\n' "$1" "$label" "$rps" "$p50" "$p99"
}

echo "$n endpoints of the service and the baseline; wrk -t$THREADS -c$CONNECTIONS; warm-up $WARMUP each," \
  "then $ROUNDS rounds of $DURATION per endpoint and $DURATION of the baseline beside each: about $estimate s"
echo "JVM options: '${JAVA_OPTS:-}' (both); $(nproc) cores; load before: $(cut -d' ' -f1-3 /proc/loadavg)"
for i in "${!ENDPOINTS[@]}"; do
  IFS='|' read -r _ _ method url body <<<"${ENDPOINTS[$i]}"
  run "$method" "$url" "$body" "$WARMUP" >/dev/null
done
for r in $(seq 1 "$ROUNDS"); do
  if ((r % 2)); then
    for i in $(seq 1 "$n"); do measure "$r" 0 "$i"; measure "$r" "$i" "$i"; done
  else
    for i in $(seq "$n" -1 1); do measure "$r" "$i" "$i"; measure "$r" 0 "$i"; done
  fi
done
echo "load after: $(cut -d' ' -f1-3 /proc/loadavg)"

python3 - "$WORK/results" "$ROUNDS" "$baseline_start_ms" "$service_start_ms" <<'PY'
import sys
from statistics import mean
path, rounds, start_b, start_s = sys.argv[1], int(sys.argv[2]), int(sys.argv[3]), int(sys.argv[4])
rows = [l.rstrip("\n").split("\t") for l in open(path)]
BASE = rows[0][2]
baseline = {}   # (round, pair) -> the baseline's req/s measured beside that endpoint
data = {}       # label -> list of (round, rps, p50, p99, requests, errors, ticks, pair)
for r, pair, label, rps, p50, p99, req, err, ticks in rows:
    m = (int(r), float(rps), float(p50), float(p99), int(req), int(err), int(ticks), int(pair))
    if label == BASE:
        baseline[m[0], m[7]] = m[1]
    data.setdefault(label, []).append(m)
cpu = lambda ms: sum(m[6] for m in ms) * 1e4 / max(1, sum(m[4] for m in ms))  # us per request
base_cpu = cpu(data[BASE])
print()
print(f"{'endpoint':<42} {'req/s':>7} {'ratio':>6}  {'per round':<17} {'p50 ms':>7} {'p99 ms':>7} "
      f"{'CPU us/r':>8} {'CPU ratio':>9} {'errors':>6}")
for label, ms in data.items():
    if label == BASE:
        ratio, rounds_text = 1.0, ""
    else:
        per = [m[1] / baseline[m[0], m[7]] for m in ms]
        ratio, rounds_text = mean(per), " ".join(f"{p:.2f}" for p in per)
    print(f"{label:<42} {mean(m[1] for m in ms):7.0f} {ratio:5.2f}x  {rounds_text:<17} "
          f"{mean(m[2] for m in ms):7.2f} {max(m[3] for m in ms):7.2f} {cpu(ms):8.0f} "
          f"{base_cpu / cpu(ms):8.2f}x {sum(m[5] for m in ms):6d}")
print(f"""
req/s, p50: means over the rounds; p99: the worst round. ratio: throughput over the baseline's
measured back to back with it, mean of the rounds, then each round. CPU us/r: CPU (user + system,
every thread) of the answering JVM per request; CPU ratio: the baseline's CPU per request (all its
measurements) over the endpoint's, less inflated by a loaded machine than req/s.
start-up to the first 200 (one sample each, started one after the other): baseline {start_b} ms,
service {start_s} ms (readiness), {start_s / start_b:.2f}x; src/bench/startup-bench.sh gives medians.
targets: a calculation endpoint at >= 0.8x the bare stack in the same run; p99 < 50 ms at 32 connections""")
PY
