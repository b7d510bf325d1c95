#!/usr/bin/python3
"""Reference values for paired comparisons of two reproduced rows (org.assay.audit comparisons).

Run with /usr/bin/python3 (Debian python3-statsmodels, python3-sklearn, python3-scipy).
Writes invented test data and src/test/resources/reference/paired_reference.json:

- src/test/resources/paired/ours.csv and baseline.csv: two invented binary classifiers scored on
  the same 240 items (id, label, predicted, score), for the audit end to end; the R script
  paired_delong_reference.R reads them too. From them: the 2x2 table of correct/incorrect and
  statsmodels.stats.contingency_tables.mcnemar(table, exact=True).pvalue (McNemar 1947), the
  accuracy gap, sklearn f1_score(average="macro") of each and sklearn roc_auc_score of each.
- "bootstrap_case": a small three-class case (60 items) and an independent paired bootstrap of
  the macro-F1 difference in numpy (Koehn 2004: the same resampled items for both systems) with
  sklearn f1_score, 20000 resamples: the standard error of the difference, the 2.5% and 97.5%
  percentiles, the share of resamples with a difference <= 0, and the unpaired standard error
  (each system resampled on its own) for contrast.
- "randomization_cases": tiny cases (10-12 items) with the exact paired permutation p-value of
  scipy.stats.permutation_test(permutation_type="samples", n_resamples=inf), which swaps each
  item's pair of outputs in all 2^n ways: approximate randomization made exact (Riezler &
  Maxwell 2005; Noreen 1989). Statistics: macro-F1 difference, accuracy difference, and the
  mean-absolute-error difference of two regressors.
"""
import csv
import json
import os
import sys

import numpy as np
import scipy
import sklearn
import statsmodels
from scipy.stats import permutation_test
from sklearn.metrics import f1_score, mean_absolute_error, roc_auc_score
from statsmodels.stats.contingency_tables import mcnemar

versions = "python %s, numpy %s, scipy %s, scikit-learn %s, statsmodels %s" % (
    sys.version.split()[0], np.__version__, scipy.__version__, sklearn.__version__, statsmodels.__version__)
print(versions)
here = os.path.dirname(os.path.abspath(__file__))
resources = os.path.join(here, "..", "resources")
rng = np.random.default_rng(20040725)

# --- the end-to-end data: "Ours" predicts labels well but ranks poorly; "Baseline" the other way
n = 240
truth = (rng.random(n) < 0.4).astype(int)
pred_a = np.where(rng.random(n) < 0.14, 1 - truth, truth)
pred_b = np.where(rng.random(n) < 0.26, 1 - truth, truth)
score_a = np.round(0.5 * truth + rng.normal(0, 0.6, n), 3)
score_b = np.round(1.5 * truth + rng.normal(0, 0.6, n), 3)
ids = ["item-%03d" % (i + 1) for i in range(n)]
order_b = rng.permutation(n)          # the baseline's file lists the same items in another order


def write(name, order, pred, score):
    with open(os.path.join(resources, "paired", name), "w", newline="") as f:
        w = csv.writer(f, lineterminator="\n")
        w.writerow(["id", "label", "predicted", "score"])
        for i in order:
            w.writerow([ids[i], int(truth[i]), int(pred[i]), "%.3f" % score[i]])


write("ours.csv", range(n), pred_a, score_a)
write("baseline.csv", order_b, pred_b, score_b)
ok_a = pred_a == truth
ok_b = pred_b == truth
table = [[int(np.sum(ok_a & ok_b)), int(np.sum(ok_a & ~ok_b))], [int(np.sum(~ok_a & ok_b)), int(np.sum(~ok_a & ~ok_b))]]
end_to_end = {
    "n": n,
    "table": table,
    "b_ours_only": table[0][1],
    "c_baseline_only": table[1][0],
    "mcnemar_exact_p_value": float(mcnemar(table, exact=True).pvalue),
    "accuracy": [float(np.mean(ok_a)), float(np.mean(ok_b))],
    "macro_f1": [float(f1_score(truth, pred_a, average="macro")), float(f1_score(truth, pred_b, average="macro"))],
    "roc_auc": [float(roc_auc_score(truth, score_a)), float(roc_auc_score(truth, score_b))],
}

