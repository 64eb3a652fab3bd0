"""Reference values for the duplicate bias statistics of Cupel (org.cupel.duplicates).

Writes invented pair sets (seeded) and what scipy 1.10 / statsmodels 0.13 compute from them:
  rma_pairs.csv, wilcoxon_exact_pairs.csv, wilcoxon_ties_pairs.csv   inputs (columns original,duplicate)
  bias_reference.json                                                 outputs
(also binomial upper tails used by the Thompson-Howarth control-line test)
Run from this folder: /usr/bin/python3 bias_reference.py
The RMA slope is computed by a route independent of Cupel's: the geometric mean of the OLS slope of y on x
and the inverse OLS slope of x on y (statsmodels), sign of r; its SEs use the Miller & Kahn (1962) formulas
evaluated with numpy.
"""
import json

import numpy as np
import scipy
import statsmodels.api as sm
from scipy import stats

rng = np.random.default_rng(20240601)


def t975(df):
    """0.975 quantile of Student t. scipy 1.10's t.ppf is off by about 4e-9 relative here (checked against
    R 4.2 qt(0.975, 39) = 2.0226909200367604), so one Newton step on t.cdf refines it."""
    q = stats.t.ppf(0.975, df)
    return q - (stats.t.cdf(q, df) - 0.975) / stats.t.pdf(q, df)


def write(name, a, b):
    with open(name, "w") as f:
        f.write("original,duplicate\n")
        for x, y in zip(a, b):
            f.write(f"{x:.3f},{y:.3f}\n")
    return np.round(a, 3), np.round(b, 3)


# Umpire-like pairs: lognormal grades, the second lab 3 % high with 8 % relative error.
g = rng.lognormal(mean=0.0, sigma=0.8, size=40)
a, b = write("rma_pairs.csv", g * (1 + 0.05 * rng.standard_normal(40)), 1.03 * g * (1 + 0.08 * rng.standard_normal(40)))

ols_yx = sm.OLS(b, sm.add_constant(a)).fit().params[1]
ols_xy = sm.OLS(a, sm.add_constant(b)).fit().params[1]
r = np.corrcoef(a, b)[0, 1]
n = len(a)
slope = np.sign(r) * np.sqrt(ols_yx / ols_xy)
intercept = b.mean() - slope * a.mean()
sx, sy = a.std(ddof=1), b.std(ddof=1)
se_slope = abs(slope) * np.sqrt((1 - r * r) / n)
se_intercept = sy * np.sqrt(((1 - r * r) / n) * (1 + a.mean() ** 2 / sx ** 2))
t = t975(n - 2)
tt = stats.ttest_rel(b, a)
rel = (b - a) / ((a + b) / 2)
rel_half = t975(n - 1) * rel.std(ddof=1) / np.sqrt(n)

# Small set without ties or zero differences: exact signed-rank distribution.
while True:  # redraw until the set has neither ties nor zeros (deterministic under the seed)
    ea = np.round(rng.uniform(1, 3, 14), 3)
    eb = np.round(ea + rng.normal(0.05, 0.1, 14), 3)
    wd = np.round(eb - ea, 9)
    if np.all(wd != 0) and len(np.unique(np.abs(wd))) == len(wd):
        break
ea, eb = write("wilcoxon_exact_pairs.csv", ea, eb)
wex = stats.wilcoxon(eb, ea, zero_method="wilcox", correction=False, mode="exact")

# Larger set of values on a 0.01 grid: zero differences and many tied magnitudes.
ta = np.round(rng.uniform(0.5, 1.5, 80), 2)
tb = np.round(ta + rng.normal(0.01, 0.03, 80), 2)
ta, tb = write("wilcoxon_ties_pairs.csv", ta, tb)
# Differences on the decimal grid, as Cupel compares them (rounded magnitudes).
td = np.round(tb - ta, 9)
wap = stats.wilcoxon(td, zero_method="wilcox", correction=True, mode="approx")
ttt = stats.ttest_rel(tb, ta)

out = {
    "generator": f"scipy {scipy.__version__}, statsmodels {sm.__version__ if hasattr(sm, '__version__') else ''}",
    "rma": {"n": n, "slope": slope, "intercept": intercept, "slopeSe": se_slope, "interceptSe": se_intercept,
            "slopeCiLow": slope - t * se_slope, "slopeCiHigh": slope + t * se_slope,
            "interceptCiLow": intercept - t * se_intercept, "interceptCiHigh": intercept + t * se_intercept,
            "r": r},
    "pairedT": {"t": tt.statistic, "p": tt.pvalue, "df": n - 1},
    "meanRelativeBias": {"mean": rel.mean(), "ciLow": rel.mean() - rel_half, "ciHigh": rel.mean() + rel_half},
    "wilcoxonExact": {"n": len(wd), "statistic": wex.statistic, "p": wex.pvalue},
    "wilcoxonTies": {"nNonZero": int(np.sum(td != 0)), "statistic": wap.statistic, "p": wap.pvalue},
    "pairedTTies": {"t": ttt.statistic, "p": ttt.pvalue},
    # Upper tails P(X >= x) of the control-line exceedance counts of ThompsonHowarthTest's constructed case.
    # Upper tail of chi-square used by BatchDispersionTest.
    "chiSquareUpperTail": {"x20_df5": stats.chi2.sf(20, 5)},
    "binomialUpperTail": {"n58_x13_p010": stats.binom.sf(12, 58, 0.10), "n58_x8_p001": stats.binom.sf(7, 58, 0.01)},
}
with open("bias_reference.json", "w") as f:
    json.dump({k: ({kk: float(vv) for kk, vv in v.items()} if isinstance(v, dict) else v) for k, v in out.items()},
              f, indent=2)
    f.write("\n")
