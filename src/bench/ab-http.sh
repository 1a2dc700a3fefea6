#!/usr/bin/env bash
# Two builds of the service side by side: the same request against jar A and jar B, in alternating
# rounds, and the service CPU per request of each (user + system of its JVM over the requests wrk
# counted). On a machine shared with other work the CPU per request of rounds taken seconds apart
# compares two builds better than their throughput does.
#
#   src/bench/ab-http.sh before.jar after.jar
#   ROUNDS=8 DURATION=10s WARMUP=30s URL_PATH=/api/tofd-setups BODY=api-examples/tofd-setups.json src/bench/ab-http.sh A.jar B.jar
#
# Default request: the lightest calculation request of http-bench.sh (a sampling assessment with
# three inputs). Needs wrk, curl, python3, Java 17.
set -euo pipefail
cd "$(dirname "$0")/../.."
A="$1"; B="$2"
DURATION="${DURATION:-10s}"; WARMUP="${WARMUP:-30s}"; ROUNDS="${ROUNDS:-6}"
URL_PATH="${URL_PATH:-/api/sampling-assessments}"
WORK="$(mktemp -d)"
if [[ -n "${BODY:-}" ]]; then cp "$BODY" "$WORK/body.json"; else
  printf '{"sampling_frequency_mhz": 100, "frequency_mhz": 5, "bandwidth_percent": 60}\n' >"$WORK/body.json"; fi
free_port() { python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1",0)); print(s.getsockname()[1])'; }
PIDS=()
cleanup() { local rc=$?; for p in "${PIDS[@]}"; do kill "$p" 2>/dev/null || true; wait "$p" 2>/dev/null || true; done; rm -rf "$WORK"; exit "$rc"; }
trap cleanup EXIT
declare -A PORT PID
for side in A B; do
  jar="${!side}"; PORT[$side]="$(free_port)"
  # shellcheck disable=SC2086
  java ${JAVA_OPTS:-} -jar "$jar" --server.port="${PORT[$side]}" --server.address=127.0.0.1 >"$WORK/$side.log" 2>&1 &
  PID[$side]=$!; PIDS+=("$!")
  until curl -fsS -o /dev/null "http://127.0.0.1:${PORT[$side]}/actuator/health/readiness" 2>/dev/null; do
    kill -0 "${PID[$side]}" 2>/dev/null || { cat "$WORK/$side.log" >&2; exit 1; }; sleep 0.2
  done
done
run() { BENCH_METHOD=POST BENCH_BODY_FILE="$WORK/body.json" wrk -t2 -c32 -d"$2" --timeout 5s \
  -s src/bench/wrk-report.lua "http://127.0.0.1:${PORT[$1]}$URL_PATH" | grep '^RESULT'; }
ticks() { awk '{print $14 + $15}' "/proc/${PID[$1]}/stat"; }
echo "A=$A B=$B $URL_PATH; warm-up $WARMUP each, $ROUNDS rounds of $DURATION each; load $(cut -d' ' -f1-3 /proc/loadavg)"
run A "$WARMUP" >/dev/null; run B "$WARMUP" >/dev/null
for r in $(seq 1 "$ROUNDS"); do
  order="A B"; ((r % 2)) || order="B A"
  for side in $order; do
    t0=$(ticks "$side"); read -r _ rps _ p99 requests _ _ <<<"$(run "$side" "$DURATION")"; t1=$(ticks "$side")
    printf '%s\t%s\t%s\t%s\t%s\n' "$r" "$side" "$rps" "$p99" "$(python3 -c "print(($t1 - $t0) * 1e4 / max(1, $requests))")" \
      | tee -a "$WORK/results"
  done
done
echo "load after: $(cut -d' ' -f1-3 /proc/loadavg)"
python3 - "$WORK/results" <<'PY'
import sys, statistics as st
rows = [l.split("\t") for l in open(sys.argv[1])]
by = {s: [(float(r[2]), float(r[3]), float(r[4])) for r in rows if r[1] == s] for s in "AB"}
for s in "AB":
    print(f"{s}: req/s median {st.median(x[0] for x in by[s]):8.0f}  p99 worst {max(x[1] for x in by[s]):7.2f} ms"
          f"  CPU us/request median {st.median(x[2] for x in by[s]):6.1f}  per round " + " ".join(f"{x[2]:.0f}" for x in by[s]))
ratios = [b[2] / a[2] for a, b in zip(by["A"], by["B"])]
print(f"B/A CPU per request, per round: " + " ".join(f"{x:.2f}" for x in ratios) + f"; median {st.median(ratios):.2f}")
PY
