#!/usr/bin/python3
"""Reference values for org.assay.stats TwoProportionTest, McNemarTest and HanleyMcNeil.

Run with /usr/bin/python3 (Debian python3-statsmodels, python3-scipy). Writes
src/test/resources/reference/power_reference.json; the Java tests read inputs and expected
outputs from it.

- McNemar: statsmodels.stats.contingency_tables.mcnemar on the table [[a, b], [c, d]] (only the
  off-diagonal b, c matter), exact=True, and exact=False with correction=True / False. Where
  statsmodels returns NaN (no discordant pairs, chi-square form) the JSON holds null.
- Unpaired two-proportion z-test: statsmodels.stats.proportion.proportions_ztest([k1, k2],
  [n1, n2]) (pooled variance, two-sided).
- Power: statsmodels.stats.power.NormalIndPower().power(effect_size=proportion_effectsize(p1, p2),
  nobs1=n1, alpha=alpha, ratio=n2/n1, alternative="two-sided") (Cohen's h).
- Minimal detectable difference: the p2 > p whose power above equals the target, found with
  scipy.optimize.brentq on that statsmodels power function over h, then p2 from h.
- AUC under the null: the exact variance of the Mann-Whitney AUC (no ties) over all
  C(m + n, m) equally likely rankings, by enumeration; compared in Java with Hanley-McNeil at
  A = 0.5.
"""
import itertools
import json
import math
import os
import sys

import numpy as np
import scipy
import statsmodels
from scipy.optimize import brentq
from statsmodels.stats.contingency_tables import mcnemar
from statsmodels.stats.power import NormalIndPower
from statsmodels.stats.proportion import proportion_effectsize, proportions_ztest

print("python", sys.version.split()[0], "numpy", np.__version__, "scipy", scipy.__version__,
      "statsmodels", statsmodels.__version__)


def finite_or_none(x):
    x = float(x)
    return x if math.isfinite(x) else None


# McNemar on (b, c): zeros, ties, one-sided extremes, small and large counts.
MCNEMAR_CASES = [(0, 0), (0, 1), (1, 0), (0, 5), (5, 0), (1, 1), (3, 3), (10, 10), (7, 2), (2, 7),
                 (25, 40), (100, 130), (0, 30), (15, 0), (60, 61), (500, 430), (1200, 1300),
                 (40, 90), (3, 17), (0, 60)]
mcnemar_cases = []
for b, c in MCNEMAR_CASES:
    table = [[50, b], [c, 50]]
    mcnemar_cases.append({
        "b": b, "c": c,
        "exact_p_value": finite_or_none(mcnemar(table, exact=True).pvalue),
        "chi_square_corrected_p_value": finite_or_none(mcnemar(table, exact=False, correction=True).pvalue),
        "chi_square_uncorrected_p_value": finite_or_none(mcnemar(table, exact=False, correction=False).pvalue),
    })

# Unpaired z-test on counts; Java recomputes p = k / n, the same double as statsmodels' count / nobs.
ZTEST_CASES = [(1824, 2000, 1816, 2000), (912, 1000, 908, 1000), (94, 100, 88, 100),
               (81, 263, 15, 148), (450, 500, 430, 520), (5, 83, 12, 99), (0, 50, 3, 50),
               (50, 50, 47, 50), (700, 1000, 700, 1000), (9120, 10000, 9080, 10000),
               (30, 40, 10, 40), (0, 40, 0, 40)]
ztest_cases = []
for k1, n1, k2, n2 in ZTEST_CASES:
    z, p = proportions_ztest([k1, k2], [n1, n2])
    ztest_cases.append({"k1": k1, "n1": n1, "k2": k2, "n2": n2, "z": finite_or_none(z),
                        "p_value": finite_or_none(p)})

