"""Independent reference for the Tarrow Vale benchmark budget (invented demo data).

Run:  python3 numpy_benchmark.py [trials]
Prints (1) the GUM estimate and standard uncertainty of E and q computed by central finite
differences, for the checks in worked-examples/tarrow-vale-benchmark.json, and (2) the throughput of
a plain vectorised NumPy Monte Carlo of the same budget, for comparison with `quire bench`.
Nothing here is copied from Quire's output.
"""
import sys
import time

import numpy as np

A1, A2, A3, A4, A5 = -3.983035, 301.797, 522528.9, 69.34881, 999.974950  # Tanaka et al. (2001)


def rho_w(t):
    return A5 * (1 - (t + A1) ** 2 * (t + A2) / (A3 * (t + A4)))


def model(x):
    (i_net, d_res, d_evap, rho_a, rho_cal, t_tank, t_meter, t_c, d_div, v_ind, d_inst, d_elec, d_res_m) = x
    m = (i_net + d_res + d_evap) * (1 - rho_a / rho_cal) / (1 - rho_a / rho_w(t_tank))
    v_ref = 1000 * m / rho_w(t_meter)
    q = 3.6 * v_ref / (t_c + d_div)
    v_m = (v_ind + d_res_m) * (1 + d_inst + d_elec)
    e = 100 * (v_m - v_ref) / v_ref
    return np.array([e, q])


R3 = np.sqrt(3.0)
EST = np.array([1000.212, 0, 0, 1.195, 8000, 20.42, 20.31, 120.0, 0, 1002.35, 0, 0, 0])
U = np.array([0.006, 0.005 / R3, 0.010 / R3, 0.02 / R3, 0, 0.05, 0.05, 0.0005, 0.010 / R3, 0.12, 5e-4 / R3,
              2e-4 / R3, 0.005 / R3])
DOF = np.array([np.inf] * 9 + [4] + [np.inf] * 3)


def gum():
    y = model(EST)
    c = np.zeros((2, len(EST)))
    for i in range(len(EST)):
        if U[i] == 0:
            continue
        h = U[i] * 1e-3
        e = np.zeros(len(EST))
        e[i] = h
        c[:, i] = (model(EST + e) - model(EST - e)) / (2 * h)
    contrib = np.abs(c) * U
    uc = np.sqrt((contrib ** 2).sum(axis=1))
    nu = uc ** 4 / ((contrib ** 4 / DOF).sum(axis=1))
    return y, uc, nu


def monte_carlo(n, rng):
    x = [
        rng.normal(1000.212, 0.006, n), rng.uniform(-0.005, 0.005, n), rng.uniform(-0.010, 0.010, n),
        rng.uniform(1.175, 1.215, n), np.full(n, 8000.0), rng.normal(20.42, 0.05, n), rng.normal(20.31, 0.05, n),
        rng.normal(120.0, 0.0005, n), rng.uniform(-0.010, 0.010, n), 1002.35 + 0.12 * rng.standard_t(4, n),
        rng.uniform(-5e-4, 5e-4, n), rng.uniform(-2e-4, 2e-4, n), rng.uniform(-0.005, 0.005, n)]
    e, q = model(x)
    out = []
    for v in (e, q):
        s = np.sort(v)
        k = int(0.9545 * n)
        w = s[k:] - s[:n - k]
        j = int(np.argmin(w))
        out.append((v.mean(), v.std(ddof=1), np.quantile(v, [0.02275, 0.97725]), (s[j], s[j + k])))
    return out


if __name__ == "__main__":
    y, uc, nu = gum()
    print("GUM by central differences: E = %.6f %%  u = %.6f  nu_eff = %.1f" % (y[0], uc[0], nu[0]))
    print("                            q = %.6f m3/h u = %.6f  nu_eff = %.1f" % (y[1], uc[1], nu[1]))
    trials = int(float(sys.argv[1])) if len(sys.argv) > 1 else 2_000_000
    rng = np.random.default_rng(1)
    monte_carlo(100_000, rng)
    t0 = time.perf_counter()
    monte_carlo(trials, rng)
    dt = time.perf_counter() - t0
    print("numpy trials_per_second=%.0f seconds=%.3f trials=%d" % (trials / dt, dt, trials))
