#!/usr/bin/python3
"""Reference values for `assay plan` (org.assay.stats NormalPlan, ExactCountPlan; org.assay.audit ClaimPlanner).

Run with /usr/bin/python3 (Debian python3-statsmodels, python3-scipy, python3-numpy). Writes
src/test/resources/reference/plan_reference.json; the Java tests read inputs and expected outputs.

Notation (ours): a claim printed with d decimals stands for its rounding interval [lo, hi]; the
margin is m; the audit's tests run at level alpha. A subsample of n of the test set's N items has
the standard error se(n) = sigma * sqrt((N - n) / ((N - 1) n)) in the normal approximation, that is
sigma / sqrt(n_eff) with n_eff = n (N - 1) / (N - n); sizes found on the n_eff scale are turned
back into n with n = n_eff N / (N - 1 + n_eff) (Cochran, Sampling Techniques, 3rd ed. 1977, 4.4).

- normal: statsmodels.stats.power.NormalIndPower (ratio=0, the one-sample z-test) for the power to
  find a true value theta discrepant, as the sum of its two one-sided tails (alternative="larger",
  alpha/2, effect sizes (lo - theta)/sigma and (theta - hi)/sigma); with lo == hi the same is the
  two-sided power, and zt_ind_solve_power gives the sample size directly. Sizes for a rounding
  interval come from scipy.optimize.brentq on that statsmodels power. Half-width sizes from
  statsmodels.stats.proportion.samplesize_confint_proportion. Agreement (two one-sided tests) from
  statsmodels.stats.proportion.power_ztost_prop(dist="norm", discrete=False, variance_prop=p);
  "consistent" (agreement and not discrepant) from scipy.stats.norm, from the definition.
- hanley_mcneil: ROC AUC with the Hanley & McNeil (1982) standard error at expected class sizes
  n * share, written out here from the paper's formula; powers as above, the agreement power from
  statsmodels' _power_ztost (it takes the variances directly); sizes by brentq.
- binomial_limit: N = 2e9, where the hypergeometric count is binomial to about n/N. Discrepancy
  power from statsmodels binom_test_reject_interval (two-sided, at lo for the lower cut and at hi
  for the upper) summed with scipy.stats.binom; agreement power from statsmodels power_binom_tost.
- hypergeometric: brute force at finite N over whole arrays of the hypergeometric pmf (from
  scipy.special.gammaln, asserted equal to scipy.stats.hypergeom.pmf to 1e-9 on sample arrays; the
  scipy.stats version is too slow for thousands of arrays) and their cumulative sums. A count k is
  discrepant when min(1, 2 min(P(X <= k | K), P(X >= k | K))) < alpha for every K of the claim; the
  exact interval keeps every K, scanned one by one over a window whose ends are rejected, with both
  one-sided tails above the tail level; a count agrees when that 1 - 2 alpha interval lies in
  [lo - m - 1e-12, hi + m + 1e-12]; consistent = agrees and not discrepant. Powers are sums of the
  pmf over those counts.
- acceptance: the sizes for `assay plan --metric accuracy --claim 87.4 --test-size 4000 --margin 1`
  from a scan of every n from N downward (the first n that misses a target, plus one), with the
  discrepant counts as above and the agreement test and the interval through the monotonicity of
  the hypergeometric tails in K (bisection over K).
- pilot: an invented regression pilot (seeded numpy draws, written to
  src/test/resources/plan/pilot-regression.csv); MAE's per-item spread is the plug-in standard
  deviation of |target - prediction| (numpy), and the three sizes follow as in "normal".
"""
import csv
import json
import math
import os
import sys
import warnings
from decimal import Decimal

import numpy as np
import scipy
import scipy.stats as st
import statsmodels
from scipy.optimize import brentq
from scipy.special import gammaln
from statsmodels.stats.power import NormalIndPower, zt_ind_solve_power
from statsmodels.stats.proportion import (_power_ztost, binom_test_reject_interval, power_binom_tost,
                                          power_ztost_prop, samplesize_confint_proportion)

warnings.filterwarnings("ignore", category=RuntimeWarning)
warnings.filterwarnings("ignore", message="no overlap, power is zero")

print("python", sys.version.split()[0], "numpy", np.__version__, "scipy", scipy.__version__,
      "statsmodels", statsmodels.__version__)

