# Sourced by .ci/run and api-examples/regenerate-*.sh: start the built jar on a port the system
# chooses, wait until it is healthy, and stop it again. Needs bash, curl.
#   service_start [jar] [log]   sets SERVICE_PID, SERVICE_PORT, SERVICE_URL
#                               (SERVICE_JAVA_OPTS: JVM options; SERVICE_ARGS: Spring arguments)
#   service_stop                stops the process started here (and only that one)

service_start() {
    local jar="${1:-}" log="${2:-target/service.log}"
    if [[ -z "$jar" ]]; then
        jar=$(ls target/ut-digitization-service-*.jar 2>/dev/null | grep -v -- '-plain' | head -n 1 || true)
    fi
    if [[ -z "$jar" || ! -f "$jar" ]]; then
        echo "service: no jar in target/; build it first (mvn -B -DskipTests package)" >&2
        return 1
    fi
    mkdir -p "$(dirname "$log")"
    # Port 0: the system picks a free port and the log says which; no race with other services.
    # shellcheck disable=SC2086 # SERVICE_JAVA_OPTS and SERVICE_ARGS are word lists on purpose.
    java ${SERVICE_JAVA_OPTS:-} -jar "$jar" --server.port=0 ${SERVICE_ARGS:-} >"$log" 2>&1 &
    SERVICE_PID=$!
    SERVICE_PORT=""
    local i
    for ((i = 0; i < ${SERVICE_START_TIMEOUT:-240}; i++)); do
        if ! kill -0 "$SERVICE_PID" 2>/dev/null; then
            echo "service: the jar stopped during start-up; its log ($log) ends:" >&2
            tail -n 30 "$log" >&2
            return 1
        fi
        if [[ -z "$SERVICE_PORT" ]]; then
            SERVICE_PORT=$(sed -n 's/.*Tomcat started on port \([0-9][0-9]*\).*/\1/p' "$log" | head -n 1)
        fi
        if [[ -n "$SERVICE_PORT" ]] \
            && curl -fsS "http://127.0.0.1:$SERVICE_PORT/actuator/health/readiness" >/dev/null 2>&1; then
            SERVICE_URL="http://127.0.0.1:$SERVICE_PORT"
            echo "service: ready on $SERVICE_URL (pid $SERVICE_PID, after ${i}s)"
            return 0
        fi
        sleep 1
    done
    echo "service: not ready after ${i}s; its log ($log) ends:" >&2
    tail -n 30 "$log" >&2
    return 1
}

service_stop() {
    if [[ -n "${SERVICE_PID:-}" ]] && kill -0 "$SERVICE_PID" 2>/dev/null; then
        kill "$SERVICE_PID" 2>/dev/null || true
        local i
        for ((i = 0; i < 40; i++)); do
            kill -0 "$SERVICE_PID" 2>/dev/null || break
            sleep 0.5
        done
        kill -9 "$SERVICE_PID" 2>/dev/null || true
        wait "$SERVICE_PID" 2>/dev/null || true
    fi
    SERVICE_PID=""
}
