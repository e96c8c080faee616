#!/usr/bin/env python3
"""Independent GUM check of the shipped budget templates (templates/*.json).

For each template this script
  * reads the input quantities' entered parameters (estimates, limits, certificates, readings) from the
    template file, and turns them into an estimate x_i and a standard uncertainty u(x_i) with its own
    formulas (JCGM 100:2008 4.2 Type A; 4.3.7 rectangular a/sqrt(3); 4.3.9 triangular a/sqrt(6);
    normal U/k);
  * evaluates the measurement model written out again here in plain Python, including its own
    implementation of the Tanaka et al. (2001) water-density formula and the CIPM-2007 air-density
    formula (Picard et al. 2008) - the model text of the template is NOT used;
  * propagates with the law of propagation of uncertainty (JCGM 100:2008 5.1.2, eq. 10) for uncorrelated
    inputs, with sensitivity coefficients from central finite differences (step 1e-3 u(x_i)), and the
    Welch-Satterthwaite formula (G.4.1, eq. G.2b) for nu_eff.

Plain Python 3, no third-party packages. Run from anywhere:
    python3 check_templates.py [path/to/templates]
It prints, for every output, the estimate, u_c, nu_eff and the share of the largest contribution, then the
lines of expected figures used by ShippedTemplatesTest.
"""
import json
import math
import os
import sys

# ---------------------------------------------------------------- densities, written out independently

# Tanaka, Girard, Davis, Peuto, Bignell (2001), Metrologia 38, 301: air-free SMOW at 101325 Pa.
TA1, TA2, TA3, TA4, TA5 = -3.983035, 301.797, 522528.9, 69.34881, 999.974950
# compressibility (k0, k1, k2) and dissolved air (s0, s1), same paper
TK0, TK1, TK2 = 50.74e-11, -0.326e-11, 0.00416e-11
TS0, TS1 = -4.612e-3, 0.106e-3


def tanaka(t, p=None, air_saturated=False):
    rho = TA5 * (1.0 - (t + TA1) ** 2 * (t + TA2) / (TA3 * (t + TA4)))
    if p is not None:
        rho *= 1.0 + (TK0 + TK1 * t + TK2 * t * t) * (p - 101325.0)
    if air_saturated:
        rho += TS0 + TS1 * t
    return rho


def cipm2007(p, t, h, xco2=0.0004):
    """Density of moist air, Picard, Davis, Glaeser, Fujii (2008), Metrologia 45, 149."""
    T = t + 273.15
    psv = math.exp(1.2378847e-5 * T * T - 1.9121316e-2 * T + 33.93711047 - 6.3431645e3 / T)
    f = 1.00062 + 3.14e-8 * p + 5.6e-7 * t * t
    xv = h * f * psv / p
    Z = (1.0 - p / T * (1.58123e-6 - 2.9331e-8 * t + 1.1043e-10 * t * t
                        + (5.707e-6 - 2.051e-8 * t) * xv + (1.9898e-4 - 2.376e-6 * t) * xv * xv)
         + (p / T) ** 2 * (1.83e-11 - 0.765e-8 * xv * xv))
    Ma = (28.96546 + 12.011 * (xco2 - 0.0004)) * 1e-3
    Mv = 18.01528e-3
    R = 8.314472
    return p * Ma / (Z * R * T) * (1.0 - xv * (1.0 - Mv / Ma))


def buoyancy(rho_a, rho_w, rho_ref=8000.0):
    """Balance indication (conventional mass of weights of density rho_ref) to true mass, OIML D 28."""
    return ((1 - 1.2 / 8000.0) / (1 - 1.2 / rho_ref)) * (1 - rho_a / rho_ref) / (1 - rho_a / rho_w)


def self_check():
    """The density formulas above against published figures, before they are used."""
    # Tanaka et al. (2001) table, kg/m^3 to 4 decimals as printed
    for t, rho in ((0, 999.8428), (4, 999.9749), (10, 999.7027), (15, 999.1026), (20, 998.2067),
                   (25, 997.0470), (30, 995.6488), (40, 992.2152)):
        assert abs(tanaka(t) - rho) <= 0.5e-4, (t, tanaka(t), rho)
    # CIPM-2007 at 101325 Pa, 20 degC, 50 % RH, 400 ppm CO2: 1.199314 kg/m^3 recomputed from the published
    # constants (no printed check value); the simplified formula of OIML R 111-1 (from memory) agrees to
    # a few parts in 1e5 (here 2e-5 kg/m^3), a coarse check that the constants are not mistyped
    assert abs(cipm2007(101325.0, 20.0, 0.5) - 1.199314) <= 0.5e-6, cipm2007(101325.0, 20.0, 0.5)
    oiml = (0.34848 * 1013.25 - 0.009 * 50 * math.exp(0.061 * 20)) / (273.15 + 20)
    assert abs(cipm2007(101325.0, 20.0, 0.5) - oiml) < 1e-4, oiml


