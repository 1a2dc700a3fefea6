-- wrk script of the HTTP benchmark (src/bench/http-bench.sh): the request comes from the
-- environment (BENCH_METHOD, BENCH_BODY_FILE), and done() prints one machine-readable line:
--   RESULT <requests/s> <p50 ms> <p99 ms> <requests> <socket errors> <non-2xx/3xx>
local method = os.getenv("BENCH_METHOD") or "GET"
local bodyFile = os.getenv("BENCH_BODY_FILE")

wrk.method = method
if bodyFile and bodyFile ~= "" then
  local f = assert(io.open(bodyFile, "rb"))
  wrk.body = f:read("*a")
  f:close()
  wrk.headers["Content-Type"] = "application/json"
end
wrk.headers["Accept"] = "application/json"

function done(summary, latency, requests)
  local seconds = summary.duration / 1e6
  local e = summary.errors
  io.write(string.format("RESULT %.1f %.3f %.3f %d %d %d\n",
    summary.requests / seconds,
    latency:percentile(50) / 1000.0,
    latency:percentile(99) / 1000.0,
    summary.requests,
    e.connect + e.read + e.write + e.timeout,
    e.status))
end
