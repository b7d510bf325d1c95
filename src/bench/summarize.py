#!/usr/bin/python3
"""Prints the table of src/bench/compare.sh from its work folder: per workload the median wall time of each
side, their ratio, the peak resident memory of each side, both results and whether they agree.

Agreement: the point values must be equal (1e-9: the same data and the same definition); an interval from
exact methods must match to 1e-9; bootstrap interval endpoints must differ by less than 4 Monte Carlo
standard errors of a bootstrap quantile, se * sqrt(p (1 - p)) / phi(z_p) * sqrt(1/B1 + 1/B2) at
p = 0.025 with se the larger bootstrap standard error (the normal approximation of a sample quantile's
standard error, e.g. Efron & Tibshirani 1993, An Introduction to the Bootstrap, sec. 19.3, applied to both runs).
Usage: /usr/bin/python3 summarize.py WORK_DIR
"""
import csv
import json
import math
import os
import statistics
import sys

from scipy.stats import norm


def seconds(text):
    """/usr/bin/time's 'h:mm:ss' or 'm:ss.cc'."""
    total = 0.0
    for part in text.split(":"):
        total = total * 60 + float(part)
    return total


def assay_results(path):
    with open(path, encoding="utf-8") as f:
        doc = json.load(f)
    out = {}
    for m in doc["metrics"]:
        name = m["metric"] + "".join(f":{k}={v}" for k, v in sorted(m["params"].items()) if k == "k")
        out[name] = {"value": m["value"], "lower": m["interval"]["lower"], "upper": m["interval"]["upper"],
                     "standard_error": m["standard_error"], "method": m["interval"]["method"],
                     "resamples": doc["resamples"]}
    return out


def reference_results(path):
    with open(path, encoding="utf-8") as f:
        doc = json.load(f)
    return {r["metric"]: dict(r, resamples=doc["resamples"]) for r in doc["results"]}


def agreement(a, r):
    exact = "bootstrap" not in a["method"] and "bootstrap" not in r["method"]
    dv = abs(a["value"] - r["value"])
    dl = abs(a["lower"] - r["lower"])
    du = abs(a["upper"] - r["upper"])
    if exact:
        tol = 1e-9
        ok = dv <= 1e-9 and dl <= tol and du <= tol
        return ok, f"value Δ {dv:.1e}, ends Δ {max(dl, du):.1e} (exact methods: ≤ 1e-9)"
    p = 0.025
    se = max(a["standard_error"], r["standard_error"])
    tol = 4 * se * math.sqrt(p * (1 - p)) / norm.pdf(norm.ppf(p)) * math.sqrt(1 / a["resamples"] + 1 / r["resamples"])
    ok = dv <= 1e-9 and dl <= tol and du <= tol
    return ok, f"value Δ {dv:.1e}, ends Δ {dl:.1e}/{du:.1e} ≤ {tol:.1e} (4 MC s.e., B {a['resamples']}/{r['resamples']})"


def main():
    work = sys.argv[1]
    runs = {}
    with open(os.path.join(work, "runs.tsv"), encoding="utf-8") as f:
        for name, side, _rep, wall, rss, cpu in csv.reader(f, delimiter="\t"):
            runs.setdefault((name, side), []).append((seconds(wall), int(rss), float(cpu)))
    with open(os.path.join(work, "workloads.tsv"), encoding="utf-8") as f:
        workloads = list(csv.reader(f, delimiter="\t"))
    all_ok = True
    print()
    print("| workload | assay s | reference s | ratio | CPU s assay / reference (ratio) | assay peak MB | reference peak MB "
          "| assay result | reference result | agree |")
    print("|---|---|---|---|---|---|---|---|---|---|")
    notes = []
    for name, b_assay, b_ref, per_resample, check_a, check_r, text in workloads:
        a_runs = runs.get((name, "assay"), [])
        r_runs = runs.get((name, "reference"), [])
        ta = statistics.median(t for t, _, _ in a_runs)
        ca = statistics.median(c for _, _, c in a_runs)
        ma = max(m for _, m, _ in a_runs) / 1024
        tr = statistics.median(t for t, _, _ in r_runs) if r_runs else None
        cr = statistics.median(c for _, _, c in r_runs) if r_runs else None
        mr = max(m for _, m, _ in r_runs) / 1024 if r_runs else None
        if tr is None:
            ratio = "-"
        elif per_resample == "yes":
            pa, pr = ta / int(b_assay), tr / int(b_ref)
            ratio = f"{pr / pa:.0f}× per resample ({pa * 1000:.2f} vs {pr * 1000:.0f} ms)"
        else:
            ratio = f"{tr / ta:.1f}×" if tr >= ta else f"{tr / ta:.2f}× (assay slower)"
        cpu_ratio = "-" if cr is None or per_resample == "yes" else f"{cr / ca:.1f}×" if cr >= ca else f"{cr / ca:.2f}×"
        ra = assay_results(os.path.join(work, "out", check_a))
        rr = reference_results(os.path.join(work, "out", check_r))
        cells_a, cells_r, verdicts = [], [], []
        for metric, x in ra.items():
            y = rr.get(metric)
            cells_a.append(f"{metric} {x['value']:.5f} [{x['lower']:.5f}, {x['upper']:.5f}]")
            if y is None:
                cells_r.append("(none)")
                verdicts.append("no reference")
                continue
            cells_r.append(f"{y['value']:.5f} [{y['lower']:.5f}, {y['upper']:.5f}]")
            ok, why = agreement(x, y)
            all_ok &= ok
            verdicts.append("yes" if ok else "NO")
            notes.append(f"{name} {metric}: {'agree' if ok else 'DISAGREE'}: {why}; {x['method']} vs {y['method']}")
        cpu_cell = f"{ca:.2f}" + ("" if cr is None else f" / {cr:.2f} ({cpu_ratio})")
        print(f"| {name} | {ta:.2f} | {'-' if tr is None else f'{tr:.2f}'} | {ratio} | {cpu_cell} | {ma:.0f} | "
              f"{'-' if mr is None else f'{mr:.0f}'} | {'<br>'.join(cells_a)} | {'<br>'.join(cells_r)} | "
              f"{', '.join(verdicts)} |")
        notes.append(f"{name}: {text}; {len(a_runs)} assay runs, {len(r_runs)} reference runs, medians")
    print()
    for n in notes:
        print("- " + n)
    print()
    print("all results agree within Monte Carlo error" if all_ok else "SOME RESULTS DISAGREE (see above)")
    sys.exit(0 if all_ok else 1)


if __name__ == "__main__":
    main()