# Power from Cohen's h.
POWER_CASES = [(0.912, 0.908, 2000, 2000), (0.70, 0.60, 100, 100), (0.5, 0.4, 300, 250),
               (0.94, 0.90, 500, 800), (0.2, 0.25, 1000, 1000), (0.99, 0.98, 5000, 5000),
               (0.3, 0.3, 200, 200), (0.05, 0.15, 60, 40), (0.6, 0.8, 50, 50),
               (0.001, 0.0, 10000, 10000), (1.0, 0.97, 400, 400)]
ALPHAS = [0.05, 0.01]
power_cases = []
for p1, p2, n1, n2 in POWER_CASES:
    for alpha in ALPHAS:
        es = proportion_effectsize(p1, p2)
        pw = NormalIndPower().power(effect_size=es, nobs1=n1, alpha=alpha, ratio=n2 / n1,
                                    alternative="two-sided")
        power_cases.append({"p1": p1, "p2": p2, "n1": n1, "n2": n2, "alpha": alpha,
                            "cohens_h": float(es), "power": float(pw)})

# Minimal detectable difference above p, equal sizes n.
MDD_CASES = [(0.908, 2000, 0.05, 0.8), (0.5, 100, 0.05, 0.8), (0.9, 500, 0.05, 0.9),
             (0.7, 1000, 0.01, 0.8), (0.1, 300, 0.05, 0.5), (0.97, 200, 0.05, 0.8),
             (0.0, 1000, 0.05, 0.8)]
mdd_cases = []
for p, n, alpha, target in MDD_CASES:
    def gap(h):
        return NormalIndPower().power(effect_size=h, nobs1=n, alpha=alpha, ratio=1.0,
                                      alternative="two-sided") - target
    h_max = math.pi - 2 * math.asin(math.sqrt(p))
    if gap(h_max) < 0:
        mdd_cases.append({"p": p, "n": n, "alpha": alpha, "power": target, "difference": None})
        continue
    h = brentq(gap, 0.0, h_max, xtol=1e-15, rtol=4 * np.finfo(float).eps, maxiter=500)
    p2 = math.sin(math.asin(math.sqrt(p)) + h / 2) ** 2
    mdd_cases.append({"p": p, "n": n, "alpha": alpha, "power": target, "cohens_h": h,
                      "difference": p2 - p})

# A p so close to 1 with so few items that no p2 <= 1 reaches the power.
mdd_cases.append({"p": 0.995, "n": 20, "alpha": 0.05, "power": 0.9, "difference": None})
h_max = math.pi - 2 * math.asin(math.sqrt(0.995))
assert NormalIndPower().power(effect_size=h_max, nobs1=20, alpha=0.05, ratio=1.0) < 0.9

# Exact null variance of the AUC (Mann-Whitney U / (m n), continuous scores, no ties).
null_auc = []
for m, n in [(3, 4), (5, 5), (4, 7), (2, 9), (6, 6)]:
    values = []
    for positives in itertools.combinations(range(m + n), m):
        pos = set(positives)
        # Ranks 0..m+n-1; a positive at rank r beats every negative below it.
        u = sum(sum(1 for r2 in range(r) if r2 not in pos) for r in positives)
        values.append(u / (m * n))
    values = np.array(values)
    null_auc.append({"positives": m, "negatives": n, "rankings": len(values),
                     "mean": float(values.mean()), "variance": float(values.var())})

out = {
    "generated_by": "src/test/reference/power_reference.py with python %s, numpy %s, scipy %s, "
                    "statsmodels %s" % (sys.version.split()[0], np.__version__, scipy.__version__,
                                        statsmodels.__version__),
    "mcnemar": mcnemar_cases,
    "proportions_ztest": ztest_cases,
    "normal_ind_power": power_cases,
    "minimal_detectable_difference": mdd_cases,
    "null_auc_variance": null_auc,
}
target = os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "resources", "reference",
                      "power_reference.json")
with open(target, "w") as f:
    json.dump(out, f, indent=1, allow_nan=False)
    f.write("\n")
print("wrote", os.path.normpath(target))