# ---------------------------------------------------------------- the models, written out again

def gravimetric(x):
    rho_a = cipm2007(x["p_a"], x["t_a"], x["h_a"])
    rho_tank = tanaka(x["t_tank"] + x["dt_strat"], air_saturated=True) + x["drho_w"]
    rho_meter = tanaka(x["t_meter"], x["p_meter"], air_saturated=True) + x["drho_w"]
    m = (x["I_net"] + x["dI_res"]) * buoyancy(rho_a, rho_tank, x["rho_ref"]) + x["dm_evap"]
    v_coll = m / rho_meter
    v_ref = v_coll * x["t_c"] / (x["t_c"] + x["dt_div"])
    v_meter = (x["N_ind"] + x["dN_res"]) / x["k_pulse"] / 1000.0 * (1 + x["d_inst"] + x["d_conv"])
    return {"E": 100 * (v_meter / v_ref - 1), "q": 3600 * v_coll / (x["t_c"] + x["dt_div"])}


def master(x):
    rho_m = tanaka(x["t_m"], x["p_m"])
    rho_mut = tanaka(x["t_mut"], x["p_mut"])
    v_m = (x["N_m"] / x["K_m"] * x["MF"] * (1 + x["d_interp"] + x["d_drift"])
           * (1 + x["alpha_m"] * (x["t_m"] - x["t_mcal"])))
    v_ref = v_m * rho_m / rho_mut
    v_mut = (x["N_mut"] + x["dN_mut"]) / x["K_mut"] * (1 - x["dt_gate"] / x["t_run"])
    return {"E": 100 * (v_mut / v_ref - 1)}


def clamp_on(x):
    d_i = (x["C_tape"] * (1 + x["alpha_tape"] * (x["t_tape"] - 20.0)) / math.pi
           - 2 * x["e_coat"] - 2 * (x["e_wall"] + x["de_gauge"])) / 1000.0
    v = (x["v_cl"] * (1 + x["d_cal"]) * (1 + x["d_straight"] + x["d_profile"] + x["d_spacing"])
         * (1 + x["beta_w"] * (x["t_w"] - x["t_set"])))
    q_ref = 3600 * math.pi * d_i * d_i / 4 * v
    v_ref = q_ref / 3600 * (x["T_cmp"] + x["dt_sync"])
    return {"E": 100 * (x["V_mut"] / v_ref - 1), "q_ref": q_ref}


def emf_electronics(x):
    def indicated(v):
        e = 1e6 * x["k_m"] * x["b"] * x["d"] * v          # Faraday: e = k B D v, in microvolts
        return x["g"] * (e + x["e_zero"] + x["e_ad"]) / x["s_cal"] + x["r_out"]
    vi_lo = indicated(x["v_lo"])
    vi_hi = indicated(x["v_hi"])
    area = math.pi * x["d"] ** 2 / 4
    return {"E_lo": 100 * (vi_lo / x["v_lo"] - 1), "E_hi": 100 * (vi_hi / x["v_hi"] - 1),
            "q_lo": 3600 * area * vi_lo, "q_hi": 3600 * area * vi_hi}


def proving_tank(x):
    t = x["t_tank"] + x["dt_strat"]
    rho_tank = tanaka(t)
    rho_meter = tanaka(x["t_meter"], x["p_meter"])
    v_tank = (x["V_20"] + x["h_neck"] + x["d_drain"]) * (1 + x["alpha_t"] * (t - 20.0)) ** 3
    v_ref = v_tank * rho_tank / rho_meter
    return {"E": 100 * ((x["V_ind"] + x["dV_res"]) / v_ref - 1)}


