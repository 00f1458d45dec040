#!/usr/bin/env bash
# Load test of statesum on loopback, against a bare Javalin endpoint measured in the same run.
#
#   bench/load.sh [seconds-of-mixed-load]      (default 60)
#
# Phases (every request goes to 127.0.0.1 only; every phase is bounded in time):
#   1. ratio:    a small spectrum request vs the bare endpoint returning fixed JSON, 5 alternating
#                rounds of 6 s each at saturation (wrk, 1 thread, 32 connections), after 30 s of
#                warm-up each (alternating rounds even out the drift of a shared machine);
#   2. mixed:    small (80 %) and medium (20 %) spectrum jobs for 60 s at saturation within the
#                admission limit: every answer must be 200;
#   3. overload: heavy jobs from 256 connections for 15 s, far past the limits, while a probe sends
#                small requests one by one: refusals must be fast 503s with Retry-After, and wrk must
#                see no timeouts;
#   memory:      the JVM runs with a fixed 512 MiB heap; its RSS is sampled every second throughout.
# Results go to bench/results/load-<time>.txt and are printed at the end.
set -euo pipefail
cd "$(dirname "$0")/.."
MIXED_SECONDS="${1:-60}"

if ! command -v wrk >/dev/null; then
    echo "installing wrk from Debian's packages"
    apt-get update -qq && apt-get install -y -qq wrk >/dev/null
fi

mvn -B -q -DskipTests test-compile
mvn -B -q dependency:build-classpath -Dmdep.outputFile=target/bench-classpath.txt -Dmdep.includeScope=test >/dev/null

mkdir -p bench/results
STAMP="$(date -u +%Y%m%dT%H%M%SZ)"
OUT="bench/results/load-$STAMP.txt"
WORK="$(mktemp -d)"
PORTS="$WORK/ports"

STATESUM_MAX_CONCURRENT_JOBS="${STATESUM_MAX_CONCURRENT_JOBS:-2}" \
STATESUM_MAX_QUEUED_REQUESTS="${STATESUM_MAX_QUEUED_REQUESTS:-32}" \
java -Xms512m -Xmx512m -XX:+UseG1GC -cp "target/classes:target/test-classes:$(cat target/bench-classpath.txt)" \
    org.statesum.bench.LoadHarness "$PORTS" >"$WORK/server.log" 2>&1 &
SERVER=$!
SAMPLER=""
cleanup() {
    [ -n "$SAMPLER" ] && kill "$SAMPLER" 2>/dev/null || true
    kill "$SERVER" 2>/dev/null || true
    wait "$SERVER" 2>/dev/null || true
    rm -rf "$WORK"
}
trap cleanup EXIT
for _ in $(seq 1 100); do [ -s "$PORTS" ] && break; sleep 0.2; done
read -r PORT BARE < "$PORTS"
BASE="http://127.0.0.1:$PORT"

# memory sampler: RSS of the server JVM, KiB, once a second
( while kill -0 "$SERVER" 2>/dev/null; do ps -o rss= -p "$SERVER" >> "$WORK/rss"; sleep 1; done ) &
SAMPLER=$!

python3 - "$WORK" <<'PY'
import json, sys
work = sys.argv[1]
small = {"levels": {"energies": [0, 1]}, "energyUnit": "K", "temperatures": {"values": [300]}}
medium = {"levels": {"energies": [i * 12.5 for i in range(200)]}, "energyUnit": "cm-1",
          "temperatures": {"start": 10, "stop": 1000, "count": 100}}
heavy = {"levels": {"energies": [i * 0.37 for i in range(2000)]}, "energyUnit": "K",
         "temperatures": {"start": 1, "stop": 1000, "count": 2000}}
for name, body in (("small", small), ("medium", medium), ("heavy", heavy)):
    open(f"{work}/{name}.json", "w").write(json.dumps(body))
def lua(name, choices):
    bodies = ", ".join("[[" + open(f"{work}/{c}.json").read() + "]]" for c in choices)
    open(f"{work}/{name}.lua", "w").write(f"""
local bodies = {{ {bodies} }}
local requests = {{}}
local n = #bodies
init = function(args)
  -- built here, once wrk knows the URL's path
  for i, b in ipairs(bodies) do
    requests[i] = wrk.format("POST", wrk.path, {{["Content-Type"] = "application/json"}}, b)
  end
  math.randomseed(42)
end
request = function() return requests[math.random(n)] end
""")
lua("small", ["small"])
lua("mixed", ["small"] * 4 + ["medium"])
lua("heavy", ["heavy"])
PY

run_wrk() { # name seconds connections url script
    wrk -t1 -c"$3" -d"$2s" --timeout 10s --latency -s "$WORK/$5.lua" "$4" > "$WORK/$1.wrk" 2>&1 || true
}
rps() { grep -E '^Requests/sec' "$WORK/$1.wrk" | awk '{print $2}'; }
non2xx() { (grep -E 'Non-2xx' "$WORK/$1.wrk" | awk '{print $NF}') || true; }
sockerr() { (grep -E 'Socket errors' "$WORK/$1.wrk" | sed 's/.*Socket errors: //') || true; }

