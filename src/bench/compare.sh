#!/usr/bin/env bash
# Side-by-side whole-process benchmark: assay against a reference doing the same computation with
# Debian's Python stack (SciPy's stats.bootstrap, scikit-learn, NLTK) or, for reading a score matrix,
# against `cat FILE > /dev/null`. Issue 7's targets; results are quoted as ratios in DEVELOPERS.md.
#
# Usage: bash src/bench/compare.sh [workload ...]      (default: all, in the order below)
#   workloads: accuracy-1e6 accuracy-1e6-bca roc-auc-2e4 accuracy-2e4 bleu recall
#   REPS=3          repetitions of each side, alternating assay / reference (A B A B ...)
#   BENCH_DIR=DIR   keep the generated data and raw timings in DIR (default: a temporary folder, removed)
#   ASSAY=CMD       how to run assay (default: the ./assay launcher, which runs target/assay.jar)
#
# Needs: Java 17 and Maven (the jar is built once first), and Debian's packages
#   time (for /usr/bin/time -v: wall time and peak resident memory; `apt-get install time` if missing),
#   python3-numpy python3-scipy python3-sklearn python3-nltk python3-pandas (only /usr/bin/python3 sees them).
# Data is invented and seeded (generate.py) and written once per workload; nothing is committed.
# The reference scripts are reference.py (computation) and summarize.py (the table and the checks).
# Run it on an otherwise idle machine: the whole default run takes about half an hour on 2 cores, most
# of it in the reference's bootstraps. CPU time (user + system) is printed beside the wall time: it is
# less disturbed by other work on the machine, and it shows what assay's threads cost (the reference
# runs on one core, assay on all of them).
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
root="$(cd "$here/../.." && pwd)"
py=/usr/bin/python3
reps=${REPS:-3}

if [[ ! -x /usr/bin/time ]]; then
    echo "compare.sh: /usr/bin/time is missing; install Debian's 'time' package (apt-get install time)" >&2
    exit 2
fi
if ! "$py" -c 'import numpy, scipy, sklearn, nltk, pandas' 2>/dev/null; then
    echo "compare.sh: $py lacks numpy/scipy/sklearn/nltk/pandas; apt-get install python3-numpy python3-scipy" \
         "python3-sklearn python3-nltk python3-pandas" >&2
    exit 2
fi

if [[ -n "${BENCH_DIR:-}" ]]; then
    work="$BENCH_DIR"; mkdir -p "$work"
else
    work="$(mktemp -d "${TMPDIR:-/tmp}/assay-compare.XXXXXX")"
    trap 'rm -rf "$work"' EXIT
fi
if [[ "$work$here" == *" "* ]]; then   # the command lines below are split on spaces
    echo "compare.sh: the checkout and BENCH_DIR/TMPDIR must not contain spaces" >&2; exit 2
fi
mkdir -p "$work/out"
: > "$work/runs.tsv"
: > "$work/workloads.tsv"

echo "building the jar ..." >&2
(cd "$root" && mvn -q -B -DskipTests package)
if [[ -n "${ASSAY:-}" ]]; then read -r -a assay <<< "$ASSAY"; else assay=("$root/assay"); fi
"${assay[@]}" --version > /dev/null   # the launcher's one-time work (if any) stays out of the timings

# timed NAME SIDE REP OUT CMD...: runs CMD once under /usr/bin/time -v, stdout to OUT (the reference
# writes its own JSON, so its stdout, and cat's, goes to /dev/null)
timed() {
    local name=$1 side=$2 rep=$3 out=$4; shift 4
    if ! /usr/bin/time -v -o "$work/time.txt" "$@" > "$out" 2> "$work/stderr.txt"; then
        echo "compare.sh: $name ($side) failed:" >&2; cat "$work/stderr.txt" "$work/time.txt" >&2; exit 3
    fi
    local wall rss cpu
    wall=$(sed -n 's/.*Elapsed (wall clock) time.*: //p' "$work/time.txt")
    rss=$(sed -n 's/.*Maximum resident set size (kbytes): //p' "$work/time.txt")
    cpu=$(awk -F': ' '/User time|System time/ {s += $2} END {print s}' "$work/time.txt")
    printf '%s\t%s\t%s\t%s\t%s\t%s\n' "$name" "$side" "$rep" "$wall" "$rss" "$cpu" >> "$work/runs.tsv"
    printf '  %-18s %-9s rep %s: %s wall, %s s CPU, %s KB, load %s\n' "$name" "$side" "$rep" "$wall" "$cpu" "$rss" \
        "$(cut -d' ' -f1 /proc/loadavg)" >&2
}

