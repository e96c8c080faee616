"""NumPy peer of `quire montecarlo templates/gravimetric-emf-flow-point.json --trials 1e6`, end to end.

Run:  time python3 numpy_gravimetric_montecarlo.py [trials]
The template's model and input distributions (invented Tarrow Vale demo data), written out by hand from the
published formulas: air density by CIPM-2007 (Picard et al., Metrologia 45 (2008) 149), water density by
Tanaka et al. (Metrologia 38 (2001) 301) with compressibility and the dissolved-air correction, the buoyancy
factor of OIML D 28 for weights of density rho_ref. The Type A input N_ind is drawn from the scaled and shifted
t distribution of JCGM 101:2008 6.4.9.7. Prints for E and q the mean, standard deviation and both 95.45 %
coverage intervals (JCGM 101:2008 7.6, 7.7.2, 7.7.3), the figures the command prints. Trials outside a
function's range of validity are not screened here (the template's inputs stay inside), so this peer does
less work than Quire per trial.
"""
import sys

import numpy as np

P = 0.9545


def air_density(p, t, h):
    T = t + 273.15
    psv = np.exp(1.2378847e-5 * T * T - 1.9121316e-2 * T + 33.93711047 - 6.3431645e3 / T)
    f = 1.00062 + 3.14e-8 * p + 5.6e-7 * t * t
    xv = h * f * psv / p
    z = (1 - p / T * (1.58123e-6 - 2.9331e-8 * t + 1.1043e-10 * t * t + (5.707e-6 - 2.051e-8 * t) * xv
                      + (1.9898e-4 - 2.376e-6 * t) * xv * xv) + (p / T) ** 2 * (1.83e-11 - 0.765e-8 * xv * xv))
    ma = 28.96546e-3
    return p * ma / (z * 8.314472 * T) * (1 - xv * (1 - 18.01528e-3 / ma))


def water_density_air_saturated(t, p=None):
    rho = 999.974950 * (1 - (t - 3.983035) ** 2 * (t + 301.797) / (522528.9 * (t + 69.34881)))
    if p is not None:
        rho = rho * (1 + (50.74e-11 - 0.326e-11 * t + 0.00416e-11 * t * t) * (p - 101325.0))
    return rho - 4.612e-3 + 0.106e-3 * t


def buoyancy_factor(rho_a, rho_w, rho_ref):
    return (1 - 1.2 / 8000) / (1 - 1.2 / rho_ref) * (1 - rho_a / rho_ref) / (1 - rho_a / rho_w)


def draw(n, rng):
    readings = np.array([10013.2, 10009.6, 10012.8, 10010.1, 10014.0])
    u = rng.uniform
    return dict(
        I_net=rng.normal(997.1, 0.03, n), dI_res=0.02 * (u(-1, 1, n) + u(-1, 1, n)) / 2,
        dm_evap=u(0, 0.05, n), p_a=rng.normal(100650, 30, n), t_a=rng.normal(21.3, 0.25, n),
        h_a=u(0.38, 0.58, n), rho_ref=u(7000, 7600, n), t_tank=rng.normal(20.42, 0.025, n),
        dt_strat=u(-0.1, 0.1, n), drho_w=u(-0.02, 0.02, n), t_meter=rng.normal(20.55, 0.025, n),
        p_meter=rng.normal(280000, 5000, n), t_c=rng.normal(72.0, 0.001, n), dt_div=u(-0.01, 0.01, n),
        N_ind=readings.mean() + readings.std(ddof=1) / np.sqrt(5) * rng.standard_t(4, n),
        dN_res=u(-1, 1, n), d_inst=u(-0.0004, 0.0004, n), d_conv=u(-0.0002, 0.0002, n))


def model(x):
    rho_a = air_density(x["p_a"], x["t_a"], x["h_a"])
    rho_tank = water_density_air_saturated(x["t_tank"] + x["dt_strat"]) + x["drho_w"]
    rho_meter = water_density_air_saturated(x["t_meter"], x["p_meter"]) + x["drho_w"]
    m = (x["I_net"] + x["dI_res"]) * buoyancy_factor(rho_a, rho_tank, x["rho_ref"]) + x["dm_evap"]
    v_coll = m / rho_meter
    v_ref = v_coll * x["t_c"] / (x["t_c"] + x["dt_div"])
    v_meter = (x["N_ind"] + x["dN_res"]) / 10.0 / 1000 * (1 + x["d_inst"] + x["d_conv"])
    return 100 * (v_meter / v_ref - 1), 3600 * v_coll / (x["t_c"] + x["dt_div"])


def summarise(v, p=P):
    m = v.size
    q = int(np.floor(p * m + 0.5))
    tail = m - q
    part = np.partition(v, [tail - 1, q])
    low = np.sort(part[:tail])
    high = np.sort(part[q:])
    r = max(1, (tail + 1) // 2)
    j = int(np.argmin(high - low))
    return v.mean(), v.std(ddof=1), (low[r - 1], high[r - 1]), (low[j], high[j])


if __name__ == "__main__":
    trials = int(float(sys.argv[1])) if len(sys.argv) > 1 else 1_000_000
    rng = np.random.default_rng(20261202)
    e, q = model(draw(trials, rng))
    for name, v in (("E", e), ("q", q)):
        mean, sd, sym, short = summarise(v)
        print("Output %s\n  mean %.10g\n  standard uncertainty %.5g\n  symmetric interval [%.8g, %.8g]\n"
              "  shortest interval [%.8g, %.8g]" % (name, mean, sd, sym[0], sym[1], short[0], short[1]))
