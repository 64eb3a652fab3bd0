"""Cupel's ordering of duplicate pairs for the Thompson-Howarth grouping, shared by the reference scripts here.

PairGroups.sortByMean: pairs sorted by mean then |d|, then each run of equal means shuffled by Fisher-Yates with
SplitMix64 seeded by the run's index among the tied runs and its length (PairGroups.shuffleTies).
"""
import numpy as np

MASK = (1 << 64) - 1
GOLDEN = 0x9E3779B97F4A7C15


def mix(z):
    z = ((z ^ (z >> 30)) * 0xBF58476D1CE4E5B9) & MASK
    z = ((z ^ (z >> 27)) * 0x94D049BB133111EB) & MASK
    return z ^ (z >> 31)


def shuffle_ties(ms, ds):
    ds = ds.copy()
    n, start, run = len(ms), 0, 0
    while start < n:
        end = start + 1
        while end < n and ms[end] == ms[start]:
            end += 1
        if end - start > 1:
            state = (run * GOLDEN + (end - start)) & MASK
            for i in range(end - start - 1, 0, -1):
                state = (state + GOLDEN) & MASK
                j = mix(state) % (i + 1)
                ds[start + i], ds[start + j] = ds[start + j], ds[start + i]
            run += 1
        start = end
    return ds


def sort_pairs(m, d):
    """Means and |d| in Cupel's grouping order."""
    order = np.lexsort((d, m))
    ms = m[order]
    return ms, shuffle_ties(ms, d[order])