# --- a small three-class case for the paired bootstrap
m = 60
t3 = rng.integers(0, 3, m)
a3 = np.where(rng.random(m) < 0.75, t3, rng.integers(0, 3, m))
b3 = np.where(rng.random(m) < 0.8, a3, rng.integers(0, 3, m))      # correlated with a3


def macro(t, p):
    return f1_score(t, p, average="macro", labels=[0, 1, 2], zero_division=0)


resamples = 20000
diffs = np.empty(resamples)
a_only = np.empty(resamples)
b_only = np.empty(resamples)
for r in range(resamples):
    idx = rng.integers(0, m, m)
    diffs[r] = macro(t3[idx], a3[idx]) - macro(t3[idx], b3[idx])
    a_only[r] = macro(t3[idx], a3[idx])
    idx2 = rng.integers(0, m, m)
    b_only[r] = macro(t3[idx2], b3[idx2])
bootstrap_case = {
    "truth": t3.tolist(), "a": a3.tolist(), "b": b3.tolist(),
    "difference": float(macro(t3, a3) - macro(t3, b3)),
    "resamples": resamples,
    "standard_error": float(np.std(diffs, ddof=1)),
    "percentile_2_5": float(np.quantile(diffs, 0.025)),
    "percentile_97_5": float(np.quantile(diffs, 0.975)),
    "share_at_or_below_zero": float(np.mean(diffs <= 0)),
    "unpaired_standard_error": float(np.sqrt(np.var(a_only, ddof=1) + np.var(b_only, ddof=1))),
}

# --- tiny cases for the exact randomization p-value
cases = []
for k, size in enumerate([10, 11, 12]):
    t = rng.integers(0, 3, size)
    a = np.where(rng.random(size) < 0.8, t, rng.integers(0, 3, size))
    b = np.where(rng.random(size) < 0.5, t, rng.integers(0, 3, size))
    for name, stat in [("macro_f1", lambda x, y, t=t: macro(t, x) - macro(t, y)),
                       ("accuracy", lambda x, y, t=t: np.mean(x == t) - np.mean(y == t))]:
        res = permutation_test((a, b), stat, permutation_type="samples", vectorized=False,
                               n_resamples=np.inf, alternative="two-sided")
        cases.append({"name": "%s, %d items" % (name, size), "metric": name, "truth": t.tolist(), "a": a.tolist(),
                      "b": b.tolist(), "statistic": float(res.statistic), "p_value": float(res.pvalue)})
for size in [9, 12]:
    target = np.round(rng.normal(10, 3, size), 2)
    a = np.round(target + rng.normal(0, 1, size), 2)
    b = np.round(target + rng.normal(0.8, 1.5, size), 2)
    res = permutation_test((a, b), lambda x, y, target=target: mean_absolute_error(target, x) - mean_absolute_error(target, y),
                           permutation_type="samples", vectorized=False, n_resamples=np.inf, alternative="two-sided")
    cases.append({"name": "mae, %d items" % size, "metric": "mae", "target": target.tolist(), "a": a.tolist(),
                  "b": b.tolist(), "statistic": float(res.statistic), "p_value": float(res.pvalue)})

out = {
    "generated_by": "src/test/reference/paired_reference.py with " + versions,
    "end_to_end": end_to_end,
    "bootstrap_case": bootstrap_case,
    "randomization_cases": cases,
}
path = os.path.join(resources, "reference", "paired_reference.json")
with open(path, "w") as f:
    json.dump(out, f, indent=1)
    f.write("\n")
print("wrote", os.path.normpath(path))
