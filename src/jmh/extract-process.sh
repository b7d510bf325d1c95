#!/usr/bin/env bash
# Whole-process timing of `assay extract` on the corpus's 20-page paper, against a reference run in
# the same loop: `assay --version` (JVM start and jar load, no PDF work). Usage: bash src/jmh/extract-process.sh [runs]
# Quote the result as a ratio (DEVELOPERS.md, Benchmarks); the absolute seconds depend on the machine.
set -euo pipefail
cd "$(dirname "$0")/../.."
runs=${1:-5}
mvn -q -B -DskipTests package
paper=src/test/resources/pdf/long-20pages.pdf
now() { date +%s.%N; }
total_extract=0 total_start=0
for _ in $(seq "$runs"); do
    t0=$(now); java -jar target/assay.jar --version >/dev/null; t1=$(now)
    java -jar target/assay.jar extract "$paper" >/dev/null; t2=$(now)
    total_start=$(echo "$total_start + $t1 - $t0" | bc)
    total_extract=$(echo "$total_extract + $t2 - $t1" | bc)
done
printf 'extract (20 pages, 8 tables): %.2f s per run; reference (JVM start, --version): %.2f s; ratio %.1f\n' \
    "$(echo "$total_extract / $runs" | bc -l)" "$(echo "$total_start / $runs" | bc -l)" \
    "$(echo "$total_extract / $total_start" | bc -l)"
