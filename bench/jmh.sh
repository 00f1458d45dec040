#!/usr/bin/env bash
# Builds the test classes (the JMH benchmarks live in org.statesum.bench, which surefire never runs)
# and runs SpectrumThroughputBenchmark on one core: the spectrum kernel and a bare Math.exp loop over
# the same (level, temperature) pairs. Prints pairs per second and the ratio spectrum / bare exp.
#
# The machine is shared, so its load drifts over a minute. The two benchmarks are therefore run in
# ROUNDS short rounds (default 5), each round measuring both back to back; the ratio is taken per
# round and the median over rounds is reported. A cross-check then times the same two computations
# by thread CPU time, alternating at every call (bench/SpectrumCpuRatio.java), which the load of
# other processes does not reach.
#
#   bench/jmh.sh                  5 rounds of 3 x 2 s per benchmark after 3 x 2 s warm-up
#   ROUNDS=9 bench/jmh.sh         more rounds
#   bench/jmh.sh -i 10            extra arguments go to org.openjdk.jmh.Main (every round)
set -euo pipefail
cd "$(dirname "$0")/.."
out=bench/results
rounds=${ROUNDS:-5}
mkdir -p "$out"

mvn -B -q -DskipTests test-compile dependency:build-classpath \
    -Dmdep.includeScope=test -Dmdep.outputFile="$out/classpath.txt"
cp="target/test-classes:target/classes:$(cat "$out/classpath.txt")"

for ((k = 1; k <= rounds; k++)); do
    echo "round $k of $rounds"
    java -cp "$cp" org.openjdk.jmh.Main 'org\.statesum\.bench\.SpectrumThroughputBenchmark' \
        -wi 3 -w 2 -i 3 -r 2 -rf json -rff "$out/jmh-round-$k.json" "$@" > "$out/jmh-round-$k.log"
    grep -E '^SpectrumThroughputBenchmark|^Benchmark ' "$out/jmh-round-$k.log"
done

python3 - "$out" "$rounds" <<'PY'
import json, statistics, sys
out, rounds = sys.argv[1], int(sys.argv[2])
spectrum, bare, ratios, best = [], [], [], {"spectrum": 0.0, "bareExp": 0.0}
for k in range(1, rounds + 1):
    scores = {}
    for r in json.load(open(f"{out}/jmh-round-{k}.json")):
        name = r["benchmark"].rsplit(".", 1)[1]
        scores[name] = r["primaryMetric"]["score"]
        best[name] = max([best[name]] + [x for fork in r["primaryMetric"]["rawData"] for x in fork])
    spectrum.append(scores["spectrum"])
    bare.append(scores["bareExp"])
    ratios.append(scores["spectrum"] / scores["bareExp"])
median = statistics.median(ratios)
print()
print("(level, temperature) pairs per second on one core, 1e5 levels x 100 temperatures")
print(f"  spectrum kernel     median of rounds {statistics.median(spectrum):.3e}, best iteration {best['spectrum']:.3e}")
print(f"  bare Math.exp loop  median of rounds {statistics.median(bare):.3e}, best iteration {best['bareExp']:.3e}")
print("ratio spectrum / bare exp per round: " + " ".join(f"{r:.3f}" for r in ratios))
print(f"ratio of the best iterations (least disturbed by other processes): {best['spectrum'] / best['bareExp']:.3f}")
print(f"median ratio {median:.3f} (target >= 0.5): {'met' if median >= 0.5 else 'MISSED'}")
PY

echo
java -XX:ActiveProcessorCount=1 -Xmx1g -cp "$cp" bench/SpectrumCpuRatio.java