def gravimetric_run(x):
    rho_tank = tanaka(x["t_tank"], air_saturated=True) + x["drho_w"]
    rho_meter = tanaka(x["t_meter"], x["p_meter"], air_saturated=True) + x["drho_w"]
    m = (x["I_full"] - x["I_empty"] + x["dI_bal"] + x["dI_res"]) * buoyancy(x["rho_a"], rho_tank, x["rho_ref"]) \
        + x["dm_evap"]
    v_ref = m / rho_meter * x["t_c"] / (x["t_c"] + x["dt_div"])
    v_meter = (x["N_p"] + x["dN_res"]) / x["k_pulse"] / 1000.0 * (1 + x["d_inst"])
    return {"E": 100 * (v_meter / v_ref - 1), "q": 3600 * m / rho_meter / (x["t_c"] + x["dt_div"])}


MODELS = {
    "gravimetric-emf-flow-point.json": gravimetric,
    "master-meter-comparison.json": master,
    "field-verification-clamp-on.json": clamp_on,
    "emf-electronics-low-velocity.json": emf_electronics,
    "volumetric-proving-tank.json": proving_tank,
    "tvfl-emf-gravimetric-calibration-run.json": gravimetric_run,
}

# ---------------------------------------------------------------- inputs: x_i, u(x_i), nu_i


def input_estimate(ev):
    """(x, u, nu) from the entered parameters, for the distributions the templates use."""
    if ev["type"] == "A":
        if "readings" in ev:
            r = ev["readings"]
            n = len(r)
            mean = sum(r) / n
            s = math.sqrt(sum((v - mean) ** 2 for v in r) / (n - 1))
            return mean, s / math.sqrt(n), n - 1
        raise ValueError("only Type A with readings is used by the templates")
    dist = ev["distribution"]
    if dist == "constant":
        return ev["estimate"], 0.0, math.inf
    if dist == "normal":
        if "standardUncertainty" in ev:
            u = ev["standardUncertainty"]
        else:
            u = ev["expandedUncertainty"] / ev["coverageFactor"]
        return ev["estimate"], u, math.inf
    if dist in ("rectangular", "triangular"):
        if "halfWidth" in ev:
            x, a = ev["estimate"], ev["halfWidth"]
        else:
            x, a = (ev["lower"] + ev["upper"]) / 2, (ev["upper"] - ev["lower"]) / 2
        return x, a / math.sqrt(3 if dist == "rectangular" else 6), math.inf
    raise ValueError("distribution not handled here: " + dist)


def gum(model, inputs):
    x = {}
    u = {}
    nu = {}
    for q in inputs:
        x[q["name"]], u[q["name"]], nu[q["name"]] = input_estimate(q["evaluation"])
    y = model(x)
    result = {}
    for out in y:
        contributions = {}
        for name in x:
            if u[name] == 0:
                continue
            h = 1e-3 * u[name]
            hi = dict(x)
            lo = dict(x)
            hi[name] += h
            lo[name] -= h
            c = (model(hi)[out] - model(lo)[out]) / (2 * h)
            contributions[name] = c * u[name]
        uc = math.sqrt(sum(v * v for v in contributions.values()))
        ws = sum(v ** 4 / nu[k] for k, v in contributions.items() if math.isfinite(nu[k]) and v != 0)
        nu_eff = uc ** 4 / ws if ws > 0 else math.inf
        top = max(contributions, key=lambda k: abs(contributions[k]))
        result[out] = (y[out], uc, nu_eff, top, contributions[top] ** 2 / uc ** 2)
    return result


def main():
    self_check()
    here = os.path.dirname(os.path.abspath(__file__))
    folder = sys.argv[1] if len(sys.argv) > 1 else os.path.join(here, "..", "..", "..", "..", "..", "templates")
    java = []
    for file, model in MODELS.items():
        with open(os.path.join(folder, file), encoding="utf-8") as fh:
            budget = json.load(fh)
        print(file)
        for out, (y, uc, nu_eff, top, share) in gum(model, budget["inputs"]).items():
            print("  %-6s y = %.12g  u_c = %.8g  nu_eff = %.1f  largest: %s (%.1f %% of u_c^2)"
                  % (out, y, uc, nu_eff, top, 100 * share))
            # printed digits: estimate to 9 significant digits, u_c to 6; tolerance half a unit in the last
            ey = 10 ** (math.floor(math.log10(abs(y))) - 8) / 2
            eu = 10 ** (math.floor(math.log10(uc)) - 5) / 2
            java.append('expect("%s", "%s", %s, %s, %s, %s);'
                        % (file, out, "%#.9g" % y, "%.0e" % ey, "%#.6g" % uc, "%.0e" % eu))
    print()
    print("\n".join(java))


if __name__ == "__main__":
    main()
