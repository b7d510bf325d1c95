#!/usr/bin/env bash
# Runs the JMH benchmarks in src/jmh/java. Usage: bash src/jmh/run.sh [JMH options] [benchmark regex]
# Example: bash src/jmh/run.sh CheckBenchmark
# Results are quoted in DEVELOPERS.md as ratios against the reference benchmark of the same class.
set -euo pipefail
cd "$(dirname "$0")/../.."
mvn -q -B -Pbench -DskipTests test-compile dependency:build-classpath \
    -Dmdep.outputFile=target/bench.classpath -Dmdep.includeScope=test
exec java -cp "target/classes:target/test-classes:$(cat target/bench.classpath)" org.openjdk.jmh.Main "$@"