HERE = os.path.dirname(os.path.abspath(__file__))
POWER = NormalIndPower()


def n_eff(n, N):
    return n * (N - 1) / (N - n)


def n_from_eff(e, N):
    return e * N / (N - 1 + e)


def detect_power(theta, lo, hi, sigma, nobs, alpha):
    """Both one-sided tails of the discrepancy test, each a statsmodels one-sample z power (se = sigma / sqrt(nobs))."""
    near = POWER.power(effect_size=(lo - theta) / sigma, nobs1=nobs, alpha=alpha / 2, ratio=0, alternative="larger")
    far = POWER.power(effect_size=(theta - hi) / sigma, nobs1=nobs, alpha=alpha / 2, ratio=0, alternative="larger")
    return float(near + far)


def consistent_power(theta, lo, hi, m, se, alpha):
    z1 = st.norm.isf(alpha)
    z2 = st.norm.isf(alpha / 2)
    low = max(lo - m + z1 * se, lo - z2 * se)
    high = min(hi + m - z1 * se, hi + z2 * se)
    return 0.0 if low > high else float(st.norm.cdf((high - theta) / se) - st.norm.cdf((low - theta) / se))


def smallest_n(meets_real, N):
    """Smallest integer n in [1, N] with meets(n), for a condition monotone in n: brentq on the real n."""
    f = meets_real
    if f(1) >= 0:
        return 1
    root = brentq(f, 1, N - 1e-9, xtol=1e-10, rtol=1e-14)
    n = math.ceil(root)
    # the root is a real n; step to the integer the condition first holds at
    while n > 1 and f(n - 1) >= 0:
        n -= 1
    while f(n) < 0:
        n += 1
    return n


def rounding_interval(printed, factor):
    """[lo, hi] on the fraction scale as assay's PrintedValue computes it: exact decimals, then one division."""
    d = Decimal(printed)
    half = Decimal(1).scaleb(d.as_tuple().exponent) / 2
    return float(d - half) / factor, float(d + half) / factor


