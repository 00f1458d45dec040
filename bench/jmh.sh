#!/usr/bin/env bash
# Builds the test classes (where the JMH benchmarks live, under org.statesum.bench, which surefire
# never runs) and runs SpectrumThroughputBenchmark on one core, then prints the throughput of the
# spectrum kernel as a fraction of the bare Math.exp loop measured in the same run.
#
#   bench/jmh.sh                 full run (about 1 minute of measurement)
#   bench/jmh.sh -wi 1 -i 2      extra arguments go to org.openjdk.jmh.Main
set -euo pipefail
cd "$(dirname "$0")/.."
out=bench/results
mkdir -p "$out"

mvn -B -q -DskipTests test-compile dependency:build-classpath \
    -Dmdep.includeScope=test -Dmdep.outputFile="$out/classpath.txt"
cp="target/test-classes:target/classes:$(cat "$out/classpath.txt")"

java -cp "$cp" org.openjdk.jmh.Main 'org\.statesum\.bench\.SpectrumThroughputBenchmark' \
    -rf json -rff "$out/jmh.json" "$@"

python3 - "$out/jmh.json" <<'PY'
import json, sys
scores = {r["benchmark"].rsplit(".", 1)[1]: r["primaryMetric"] for r in json.load(open(sys.argv[1]))}
spectrum, bare = scores["spectrum"], scores["bareExp"]
print()
print("pairs per second on one core (levels x temperatures = 1e5 x 100)")
for name, m in (("spectrum kernel", spectrum), ("bare Math.exp loop", bare)):
    print(f"  {name:20s} {m['score']:.4g} +- {m['scoreError']:.2g}")
ratio = spectrum["score"] / bare["score"]
print(f"ratio spectrum / bare exp = {ratio:.3f} (target >= 0.5): {'met' if ratio >= 0.5 else 'MISSED'}")
PY
