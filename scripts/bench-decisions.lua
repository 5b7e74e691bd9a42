-- wrk script for scripts/bench-scoring: posts realistic, distinct applications of an invented
-- lender (12 numeric and 8 categorical characteristics) with unique application ids, and prints
-- a machine-readable summary line at the end.
local path = "/"
local token = ""
local threads = {}
local counter = 0
local prefix = ""
local bodies = {}

function setup(thread)
  thread:set("tid", #threads + 1)
  table.insert(threads, thread)
end

function init(args)
  path = args[1]
  token = args[2] or ""
  -- A third argument keeps application ids apart when several wrk processes run at once.
  prefix = (args[3] or "B") .. tostring(tid) .. "-" .. tostring(os.time()) .. "-"
  math.randomseed(tid * 7919 + os.time())
  local categories = { "owner", "mortgage", "tenant", "with-family", "other" }
  for b = 1, 256 do
    local parts = {}
    for i = 0, 11 do
      table.insert(parts, string.format('"numeric%02d":%d', i, math.random(0, 110)))
    end
    for i = 0, 7 do
      table.insert(parts, string.format('"category%02d":"%s"', i, categories[math.random(1, 5)]))
    end
    bodies[b] = '","applicationDate":"2026-01-15","characteristics":{' .. table.concat(parts, ",") .. "}}"
  end
end

function request()
  counter = counter + 1
  local body = '{"applicationId":"' .. prefix .. counter .. bodies[(counter % 256) + 1]
  local headers = { ["Content-Type"] = "application/json" }
  if token ~= "" then
    headers["Authorization"] = "Bearer " .. token
  end
  return wrk.format("POST", path, headers, body)
end

function done(summary, latency, requests)
  io.write(string.format("SUMMARY requests=%d non2xx=%d socket_errors=%d p50_us=%d p99_us=%d duration_us=%d\n",
    summary.requests, summary.errors.status,
    summary.errors.connect + summary.errors.read + summary.errors.write + summary.errors.timeout,
    latency:percentile(50), latency:percentile(99), summary.duration))
end
