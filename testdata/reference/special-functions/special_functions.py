"""Reference values of the distribution functions Cupel takes from Apache Commons Statistics / Numbers,
computed with mpmath at 50 significant digits (an outside, arbitrary-precision reference), each written
with repr() of the nearest double (round-trip digits).

Run from the repository root:
    /usr/bin/python3 testdata/reference/special-functions/special_functions.py

Writes, beside this script:
  normal_quantile.csv  p,z: the standard normal quantile at the probabilities of
                       ../censored/normal_quantile.csv (read from there) plus ROS plotting positions
  normal_cdf.csv       x,cdf: Phi(x) for x in [-38, 8.5] (step 1/64 and a few far points)
  binomial_tails.csv   n,p,k,lower,upper: P(X <= k) and P(X >= k) for X ~ Binomial(n, p)
  chi2_upper.csv       df,x,upper: P(chi2(df) > x)
  t_cdf.csv            df,t,cdf: P(T_df <= t) for t <= 0 (the lower tail Welch's p-value uses)
  t_quantile.csv       df,p,q: the t quantile for the two-sided 90/95/99 % intervals
"""
import csv
import os

import mpmath as mp

mp.mp.dps = 50
HERE = os.path.dirname(os.path.abspath(__file__))


def out(name, header, rows):
    with open(os.path.join(HERE, name), "w", newline="") as f:
        w = csv.writer(f, lineterminator="\n")
        w.writerow(header)
        w.writerows(rows)
    print(name, len(rows), "rows")


def phi(x):
    return mp.ncdf(x)


def quantile(p):
    """z with Phi(z) = p, by Newton's method on log Phi (lower half) in 50-digit arithmetic."""
    p = mp.mpf(p)
    if p == mp.mpf(1) / 2:
        return mp.mpf(0)
    lower = p < mp.mpf(1) / 2
    target = p if lower else 1 - p
    # Start from the tail asymptote, then Newton on log Phi(-|z|) = log target.
    z = -mp.sqrt(-2 * mp.log(target)) if target < mp.mpf("0.3") else mp.mpf(-0.5)
    for _ in range(200):
        f = mp.log(phi(z)) - mp.log(target)
        step = f * phi(z) / mp.npdf(z)
        z -= step
        if abs(step) < mp.mpf(10) ** -45 * max(1, abs(z)):
            break
    return z if lower else -z


def normal_quantiles():
    ps = []
    with open(os.path.join(HERE, "..", "censored", "normal_quantile.csv")) as f:
        for row in csv.DictReader(f):
            ps.append(float(row["p"]))
    n = 10 ** 6
    ps += [r / (n + 1.0) for r in range(21, 2001)]
    ps += [(r - 0.375) / (n + 0.25) for r in list(range(1, 51)) + list(range(n - 49, n + 1))]
    rows = []
    for p in ps:
        if 0 < p < 1:
            rows.append([repr(p), repr(float(quantile(p)))])
    out("normal_quantile.csv", ["p", "z"], rows)


def normal_cdf():
    xs = [k / 64.0 for k in range(-38 * 64, int(8.5 * 64) + 1)]
    xs += [-37.5, -37.0, -36.5, -30.3, -20.1, -10.7, -7.071067811865475, -7.0710678118654755, 7.5, 8.25]
    rows = [[repr(x), repr(float(phi(mp.mpf(x))))] for x in xs]
    out("normal_cdf.csv", ["x", "cdf"], rows)


def binomial_tails():
    rows = []
    ns = list(range(1, 13)) + [15, 20, 25, 30, 40, 50, 100, 250, 1000]
    for n in ns:
        for p in [0.5, 0.9, 0.95, 0.99, 0.1, 0.05, 0.01]:
            pm = mp.mpf(p)
            terms = [mp.binomial(n, k) * pm ** k * (1 - pm) ** (n - k) for k in range(n + 1)]
            ks = range(n + 1) if n <= 50 else sorted(set(list(range(0, 21)) + list(range(n - 20, n + 1))
                                                           + [int(n * p) + d for d in range(-10, 11)
                                                              if 0 <= int(n * p) + d <= n]))
            for k in ks:
                lower = mp.fsum(terms[:k + 1])
                upper = mp.fsum(terms[k:])
                rows.append([n, repr(p), k, repr(float(lower)), repr(float(upper))])
    out("binomial_tails.csv", ["n", "p", "k", "lower", "upper"], rows)


def chi2_upper():
    rows = []
    for df in [1, 2, 3, 4, 5, 7, 10, 20, 30, 50, 100, 200, 400]:
        for x in [0.001, 0.1, 0.5, 1, 2, 3.84, 5, 10, 20, 40, 60, 100, 150, 200, 300, 400, 500, 1000]:
            q = mp.gammainc(mp.mpf(df) / 2, mp.mpf(x) / 2, mp.inf, regularized=True)
            rows.append([df, repr(x), repr(float(q))])
    out("chi2_upper.csv", ["df", "x", "upper"], rows)


def t_lower(t, df):
    t = mp.mpf(t)
    df = mp.mpf(df)
    return mp.betainc(df / 2, mp.mpf(1) / 2, 0, df / (df + t * t), regularized=True) / 2


def t_cdf():
    rows = []
    for df in [1, 2, 2.5, 3, 3.7, 4.9, 7.25, 10, 17.3, 30, 100, 1000]:
        for t in [0, -0.1, -0.5, -1, -1.5, -2, -2.5, -3, -4, -5, -7.5, -10, -15, -20, -30, -50, -100]:
            rows.append([repr(float(df)), repr(float(t)), repr(float(t_lower(t, df)))])
    out("t_cdf.csv", ["df", "t", "cdf"], rows)


def t_quantile():
    rows = []
    for df in [1, 2, 2.5, 3, 3.7, 4.9, 7.25, 10, 17.3, 30, 100, 1000]:
        for p in [0.95, 0.975, 0.995]:
            q = mp.findroot(lambda t: 1 - t_lower(-t, df) - p, 2)
            rows.append([repr(float(df)), repr(p), repr(float(q))])
    out("t_quantile.csv", ["df", "p", "q"], rows)


if __name__ == "__main__":
    print("mpmath", mp.__version__)
    normal_quantiles()
    normal_cdf()
    binomial_tails()
    chi2_upper()
    t_cdf()
    t_quantile()
