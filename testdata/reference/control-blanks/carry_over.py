"""Reference values for Cupel's carry-over statistics (org.cupel.control.CarryOver).

Reads carry_over_pairs.csv (invented blanks: preceding-sample grade, blank value, blank qualifier) and
writes carry_over_expected.json with
  - Spearman's rho and its two-sided p (scipy.stats.spearmanr; average ranks for ties, t approximation
    on n-2 df) over all pairs, censored blanks ("<") entered at their limit;
  - ordinary least squares of blank on preceding grade (scipy.stats.linregress) over pairs with a
    detected blank: slope, its standard error, intercept and the two-sided p of the slope.
Run: /usr/bin/python3 testdata/reference/control-blanks/carry_over.py
"""
import csv
import json
import os

import scipy
from scipy import stats

here = os.path.dirname(os.path.abspath(__file__))
rows = list(csv.DictReader(open(os.path.join(here, "carry_over_pairs.csv"))))
x = [float(r["preceding"]) for r in rows]
y = [float(r["blank"]) for r in rows]
det = [r["qualifier"] == "" for r in rows]

rho, p = stats.spearmanr(x, y)
xd = [a for a, d in zip(x, det) if d]
yd = [b for b, d in zip(y, det) if d]
lr = stats.linregress(xd, yd)

out = {
    "scipy_version": scipy.__version__,
    "n_rank": len(x),
    "spearman_rho": float(rho),
    "spearman_p": float(p),
    "n_regression": len(xd),
    "slope": float(lr.slope),
    "slope_stderr": float(lr.stderr),
    "intercept": float(lr.intercept),
    "slope_p": float(lr.pvalue),
}
with open(os.path.join(here, "carry_over_expected.json"), "w") as f:
    json.dump(out, f, indent=2)
    f.write("\n")
print(json.dumps(out, indent=2))
