#!/usr/bin/python3
"""Reference bootstrap intervals from scipy.stats.bootstrap for assay's BootstrapEngine tests.

Run with Debian's interpreter (scipy from python3-scipy):
    /usr/bin/python3 src/test/reference/bootstrap_reference.py
Writes src/test/resources/reference/bootstrap_data.json (the generated inputs, also read by
bootstrap_reference.R) and bootstrap_scipy.json (inputs and outputs).

Bootstrap endpoints are Monte Carlo estimates, so each method is run with 30 seeds at
B = 10,000 and the mean endpoint and its standard deviation across seeds are recorded; the
Java test accepts |ours - mean| <= 4 sd (+ a tiny absolute slack).
"""
import json
import os
import platform
import sys

import numpy as np
import scipy
from scipy import stats

HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.normpath(os.path.join(HERE, "..", "resources", "reference"))
RESAMPLES = 10_000
CONFIDENCE = 0.95
SEEDS = list(range(30))
METHODS = ["percentile", "basic", "BCa"]


def mean(x, axis=-1):
    return np.mean(x, axis=axis)


def ratio_of_sums(x, y, axis=-1):
    return np.sum(x, axis=axis) / np.sum(y, axis=axis)


def make_data():
    rng = np.random.default_rng(20240517)
    # right-skewed values, so percentile and BCa differ visibly
    skewed = np.round(rng.lognormal(mean=0.0, sigma=1.0, size=40), 6)
    # paired data for a ratio of sums (e.g. a micro-averaged rate): n = 30 pairs
    y = np.round(rng.uniform(1.0, 3.0, size=30), 6)
    x = np.round(y * rng.lognormal(mean=-0.4, sigma=0.5, size=30), 6)
    # 0/1 outcomes (a proportion): 45 successes out of 60, in random order
    binary = np.array([1] * 45 + [0] * 15, dtype=float)
    rng.shuffle(binary)
    return {
        "skewed_mean": {"statistic": "mean", "x": skewed.tolist()},
        "paired_ratio": {"statistic": "ratio_of_sums", "x": x.tolist(), "y": y.tolist()},
        "binary_mean": {"statistic": "mean", "x": binary.tolist()},
    }


def run(dataset, method, seed):
    if dataset["statistic"] == "mean":
        data, statistic, paired = (np.array(dataset["x"]),), mean, False
    else:
        data, statistic, paired = (np.array(dataset["x"]), np.array(dataset["y"])), ratio_of_sums, True
    res = stats.bootstrap(data, statistic, n_resamples=RESAMPLES, paired=paired,
                          confidence_level=CONFIDENCE, method=method, vectorized=True,
                          random_state=np.random.default_rng(seed))
    return float(res.confidence_interval.low), float(res.confidence_interval.high), float(res.standard_error)


def main():
    versions = {"python": platform.python_version(), "numpy": np.__version__, "scipy": scipy.__version__}
    print("versions:", versions, "executable:", sys.executable)
    datasets = make_data()
    results = []
    for name, dataset in datasets.items():
        for method in METHODS:
            lows, highs, ses = zip(*(run(dataset, method, s) for s in SEEDS))
            results.append({
                "dataset": name, "method": method,
                "lower_mean": float(np.mean(lows)), "lower_sd": float(np.std(lows, ddof=1)),
                "upper_mean": float(np.mean(highs)), "upper_sd": float(np.std(highs, ddof=1)),
                "standard_error_mean": float(np.mean(ses)), "standard_error_sd": float(np.std(ses, ddof=1)),
                "lower": list(lows), "upper": list(highs),
            })
            print(f"{name:13s} {method:10s} [{np.mean(lows):.6f} +- {np.std(lows, ddof=1):.6f}, "
                  f"{np.mean(highs):.6f} +- {np.std(highs, ddof=1):.6f}]")
    # the quantile rule: numpy.percentile default ("linear", Hyndman-Fan 7) on a fixed sample
    qv = np.round(np.random.default_rng(7).normal(size=23), 6)
    qp = [0.0, 0.001, 0.025, 0.1, 0.5, 0.77, 0.975, 0.999, 1.0]
    quantile_rule = {"values": qv.tolist(), "probabilities": qp,
                     "numpy_percentile_linear": [float(np.percentile(qv, 100 * p)) for p in qp]}
    os.makedirs(OUT, exist_ok=True)
    with open(os.path.join(OUT, "bootstrap_data.json"), "w") as f:
        json.dump({"generated_by": "src/test/reference/bootstrap_reference.py",
                   "versions": versions, "datasets": datasets}, f, indent=1)
        f.write("\n")
    with open(os.path.join(OUT, "bootstrap_scipy.json"), "w") as f:
        json.dump({"generated_by": "src/test/reference/bootstrap_reference.py",
                   "function": "scipy.stats.bootstrap(vectorized=True, paired=True for two samples)",
                   "versions": versions, "resamples": RESAMPLES, "confidence": CONFIDENCE,
                   "seeds": SEEDS, "datasets": datasets, "results": results,
                   "quantile_rule": quantile_rule}, f, indent=1)
        f.write("\n")


if __name__ == "__main__":
    main()
