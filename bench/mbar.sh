#!/bin/sh
# MBAR solve time against one log-sum-exp pass over the same 10 x 1e6 matrix, in one run.
# Usage: bench/mbar.sh [pooled samples] [rounds]
set -e
cd "$(dirname "$0")/.."
mvn -B -q -DskipTests compile
mvn -B -q dependency:build-classpath -Dmdep.outputFile=target/bench.classpath -Dmdep.includeScope=runtime
exec java -Xmx2g -cp "target/classes:$(cat target/bench.classpath)" bench/MbarBench.java "$@"
