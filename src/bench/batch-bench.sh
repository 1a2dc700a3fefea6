#!/usr/bin/env bash
# Batch benchmark: rows per second of a CSV batch through POST /api/{calculation}/batch with the
# service's heap capped at 256 MiB, rows in = rows out, and the heap seen by the GC log.
# Targets: src/docs/performance.md.
#
#   src/bench/batch-bench.sh                                   # quantization-assessments, 1,000,000 rows
#   src/bench/batch-bench.sh sampling-assessments 1000000
#   ROWS_WARMUP=50000 JAVA_OPTS='-Xmx256m' src/bench/batch-bench.sh technique-sheet-validations 1000000
#   JFR=1 src/bench/batch-bench.sh quantization-assessments 100000   # + a JFR profile of the measured batch
#   JAR=/tmp/before.jar src/bench/batch-bench.sh sampling-assessments 1000000   # another build (A/B)
#
# The CSV is generated into a temporary directory (never committed) and removed afterwards; the
# answer (CSV, Accept text/csv) is counted as it streams, not stored.
set -euo pipefail
cd "$(dirname "$0")/../.."
CALC="${1:-quantization-assessments}"
ROWS="${2:-1000000}"
ROWS_WARMUP="${ROWS_WARMUP:-100000}"
JAVA_OPTS="${JAVA_OPTS:--Xmx256m}"
PORT="$(python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1",0)); print(s.getsockname()[1])')"
JAR="${JAR:-$(ls target/ut-digitization-service-*.jar 2>/dev/null | grep -v plain | head -1 || true)}"
if [[ -z "$JAR" || "${REBUILD:-0}" == 1 ]]; then
  mvn -B -q -DskipTests package
  JAR="$(ls target/ut-digitization-service-*.jar | grep -v plain | head -1)"
fi
WORK="$(mktemp -d)"
URL="http://127.0.0.1:$PORT/api/$CALC/batch"

python3 src/bench/batch-csv.py "$CALC" "$ROWS_WARMUP" >"$WORK/warmup.csv"
python3 src/bench/batch-csv.py "$CALC" "$ROWS" >"$WORK/body.csv"

# shellcheck disable=SC2086
java $JAVA_OPTS ${JFR:+-XX:FlightRecorderOptions=stackdepth=512} -Xlog:gc:file="$WORK/gc.log" -jar "$JAR" --server.port="$PORT" --server.address=127.0.0.1 \
  >"$WORK/service.log" 2>&1 &
SERVICE=$!
cleanup() { local rc=$?; kill "$SERVICE" 2>/dev/null || true; wait "$SERVICE" 2>/dev/null || true; rm -rf "$WORK"; exit "$rc"; }
trap cleanup EXIT
for _ in $(seq 1 240); do
  curl -fsS -o /dev/null "http://127.0.0.1:$PORT/actuator/health/readiness" 2>/dev/null && break
  kill -0 "$SERVICE" 2>/dev/null || { cat "$WORK/service.log"; exit 1; }
  sleep 0.5
done

# Warm-up (JIT), not measured.
curl -sS -X POST -H 'Content-Type: text/csv' -H 'Accept: text/csv' -T "$WORK/warmup.csv" "$URL" | tail -1 >/dev/null
gc_lines_before=$(wc -l <"$WORK/gc.log")
if [[ "${JFR:-0}" == 1 ]]; then
  mkdir -p target/jfr
  jcmd "$SERVICE" JFR.start name=batch settings=profile >/dev/null
fi

echo "$CALC: $ROWS rows, $(du -h "$WORK/body.csv" | cut -f1) of CSV, service $JAVA_OPTS, $(nproc) cores, load before: $(cut -d' ' -f1-3 /proc/loadavg)"
cpu_before=$(awk '{print $14 + $15}' "/proc/$SERVICE/stat")
start=$(date +%s.%N)
curl -sS -X POST -H 'Content-Type: text/csv' -H 'Accept: text/csv' -T "$WORK/body.csv" "$URL" \
  | tee >(wc -l >"$WORK/lines") | LC_ALL=C grep -cF ',OK,' >"$WORK/ok" || true
end=$(date +%s.%N)
cpu_after=$(awk '{print $14 + $15}' "/proc/$SERVICE/stat")
sleep 0.5
if [[ "${JFR:-0}" == 1 ]]; then
  jcmd "$SERVICE" JFR.stop name=batch filename="$PWD/target/jfr/batch-$CALC.jfr" >/dev/null
  jfr print --json --stack-depth 512 --events jdk.ExecutionSample "target/jfr/batch-$CALC.jfr" >"$WORK/samples.json"
  python3 src/bench/jfr-top.py "$WORK/samples.json" >"target/jfr/batch-$CALC.txt"
fi
lines=$(cat "$WORK/lines"); ok=$(cat "$WORK/ok")
out=$((lines - 1))
python3 - "$start" "$end" "$ROWS" "$out" "$ok" "$WORK/gc.log" "$gc_lines_before" "$SERVICE" \
  "$cpu_before" "$cpu_after" <<'PY'
import re, sys
start, end, rows, out, ok, gclog, skip, pid, cpu0, cpu1 = sys.argv[1:]
seconds = float(end) - float(start)
rows, out, ok, skip = int(rows), int(out), int(ok), int(skip)
cpu = (float(cpu1) - float(cpu0)) / 100.0
print(f"rows in {rows:,}, rows out {out:,}, OK {ok:,}; {seconds:.1f} s: {rows / seconds:,.0f} rows/s; "
      f"rows in = rows out: {'yes' if rows == out else 'NO'}")
print(f"service CPU {cpu:.1f} s (user + system, all threads): {cpu * 1e6 / rows:.1f} us per row, "
      f"{rows / cpu:,.0f} rows per CPU-second")
before, after, total, pauses = [], [], [], []
for line in open(gclog).read().splitlines()[skip:]:
    m = re.search(r"Pause.* (\d+)M->(\d+)M\((\d+)M\) ([\d.]+)ms", line)
    if m:
        before.append(int(m[1])); after.append(int(m[2])); total.append(int(m[3])); pauses.append(float(m[4]))
if before:
    n = len(after)
    print(f"GC during the batch: {n} pauses, heap before GC max {max(before)} MiB, after GC max {max(after)} MiB "
          f"(first {after[0]}, last {after[-1]}), committed max {max(total)} MiB, pause max {max(pauses):.1f} ms")
try:
    hwm = [l for l in open(f"/proc/{pid}/status") if l.startswith("VmHWM")][0].split()[1]
    print(f"process peak RSS {int(hwm) / 1024:.0f} MiB")
except OSError:
    pass
sys.exit(0 if rows == out else 1)  # a lost row fails the run
PY
