-- wrk script for run-load.sh: the request from the environment, and one parseable RESULT line.
--   DWELLWISE_LOAD_BODY  file with a JSON body: the request is a POST of it; unset: a GET
local body_file = os.getenv("DWELLWISE_LOAD_BODY")
if body_file and body_file ~= "" then
  local f = assert(io.open(body_file, "rb"))
  wrk.method = "POST"
  wrk.body = f:read("*a")
  f:close()
  wrk.headers["Content-Type"] = "application/json"
end

function done(summary, latency, requests)
  local e = summary.errors
  io.write(string.format(
    "RESULT requests=%d seconds=%.1f rps=%.1f p50_ms=%.2f p90_ms=%.2f p99_ms=%.2f max_ms=%.2f " ..
    "errors_status=%d errors_connect=%d errors_read=%d errors_write=%d errors_timeout=%d\n",
    summary.requests, summary.duration / 1e6, summary.requests / (summary.duration / 1e6),
    latency:percentile(50) / 1000, latency:percentile(90) / 1000, latency:percentile(99) / 1000,
    latency.max / 1000, e.status, e.connect, e.read, e.write, e.timeout))
end
