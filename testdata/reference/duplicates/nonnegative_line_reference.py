"""Reference values for Cupel's Thompson-Howarth fit with sigma0 >= 0 and k >= 0.

Run from this folder:  /usr/bin/python3 nonnegative_line_reference.py
Writes nonnegative_line_pairs.csv and nonnegative_line_reference.json.

- "lines": four invented sets of group points (x, y) fitted by scipy.optimize.lsq_linear with bounds
  (0, inf) on both coefficients, beside the unconstrained numpy least-squares line.
- "thompsonHowarth": 330 invented pairs (seeded; multiplicative errors, so the true sigma0 is 0) whose
  unconstrained Thompson-Howarth and RMS-SD intercepts are negative: grouped as Cupel does (sorted by mean then |d|, each run of equal means shuffled as
  PairGroups.shuffleTies does, groups of 11 from the lowest), the median-|d| and RMS-SD lines fitted by
  lsq_linear with bounds (0, inf), sigma0 = 1.048358 x intercept for the median line; the pairs above the 90 %
  and 99 % lines of that model and the binomial upper and lower tails (scipy.stats.binom.sf and .cdf).
"""
import json

import numpy as np
import scipy
from scipy import stats
from scipy.optimize import lsq_linear
from pair_order import sort_pairs

GROUP = 11
SIGMA_PER_MEDIAN = 1 / (np.sqrt(2) * stats.norm.ppf(0.75))


def bounded(x, y):
    a = np.column_stack([np.ones_like(x), x])
    r = lsq_linear(a, y, bounds=(0, np.inf), tol=1e-15, lsmr_tol="auto", method="bvls")
    free = np.linalg.lstsq(a, y, rcond=None)[0]
    return {"intercept": r.x[0], "slope": r.x[1], "free_intercept": free[0], "free_slope": free[1]}


out = {"versions": {"numpy": np.__version__, "scipy": scipy.__version__}, "lines": []}
cases = [
    ([0.1, 0.3, 0.6, 1.0, 1.8, 3.0], [0.012, 0.021, 0.033, 0.05, 0.09, 0.16]),   # both positive
    ([0.1, 0.3, 0.6, 1.0, 1.8, 3.0], [0.001, 0.004, 0.02, 0.04, 0.09, 0.15]),    # negative intercept
    ([0.1, 0.3, 0.6, 1.0, 1.8, 3.0], [0.05, 0.048, 0.047, 0.045, 0.044, 0.04]),  # negative slope
    ([0.5, 0.7, 0.9, 1.1], [0.03, 0.01, 0.02, 0.005]),                           # both would be held
]
for x, y in cases:
    x, y = np.array(x), np.array(y)
    out["lines"].append({"x": x.tolist(), "y": y.tolist(), **bounded(x, y)})

# Multiplicative errors (log SD 0.3, a field-duplicate-like scatter with no constant part), rounded to 0.001.
rng = np.random.default_rng(20260304)
n = 330
c = np.exp(rng.normal(np.log(0.3), 1.0, n))
a = np.clip(np.round(c * np.exp(0.3 * rng.standard_normal(n)), 3), 0.001, None)
b = np.clip(np.round(c * np.exp(0.3 * rng.standard_normal(n)), 3), 0.001, None)
with open("nonnegative_line_pairs.csv", "w") as f:
    f.write("original,duplicate\n")
    for x, y in zip(a, b):
        f.write(f"{x:.3f},{y:.3f}\n")
a = np.array([float(f"{x:.3f}") for x in a])
b = np.array([float(f"{y:.3f}") for y in b])
m = (a + b) / 2
d = np.abs(a - b)
ms, ds = sort_pairs(m, d)
g = n // GROUP
gm = ms[: g * GROUP].reshape(g, GROUP).mean(axis=1)
gd = ds[: g * GROUP].reshape(g, GROUP)
med = np.median(gd, axis=1)
rms = np.sqrt((gd ** 2).sum(axis=1) / (2.0 * GROUP))
th = bounded(gm, med)
rl = bounded(gm, rms)
s0, k = SIGMA_PER_MEDIAN * th["intercept"], SIGMA_PER_MEDIAN * th["slope"]
res = {"sigma0": s0, "k": k, "free_sigma0": SIGMA_PER_MEDIAN * th["free_intercept"],
       "rms_sigma0": rl["intercept"], "rms_k": rl["slope"], "rms_free_sigma0": rl["free_intercept"]}
for pct, q in ((90, stats.norm.ppf(0.95) * np.sqrt(2)), (99, stats.norm.ppf(0.995) * np.sqrt(2))):
    count = int((d > q * np.maximum(0, s0 + k * m)).sum())
    res[f"above{pct}"] = count
    res[f"p{pct}"] = float(stats.binom.sf(count - 1, n, 1 - pct / 100)) if count > 0 else 1.0
    res[f"p{pct}_lower"] = float(stats.binom.cdf(count, n, 1 - pct / 100))
out["thompsonHowarth"] = res
with open("nonnegative_line_reference.json", "w") as f:
    json.dump(out, f, indent=2)
print(json.dumps(out, indent=2))
