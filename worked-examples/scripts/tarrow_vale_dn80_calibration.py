#!/usr/bin/env python3
"""Independent recomputation of the Tarrow Vale DN 80 calibration (invented demonstration data).

Run from the repository root with no arguments: it reads the rig's runs
(worked-examples/calibration/tarrow-vale-dn80-runs.csv), recomputes every figure the worked example
worked-examples/tarrow-vale-dn80-calibration.json checks, compares each with the expected value committed
there within the tolerance stated there, prints every comparison, and exits 0 only when all agree.
With --write it writes its figures into that file's checks instead (how the expected values were made).

It does not call Quire. It restates the method (the model of one run of the method template
templates/tvfl-emf-gravimetric-calibration-run.json and the standard uncertainties of its inputs) and
evaluates it in its own way:
  * water density: Tanaka et al. (2001), Metrologia 38, 301, eq. (1), compressibility and dissolved-air
    corrections (coefficients from the paper);
  * buoyancy: m = I (1 - 1.2/8000)/(1 - 1.2/rho_ref) (1 - rho_a/rho_ref)/(1 - rho_a/rho_w) (OIML D 28
    conventional mass);
  * sensitivity coefficients by central differences (Quire uses automatic differentiation);
  * per point: mean of the run errors, s, u = s/sqrt(n), nu = n - 1 (JCGM 100:2008 4.2), u_c by the law of
    propagation (5.1.2), nu_eff by Welch-Satterthwaite (G.4.1) truncated to an integer, k = t_p(nu) for
    p = 0.9545 by numerical integration of the t density (G.3);
  * covariance between points: sum over inputs of c_p u c_q u rho (JCGM 102:2011 6.2.1.3) with the job
    file's declarations (shared 1, independent 0, correlated r; the repeatability independent);
  * weighted mean error with weights 1/u^2 and its uncertainty w' V w / (sum w)^2; new constant
    C_old / (1 + E_w/100);
  * CMC: reported U = max(U, CMC); MPE = 0.2 % + 1.5 mm/s / v over an 80 mm bore; simple acceptance;
    U <= MPE/3.
numpy only (no scipy).
"""
import csv
import json
import math
import sys

import numpy as np

EXAMPLE = "worked-examples/tarrow-vale-dn80-calibration.json"
RUNS = "worked-examples/calibration/tarrow-vale-dn80-runs.csv"
JOB = "worked-examples/calibration/tarrow-vale-dn80-job.json"

# The method's inputs: name -> (estimate or None for a per-run reading, standard uncertainty).
# Standard uncertainties from the template's stated evaluations: normal U/k, rectangular a/sqrt(3),
# triangular a/sqrt(6) (JCGM 100:2008 4.3.7 and 4.3.9).
INPUTS = {
    "I_full": (None, 0.0), "I_empty": (None, 0.0),
    "dI_bal": (0.0, 0.060 / 2), "dI_res": (0.0, 0.02 / math.sqrt(6)),
    "dm_evap": (0.025, 0.025 / math.sqrt(3)), "rho_a": (1.190, 0.003),
    "rho_ref": (7950.0, 50 / math.sqrt(3)), "t_tank": (None, 0.05 / 2), "t_meter": (None, 0.05 / 2),
    "p_meter": (None, 5000.0), "drho_w": (0.0, 0.02 / math.sqrt(3)), "t_c": (None, 0.002 / 2),
    "dt_div": (0.0, 0.010 / math.sqrt(3)), "N_p": (None, 0.0), "dN_res": (0.0, 1 / math.sqrt(3)),
    "k_pulse": (10.0, 0.0), "d_inst": (0.0, 0.0004 / math.sqrt(3)),
}
NAMES = list(INPUTS)
PER_RUN = [n for n in NAMES if INPUTS[n][0] is None]
P = 0.9545
CONSTANT = 1.2345


