"""One-sided exact binomial test of a batch's share of duplicate pairs within the HARD limit.

H0: the batch's true share within the limit is at least p0 (the acceptance rule, 90 % by default);
H1: it is below p0. p-value = P(X <= k | n, p0), X ~ Binomial(n, p0), from
scipy.stats.binomtest(k, n, p0, alternative='less'). Grid: n = 1..30 and n = 50, 125, every k = 0..n,
p0 in {0.90, 0.80, 0.95}. Writes batch_rule_binomial.csv next to this script.

Run from the repository root:
    /usr/bin/python3 testdata/reference/duplicates/batch_rule_binomial.py
"""
import csv
import os

import scipy
from scipy.stats import binomtest

here = os.path.dirname(os.path.abspath(__file__))
rows = []
for p0 in (0.90, 0.80, 0.95):
    for n in list(range(1, 31)) + [50, 125]:
        for k in range(0, n + 1):
            rows.append((n, k, p0, binomtest(k, n, p0, alternative="less").pvalue))
with open(os.path.join(here, "batch_rule_binomial.csv"), "w", newline="") as f:
    w = csv.writer(f, lineterminator="\n")
    w.writerow(["n", "k", "p0", "p_less"])
    for n, k, p0, p in rows:
        w.writerow([n, k, repr(p0), repr(float(p))])
print("scipy", scipy.__version__, len(rows), "rows")
