#!/usr/bin/python3
"""Reference values for the `assay measure` command, end to end.

Writes a binary predictions file (src/test/resources/reference/measure_binary.csv) from a
fixed seed, and the values scikit-learn and statsmodels give on it
(measure_python.json). measure_reference.R adds pROC's DeLong values for the same file.
Run with /usr/bin/python3 (Debian python3-sklearn, python3-statsmodels).
"""
import csv
import json
import os
import sys

import numpy as np
import sklearn
import statsmodels
from sklearn import metrics
from statsmodels.stats.proportion import proportion_confint

RES = os.path.join(os.path.dirname(__file__), "..", "resources", "reference")


def main():
    rng = np.random.default_rng(7351)
    n = 731
    truth = rng.binomial(1, 0.42, n)
    score = np.round(1 / (1 + np.exp(-(rng.normal(0, 1.3, n) + 1.6 * truth - 0.5))), 3)
    pred = (score >= 0.5).astype(int)
    path = os.path.join(RES, "measure_binary.csv")
    with open(path, "w", newline="") as f:
        w = csv.writer(f, lineterminator="\n")
        w.writerow(["id", "label", "prediction", "score"])
        for i in range(n):
            w.writerow([f"case{i:04d}", truth[i], pred[i], f"{score[i]:.3f}"])
    k = int((pred == truth).sum())
    out = {
        "generated_by": f"sklearn {sklearn.__version__}, statsmodels {statsmodels.__version__}, "
                        f"numpy {np.__version__}, python {sys.version.split()[0]}",
        "n": n,
        "correct": k,
        "accuracy": metrics.accuracy_score(truth, pred),
        "roc_auc": metrics.roc_auc_score(truth, score),
        "macro_f1": metrics.f1_score(truth, pred, average="macro"),
        "intervals": {},
    }
    for method in ("wilson", "normal", "beta", "jeffreys", "agresti_coull"):
        lo, hi = proportion_confint(k, n, alpha=0.05, method=method)
        out["intervals"][method] = [float(lo), float(hi)]
    with open(os.path.join(RES, "measure_python.json"), "w") as f:
        json.dump(out, f, indent=1)
    print("wrote", path, out["generated_by"])


if __name__ == "__main__":
    main()
