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
- Paired gap range: for printed accuracies p1, p2 on the same n items, the counts
  k = floor(p*n + 0.5), the two ends of the disagreement range worked out here from the 2x2 table
  (fewest discordant items: |k1 - k2|; most: min(k1 + k2, 2n - k1 - k2)), statsmodels mcnemar
  exact p-values at both ends, Connor's (1987) power formula evaluated with scipy.stats.norm, and
  the unpaired proportions_ztest / NormalIndPower values on k1/n, k2/n.
- AUC under the null: the exact variance of the Mann-Whitney AUC (no ties) over all
  C(m + n, m) equally likely rankings, by enumeration; compared in Java with Hanley-McNeil at
  A = 0.5.
"""
import itertools
import json
import math
import os
import sys
import warnings

import numpy as np
import scipy
import scipy.stats as st
import statsmodels
from scipy.optimize import brentq
from statsmodels.stats.contingency_tables import mcnemar
from statsmodels.stats.power import NormalIndPower
from statsmodels.stats.proportion import proportion_effectsize, proportions_ztest

# statsmodels divides by zero on purpose-built edge cases (no discordant pair, both proportions 0);
# the NaN / inf it returns is recorded, so its warnings are noise here.
warnings.filterwarnings("ignore", category=RuntimeWarning)

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

# Paired gap range: the 2x2 table of two systems on n items with k1 and k2 correct.
def connor_power(delta, psi, n, alpha):
    z = st.norm.isf(alpha / 2)
    spread = math.sqrt(psi - delta ** 2)
    if spread == 0:
        return 1.0 if math.sqrt(n) * abs(delta) > z * math.sqrt(psi) else 0.0
    return float(st.norm.cdf((math.sqrt(n) * abs(delta) - z * math.sqrt(psi)) / spread)
                 + st.norm.cdf((-math.sqrt(n) * abs(delta) - z * math.sqrt(psi)) / spread))


def table_end(k1, k2, n, both_right, alpha):
    # both_right items correct for both systems fixes the whole table.
    b = k1 - both_right            # first right, second wrong
    c = k2 - both_right            # second right, first wrong
    both_wrong = n - both_right - b - c
    assert min(b, c, both_right, both_wrong) >= 0
    return {"b": b, "c": c, "disagreement": (b + c) / n,
            "exact_p_value": float(mcnemar([[both_right, b], [c, both_wrong]], exact=True).pvalue),
            "power": connor_power((b - c) / n, (b + c) / n, n, alpha)}


paired_cases = []
for p1, p2, n, alpha in [(0.912, 0.908, 2000, 0.05), (0.94, 0.90, 100, 0.05), (0.5, 0.5, 1000, 0.05),
                         (0.3, 0.1, 250, 0.01), (0.999, 0.95, 1000, 0.05), (0.8764, 0.8712, 3700, 0.05),
                         (0.25, 0.31, 400, 0.05), (1.0, 0.0, 10, 0.05)]:
    k1 = math.floor(p1 * n + 0.5)
    k2 = math.floor(p2 * n + 0.5)
    # Fewest disagreements: as many items right for both as possible, min(k1, k2).
    most = table_end(k1, k2, n, min(k1, k2), alpha)
    # Most disagreements: as few items right for both as possible, max(0, k1 + k2 - n).
    least = table_end(k1, k2, n, max(0, k1 + k2 - n), alpha)
    z, p = proportions_ztest([k1, k2], [n, n])
    pw = NormalIndPower().power(effect_size=proportion_effectsize(k1 / n, k2 / n), nobs1=n,
                                alpha=alpha, ratio=1.0, alternative="two-sided")
    paired_cases.append({"p1": p1, "p2": p2, "n": n, "alpha": alpha, "correct1": k1, "correct2": k2,
                         "most_favourable": most, "least_favourable": least,
                         "unpaired_p_value": finite_or_none(p), "unpaired_power": float(pw)})

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
    "paired_gap_range": paired_cases,
    "null_auc_variance": null_auc,
}
target = os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "resources", "reference",
                      "power_reference.json")
with open(target, "w") as f:
    json.dump(out, f, indent=1, allow_nan=False)
    f.write("\n")
print("wrote", os.path.normpath(target))