def rho_water(t, p=None):
    a1, a2, a3, a4, a5 = -3.983035, 301.797, 522528.9, 69.34881, 999.974950
    rho = a5 * (1 - (t + a1) ** 2 * (t + a2) / (a3 * (t + a4)))
    if p is not None:
        rho *= 1 + (50.74e-11 - 0.326e-11 * t + 0.00416e-11 * t * t) * (p - 101325)
    return rho + (-4.612e-3 + 0.106e-3 * t)


def model(x):
    v = dict(zip(NAMES, x))
    rho_tank = rho_water(v["t_tank"]) + v["drho_w"]
    rho_meter = rho_water(v["t_meter"], v["p_meter"]) + v["drho_w"]
    bf = (1 - 1.2 / 8000) / (1 - 1.2 / v["rho_ref"]) * (1 - v["rho_a"] / v["rho_ref"]) / (1 - v["rho_a"] / rho_tank)
    m = (v["I_full"] - v["I_empty"] + v["dI_bal"] + v["dI_res"]) * bf + v["dm_evap"]
    v_ref = m / rho_meter * v["t_c"] / (v["t_c"] + v["dt_div"])
    v_meter = (v["N_p"] + v["dN_res"]) / v["k_pulse"] / 1000 * (1 + v["d_inst"])
    return 100 * (v_meter / v_ref - 1), 3600 * m / rho_meter / (v["t_c"] + v["dt_div"])


def vector(readings):
    return np.array([readings[n] if INPUTS[n][0] is None else INPUTS[n][0] for n in NAMES], dtype=float)


def sensitivities(x):
    c = np.zeros(len(x))
    for i in range(len(x)):
        u = INPUTS[NAMES[i]][1]
        if u == 0:
            continue
        h = 1e-3 * u  # a step on the scale of the input's uncertainty: no cancellation, O(h^2) error
        xp, xm = x.copy(), x.copy()
        xp[i] += h
        xm[i] -= h
        c[i] = (model(xp)[0] - model(xm)[0]) / (2 * h)
    return c


def t_coverage(nu, p=P):
    """k with P(|t_nu| <= k) = p, by bisection on the numerically integrated t density."""
    if nu > 1e7:
        lo, hi = 0.0, 10.0
        for _ in range(200):
            mid = 0.5 * (lo + hi)
            lo, hi = (mid, hi) if math.erf(mid / math.sqrt(2)) < p else (lo, mid)
        return 0.5 * (lo + hi)
    const = math.exp(math.lgamma((nu + 1) / 2) - math.lgamma(nu / 2)) / math.sqrt(nu * math.pi)

    def central(k):
        xs = np.linspace(0, k, 40001)
        ys = const * (1 + xs * xs / nu) ** (-(nu + 1) / 2)
        h = xs[1] - xs[0]
        return 2 * h / 3 * (ys[0] + ys[-1] + 4 * ys[1:-1:2].sum() + 2 * ys[2:-1:2].sum())

    lo, hi = 0.0, 50.0
    for _ in range(80):
        mid = 0.5 * (lo + hi)
        lo, hi = (mid, hi) if central(mid) < p else (lo, mid)
    return 0.5 * (lo + hi)


def read_runs():
    series = {"as-found": {}, "as-left": {}}
    with open(RUNS, newline="", encoding="utf-8") as f:
        lines = [l for l in f if not l.startswith("#")]
    for row in csv.DictReader(lines):
        series[row["phase"]].setdefault(row["point"], []).append({n: float(row[n]) for n in PER_RUN})
    return series


