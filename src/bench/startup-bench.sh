#!/usr/bin/env bash
# Start-up benchmark: time from `java` to the first 200 on /actuator/health/readiness, for the
# service and for an empty application of the same stack (same parent, same starters and
# dependencies, one @SpringBootApplication class, probes enabled), each plain and with what the
# platform offers: lazy initialization, Spring AOT (built with -Paot, run with
# -Dspring.aot.enabled=true), class data sharing (CDS) of the extracted jar
# (-XX:ArchiveClassesAtExit in a training run, then -XX:SharedArchiveFile), and CDS with AOT.
# Both jars are built with -Paot: an AOT-processed jar runs as a plain one unless AOT is enabled.
# README "Performance": ready within 1.3x the empty application.
#
#   src/bench/startup-bench.sh            # 5 runs per variant, median; about 3 minutes
#   RUNS=9 src/bench/startup-bench.sh
#
# The empty application is generated under $TMPDIR (never committed) and built offline with the
# service's own pom.xml, so both resolve the same dependency versions.
set -euo pipefail
cd "$(dirname "$0")/../.."
ROOT="$PWD"
RUNS="${RUNS:-5}"
TMP="${TMPDIR:-/tmp}/utdigit-startup"
mkdir -p "$TMP"
if [[ ! -f "$TMP/service-aot.jar" || "${REBUILD:-0}" == 1 ]]; then
  mvn -B -q -Paot -DskipTests package >/dev/null
  cp "$(ls target/ut-digitization-service-*.jar | grep -v plain | head -1)" "$TMP/service-aot.jar"
fi
JAR="$TMP/service-aot.jar"

# --- the empty application of the same stack
EMPTY="$TMP/empty-app"
if [[ ! -f "$EMPTY/.aot-built" || "${REBUILD:-0}" == 1 ]]; then
  rm -rf "$EMPTY"
  mkdir -p "$EMPTY/src/main/java/empty" "$EMPTY/src/main/resources"
  sed -e 's|<artifactId>ut-digitization-service</artifactId>|<artifactId>empty-app</artifactId>|' \
      -e '0,/<\/plugins>/s||</plugins><finalName>empty-app</finalName>|' pom.xml >"$EMPTY/pom.xml"
  cat >"$EMPTY/src/main/java/empty/EmptyApplication.java" <<'JAVA'
package empty;

import org.springframework.boot.SpringApplication;
import org.springframework.boot.autoconfigure.SpringBootApplication;

@SpringBootApplication
public class EmptyApplication {
    public static void main(String[] args) {
        SpringApplication.run(EmptyApplication.class, args);
    }
}
JAVA
  printf 'management:\n  endpoint:\n    health:\n      probes:\n        enabled: true\n' \
    >"$EMPTY/src/main/resources/application.yml"
  (cd "$EMPTY" && mvn -B -q -o -Paot -DskipTests package >/dev/null)
  touch "$EMPTY/.aot-built"
fi

# --- extracted layouts and CDS archives (Spring Boot's jarmode tools; one training run each)
extract() { # jar dir
  rm -rf "$2"
  java -Djarmode=tools -jar "$1" extract --destination "$2" >/dev/null
}
train() { # dir archive [java options]
  local dir="$1" archive="$2"; shift 2
  java -XX:ArchiveClassesAtExit="$archive" "$@" -Dspring.context.exit=onRefresh -jar "$dir"/*.jar \
    --server.port=0 >/dev/null 2>&1 || true
}
extract "$JAR" "$TMP/service"
extract "$EMPTY/target/empty-app.jar" "$TMP/empty"
train "$TMP/service" "$TMP/service.jsa"
train "$TMP/empty" "$TMP/empty.jsa"
train "$TMP/service" "$TMP/service-aot.jsa" -Dspring.aot.enabled=true
train "$TMP/empty" "$TMP/empty-aot.jsa" -Dspring.aot.enabled=true

free_port() { python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1",0)); print(s.getsockname()[1])'; }

ready_ms() { # java args... -> ms to the first 200 on readiness
  local port; port="$(free_port)"
  local start; start=$(date +%s%N)
  java "$@" --server.port="$port" --server.address=127.0.0.1 >"$TMP/run.log" 2>&1 &
  local pid=$!
  until curl -fsS -o /dev/null "http://127.0.0.1:$port/actuator/health/readiness" 2>/dev/null; do
    kill -0 "$pid" 2>/dev/null || { cat "$TMP/run.log" >&2; echo "did not start: $*" >&2; return 1; }
    sleep 0.02
  done
  local end; end=$(date +%s%N)
  kill "$pid"; wait "$pid" 2>/dev/null || true
  echo $(((end - start) / 1000000))
}

median() { tr ' ' '\n' | sort -n | awk '{a[NR]=$1} END {print a[int((NR+1)/2)]}'; }

measure() { # label java-args...
  local label="$1"; shift
  local times=()
  for _ in $(seq 1 "$RUNS"); do times+=("$(ready_ms "$@")"); done
  local m; m="$(echo "${times[*]}" | median)"
  printf '%-44s %7s ms   (runs: %s)\n' "$label" "$m" "${times[*]}"
  echo "$m" >"$TMP/last"
}

echo "time to ready (first 200 on /actuator/health/readiness), median of $RUNS; $(nproc) cores, load before: $(cut -d' ' -f1-3 /proc/loadavg)"
measure "empty app, java -jar" -jar "$EMPTY/target/empty-app.jar"; empty=$(cat "$TMP/last")
measure "service, java -jar" -jar "$JAR"; plain=$(cat "$TMP/last")
measure "service, lazy initialization" -jar "$JAR" --spring.main.lazy-initialization=true
measure "empty app, AOT" -Dspring.aot.enabled=true -jar "$EMPTY/target/empty-app.jar"; empty_aot=$(cat "$TMP/last")
measure "service, AOT" -Dspring.aot.enabled=true -jar "$JAR"; aot=$(cat "$TMP/last")
measure "empty app, extracted + CDS" -XX:SharedArchiveFile="$TMP/empty.jsa" -jar "$TMP/empty/empty-app.jar"; empty_cds=$(cat "$TMP/last")
measure "service, extracted + CDS" -XX:SharedArchiveFile="$TMP/service.jsa" -jar "$TMP"/service/*.jar; cds=$(cat "$TMP/last")
measure "empty app, extracted + CDS + AOT" -XX:SharedArchiveFile="$TMP/empty-aot.jsa" -Dspring.aot.enabled=true \
  -jar "$TMP/empty/empty-app.jar"; empty_both=$(cat "$TMP/last")
measure "service, extracted + CDS + AOT" -XX:SharedArchiveFile="$TMP/service-aot.jsa" -Dspring.aot.enabled=true \
  -jar "$TMP"/service/*.jar; both=$(cat "$TMP/last")
python3 - "$empty" "$plain" "$empty_aot" "$aot" "$empty_cds" "$cds" "$empty_both" "$both" <<'PY'
import sys
e, p, ea, a, ec, c, eb, b = map(float, sys.argv[1:])
print(f"service / empty app: plain {p / e:.2f}x, AOT {a / ea:.2f}x, CDS {c / ec:.2f}x, CDS + AOT {b / eb:.2f}x "
      f"(target <= 1.3x)")
print(f"service gain over plain java -jar: AOT {100 * (1 - a / p):.0f} %, CDS {100 * (1 - c / p):.0f} %, "
      f"CDS + AOT {100 * (1 - b / p):.0f} %")
PY
