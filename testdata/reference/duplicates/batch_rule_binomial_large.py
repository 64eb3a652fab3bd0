"""One-sided exact binomial p-values P(X <= k | n, p0) for large batches (a whole pairs file as one batch).

scipy.stats.binomtest(k, n, p0, alternative='less').pvalue for n = 1,001 to 1,000,000 and k on both sides of
the mode n*p0 (far lower tail, near the mode, above it), p0 in {0.90, 0.80}. Writes
batch_rule_binomial_large.csv next to this script.

Run from the repository root:
    /usr/bin/python3 testdata/reference/duplicates/batch_rule_binomial_large.py
"""
import csv
import os

import scipy
from scipy.stats import binomtest

here = os.path.dirname(os.path.abspath(__file__))
rows = []
for p0 in (0.90, 0.80):
    for n in (1001, 5000, 100000, 1000000):
        mode = int((n + 1) * p0)
        sd = (n * p0 * (1 - p0)) ** 0.5
        ks = sorted({1000, mode - int(8 * sd), mode - int(3 * sd), mode - int(sd), mode - 1, mode, mode + 1,
                     mode + int(sd), mode + int(3 * sd), n - 1, n})
        for k in ks:
            if 1000 <= k <= n:
                rows.append((n, k, p0, binomtest(k, n, p0, alternative="less").pvalue))
with open(os.path.join(here, "batch_rule_binomial_large.csv"), "w", newline="") as f:
    w = csv.writer(f, lineterminator="\n")
    w.writerow(["n", "k", "p0", "p_less"])
    for n, k, p0, p in rows:
        w.writerow([n, k, repr(p0), repr(float(p))])
print("scipy", scipy.__version__, len(rows), "rows")