def evaluate_series(points, rho, cmc, label):
    out, cu = {}, []
    for name, runs in points.items():
        n = len(runs)
        errors = np.array([model(vector(r))[0] for r in runs])
        flows = np.array([model(vector(r))[1] for r in runs])
        mean_readings = {k: np.mean([r[k] for r in runs]) for k in PER_RUN}
        x = vector(mean_readings)
        c = sensitivities(x)
        u = np.array([INPUTS[k][1] for k in NAMES])
        s = errors.std(ddof=1)
        u_rep = s / math.sqrt(n)
        uc = math.sqrt(float(np.sum((c * u) ** 2)) + u_rep ** 2)
        nu_eff = uc ** 4 / (u_rep ** 4 / (n - 1))
        k = t_coverage(max(1, math.floor(nu_eff + 1e-9)))
        big_u = k * uc
        q = float(flows.mean())
        c_at = next(r["expandedUncertainty"] for r in cmc if r["from"] <= q < r["to"])
        out[name] = dict(error=float(errors.mean()), s=float(s), u_rep=u_rep, u=uc, nu_eff=nu_eff, k=k, U=big_u,
                         flow=q, cmc=c_at, reported=max(big_u, c_at))
        cu.append(np.append(c * u, u_rep))
    cu = np.array(cu)
    rho_all = np.append(rho, 0.0)
    m = len(cu)
    cov = np.array([[np.sum(cu[p] * cu[q] * (1.0 if p == q else rho_all)) for q in range(m)] for p in range(m)])
    return out, cov


def conformity(pts):
    res = {}
    for name, p in pts.items():
        v = p["flow"] / 3600 / (math.pi * 0.080 ** 2 / 4)
        mpe = 0.2 + 100 * 0.0015 / v
        u = p["reported"] / p["k"]
        phi = lambda z: 0.5 * (1 + math.erf(z / math.sqrt(2)))
        pc = phi((mpe - p["error"]) / u) - phi((-mpe - p["error"]) / u)
        res[name] = dict(mpe=mpe, pc=pc, decision="conforms" if abs(p["error"]) <= mpe else "does not conform",
                         ratio=p["reported"] <= mpe / 3)
    return res


def figures():
    job = json.load(open(JOB, encoding="utf-8"))
    rho = []
    for n in NAMES:
        d = job["declarations"][n]
        rho.append({"shared": 1.0, "independent": 0.0}[d] if isinstance(d, str) else d["coefficient"])
    rho = np.array(rho)
    cmc = job["cmc"]["ranges"]
    runs = read_runs()
    found, cov = evaluate_series(runs["as-found"], rho, cmc, "as found")
    left, cov_left = evaluate_series(runs["as-left"], rho, cmc, "as left")
    names = list(found)
    w = np.array([1 / found[n]["u"] ** 2 for n in names])
    e = np.array([found[n]["error"] for n in names])
    ew = float(np.sum(w * e) / np.sum(w))
    uew = float(math.sqrt(w @ cov @ w) / np.sum(w))
    c_new = CONSTANT / (1 + ew / 100)
    u_c_new = CONSTANT / (1 + ew / 100) ** 2 * uew / 100
    scale = c_new / CONSTANT
    f = {}
    for name, p in found.items():
        for key, fig in (("error", "error"), ("runStandardDeviation", "s"), ("repeatabilityUncertainty", "u_rep"),
                         ("standardUncertainty", "u"), ("effectiveDof", "nu_eff"), ("coverageFactor", "k"),
                         ("expandedUncertainty", "U"), ("reportedExpandedUncertainty", "reported"), ("flow", "flow")):
            f[f"asFound.points.{name}.{key}"] = p[fig]
    for name, p in left.items():
        for key, fig in (("error", "error"), ("standardUncertainty", "u"), ("coverageFactor", "k"),
                         ("expandedUncertainty", "U"), ("reportedExpandedUncertainty", "reported")):
            f[f"asLeft.points.{name}.{key}"] = p[fig]
    for p in range(len(names)):
        for q in range(p + 1, len(names)):
            f[f"asFound.covariance.{p}.{q}"] = float(cov[p][q])
    f["asFound.correlation.0.4"] = float(cov[0][4] / math.sqrt(cov[0][0] * cov[4][4]))
    f["adjustment.errorRemoved"] = ew
    f["adjustment.errorRemovedUncertainty"] = uew
    f["adjustment.newConstant"] = c_new
    f["adjustment.newConstantUncertainty"] = u_c_new
    for series, pts in (("asFound", found), ("asLeft", left)):
        for name, c in conformity(pts).items():
            f[f"{series}.conformity.points.{name}.mpe"] = c["mpe"]
            f[f"{series}.conformity.points.{name}.probabilityOfConformity"] = c["pc"]
            f[f"{series}.conformity.points.{name}.decision"] = c["decision"]
            f[f"{series}.conformity.points.{name}.ratioMet"] = "true" if c["ratio"] else "false"
        f[f"{series}.conformity.overall"] = ("conforms" if all(c["decision"] == "conforms"
                                              for c in conformity(pts).values()) else "does not conform")
    # predicted as left: E' = 100 [(1 + E/100) s - 1], U' = s U, reported at the CMC where below it
    pred = {}
    for name, p in found.items():
        pe = 100 * ((1 + p["error"] / 100) * scale - 1)
        f[f"predicted|asLeft.points.{name}.error"] = pe
        f[f"predicted|asLeft.points.{name}.expandedUncertainty"] = p["U"] * scale
        f[f"predicted|asLeft.points.{name}.reportedExpandedUncertainty"] = max(p["U"] * scale, p["cmc"])
        pred[name] = dict(p, error=pe, reported=max(p["U"] * scale, p["cmc"]))
    for name, c in conformity(pred).items():
        f[f"predicted|asLeft.conformity.points.{name}.decision"] = c["decision"]
    return f


