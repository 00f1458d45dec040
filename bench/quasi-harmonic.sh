#!/bin/sh
# The quasi-harmonic performance target (15 volumes x 2 016 frequencies x 500 temperatures) against the
# harmonic-crystal baseline with the same number of (mode, temperature) terms, in one JMH run.
# Usage: bench/quasi-harmonic.sh [extra JMH options]
set -eu
cd "$(dirname "$0")/.."
mvn -B -q test-compile dependency:build-classpath -Dmdep.outputFile=target/bench.classpath -Dmdep.includeScope=test
# Other JMH runs may share this machine: the ratio to the baseline, measured in the same run, is the figure.
exec java -Djmh.ignoreLock=true -cp "target/test-classes:target/classes:$(cat target/bench.classpath)" \
    org.openjdk.jmh.Main 'org.statesum.bench.QuasiHarmonicBenchmark' "$@"
