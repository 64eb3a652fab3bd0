"""Reference CUSUM and EWMA values for org.cupel.control.crm tests.

Data: Montgomery, Introduction to Statistical Quality Control, Table 9.1 (30 observations, mu0 = 10,
sigma = 1; the mean shifts by 1 sigma after observation 22).
Tabular CUSUM (Montgomery, section 9.1): K = k*sigma, H = h*sigma, k = 0.5, h = 5.
EWMA (NIST/SEMATECH e-Handbook 6.3.2.4): E_i = lam*x_i + (1-lam)*E_{i-1}, E_0 = mu0,
limits mu0 +/- L*sigma*sqrt(lam/(2-lam)*(1-(1-lam)**(2i))), for (lam, L) = (0.1, 2.7) and (0.2, 3).

Run from this folder: /usr/bin/python3 montgomery_cusum_ewma.py > montgomery_cusum_ewma.csv
"""
import numpy as np

x = np.array([9.45, 7.99, 9.29, 11.66, 12.16, 10.18, 8.04, 11.46, 9.20, 10.34, 9.03, 11.47, 10.51, 9.40,
              10.08, 9.37, 10.62, 10.31, 8.52, 10.84, 10.90, 9.33, 12.29, 11.50, 10.60, 11.08, 10.38, 11.62,
              11.31, 10.52])
mu0, sigma = 10.0, 1.0


def cusum(k, h):
    cp, cm, up, lo = 0.0, 0.0, [], []
    for xi in x:
        cp = max(0.0, xi - (mu0 + k * sigma) + cp)
        cm = max(0.0, (mu0 - k * sigma) - xi + cm)
        up.append(cp)
        lo.append(cm)
    return np.array(up), np.array(lo)


def ewma(lam, width):
    e, prev = [], mu0
    for xi in x:
        prev = lam * xi + (1 - lam) * prev
        e.append(prev)
    i = np.arange(1, len(x) + 1)
    half = width * sigma * np.sqrt(lam / (2 - lam) * (1 - (1 - lam) ** (2 * i)))
    return np.array(e), mu0 - half, mu0 + half


up, lo = cusum(0.5, 5)
e1, l1, u1 = ewma(0.1, 2.7)
e2, l2, u2 = ewma(0.2, 3.0)
print("i,x,cusum_upper,cusum_lower,ewma01,ewma01_lcl,ewma01_ucl,ewma02,ewma02_lcl,ewma02_ucl")
for j in range(len(x)):
    print(",".join([str(j + 1)] + [repr(float(v)) for v in
                                   (x[j], up[j], lo[j], e1[j], l1[j], u1[j], e2[j], l2[j], u2[j])]))
