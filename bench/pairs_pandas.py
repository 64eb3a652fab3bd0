"""The duplicate-precision script a user would write with pandas: the comparator of bench/duplicates-vs-pandas.sh.

Reads a pairs CSV (columns original, duplicate; values such as 0.070 or <0.005) and prints, as one JSON object,
the statistics `cupel duplicates` reports, with Cupel's definitions (docs/duplicates.md):

- pairs used: both values numeric and positive (a censored '<0.005' cell is not a number here, so its pair is
  left out, as Cupel leaves out pairs with a below-detection member);
- HARD = |a - b| / (a + b) per pair (Shaw 1997; here in %), its median;
- percent within 10 %: pairs with HARD <= 10 %, "<=" with Cupel's relative tolerance of 1e-9 (a HARD of exactly
  10 % in the written decimals, such as 1.1 / 0.9, is within; docs/control-rules.md);
- RMS CV = sqrt(mean(CV_i^2)), CV_i = sqrt(2) |a - b| / (a + b) (Stanley & Lawie 2007);
- s_r = sqrt(sum(d^2) / (2 n)) (ISO 5725-2);
- Thompson-Howarth: pairs sorted by mean m = (a + b) / 2, consecutive groups of 11 from the lowest mean (the
  remainder dropped), per group the mean of m and the median of |d|, least squares of median |d| on group mean,
  sigma0 = 1.048358 * intercept, k = 1.048358 * slope (Thompson & Howarth 1978). Equal means are kept in file
  order here (a stable sort); Cupel shuffles each run of equal means in a fixed pseudo-random order and bounds
  the line at sigma0 >= 0, k >= 0, so sigma0 and k may differ in the last digits.

    python3 bench/pairs_pandas.py pairs.csv
"""
import json
import sys

import numpy as np
import pandas as pd

df = pd.read_csv(sys.argv[1])
a = pd.to_numeric(df["original"], errors="coerce").to_numpy()
b = pd.to_numeric(df["duplicate"], errors="coerce").to_numpy()
used = (a > 0) & (b > 0)
a, b = a[used], b[used]
d = np.abs(a - b)
s = a + b
hard = 100 * d / s
cv = np.sqrt(2) * d / s
limit = 10.0
within = 100 * np.mean(hard <= limit * (1 + 1e-9))

m = s / 2
order = np.argsort(m, kind="stable")
g = len(m) // 11
ms = m[order][: g * 11].reshape(g, 11)
ds = d[order][: g * 11].reshape(g, 11)
gx = ms.mean(axis=1)
gy = np.median(ds, axis=1)
slope, intercept = np.polyfit(gx, gy, 1)

print(json.dumps({
    "pairs": int(len(df)),
    "used": int(used.sum()),
    "medianHardPercent": float(np.median(hard)),
    "percentWithin10": float(within),
    "rmsCvPercent": float(100 * np.sqrt(np.mean(cv ** 2))),
    "repeatabilitySd": float(np.sqrt(np.sum(d ** 2) / (2 * len(d)))),
    "thGroups": int(g),
    "thSigma0": float(1.048358 * intercept),
    "thK": float(1.048358 * slope),
}))
