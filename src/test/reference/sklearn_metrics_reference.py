#!/usr/bin/python3
"""Reference values for assay's classification metrics, computed with scikit-learn.

Run with Debian's interpreter (/usr/bin/python3, package python3-sklearn). Writes
src/test/resources/reference/sklearn_metrics.json with the generated inputs and the
expected values; the Java test ClassificationMetricsReferenceTest reads it offline.
"""
import json
import os
import sys

import numpy as np
import sklearn
from sklearn import metrics

OUT = os.path.join(os.path.dirname(__file__), "..", "resources", "reference", "sklearn_metrics.json")


def case_binary(rng, n):
    truth = rng.integers(0, 2, n)
    # scores rounded to 2 decimals so that ties occur
    scores = np.round(np.clip(rng.normal(0.35 + 0.3 * truth, 0.2), 0, 1), 2)
    predicted = (scores >= 0.5).astype(int)
    probs = np.stack([1 - scores, scores], axis=1)
    return truth, predicted, scores, probs


def case_multiclass(rng, n, k):
    truth = rng.integers(0, k, n)
    logits = rng.normal(0, 1, (n, k))
    logits[np.arange(n), truth] += 1.2
    probs = np.exp(logits) / np.exp(logits).sum(axis=1, keepdims=True)
    predicted = probs.argmax(axis=1)
    return truth, predicted, None, probs


def expected(truth, predicted, scores, probs, k):
    labels = list(range(k))
    out = {
        "accuracy": metrics.accuracy_score(truth, predicted),
        "error_rate": 1 - metrics.accuracy_score(truth, predicted),
        "balanced_accuracy": metrics.balanced_accuracy_score(truth, predicted),
        "mcc": metrics.matthews_corrcoef(truth, predicted),
        "cohen_kappa": metrics.cohen_kappa_score(truth, predicted),
    }
    for name, fn in (("precision", metrics.precision_score), ("recall", metrics.recall_score),
                     ("f1", metrics.f1_score)):
        for avg in ("macro", "micro", "weighted"):
            out[f"{avg}_{name}"] = fn(truth, predicted, average=avg, zero_division=0)
        if k == 2:
            out[name] = fn(truth, predicted, average="binary", pos_label=1, zero_division=0)
    if k == 2:
        out["roc_auc"] = metrics.roc_auc_score(truth, scores)
    else:
        for top in (2, 3):
            out[f"top_k_accuracy:k={top}"] = metrics.top_k_accuracy_score(truth, probs, k=top, labels=labels)
    return {key: float(v) for key, v in out.items()}


def main():
    rng = np.random.default_rng(20261201)
    cases = []
    for name, (truth, predicted, scores, probs), k in (
            ("binary_300", case_binary(rng, 300), 2),
            ("binary_57", case_binary(rng, 57), 2),
            ("multiclass_4x500", case_multiclass(rng, 500, 4), 4),
            ("multiclass_6x120", case_multiclass(rng, 120, 6), 6)):
        cases.append({
            "name": name,
            "classes": k,
            "truth": truth.tolist(),
            "predicted": predicted.tolist(),
            "scores": None if scores is None else scores.tolist(),
            "probabilities": probs.ravel().tolist(),
            "expected": expected(truth, predicted, scores, probs, k),
        })
    doc = {
        "generated_by": f"sklearn {sklearn.__version__}, numpy {np.__version__}, python {sys.version.split()[0]}",
        "script": "src/test/reference/sklearn_metrics_reference.py",
        "cases": cases,
    }
    with open(OUT, "w") as f:
        json.dump(doc, f, indent=1)
    print("wrote", OUT, doc["generated_by"])


if __name__ == "__main__":
    main()
