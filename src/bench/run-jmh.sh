#!/usr/bin/env bash
# JMH benchmarks of the solver: ./src/bench/run-jmh.sh [JMH options], e.g. -p spans=500
set -euo pipefail
cd "$(dirname "$0")/../.."
./mvnw -q -Pbench -DskipTests test-compile dependency:build-classpath -Dmdep.outputFile=target/bench-classpath.txt -Dmdep.includeScope=test
java -cp "target/test-classes:target/classes:$(cat target/bench-classpath.txt)" org.openjdk.jmh.Main SolverBenchmark "$@"
