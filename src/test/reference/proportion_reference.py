#!/usr/bin/python3
"""Reference values for org.assay.stats proportion intervals and the binomial test.

Run with /usr/bin/python3 (Debian python3-statsmodels, python3-scipy). Writes
src/test/resources/reference/proportion_reference.json. The Java tests read both the
inputs and the expected outputs from that file.

Intervals: statsmodels.stats.proportion.proportion_confint, methods
normal (Wald), wilson, beta (Clopper-Pearson), jeffreys, agresti_coull.
Binomial test: two-sided p-value defined as min(1, 2*min(P(X<=k), P(X>=k))) computed from
scipy.stats.binom.cdf / sf; quantiles from scipy.stats.binom.ppf.
"""
import json
import os
import sys

import numpy as np
import scipy
import scipy.stats as st
import statsmodels
from statsmodels.stats.proportion import proportion_confint

print("python", sys.version.split()[0], "numpy", np.__version__, "scipy", scipy.__version__,
      "statsmodels", statsmodels.__version__)

CASES = [(81, 263), (15, 148), (0, 20), (1, 29), (29, 29), (94, 100)]
CONFIDENCES = [0.95, 0.90]
METHODS = {"wald": "normal", "wilson": "wilson", "clopper-pearson": "beta",
           "jeffreys": "jeffreys", "agresti-coull": "agresti_coull"}

intervals = []
for k, n in CASES:
    for conf in CONFIDENCES:
        for our_id, sm_id in METHODS.items():
            lo, hi = proportion_confint(k, n, alpha=1 - conf, method=sm_id)
            intervals.append({"successes": k, "trials": n, "confidence": conf,
                              "method": our_id, "statsmodels_method": sm_id,
                              "lower": float(lo), "upper": float(hi)})


def two_sided(k, n, p):
    return min(1.0, 2.0 * min(st.binom.cdf(k, n, p), st.binom.sf(k - 1, n, p)))


binomial_tests = []
for k, n, p in [(81, 263, 0.25), (81, 263, 0.3080), (15, 148, 0.2), (0, 20, 0.05),
                (29, 29, 0.9), (94, 100, 0.97), (940, 1000, 0.95), (5, 25, 0.5),
                (388, 400, 0.97), (340, 400, 0.85)]:
    binomial_tests.append({"successes": k, "trials": n, "p": p,
                           "two_sided_p_value": float(two_sided(k, n, p))})

binomial_quantiles = []
for n, p, lo, hi in [(400, 0.85, 0.025, 0.975), (400, 0.97, 0.025, 0.975),
                     (263, 0.308, 0.05, 0.95), (20, 0.0, 0.025, 0.975),
                     (1000, 0.5, 0.005, 0.995), (10, 0.3, 0.1, 1.0)]:
    # p = 1 is left out: scipy 1.10 binom.ppf(q, n, 1.0) returns 0 instead of n.
    binomial_quantiles.append({"trials": n, "p": p, "lower_prob": lo, "upper_prob": hi,
                               "lower": int(st.binom.ppf(lo, n, p)),
                               "upper": int(st.binom.ppf(hi, n, p))})

out = {
    "generated_by": "src/test/reference/proportion_reference.py with python %s, numpy %s, "
                    "scipy %s, statsmodels %s" % (sys.version.split()[0], np.__version__,
                                                   scipy.__version__, statsmodels.__version__),
    "intervals": intervals,
    "binomial_tests": binomial_tests,
    "binomial_quantiles": binomial_quantiles,
}
path = os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "resources", "reference",
                    "proportion_reference.json")
with open(path, "w") as f:
    json.dump(out, f, indent=1)
    f.write("\n")
print("wrote", os.path.normpath(path))