echo "warming up"
run_wrk warm-bare 30 32 "http://127.0.0.1:$BARE/fixed" small
run_wrk warm-small 30 32 "$BASE/v1/spectrum" small
run_wrk warm-mixed 10 16 "$BASE/v1/spectrum" mixed

echo "phase 1: ratio"
BARE_TOTAL=0; SMALL_TOTAL=0
for round in 1 2 3 4 5; do
    run_wrk "bare-$round" 6 32 "http://127.0.0.1:$BARE/fixed" small
    run_wrk "small-$round" 6 32 "$BASE/v1/spectrum" small
    BARE_TOTAL=$(python3 -c "print($BARE_TOTAL + $(rps bare-$round))")
    SMALL_TOTAL=$(python3 -c "print($SMALL_TOTAL + $(rps small-$round))")
done

echo "phase 2: mixed load for ${MIXED_SECONDS}s"
run_wrk mixed "$MIXED_SECONDS" 16 "$BASE/v1/spectrum" mixed

echo "phase 3: overload"
run_wrk overload 15 256 "$BASE/v1/spectrum" heavy &
WRK_OVERLOAD=$!
sleep 3
python3 - "$BASE" "$WORK/small.json" > "$WORK/probe.txt" <<'PY'
import sys, time, urllib.request, urllib.error
base, body = sys.argv[1], open(sys.argv[2], "rb").read()
results = []
for _ in range(40):
    start = time.perf_counter()
    req = urllib.request.Request(base + "/v1/spectrum", data=body, headers={"Content-Type": "application/json"})
    try:
        with urllib.request.urlopen(req, timeout=10) as r:
            status, retry = r.status, r.headers.get("Retry-After")
    except urllib.error.HTTPError as e:
        status, retry = e.code, e.headers.get("Retry-After")
    results.append((status, (time.perf_counter() - start) * 1000, retry))
    time.sleep(0.2)
refused = sorted(ms for s, ms, r in results if s == 503 and r is not None)
served = sorted(ms for s, ms, r in results if s == 200)
other = [s for s, ms, r in results if s not in (200, 503)]
def pct(v, p): return v[min(len(v) - 1, int(p * len(v)))] if v else float("nan")
print(f"probe: {len(refused)} x 503 with Retry-After (median {pct(refused, .5):.1f} ms, max {max(refused) if refused else float('nan'):.1f} ms), "
      f"{len(served)} x 200 (median {pct(served, .5):.1f} ms), other statuses: {other}")
PY
wait "$WRK_OVERLOAD" || true
METRICS="$(curl -s "$BASE/metrics")"
HEAP_MAX="$(printf '%s\n' "$METRICS" | awk '/^jvm_memory_max_bytes\{.*area="heap"/ && $NF > 0 {s += $NF} END {printf "%.0f", s / 1048576}')"
REJECTED="$(printf '%s\n' "$METRICS" | awk '/^statesum_requests_rejected_total\{.*reason="overloaded"/ {print $NF}')"
RSS_MAX="$(sort -n "$WORK/rss" | tail -1)"
RSS_END="$(tail -1 "$WORK/rss")"

{
    echo "statesum load test, $STAMP, $(nproc) cores, load average before: $(cut -d' ' -f1-3 /proc/loadavg)"
    echo "limits: STATESUM_MAX_CONCURRENT_JOBS=${STATESUM_MAX_CONCURRENT_JOBS:-2} STATESUM_MAX_QUEUED_REQUESTS=${STATESUM_MAX_QUEUED_REQUESTS:-32}, heap 512 MiB"
    echo
    echo "phase 1, ratio (5 x 6 s each, 32 connections):"
    for round in 1 2 3 4 5; do
        echo "  round $round: bare $(rps bare-$round) req/s, small spectrum $(rps small-$round) req/s"
    done
    python3 -c "print(f'  small spectrum / bare endpoint = {$SMALL_TOTAL / $BARE_TOTAL:.3f} (target >= 0.7)')"
    echo "  non-2xx in ratio rounds: bare $(for r in 1 2 3 4 5; do non2xx bare-$r; done | paste -sd+ -), small $(for r in 1 2 3 4 5; do non2xx small-$r; done | paste -sd+ -)"
    echo
    echo "phase 2, mixed 80 % small / 20 % medium (200 levels x 100 temperatures), ${MIXED_SECONDS} s, 16 connections:"
    grep -E 'Requests/sec|requests in|Latency  |50%|99%' "$WORK/mixed.wrk" | sed 's/^/  /'
    echo "  non-2xx: $(non2xx mixed) socket errors: $(sockerr mixed)"
    echo
    echo "phase 3, overload: heavy jobs (2000 levels x 2000 temperatures), 256 connections, 15 s:"
    grep -E 'Requests/sec|requests in|Latency  |50%|99%' "$WORK/overload.wrk" | sed 's/^/  /'
    echo "  non-2xx (503): $(non2xx overload), socket errors: $(sockerr overload)"
    echo "  rejected as overloaded (metrics): $REJECTED"
    echo "  $(cat "$WORK/probe.txt")"
    echo
    echo "memory: RSS max $((RSS_MAX / 1024)) MiB, at end $((RSS_END / 1024)) MiB; heap limit $HEAP_MAX MiB"
} | tee "$OUT"
