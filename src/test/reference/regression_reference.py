#!/usr/bin/python3
"""Reference values for assay's regression metrics, computed with scikit-learn and scipy.

Run with Debian's interpreter (/usr/bin/python3; packages python3-sklearn, python3-scipy).
Writes src/test/resources/reference/regression_reference.json with the generated inputs (from
a fixed seed) and the expected values; the Java test RegressionMetricsReferenceTest reads it
offline.

For every case the script also draws integer weights (0..3) and computes each metric on the
data with example i repeated weights[i] times (numpy.repeat): assay's value(weights) must equal
that. Bootstrap intervals from scipy.stats.bootstrap are included for a loose comparison only
(the random draws differ from assay's).
"""
import json
import os
import sys
import warnings

import numpy as np
import scipy
import sklearn
from scipy import stats
from sklearn import metrics

OUT = os.path.join(os.path.dirname(__file__), "..", "resources", "reference", "regression_reference.json")


def expected(target, prediction):
    return {
        "mae": float(metrics.mean_absolute_error(target, prediction)),
        "rmse": float(metrics.mean_squared_error(target, prediction, squared=False)),
        "r2": float(metrics.r2_score(target, prediction)),
        "pearson": float(stats.pearsonr(prediction, target)[0]),
        "spearman": float(stats.spearmanr(prediction, target)[0]),
    }


def cases(rng):
    out = []
    # Continuous values rounded to one decimal, so that ties occur in both variables.
    t = np.round(rng.normal(3.0, 2.0, 200), 1)
    out.append(("rounded_200", t, np.round(0.8 * t + rng.normal(0.5, 1.0, 200), 1)))
    # A large offset: naive raw sums of squares would lose most digits here.
    t = 1e6 + rng.normal(0.0, 1.0, 150)
    out.append(("offset_1e6", t, t + rng.normal(0.1, 0.5, 150)))
    t = 1e9 + rng.normal(0.0, 3.0, 120)
    out.append(("offset_1e9", t, 0.5 * t + 5e8 + rng.normal(0.0, 2.0, 120)))
    # Ratings 1..5: heavy ties, the case where mid-ranks matter most.
    t = rng.integers(1, 6, 90).astype(float)
    out.append(("ratings_90", t, np.clip(t + rng.integers(-1, 2, 90), 1, 5).astype(float)))
    # Negative correlation, few examples.
    t = rng.normal(0.0, 1.0, 9)
    out.append(("small_9", t, -t + rng.normal(0.0, 0.3, 9)))
    return out


def bootstrap_intervals(target, prediction, resamples):
    rng = np.random.default_rng(7)
    mae = lambda t, p: np.mean(np.abs(t - p))
    spearman = lambda t, p: stats.spearmanr(p, t)[0]
    out = {}
    for name, fn in (("mae", mae), ("spearman", spearman)):
        for method in ("percentile", "BCa"):
            res = stats.bootstrap((target, prediction), fn, paired=True, vectorized=False,
                                  n_resamples=resamples, confidence_level=0.95, method=method,
                                  random_state=rng)
            out[f"{name}:{method}"] = [float(res.confidence_interval.low), float(res.confidence_interval.high)]
    return out


def main():
    rng = np.random.default_rng(20261207)
    doc_cases = []
    for name, target, prediction in cases(rng):
        weights = rng.integers(0, 4, len(target))
        weights[0] = max(weights[0], 1)
        doc_cases.append({
            "name": name,
            "target": target.tolist(),
            "prediction": prediction.tolist(),
            "expected": expected(target, prediction),
            "weights": weights.tolist(),
            "expected_repeated": expected(np.repeat(target, weights), np.repeat(prediction, weights)),
        })
    # Definition differences, tested as such: a constant target.
    constant_t = np.full(6, 2.5)
    constant_p = np.array([2.0, 2.5, 3.0, 2.4, 2.6, 2.5])
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        degenerate = {
            "target": constant_t.tolist(),
            "prediction": constant_p.tolist(),
            "mae": float(metrics.mean_absolute_error(constant_t, constant_p)),
            "r2_default": float(metrics.r2_score(constant_t, constant_p)),
            "r2_force_finite_false": str(metrics.r2_score(constant_t, constant_p, force_finite=False)),
            "pearson": str(stats.pearsonr(constant_p, constant_t)[0]),
            "spearman": str(stats.spearmanr(constant_p, constant_t)[0]),
        }
    resamples = 20000
    first = doc_cases[0]
    doc = {
        "generated_by": f"sklearn {sklearn.__version__}, scipy {scipy.__version__}, numpy {np.__version__}, "
                        f"python {sys.version.split()[0]}",
        "script": "src/test/reference/regression_reference.py",
        "cases": doc_cases,
        "constant_target": degenerate,
        "bootstrap": {
            "case": first["name"],
            "resamples": resamples,
            "confidence": 0.95,
            "function": "scipy.stats.bootstrap(paired=True, vectorized=False)",
            "intervals": bootstrap_intervals(np.array(first["target"]), np.array(first["prediction"]), resamples),
        },
    }
    with open(OUT, "w") as f:
        json.dump(doc, f, indent=1)
        f.write("\n")
    print(doc["generated_by"])
    print("wrote", os.path.normpath(OUT))


if __name__ == "__main__":
    main()
