"""Independent check of the Tarrow Vale demo (worked-examples/tarrow-vale-emf-six-point.json).

Invented data: the Tarrow Vale Flow Laboratory's calibration of an electromagnetic meter (DN50, Q3 = 25 m3/h,
R = 160, OIML R 49 class 2) at six flow points. This script does not use Quire. It recomputes every figure the
worked example checks, by other routes than Quire's:

* the generalized distance regression line (ISO/TS 28037:2010 clause 7) by Gauss-Newton on the FULL problem
  in the unknowns (a, b, X_1..X_n) with numpy.linalg.lstsq, uncertainties from (J^T J)^-1 of that problem;
* the flow-range results by stacking all inputs of all points into one vector and propagating with a
  numerical (central-difference) Jacobian J: U_y = J U_x J^T (JCGM 102:2011 6.2.1.3);
* probabilities of conformity with math.erf (JCGM 106:2012 7.2) and guarded acceptance w = U (ILAC G8).

Run with plain Python 3 and NumPy: python3 tarrow_vale_emf_six_point.py
"""
import math
import numpy as np

q_ref = np.array([0.1602, 0.2504, 2.5011, 10.0032, 24.9870, 31.2410])     # m3/h, rig master meter
u_q_ref = np.array([0.00008, 0.00013, 0.0013, 0.005, 0.0125, 0.0156])    # random part, 0.05 %
q_ind = np.array([0.16466, 0.25463, 2.50195, 9.99172, 24.95198, 31.19588])  # m3/h, meter under test
u_q_ind = np.array([0.0005, 0.0004, 0.0013, 0.005, 0.0125, 0.0156])      # repeatability of the mean
u_e_ref = 0.002 / 2          # reference standard, certificate U = 0.2 %, k = 2 (shared by all points)
u_res = 0.0005 / math.sqrt(3)  # indication resolution 0.001 m3/h, rectangular +-0.0005
n = len(q_ref)

# --- GDR on the full problem -------------------------------------------------------------------------------
def residuals(p):
    a, b, X = p[0], p[1], p[2:]
    return np.concatenate([(q_ref - X) / u_q_ref, (q_ind - a - b * X) / u_q_ind])

def jacobian(p):
    a, b, X = p[0], p[1], p[2:]
    J = np.zeros((2 * n, n + 2))
    for i in range(n):
        J[i, 2 + i] = -1 / u_q_ref[i]
        J[n + i, 0] = -1 / u_q_ind[i]
        J[n + i, 1] = -X[i] / u_q_ind[i]
        J[n + i, 2 + i] = -b / u_q_ind[i]
    return J

p = np.concatenate([[0.0, 1.0], q_ref])
for _ in range(100):
    step, *_ = np.linalg.lstsq(jacobian(p), -residuals(p), rcond=None)
    p = p + step
    if np.max(np.abs(step[:2])) < 1e-15:
        break
J = jacobian(p)
V = np.linalg.inv(J.T @ J)[:2, :2]
a, b = p[0], p[1]
chi2 = float(np.sum(residuals(p) ** 2))
print("GDR: a = %.7f  b = %.7f  u(a) = %.7f  u(b) = %.7f  cov = %.4e  r = %.5f  chi2 = %.4f"
      % (a, b, math.sqrt(V[0, 0]), math.sqrt(V[1, 1]), V[0, 1], V[0, 1] / math.sqrt(V[0, 0] * V[1, 1]), chi2))
# chi-squared 95 % quantile for nu = 4 is 9.488 (statistical tables): consistent when chi2 <= 9.488

# --- the calibrated flow at the base point: q_cal = (q_ind - a) / b ------------------------------------------
def q_cal(v):
    return (v[0] - v[1]) / v[2]
x = np.array([q_ind[3], a, b])
Ux = np.zeros((3, 3))
Ux[0, 0] = u_q_ind[3] ** 2
Ux[1:, 1:] = V
g = np.array([(q_cal(x + h) - q_cal(x - h)) / (2 * hh) for h, hh in
              ((np.eye(3)[k] * 1e-6, 1e-6) for k in range(3))])
print("q_cal = %.6f  u = %.6f" % (q_cal(x), math.sqrt(g @ Ux @ g)))

# --- flow range: stack [e_ref, (q_ref_p, q_ind_p, dq_res_p) for p] -------------------------------------------
def errors(v):
    e_ref = v[0]
    out = []
    for k in range(n):
        qr, qi, dq = v[1 + 3 * k], v[2 + 3 * k], v[3 + 3 * k]
        out.append(100 * ((qi + dq) / (qr * (1 + e_ref)) - 1))
    return np.array(out)

x0 = [0.0]
u = [u_e_ref]
for k in range(n):
    x0 += [q_ref[k], q_ind[k], 0.0]
    u += [u_q_ref[k], u_q_ind[k], u_res]
x0 = np.array(x0)
Ux = np.diag(np.array(u) ** 2)
m = len(x0)
J = np.zeros((n, m))
for j in range(m):
    h = 1e-7 * max(1.0, abs(x0[j]))
    e = np.zeros(m)
    e[j] = h
    J[:, j] = (errors(x0 + e) - errors(x0 - e)) / (2 * h)
Uy = J @ Ux @ J.T
E = errors(x0)
uE = np.sqrt(np.diag(Uy))
R = Uy / np.outer(uE, uE)
k = 2.0  # coverage factor fixed in the budget's settings
print("flow-range table (E in %):")
for i in range(n):
    print("  %8.4f  E = %.4f  u = %.4f  U = %.4f  U/|E| = %.4f" % (q_ref[i], E[i], uE[i], k * uE[i], k * uE[i] / abs(E[i])))
print("correlation:")
for row in R:
    print("  " + " ".join("%.4f" % v for v in row))

# --- conformity: OIML R 49 class 2, Q3 = 25 m3/h, R = 160, water at 18.5 degC; guarded acceptance w = U ------
q1 = 25 / 160
q2 = 1.6 * q1
def phi(z):
    return 0.5 * (1 + math.erf(z / math.sqrt(2)))
for i in range(n):
    mpe = 5.0 if q_ref[i] < q2 else 2.0
    U = k * uE[i]
    pc = phi((mpe - E[i]) / uE[i]) - phi((-mpe - E[i]) / uE[i])
    decision = "conforms" if (-mpe + U) <= E[i] <= (mpe - U) else "does not conform"
    print("  %8.4f  MPE +-%.0f %%  p_c = %.4f  %s" % (q_ref[i], mpe, pc, decision))
