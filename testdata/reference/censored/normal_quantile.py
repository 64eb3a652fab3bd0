"""Standard normal quantiles from scipy.stats.norm.ppf, the reference for Cupel's NormalQuantile (AS 241).

Run: cd testdata/reference/censored && /usr/bin/python3 normal_quantile.py
Writes normal_quantile.csv: p,ppf with repr() (round-trip) digits.
"""
import math

import numpy as np
import scipy
from scipy.stats import norm

fixed = [1e-300, 1e-100, 1e-20, 1e-12, math.exp(-25) * 0.999, math.exp(-25), math.exp(-25) * 1.001, 1e-10, 1e-8,
         1e-6, 3.999996000004e-6, 1e-4, 1e-3, 0.01, 0.05, 0.074999, 0.075, 0.075001, 0.1, 0.25, 0.4, 0.5,
         0.5000001, 0.6, 0.75, 0.9, 0.924999, 0.925, 0.925001, 0.95, 0.99, 0.999999, 1 - 1e-12, 1 - 2.0 ** -53]
# ROS-like plotting positions r / (n + 1) for n = 10^6: both ends.
n = 10 ** 6
ros = [r / (n + 1.0) for r in list(range(1, 21)) + list(range(n - 19, n + 1))]
rng = np.random.default_rng(20260101)
uniform = list(rng.uniform(0, 1, 2000))
log_uniform = list(10.0 ** rng.uniform(-300, -1, 500))
upper = [1 - x for x in 10.0 ** rng.uniform(-15, -1, 300)]
with open("normal_quantile.csv", "w") as f:
    f.write("p,ppf\n")
    for p in fixed + ros + uniform + log_uniform + upper:
        f.write(f"{float(p)!r},{float(norm.ppf(p))!r}\n")
print("scipy", scipy.__version__, "rows", len(fixed) + len(ros) + len(uniform) + len(log_uniform) + len(upper))
