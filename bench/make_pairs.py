"""Writes a deterministic pairs file for bench/duplicates-vs-pandas.sh (columns id, original, duplicate).

True grades are log-normal (median 0.5, log-SD 1.2, as gold assays in g/t); each assay of a pair has the
Thompson-Howarth error sigma_c = 0.01 + 0.05 c, and 3 % of pairs carry a second, five times larger error (a
nugget effect), so the flagged-pair lists are long as in real gold data. Values are written with three
decimals, as a lab reports them; a value below 0.005 is written '<0.005' (censored, as a lab prints it).

    python3 bench/make_pairs.py N SEED OUT.csv
"""
import sys

import numpy as np

n, seed, out = int(sys.argv[1]), int(sys.argv[2]), sys.argv[3]
rng = np.random.default_rng(seed)
grade = rng.lognormal(np.log(0.5), 1.2, n)
sigma = 0.01 + 0.05 * grade
sigma = np.where(rng.random(n) < 0.03, 5 * sigma, sigma)
a = np.round(grade + rng.normal(0, 1, n) * sigma, 3)
b = np.round(grade + rng.normal(0, 1, n) * sigma, 3)


def cells(v):
    text = np.char.mod("%.3f", v)
    return np.where(v < 0.005, "<0.005", text)


ids = np.char.add("D", np.char.zfill(np.arange(1, n + 1).astype(str), 8))
with open(out, "w") as f:
    f.write("id,original,duplicate\n")
    chunk = 1_000_000
    for s in range(0, n, chunk):
        e = min(n, s + chunk)
        rows = np.char.add(np.char.add(np.char.add(np.char.add(ids[s:e], ","), cells(a[s:e])), ","), cells(b[s:e]))
        f.write("\n".join(rows.tolist()))
        f.write("\n")
