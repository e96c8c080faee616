"""Matched NumPy peer of `quire bench`: the Tarrow Vale benchmark budget (invented demo data), with the
same summaries that every Quire run computes for each output.

Run:  python3 numpy_benchmark_summaries.py [trials] [runs]
Per output: mean and standard deviation (JCGM 101:2008 7.6), the probabilistically symmetric and the
shortest 95.45 % coverage intervals from the order statistics (7.7.2, 7.7.3; the two tails put in order
by np.partition, then sorted), the 21 percentiles 0, 0.1 %, 0.5 %, 1 %, 2.5 %, 5 %, 10 % ... 99.9 %, 100 %
(np.quantile, linear interpolation) and a histogram of the values (np.histogram, Freedman-Diaconis bins).
Prints the median of `runs` timed runs as trials_per_second, in the same form as `quire bench`.
"""
import sys
import time

import numpy as np

from numpy_benchmark import model

P = 0.9545
PERCENTILES = [0.0, 0.001, 0.005, 0.01, 0.025, 0.05, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 0.95, 0.975,
               0.99, 0.995, 0.999, 1.0]


def draw(n, rng):
    return [
        rng.normal(1000.212, 0.006, n), rng.uniform(-0.005, 0.005, n), rng.uniform(-0.010, 0.010, n),
        rng.uniform(1.175, 1.215, n), np.full(n, 8000.0), rng.normal(20.42, 0.05, n), rng.normal(20.31, 0.05, n),
        rng.normal(120.0, 0.0005, n), rng.uniform(-0.010, 0.010, n), 1002.35 + 0.12 * rng.standard_t(4, n),
        rng.uniform(-5e-4, 5e-4, n), rng.uniform(-2e-4, 2e-4, n), rng.uniform(-0.005, 0.005, n)]


def summarise(v, p=P):
    m = v.size
    q = int(np.floor(p * m + 0.5))
    tail = m - q
    part = np.partition(v, [tail - 1, q])
    low = np.sort(part[:tail])       # order statistics 0 .. tail-1
    high = np.sort(part[q:])         # order statistics q .. m-1
    r = max(1, (tail + 1) // 2)      # JCGM 101:2008 7.7.2
    symmetric = (low[r - 1], high[r - 1])
    j = int(np.argmin(high - low))   # JCGM 101:2008 7.7.3
    shortest = (low[j], high[j])
    pct = np.quantile(v, PERCENTILES)
    iqr = pct[12] - pct[7]  # rough: 70 % - 20 %, only sets the bin count
    bins = int(max(10, min(200, np.ceil((pct[-1] - pct[0]) / (2 * iqr / np.cbrt(m)))))) if iqr > 0 else 10
    hist = np.histogram(v, bins=bins)
    return v.mean(), v.std(ddof=1), symmetric, shortest, pct, hist


def run(n, rng):
    e, q = model(draw(n, rng))
    return [summarise(e), summarise(q)]


if __name__ == "__main__":
    trials = int(float(sys.argv[1])) if len(sys.argv) > 1 else 2_000_000
    runs = int(sys.argv[2]) if len(sys.argv) > 2 else 3
    rng = np.random.default_rng(1)
    run(100_000, rng)
    seconds = []
    for r in range(runs):
        t0 = time.perf_counter()
        out = run(trials, rng)
        seconds.append(time.perf_counter() - t0)
        print("run %d: %.3f s, u(E) = %.5g %%, u(q) = %.5g m^3/h" % (r + 1, seconds[-1], out[0][1], out[1][1]))
    dt = sorted(seconds)[len(seconds) // 2]
    print("numpy_summaries trials_per_second=%.0f seconds=%.4f trials=%d" % (trials / dt, dt, trials))