# ---------------------------------------------------------------- normal (binomial spread)
NORMAL_CASES = [
    # N, p (claimed value, spread p(1-p)), lo, hi, margin, alpha, power, sizes
    (4000, 0.874, 0.8735, 0.8745, 0.01, 0.05, 0.8),
    (50000, 0.62, 0.6195, 0.6205, 0.02, 0.05, 0.9),
    (10000, 0.955, 0.9545, 0.9555, 0.005, 0.01, 0.8),
    (2000, 0.30, 0.30, 0.30, 0.03, 0.05, 0.8),          # a point claim: the textbook two-sided z power
    (800, 0.5, 0.495, 0.505, 0.05, 0.1, 0.85),
]
normal = []
for N, p, lo, hi, m, alpha, target in NORMAL_CASES:
    sigma = math.sqrt(p * (1 - p))
    se = lambda n, N=N, sigma=sigma: sigma / math.sqrt(n_eff(n, N))
    rows = []
    for n in [50, 100, 500, 1000, N // 2, N - 1]:
        if n > N - 1:
            continue
        s = se(n)
        rows.append({
            "n": n,
            "half_width": float(st.norm.isf(alpha / 2) * s),
            "detect_lower": detect_power(p - m, lo, hi, sigma, n_eff(n, N), alpha),
            "detect_higher": detect_power(p + m, lo, hi, sigma, n_eff(n, N), alpha),
            # statsmodels: the TOST critical values from variance_prop, the alternative's spread from p_alt
            "agreement": float(power_ztost_prop(lo - m, hi + m, n_eff(n, N), p, alpha=alpha, dist="norm",
                                                variance_prop=p, discrete=False)[0]),
            "consistent": consistent_power(p, lo, hi, m, s, alpha),
        })
    # sizes
    n0 = samplesize_confint_proportion(p, m, alpha=alpha)
    n_interval = math.ceil(n_from_eff(n0, N) - 1e-9)
    if lo == hi:
        e = zt_ind_solve_power(effect_size=m / sigma, nobs1=None, alpha=alpha, power=target, ratio=0,
                               alternative="two-sided")
        n_detect = math.ceil(n_from_eff(e, N) - 1e-9)
    else:
        n_detect = smallest_n(lambda n: min(detect_power(p - m, lo, hi, sigma, n_eff(n, N), alpha),
                                            detect_power(p + m, lo, hi, sigma, n_eff(n, N), alpha)) - target, N)
    n_agree = smallest_n(lambda n: consistent_power(p, lo, hi, m, se(n), alpha) - target, N)
    normal.append({"N": N, "p": p, "lo": lo, "hi": hi, "margin": m, "alpha": alpha, "power": target,
                   "rows": rows, "n_interval": n_interval, "n_detect_either": n_detect, "n_agree": n_agree})

# ---------------------------------------------------------------- Hanley-McNeil
def hanley_mcneil(a, pos, neg):
    q1 = a / (2 - a)
    q2 = 2 * a * a / (1 + a)
    return math.sqrt((a * (1 - a) + (pos - 1) * (q1 - a * a) + (neg - 1) * (q2 - a * a)) / (pos * neg))


HM_CASES = [
    # printed, decimals -> lo/hi, positives, negatives, margin, alpha, power
    ("0.912", 0.9115, 0.9125, 1200, 800, 0.02, 0.05, 0.8),
    ("0.85", 0.845, 0.855, 300, 2700, 0.03, 0.05, 0.9),
]
hm = []
for printed, lo, hi, pos, neg, m, alpha, target in HM_CASES:
    a = float(printed)
    N = pos + neg
    share = pos / N

    def se(n, a=a, N=N, share=share, pos=pos, neg=neg):
        return hanley_mcneil(a, n * share, n * (1 - share)) * math.sqrt((N - n) / (N - 1))

    def agreement(n, se=se, a=a, lo=lo, hi=hi, m=m, alpha=alpha):
        v = se(n) ** 2
        return float(_power_ztost(lo - m, v, hi + m, v, a, v, alpha=alpha, discrete=False, dist="norm", nobs=1)[0])

    rows = []
    for n in [100, 500, 1000, N // 2]:
        s = se(n)
        rows.append({"n": n, "half_width": float(st.norm.isf(alpha / 2) * s),
                     "detect_lower": detect_power(a - m, lo, hi, s, 1, alpha),
                     "detect_higher": detect_power(a + m, lo, hi, s, 1, alpha) if a + m <= 1 else None,
                     "agreement": max(agreement(n), 0.0), "consistent": consistent_power(a, lo, hi, m, s, alpha)})
    z = st.norm.isf(alpha / 2)
    lowest = math.ceil(max(1 / share, 1 / (1 - share)))     # both expected class sizes at least 1
    first = lambda f: smallest_n(lambda n: f(max(n, lowest)) if n >= lowest else -1, N)
    n_interval = first(lambda n: m - z * se(n))
    both = a + m <= 1
    n_detect = first(lambda n: min(detect_power(a - m, lo, hi, se(n), 1, alpha),
                                   detect_power(a + m, lo, hi, se(n), 1, alpha) if both else 1) - target)
    n_agree = first(lambda n: consistent_power(a, lo, hi, m, se(n), alpha) - target)
    hm.append({"printed": printed, "positives": pos, "negatives": neg, "margin": m, "alpha": alpha, "power": target,
               "lo": lo, "hi": hi, "rows": rows, "n_interval": n_interval, "n_detect": n_detect, "n_agree": n_agree})

# ---------------------------------------------------------------- binomial limit
BIG = 2_000_000_000
LIMIT_CASES = [
    # lo, hi, margin, alpha, n, true lower, true higher, claimed
    (0.8735, 0.8745, 0.01, 0.05, [300, 1000, 2500, 4000], 0.874),
    (0.6195, 0.6205, 0.02, 0.05, [200, 800, 2000], 0.62),
    (0.955, 0.965, 0.01, 0.01, [500, 1500, 3000], 0.96),
]
limit = []
for lo, hi, m, alpha, sizes, p in LIMIT_CASES:
    for n in sizes:
        x_low = binom_test_reject_interval(lo, n, alpha=alpha, alternative="two-sided")[0]
        x_upp = binom_test_reject_interval(hi, n, alpha=alpha, alternative="two-sided")[1]
        det = lambda theta: float(st.binom.cdf(x_low, n, theta) + st.binom.sf(x_upp - 1, n, theta))
        limit.append({"N": BIG, "lo": lo, "hi": hi, "margin": m, "alpha": alpha, "n": n, "p": p,
                      "lower_cut": int(x_low), "upper_cut": int(x_upp),
                      "detect_lower": det(p - m), "detect_higher": det(p + m),
                      # power_binom_tost returns cdf(x_upp) - cdf(x_low - 1), negative when no count agrees
                      "agreement": max(0.0, float(power_binom_tost(lo - m, hi + m, n, p_alt=p, alpha=alpha)))})

# ---------------------------------------------------------------- hypergeometric brute force
def hyper_pmf(N, K, n):
    """P(X = k) for k = 0..n, from log binomial coefficients (scipy.special.gammaln); checked below
    against scipy.stats.hypergeom.pmf, which is exact but too slow for thousands of whole arrays."""
    k = np.arange(n + 1)

    def log_choose(a, b):
        with np.errstate(invalid="ignore"):
            out = gammaln(a + 1) - gammaln(b + 1) - gammaln(a - b + 1)
        return np.where((b < 0) | (b > a), -np.inf, out)

    return np.exp(log_choose(K, k) + log_choose(N - K, n - k) - log_choose(N, n))


def tails(N, K, n):
    """(pmf, P(X <= k), P(X >= k)) over k = 0..n."""
    pmf = hyper_pmf(N, K, n)
    return pmf, np.cumsum(pmf), np.cumsum(pmf[::-1])[::-1]


for N, K, n in [(4000, 3496, 2888), (1500, 900, 400), (250, 125, 20), (600, 560, 250)]:
    k = np.arange(max(0, n - (N - K)), min(n, K) + 1)
    ours = hyper_pmf(N, K, n)[k]
    scipys = st.hypergeom.pmf(k, N, K, n)
    big = scipys > 1e-300
    assert np.allclose(ours[big], scipys[big], rtol=1e-9, atol=0), (N, K, n)


def claim_counts(lo, hi, N):
    """Counts K of the test set with K/N in [lo, hi]; when none is, the two nearest (as the audit tests
    a claim no count can print as: DESIGN.md, the `infeasible` check)."""
    k_min = math.ceil(lo * N - 1e-9)
    k_max = math.floor(hi * N + 1e-9)
    return min(k_min, k_max), max(k_min, k_max)


def discrepant_counts(N, lo, hi, alpha, n):
    """Counts k whose two-sided p-value is below alpha for every count K of the claim."""
    k_min, k_max = claim_counts(lo, hi, N)
    p = np.zeros(n + 1)
    for K in range(k_min, k_max + 1):
        _, cdf, sf = tails(N, K, n)
        p = np.maximum(p, np.minimum(1, 2 * np.minimum(cdf, sf)))
    return p < alpha


def interval_counts(N, n, level_tail, ks):
    """Exact interval (K_low, K_high) for each count in ks, by scanning a window of K wide enough
    that its ends are rejected (or are 0 and N): K is kept when both one-sided tails exceed the level."""
    out = {}
    for kk in ks:
        centre = kk * N / n
        width = 12 * N * math.sqrt(max(kk / n * (1 - kk / n), 0.25 / n) / n) + 3
        while True:
            K0, K1 = max(0, int(centre - width)), min(N, int(centre + width) + 1)
            kept = []
            for K in range(K0, K1 + 1):
                _, cdf, sf = tails(N, K, n)
                if sf[kk] > level_tail and cdf[kk] > level_tail:
                    kept.append(K)
            if kept and (kept[0] > K0 or K0 == 0) and (kept[-1] < K1 or K1 == N):
                break
            width *= 2
        out[kk] = (kept[0], kept[-1])
    return out


def brute_force(N, lo, hi, m, alpha, n, truths, value):
    discrepant = discrepant_counts(N, lo, hi, alpha, n)
    tail = (1 - (1 - 2 * alpha)) / 2
    weight = np.zeros(n + 1)
    pmfs = {name: hyper_pmf(N, K, n) for name, K in truths.items()}
    for pmf in pmfs.values():
        weight += pmf
    relevant = [int(kk) for kk in np.nonzero(weight > 1e-13)[0]]
    agrees = np.zeros(n + 1, dtype=bool)
    for kk, (low_k, high_k) in interval_counts(N, n, tail, relevant).items():
        agrees[kk] = low_k / N >= lo - m - 1e-12 and high_k / N <= hi + m + 1e-12
    consistent = agrees & ~discrepant
    out = {}
    for name, K in truths.items():
        pmf = pmfs[name]
        out[name] = {"count": int(K), "discrepant": float(pmf[discrepant].sum()),
                     "agreement": float(pmf[agrees].sum()), "consistent": float(pmf[consistent].sum())}
    # half-width of the 1 - alpha interval when the subsample shows the claimed value
    kk = int(np.floor(value * n + 0.5))
    low_k, high_k = interval_counts(N, n, alpha / 2, [kk])[kk]
    out["half_width"] = float((high_k - low_k) / (2 * N))
    return out


HYPER_CASES = [
    # N, printed value (percent), margin, alpha, sizes
    (4000, "87.4", 0.01, 0.05, [100, 700, 2000, 3500]),
    (1500, "62.3", 0.02, 0.05, [60, 400, 1100]),
    (600, "93.5", 0.02, 0.10, [50, 250, 500]),
    (250, "50.0", 0.05, 0.05, [20, 120, 249]),
    (1000, "71.25", 0.01, 0.05, [150, 900]),     # no count of 1000 prints as 71.25: 712 and 713 are tested
]
hyper = []
for N, printed, m, alpha, sizes in HYPER_CASES:
    lo, hi = rounding_interval(printed, 100)
    value = float(Decimal(printed)) / 100
    k_min, k_max = claim_counts(lo, hi, N)
    truths = {"lower": math.ceil((value - m) * N - 1e-9), "higher": math.floor((value + m) * N + 1e-9),
              "claimed": min(max(int(np.floor(value * N + 0.5)), k_min), k_max)}
    for n in sizes:
        r = brute_force(N, lo, hi, m, alpha, n, truths, value)
        hyper.append({"N": N, "printed": printed, "margin": m, "alpha": alpha, "n": n,
                      "lower": r["lower"], "higher": r["higher"], "claimed": r["claimed"], "half_width": r["half_width"]})


# ---------------------------------------------------------------- acceptance case, every n from N down
def acceptance(N=4000, printed="87.4", m=0.01, alpha=0.05, target=0.8):
    lo, hi = rounding_interval(printed, 100)
    value = float(Decimal(printed)) / 100
    k_min, k_max = claim_counts(lo, hi, N)
    lower_true = math.ceil((value - m) * N - 1e-9)
    higher_true = math.floor((value + m) * N + 1e-9)
    claimed = min(max(int(np.floor(value * N + 0.5)), k_min), k_max)
    tail = (1 - (1 - 2 * alpha)) / 2
    # the band's end counts: the smallest K with K/N >= lo - m - 1e-12 and the largest with K/N <= hi + m + 1e-12
    band_low = min(K for K in range(N + 1) if K / N >= lo - m - 1e-12)
    band_high = max(K for K in range(N + 1) if K / N <= hi + m + 1e-12)

    def powers(n):
        discrepant = discrepant_counts(N, lo, hi, alpha, n)
        # the interval's lower end is at least band_low iff P(X >= k | band_low - 1) <= tail (the tails rise with K)
        _, _, sf_low = tails(N, band_low - 1, n)
        _, cdf_high, _ = tails(N, band_high + 1, n)
        agrees = (sf_low <= tail) & (cdf_high <= tail)
        consistent = agrees & ~discrepant
        return (float(hyper_pmf(N, lower_true, n)[discrepant].sum()),
                float(hyper_pmf(N, higher_true, n)[discrepant].sum()),
                float(hyper_pmf(N, claimed, n)[consistent].sum()))

    def half_width(n):
        if n == N:
            return 0.0
        kk = int(np.floor(value * n + 0.5))
        # bisection over K on the tails, which rise (P(X >= k)) and fall (P(X <= k)) with K
        lo_k, hi_k = kk, N
        while lo_k < hi_k:
            mid = (lo_k + hi_k) // 2
            if tails(N, mid, n)[2][kk] > alpha / 2:
                hi_k = mid
            else:
                lo_k = mid + 1
        lower = lo_k
        lo_k, hi_k = 0, N - (n - kk)
        while lo_k < hi_k:
            mid = (lo_k + hi_k + 1) // 2
            if tails(N, mid, n)[1][kk] > alpha / 2:
                lo_k = mid
            else:
                hi_k = mid - 1
        return float((lo_k - lower) / (2 * N))

    def from_then_on(meets):
        n = N
        if not meets(n):
            return None
        while n > 1 and meets(n - 1):
            n -= 1
        return n

    cache = {}

    def pw(n):
        if n not in cache:
            cache[n] = powers(n)
        return cache[n]

    n_interval = from_then_on(lambda n: half_width(n) <= m + 1e-12)
    n_detect = from_then_on(lambda n: min(pw(n)[0], pw(n)[1]) >= target)
    n_agree = from_then_on(lambda n: pw(n)[2] >= target)
    rows = []
    for n in sorted({50, 100, 200, 500, 1000, N, n_interval, n_detect, n_agree}):
        d_l, d_h, c = pw(n)
        rows.append({"n": n, "half_width": half_width(n), "detect_lower": d_l, "detect_higher": d_h, "agree": c})
    return {"command": ["plan", "--metric", "accuracy", "--claim", "87.4", "--test-size", "4000", "--margin", "1"],
            "n_interval": n_interval, "n_detect": n_detect, "n_agree": n_agree,
            "n": max(n_interval, n_detect, n_agree), "rows": rows}


accept = acceptance()

# ---------------------------------------------------------------- pilot (regression, MAE)
rng = np.random.default_rng(20250301)
PILOT_N, PILOT_TEST = 300, 5000
target_values = rng.normal(20, 6, PILOT_N).round(2)
predictions = (target_values + rng.standard_t(5, PILOT_N) * 1.5).round(2)
pilot_path = os.path.join(HERE, "..", "resources", "plan", "pilot-regression.csv")
os.makedirs(os.path.dirname(pilot_path), exist_ok=True)
with open(pilot_path, "w", newline="") as f:
    w = csv.writer(f, lineterminator="\n")
    w.writerow(["id", "target", "prediction"])
    for i, (t, p) in enumerate(zip(target_values, predictions)):
        w.writerow(["item%03d" % i, "%.2f" % t, "%.2f" % p])
errors = np.abs(np.array([float("%.2f" % t) for t in target_values]) - np.array([float("%.2f" % p) for p in predictions]))
sigma = float(errors.std(ddof=0))      # plug-in spread: the bootstrap's per-item variance of a mean
PILOT_CLAIM, PILOT_MARGIN, PILOT_ALPHA, PILOT_POWER = "1.25", 0.05, 0.05, 0.8
v = float(PILOT_CLAIM)
lo, hi = rounding_interval(PILOT_CLAIM, 1)
se = lambda n: sigma / math.sqrt(n_eff(n, PILOT_TEST))
pilot = {"file": "plan/pilot-regression.csv", "n": PILOT_N, "test_size": PILOT_TEST, "claim": PILOT_CLAIM,
         "margin": PILOT_MARGIN, "alpha": PILOT_ALPHA, "power": PILOT_POWER, "sigma": sigma,
         "pilot_mae": float(errors.mean()),
         "n_interval": smallest_n(lambda n: PILOT_MARGIN - st.norm.isf(PILOT_ALPHA / 2) * se(n), PILOT_TEST),
         "n_detect": smallest_n(lambda n: min(detect_power(v - PILOT_MARGIN, lo, hi, sigma, n_eff(n, PILOT_TEST), PILOT_ALPHA),
                                              detect_power(v + PILOT_MARGIN, lo, hi, sigma, n_eff(n, PILOT_TEST), PILOT_ALPHA))
                                - PILOT_POWER, PILOT_TEST),
         "n_agree": smallest_n(lambda n: consistent_power(v, lo, hi, PILOT_MARGIN, se(n), PILOT_ALPHA) - PILOT_POWER,
                               PILOT_TEST)}

out = {
    "generated_by": "src/test/reference/plan_reference.py with python %s, numpy %s, scipy %s, statsmodels %s"
                    % (sys.version.split()[0], np.__version__, scipy.__version__, statsmodels.__version__),
    "normal": normal,
    "hanley_mcneil": hm,
    "binomial_limit": limit,
    "hypergeometric": hyper,
    "acceptance": accept,
    "pilot": pilot,
}
target = os.path.join(HERE, "..", "resources", "reference", "plan_reference.json")
with open(target, "w") as f:
    json.dump(out, f, indent=1, allow_nan=False)
print("wrote", os.path.normpath(target))
