#!/usr/bin/env bash
# JMH benchmarks: ./src/bench/run-jmh.sh [JMH options], e.g. -p spans=500; BENCH=SelectionBenchmark for the
# choice of a section from the whole W family (default: SolverBenchmark, the solver)
set -euo pipefail
cd "$(dirname "$0")/../.."
./mvnw -q -Pbench -DskipTests test-compile dependency:build-classpath -Dmdep.outputFile=target/bench-classpath.txt -Dmdep.includeScope=test
java -cp "target/test-classes:target/classes:$(cat target/bench-classpath.txt)" org.openjdk.jmh.Main "${BENCH:-SolverBenchmark}" "$@"
