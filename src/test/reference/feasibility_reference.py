#!/usr/bin/python3
"""Reference values for assay's granularity checks (RatioFeasibility), computed with scikit-learn.

Run with Debian's interpreter (/usr/bin/python3, package python3-sklearn). Builds concrete
confusion matrices and score vectors, turns each into per-item labels, computes the metric with
scikit-learn, prints the value with Python's own formatting, and writes
src/test/resources/reference/feasibility_sklearn.json. The Java test FeasibilityReferenceTest
checks that each printed value is found feasible on the stated test-set size and that the exact
counts print as the same string.
"""
import json
import os
import sys
from fractions import Fraction

import numpy as np
import sklearn
from sklearn import metrics

OUT = os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "resources", "reference",
                   "feasibility_sklearn.json")


def labels_from_counts(tp, fp, fn, tn):
    y_true = np.array([1] * tp + [0] * fp + [1] * fn + [0] * tn)
    y_pred = np.array([1] * tp + [1] * fp + [0] * fn + [0] * tn)
    return y_true, y_pred


def printed(value):
    # Python formats the binary double exactly, rounding half to even on exact ties.
    return {"fraction_2": format(value, ".2f"), "fraction_3": format(value, ".3f"),
            "percent_1": format(100 * value, ".1f"), "percent_2": format(100 * value, ".2f")}


def binary_cases(rng):
    chosen = [(40, 7, 9, 944), (941, 30, 29, 0), (3, 0, 0, 1), (0, 5, 5, 10), (17, 3, 2, 78),
              (1, 1, 1, 1), (250, 250, 250, 250), (99, 0, 1, 0)]
    for _ in range(12):
        n = int(rng.integers(5, 3000))
        cuts = np.sort(rng.integers(0, n + 1, 3))
        tp, fp, fn, tn = int(cuts[0]), int(cuts[1] - cuts[0]), int(cuts[2] - cuts[1]), int(n - cuts[2])
        chosen.append((tp, fp, fn, tn))
    out = []
    for tp, fp, fn, tn in chosen:
        y_true, y_pred = labels_from_counts(tp, fp, fn, tn)
        n = tp + fp + fn + tn
        case = {"tp": tp, "fp": fp, "fn": fn, "tn": tn, "n": n, "positives": tp + fn}
        if tp + fn > 0:
            v = float(metrics.recall_score(y_true, y_pred, zero_division=0))
            out.append(dict(case, metric="recall", value=v, num=tp, den=tp + fn, printed=printed(v)))
        if tp + fp > 0:
            v = float(metrics.precision_score(y_true, y_pred, zero_division=0))
            out.append(dict(case, metric="precision", value=v, num=tp, den=tp + fp, printed=printed(v)))
        v = float(metrics.f1_score(y_true, y_pred, zero_division=0))
        den = 2 * tp + fp + fn if tp > 0 else 1
        out.append(dict(case, metric="f1", value=v, num=2 * tp, den=den, printed=printed(v)))
    return out


def auc_cases(rng):
    out = []
    for n_pos, n_neg, levels in [(3, 4, 3), (10, 10, 5), (25, 40, 8), (200, 300, 20), (7, 1, 2)]:
        y = np.array([1] * n_pos + [0] * n_neg)
        # few score levels, so that ties occur and U has halves
        scores = rng.integers(0, levels, n_pos + n_neg) + y * rng.integers(0, 2, n_pos + n_neg)
        v = float(metrics.roc_auc_score(y, scores))
        pos, neg = scores[y == 1], scores[y == 0]
        halves = int(sum(2 * int(p > q) + int(p == q) for p in pos for q in neg))
        assert Fraction(halves, 2 * n_pos * n_neg) == Fraction(v).limit_denominator(2 * n_pos * n_neg)
        out.append({"metric": "roc_auc", "positives": n_pos, "negatives": n_neg, "value": v,
                    "num": halves, "den": 2 * n_pos * n_neg, "printed": printed(v)})
    return out


def balanced_cases(rng):
    out = []
    for counts in [[3, 4, 5], [50, 7], [10, 20, 30, 40], [101, 97, 13], [1000, 10, 1]]:
        k = len(counts)
        y_true = np.concatenate([np.full(c, i) for i, c in enumerate(counts)])
        y_pred = y_true.copy()
        flip = rng.random(len(y_true)) < 0.3
        y_pred[flip] = rng.integers(0, k, int(flip.sum()))
        v = float(metrics.balanced_accuracy_score(y_true, y_pred))
        right = [int(((y_true == i) & (y_pred == i)).sum()) for i in range(k)]
        exact = sum(Fraction(r, c) for r, c in zip(right, counts)) / k
        out.append({"metric": "balanced_accuracy", "class_counts": counts, "correct": right, "value": v,
                    "num": exact.numerator, "den": exact.denominator, "printed": printed(v)})
    return out


def main():
    rng = np.random.default_rng(20240611)
    cases = binary_cases(rng) + auc_cases(rng) + balanced_cases(rng)
    doc = {
        "generated_by": "src/test/reference/feasibility_reference.py with scikit-learn " + sklearn.__version__
                        + ", numpy " + np.__version__ + ", Python " + sys.version.split()[0],
        "cases": cases,
    }
    with open(OUT, "w") as f:
        json.dump(doc, f, indent=1)
        f.write("\n")
    print("scikit-learn", sklearn.__version__, "numpy", np.__version__)
    print("wrote", len(cases), "cases to", os.path.normpath(OUT))


if __name__ == "__main__":
    main()
