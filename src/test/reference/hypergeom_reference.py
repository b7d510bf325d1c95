#!/usr/bin/python3
"""Reference values for org.assay.stats.FinitePopulation.

Run with /usr/bin/python3 (Debian python3-scipy). Writes
src/test/resources/reference/hypergeom_reference.json with inputs and expected outputs.

Notation (ours): a simple random sample of n items without replacement from a finite test set of
N items, K of them successes; k successes in the sample. scipy.stats.hypergeom(M, n, N) spells
these hypergeom(M=N, n=K, N=n).

- pmf/cdf/sf: scipy.stats.hypergeom.pmf/cdf/sf (sf(k) = P(X > k)).
- quantiles: scipy.stats.hypergeom.ppf (smallest k with P(X <= k) >= q).
- two-sided p-value: min(1, 2*min(P(X<=k), P(X>=k))) from scipy cdf and sf(k-1).
- exact interval: computed here by brute force over a window of integer K (all of 0..N when N
  is small; the window ends are asserted to be rejected) with scipy's vectorised cdf/sf: K is kept when both one-sided tails exceed alpha/2, i.e. neither
  one-sided test at level alpha/2 rejects (finite-population analogue of Clopper-Pearson;
  Wendell & Schmee 1996 JASA 91:825-830; Buonaccorsi 1987 Commun. Statist. Theory Methods).
  The brute-force scan is independent of the binary search used in Java.
"""
import json
import os
import sys

import numpy as np
import scipy
import scipy.stats as st

print("python", sys.version.split()[0], "numpy", np.__version__, "scipy", scipy.__version__)

rng = np.random.default_rng(20240607)

# (N, K, n): population size, successes in the population, sample size.
GRID = [(20, 7, 12), (50, 25, 10), (263, 81, 100), (4000, 3400, 400), (4000, 3880, 400),
        (4000, 2400, 400), (10000, 9500, 2000), (100000, 30000, 5000), (100000, 99000, 1000),
        (100000, 500, 20000)]

distribution = []
for N, K, n in GRID:
    lo = max(0, n - (N - K))
    hi = min(n, K)
    mean = n * K / N
    ks = sorted(set([lo, hi, int(round(mean)), int(round(mean)) - 3, int(round(mean)) + 3,
                     int(rng.integers(lo, hi + 1)), int(rng.integers(lo, hi + 1))]))
    ks = [k for k in ks if lo <= k <= hi]
    for k in ks:
        d = st.hypergeom(N, K, n)
        distribution.append({"N": N, "K": K, "n": n, "k": k,
                             "pmf": float(d.pmf(k)), "cdf": float(d.cdf(k)),
                             "sf": float(d.sf(k)),
                             "two_sided_p_value": float(min(1.0, 2 * min(d.cdf(k), d.sf(k - 1))))})

quantiles = []
for N, K, n in GRID:
    d = st.hypergeom(N, K, n)
    for lo_p, hi_p in [(0.025, 0.975), (0.005, 0.995), (0.25, 0.75)]:
        quantiles.append({"N": N, "K": K, "n": n, "lower_prob": lo_p, "upper_prob": hi_p,
                          "lower": int(d.ppf(lo_p)), "upper": int(d.ppf(hi_p))})


def exact_interval(k, n, N, conf):
    alpha = 1 - conf
    # Scan a window of K around k/n*N (every K when N is small). The kept set is an interval
    # of K, so it suffices to check that the window's ends are rejected or are the ends of 0..N.
    sd = np.sqrt(max(k, 1) * max(n - k, 1) / n) / n * N * np.sqrt((N - n) / max(N - 1, 1))
    centre = k / n * N
    width = int(15 * sd) + 50
    first = max(0, int(centre) - width)
    last = min(N, int(centre) + width)
    Ks = np.arange(first, last + 1)
    upper_tail = st.hypergeom.sf(k - 1, N, Ks, n)   # P(X >= k | K)
    lower_tail = st.hypergeom.cdf(k, N, Ks, n)      # P(X <= k | K)
    keep = (upper_tail > alpha / 2) & (lower_tail > alpha / 2)
    assert first == 0 or not keep[0], "window too narrow at the bottom"
    assert last == N or not keep[-1], "window too narrow at the top"
    kept = Ks[keep]
    assert kept.size == kept.max() - kept.min() + 1, "kept set is not contiguous"
    return int(kept.min()), int(kept.max())


intervals = []
for k, n, N, conf in [(81, 263, 1000, 0.95), (81, 263, 300, 0.95), (15, 148, 2000, 0.90),
                      (0, 20, 100, 0.95), (20, 20, 100, 0.95), (340, 400, 4000, 0.95),
                      (388, 400, 4000, 0.95), (400, 400, 4000, 0.95), (240, 400, 4000, 0.90),
                      (4700, 5000, 100000, 0.95), (12, 12, 12, 0.95), (5, 12, 12, 0.95),
                      (1, 1000, 100000, 0.99)]:
    K_lo, K_hi = exact_interval(k, n, N, conf)
    intervals.append({"k": k, "n": n, "N": N, "confidence": conf,
                      "K_lower": K_lo, "K_upper": K_hi,
                      "lower": K_lo / N, "upper": K_hi / N})

out = {
    "generated_by": "src/test/reference/hypergeom_reference.py with python %s, numpy %s, scipy %s"
                    % (sys.version.split()[0], np.__version__, scipy.__version__),
    "distribution": distribution,
    "quantiles": quantiles,
    "exact_intervals": intervals,
}
path = os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "resources", "reference",
                    "hypergeom_reference.json")
with open(path, "w") as f:
    json.dump(out, f, indent=1)
    f.write("\n")
print("wrote", os.path.normpath(path))