# pair NAME ASSAY_ARGS REFERENCE_CMD: REPS alternating runs of assay and the reference
pair() {
    local name=$1 assay_args=$2 reference=$3 r
    for r in $(seq "$reps"); do
        # shellcheck disable=SC2086 # the argument strings are ours and split on purpose
        timed "$name" assay "$r" "$work/out/$name-assay.json" "${assay[@]}" $assay_args
        if [[ -n "$reference" ]]; then
            # shellcheck disable=SC2086
            timed "$name" reference "$r" /dev/null $reference
        fi
    done
}

# describe NAME ASSAY_B REFERENCE_B PER_RESAMPLE CHECK_ASSAY CHECK_REFERENCE TEXT (read by summarize.py)
describe() { printf '%s\t%s\t%s\t%s\t%s\t%s\t%s\n' "$@" >> "$work/workloads.tsv"; }

data() {   # data KIND N FILE: generate once
    [[ -f "$work/$3" ]] || { echo "generating $3 ..." >&2; "$py" "$here/generate.py" "$1" "$2" "$work/$3"; }
}

workloads=("$@")
[[ ${#workloads[@]} -gt 0 ]] || workloads=(accuracy-1e6 accuracy-1e6-bca roc-auc-2e4 accuracy-2e4 bleu recall)
measure="measure --format json"
for w in "${workloads[@]}"; do
    echo "== $w" >&2
    case "$w" in
    accuracy-1e6)
        data classification 1000000 c1e6.csv
        describe "$w" 10000 10000 no "$w-assay.json" "$w-reference.json" "accuracy, n=1e6, B=1e4, percentile"
        pair "$w" "$measure $work/c1e6.csv --metric accuracy --interval percentile --resamples 10000" \
            "$py $here/reference.py accuracy $work/c1e6.csv $work/out/$w-reference.json --method percentile --resamples 10000" ;;
    accuracy-1e6-bca)
        data classification 1000000 c1e6.csv
        # SciPy's BCa would need 1e6 leave-one-out means: no reference run; checked against the percentile one
        describe "$w" 10000 - no "$w-assay.json" "accuracy-1e6-reference.json" "accuracy, n=1e6, B=1e4, BCa (assay only)"
        pair "$w" "$measure $work/c1e6.csv --metric accuracy --interval bca --resamples 10000" "" ;;
    roc-auc-2e4)
        data classification 20000 c2e4.csv
        describe "$w" 2000 2000 no "$w-assay.json" "$w-reference.json" "ROC AUC, n=2e4, B=2e3, BCa"
        pair "$w" "$measure $work/c2e4.csv --metric roc_auc --positive 1 --interval bca --resamples 2000" \
            "$py $here/reference.py roc_auc $work/c2e4.csv $work/out/$w-reference.json --method BCa --resamples 2000" ;;
    accuracy-2e4)
        data classification 20000 c2e4.csv
        describe "$w" 2000 2000 no "$w-assay.json" "$w-reference.json" "accuracy, n=2e4, B=2e3, BCa"
        pair "$w" "$measure $work/c2e4.csv --metric accuracy --interval bca --resamples 2000" \
            "$py $here/reference.py accuracy $work/c2e4.csv $work/out/$w-reference.json --method BCa --resamples 2000" ;;
    bleu)
        data generation 100000 g1e5.jsonl
        head -n 10000 "$work/g1e5.jsonl" > "$work/g1e4.jsonl"
        # timed: assay on 1e5 sentences with B=1e3, the reference on 1e4 with B=200 (per resample);
        # checked: assay on the reference's 1e4 sentences with the same B (one untimed run)
        "${assay[@]}" $measure "$work/g1e4.jsonl" --task generation --metric "bleu:tokenize=none" --interval percentile \
            --resamples 200 > "$work/out/$w-check-assay.json"
        describe "$w" 1000 200 yes "$w-check-assay.json" "$w-reference.json" \
            "corpus BLEU bootstrap, percentile: assay 1e5 sentences B=1e3, reference 1e4 sentences B=200"
        pair "$w" "$measure $work/g1e5.jsonl --task generation --metric bleu:tokenize=none --interval percentile --resamples 1000" \
            "$py $here/reference.py bleu $work/g1e4.jsonl $work/out/$w-reference.json --method percentile --resamples 200" ;;
    recall)
        data retrieval 5000 r5000.npy
        # the reference is reading the file; the values are checked against numpy (one untimed run)
        "$py" "$here/reference.py" recall "$work/r5000.npy" "$work/out/$w-reference.json"
        describe "$w" - - no "$w-assay.json" "$w-reference.json" "Recall@1/5/10, 5,000 x 25,000 float32 (500 MB); reference: cat FILE > /dev/null"
        pair "$w" "$measure --task retrieval --scores $work/r5000.npy --group-size 5 --metric recall_at_k --k 1,5,10" \
            "cat $work/r5000.npy" ;;
    *) echo "compare.sh: unknown workload '$w'" >&2; exit 2 ;;
    esac
done

"$py" "$here/summarize.py" "$work"