def tolerance(path):
    """Absolute tolerances: 1e-6 percentage points for errors, relative 1e-5 for uncertainties and
    covariances (central differences against exact derivatives), 1e-4 for k and p_c, 1e-3 relative for
    nu_eff (a truncation is not near an integer here, checked below)."""
    last = path.split(".")[-1]
    if last in ("error", "errorRemoved", "mpe", "flow"):
        return {"tolerance": 1e-6}
    if last in ("coverageFactor", "probabilityOfConformity"):
        return {"tolerance": 1e-4}
    if last == "effectiveDof":
        return {"relativeTolerance": 1e-3}
    if last == "newConstant":
        return {"tolerance": 1e-9}
    return {"relativeTolerance": 1e-5}


def main():
    f = figures()
    doc = json.load(open(EXAMPLE, encoding="utf-8"))
    if "--write" in sys.argv:
        checks = []
        for key, value in f.items():
            predicted = key.startswith("predicted|")
            path = key.split("|")[-1]
            check = {"figure": ("predicted " if predicted else "") + path, "compute": "calibration",
                     "arguments": {"file": "calibration/tarrow-vale-dn80-calibration.json"} | (
                         {"asLeft": "predicted"} if predicted else {}),
                     "path": path, "expected": value}
            if not isinstance(value, str):
                check.update(tolerance(path))
            checks.append(check)
        doc["checks"] = checks
        with open(EXAMPLE, "w", encoding="utf-8") as out:
            json.dump(doc, out, indent=2, ensure_ascii=False)
            out.write("\n")
        print(f"wrote {len(checks)} checks to {EXAMPLE}")
        return 0
    failed = 0
    seen = 0
    for check in doc["checks"]:
        key = ("predicted|" if check["arguments"].get("asLeft") == "predicted" else "") + check["path"]
        if key not in f:
            print(f"FAIL {check['figure']}: this script does not compute it")
            failed += 1
            continue
        seen += 1
        want, got = check["expected"], f[key]
        if isinstance(want, str):
            ok, tol = want == got, "exact"
        else:
            tol = check.get("tolerance", abs(want) * check.get("relativeTolerance", 0))
            ok = abs(got - want) <= tol * (1 + 1e-9)
        print(f"{'ok  ' if ok else 'FAIL'} {check['figure']:<58} committed {want!s:<22} recomputed {got!s:<22} "
              f"tolerance {tol}")
        failed += 0 if ok else 1
    for key, nu in f.items():
        if key.endswith("effectiveDof") and nu < 1000 and abs(nu - round(nu)) < 1e-3 * nu:
            print(f"FAIL {key}: nu_eff {nu} is too near an integer for its truncation to be checked")
            failed += 1
    print(f"{seen} figures compared with {EXAMPLE}, {failed} failed")
    return 1 if failed else 0


if __name__ == "__main__":
    sys.exit(main())
