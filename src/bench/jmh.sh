#!/usr/bin/env bash
# Runs the JMH benchmarks of the core, the sheet validation and the stamp path (src/jmh/java) and
# prints the table of src/docs/performance.md: benchmark, median, target, met?
#
#   src/bench/jmh.sh                      # the whole suite, about 4 minutes on 2 cores
#   src/bench/jmh.sh 'ClosedForm.*'       # a subset (JMH regular expression)
#   JMH_ARGS='-f 1 -wi 3 -w 1s -i 5 -r 1s -prof gc' src/bench/jmh.sh Stamp
#
# Results: target/jmh-result.json (JMH's own JSON), the table on stdout.
set -euo pipefail
cd "$(dirname "$0")/../.."
args="${JMH_ARGS:--f 1 -wi 3 -w 1s -i 5 -r 1s}"
mvn -B -q -Pjmh -DskipTests test-compile
echo "load average before: $(cut -d" " -f1-3 /proc/loadavg)"
mvn -B -q -Pjmh exec:exec -Djmh.args="$args -rf json -rff target/jmh-result.json ${*:-}"
python3 src/bench/jmh-table.py target/jmh-result.json
echo "($(nproc) cores; load average at the end: $(cut -d" " -f1-3 /proc/loadavg))"
