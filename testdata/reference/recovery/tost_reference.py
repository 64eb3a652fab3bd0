"""Reference values for Cupel's TOST equivalence and Welch tests (scipy 1.10, statsmodels 0.13).

Run from the repository root:
    /usr/bin/python3 testdata/reference/recovery/tost_reference.py
Writes tost.csv beside this script: Schuirmann's two one-sided tests with unequal variances
(statsmodels.stats.weightstats.ttost_ind, usevar='unequal') and scipy's Welch t-test.
"""
import csv
import os

from scipy import stats
from statsmodels.stats.weightstats import ttost_ind

OUT = os.path.join("testdata", "reference", "recovery", "tost.csv")
CASES = [
    # name, sample a, sample b, margin (same units as the data: percentage points of recovery)
    ("close", [99.12, 98.85, 99.30, 99.05], [99.20, 98.95, 99.10, 99.25], 0.5),
    ("apart", [99.12, 98.85, 99.30], [98.40, 98.95], 0.5),
    ("wide_margin", [97.1, 96.4, 97.9], [96.8, 97.5, 96.1], 2.0),
]
with open(OUT, "w", newline="") as f:
    w = csv.writer(f)
    w.writerow(["case", "a", "b", "margin", "p_tost", "t_lower", "p_lower", "t_upper", "p_upper", "welch_t", "welch_p"])
    for name, a, b, margin in CASES:
        p, lower, upper = ttost_ind(a, b, -margin, margin, usevar="unequal")
        welch = stats.ttest_ind(a, b, equal_var=False)
        w.writerow([name, " ".join(map(str, a)), " ".join(map(str, b)), margin, repr(p),
                    repr(lower[0]), repr(lower[1]), repr(upper[0]), repr(upper[1]),
                    repr(welch.statistic), repr(welch.pvalue)])
