#!/usr/bin/python3
"""Reference values for the audit of count claims on a random subsample of a finite test set.

For a claim printed with d decimals on a test set of N items, the published count K can be any
integer with K/N in the claim's rounding interval. For k successes in a random subsample of n,
the exact two-sided p-value is the largest over those K of min(1, 2 min(P(X <= k), P(X >= k)))
with X ~ Hypergeometric(N, K, n), and the range a subsample would show if the claim were true
runs from the 2.5% quantile at the smallest K to the 97.5% quantile at the largest K.
Computed here with scipy.stats.hypergeom (Debian python3-scipy); AuditCountClaimTest reads it.
"""
import json
import math
import os
import sys

import scipy
from scipy.stats import hypergeom

OUT = os.path.join(os.path.dirname(__file__), "..", "resources", "reference", "audit_counts.json")

CASES = [
    # (printed, decimals, N, n, k)
    ("88.7", 1, 4000, 400, 342),
    ("88.7", 1, 4000, 400, 371),
    ("91.25", 2, 2000, 250, 214),
    ("75.0", 1, 10000, 1000, 700),
    ("62.3", 1, 5000, 300, 190),
]


def main():
    out = []
    for printed, d, N, n, k in CASES:
        v = float(printed)
        half = 0.5 * 10 ** -d
        lo, hi = (v - half) / 100, (v + half) / 100
        k_min, k_max = math.ceil(lo * N - 1e-9), math.floor(hi * N + 1e-9)
        p = 0.0
        for K in range(k_min, k_max + 1):
            rv = hypergeom(N, K, n)
            p = max(p, min(1.0, 2 * min(rv.cdf(k), rv.sf(k - 1))))
        low = hypergeom(N, k_min, n).ppf(0.025)
        high = hypergeom(N, k_max, n).ppf(0.975)
        out.append({"printed": printed, "N": N, "n": n, "k": k, "K_range": [k_min, k_max],
                    "p_value": p, "range_if_true": [low / n, high / n]})
    doc = {"generated_by": f"scipy {scipy.__version__}, python {sys.version.split()[0]}", "cases": out}
    with open(OUT, "w") as f:
        json.dump(doc, f, indent=1)
    print("wrote", OUT, doc["generated_by"])


if __name__ == "__main__":
    main()
