#!/usr/bin/env bash
# Builds and starts the service jar on a free port with its default limits, then runs
# bench/spectrum_vs_numpy.py against it: a warm POST /v1/spectrum of 1e5 levels x 100 temperatures
# (median of 11 after 3 warm-ups) against NumPy/SciPy on the same data, and one job of 1e6 levels x
# 1000 temperatures. Set SKIP_BUILD=1 to reuse target/statesum.jar.
set -euo pipefail
cd "$(dirname "$0")/.."
mkdir -p bench/results
if [[ -z "${SKIP_BUILD:-}" ]]; then
    mvn -B -q -DskipTests package
fi
port=$(python3 -c 'import socket; s = socket.socket(); s.bind(("127.0.0.1", 0)); print(s.getsockname()[1])')
STATESUM_PORT=$port java -jar target/statesum.jar > bench/results/service.log 2>&1 &
service=$!
trap 'kill "$service" 2>/dev/null || true' EXIT
for _ in $(seq 1 120); do
    curl -fs "http://127.0.0.1:$port/health/ready" > /dev/null && break
    sleep 0.5
done
python3 bench/spectrum_vs_numpy.py "http://127.0.0.1:$port" "$service"
