#!/usr/bin/env bash
# Start-up of whole assay processes through the ./assay launcher, with and without its class-data
# sharing archive (ASSAY_CDS=off), alternating runs: `assay --version` (JVM start, picocli, jar) and a
# small audit (the birdcalls demo with --resamples 2000, written to a fresh folder each run), plus the
# bare JVM (`java -version`) as the floor. Prints the median wall time of each and the ratios.
# Usage: bash src/bench/startup.sh [runs]        (default 15 runs of each)
# Needs Java 17 and Maven; the first call builds the jar and the archive (not timed).
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
runs=${1:-15}
launcher="$root/assay"
work="$(mktemp -d "${TMPDIR:-/tmp}/assay-startup.XXXXXX")"
trap 'rm -rf "$work"' EXIT
"$launcher" --version > /dev/null           # build the jar and the archive if needed
ASSAY_CDS=off "$launcher" --version > /dev/null

now() { date +%s%N; }
# once LABEL CMD...: one timed run, milliseconds appended to $work/LABEL
once() {
    local label=$1; shift
    local t0; t0=$(now)
    "$@" > /dev/null 2>&1
    echo $(( ($(now) - t0) / 1000000 )) >> "$work/$label"
}
for r in $(seq "$runs"); do
    once jvm java -version
    once version-cds "$launcher" --version
    once version-plain env ASSAY_CDS=off "$launcher" --version
    once demo-cds "$launcher" demo --out "$work/d$r-a" --resamples 2000
    once demo-plain env ASSAY_CDS=off "$launcher" demo --out "$work/d$r-b" --resamples 2000
done
median() { sort -n "$work/$1" | awk '{v[NR] = $1} END {print (NR % 2) ? v[(NR + 1) / 2] : (v[NR / 2] + v[NR / 2 + 1]) / 2}'; }
jvm=$(median jvm); vc=$(median version-cds); vp=$(median version-plain); dc=$(median demo-cds); dp=$(median demo-plain)
printf 'median of %d runs (ms): java -version %s | assay --version: %s without CDS, %s with (%.2fx) | demo audit: %s without, %s with (%.2fx)\n' \
    "$runs" "$jvm" "$vp" "$vc" "$(echo "$vp / $vc" | bc -l)" "$dp" "$dc" "$(echo "$dp / $dc" | bc -l)"
