"""Reference values for the large-sample intervals of Cupel's duplicate analysis (org.cupel.duplicates), used
above the setting duplicates.bootstrapMaxPairs instead of the bootstrap.

Writes invented pairs (seeded) and what scipy 1.10 / statsmodels 0.13 (Debian) compute from them:
  large_sample_pairs.csv       input: 1,325 pairs (columns original,duplicate), values to 3 decimals
  large_sample_reference.json  outputs
Run from this folder: /usr/bin/python3 large_sample_reference.py

- Thompson-Howarth and RMS SD lines: the pairs are grouped as Thompson and Howarth (1978) do (sorted by pair
  mean, ties by |d|, consecutive groups of 11 from the lowest, the remainder dropped), and each line (group
  median |d|, resp. group RMS SD sqrt(sum d^2 / 22), on group mean) is fitted by statsmodels
  OLS(...).fit(cov_type='HC3') (MacKinnon and White 1985). conf_int() then gives the normal 95 % interval
  b +- z * SE(HC3); for P_c = 2 sigma_c / c, which is linear in (intercept, slope), t_test(R) gives the
  interval of the linear combination R = s * [2/c, 2] with s = 1.048358 (Thompson-Howarth) or 1 (RMS SD).
- RMS CV: the normal 95 % interval of the mean of the squared pair CVs, statsmodels DescrStatsW.zconfint_mean,
  square-rooted.
- A small 8-point line with HC3 and HC0 covariances, where the two differ, to pin down the HC3 form.
- z = scipy.stats.norm.ppf(0.975).
"""
import json

import numpy as np
import scipy
import statsmodels
import statsmodels.api as sm
from scipy import stats
from statsmodels.stats.weightstats import DescrStatsW
from pair_order import sort_pairs

rng = np.random.default_rng(20261202)
GROUP = 11
# sigma / median |d| for two normal measurements: 1 / (sqrt(2) * Phi^-1(0.75)).
SIGMA_PER_MEDIAN = 1.0 / (np.sqrt(2.0) * stats.norm.ppf(0.75))
GRADES = [0.5, 2.0]

# Pairs of two normal measurements with SD 0.02 + 0.05 c at lognormal grades, reported to 3 decimals.
n = 120 * GROUP + 5
c = rng.lognormal(mean=0.0, sigma=1.0, size=n)
sd = 0.02 + 0.05 * c
a = np.clip(c + sd * rng.standard_normal(n), 0.001, None)
b = np.clip(c + sd * rng.standard_normal(n), 0.001, None)
rows = [(f"{x:.3f}", f"{y:.3f}") for x, y in zip(a, b)]
with open("large_sample_pairs.csv", "w") as f:
    f.write("original,duplicate\n")
    for x, y in rows:
        f.write(f"{x},{y}\n")
# The values exactly as Java's Double.parseDouble reads the file.
a = np.array([float(x) for x, _ in rows])
b = np.array([float(y) for _, y in rows])

m = (a + b) / 2
d = np.abs(a - b)


m_sorted, d_sorted = sort_pairs(m, d)
g = n // GROUP
ms = m_sorted[: g * GROUP].reshape(g, GROUP)
ds = d_sorted[: g * GROUP].reshape(g, GROUP)
group_mean = ms.mean(axis=1)
group_median = np.median(ds, axis=1)
group_rms = np.sqrt((ds ** 2).sum(axis=1) / (2.0 * GROUP))


def line(y, scale):
    fit = sm.OLS(y, sm.add_constant(group_mean)).fit(cov_type="HC3")
    ci = fit.conf_int(alpha=0.05)
    out = {
        "sigma0": scale * fit.params[0], "k": scale * fit.params[1],
        "sigma0_se": scale * fit.bse[0], "k_se": scale * fit.bse[1],
        "sigma0_ci": [scale * ci[0][0], scale * ci[0][1]], "k_ci": [scale * ci[1][0], scale * ci[1][1]],
        "precision": {},
    }
    for grade in GRADES:
        tt = fit.t_test(np.array([[scale * 2 / grade, scale * 2]]))
        lo, hi = tt.conf_int(alpha=0.05)[0]
        out["precision"][str(grade)] = {"value": float(tt.effect[0]), "ci": [lo, hi]}
    return out


cv2 = 2 * (a - b) ** 2 / (a + b) ** 2
lo, hi = DescrStatsW(cv2).zconfint_mean(alpha=0.05)

# A small line where leverage matters: HC3 and HC0 differ clearly.
x8 = np.array([1.0, 2.0, 3.0, 4.0, 5.0, 6.0, 8.0, 15.0])
y8 = np.array([0.9, 2.3, 2.8, 4.4, 4.7, 6.9, 7.2, 16.5])
hc3 = sm.OLS(y8, sm.add_constant(x8)).fit(cov_type="HC3")
hc0 = sm.OLS(y8, sm.add_constant(x8)).fit(cov_type="HC0")

out = {
    "versions": {"numpy": np.__version__, "scipy": scipy.__version__, "statsmodels": statsmodels.__version__},
    "z975": stats.norm.ppf(0.975),
    "groups": int(g),
    "thompsonHowarth": line(group_median, SIGMA_PER_MEDIAN),
    "rmsRegression": line(group_rms, 1.0),
    "rmsCv": {"value": float(np.sqrt(cv2.mean())), "ci": [float(np.sqrt(max(lo, 0.0))), float(np.sqrt(hi))],
              "n": int(n)},
    "smallLine": {
        "x": x8.tolist(), "y": y8.tolist(),
        "params": hc3.params.tolist(),
        "hc3_cov": hc3.cov_params().tolist(),
        "hc0_cov": hc0.cov_params().tolist(),
    },
}
with open("large_sample_reference.json", "w") as f:
    json.dump(out, f, indent=2)
    f.write("\n")
print(json.dumps(out, indent=2))
