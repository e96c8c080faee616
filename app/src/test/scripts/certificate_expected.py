"""Independent figures for the certificate tests (CertificateTest): the calibration of CertificateFixture,
recomputed from first principles with numpy and the standard library only.

Method: E = 100 (q_ind / q_ref - 1). Per point (JCGM 100:2008 4.2, 5.1, G.4): E at the mean readings plus the
repeatability R (Type A, s of the run errors / sqrt(n), nu = n - 1); u(q_ref) = U/k of the reference meter's
certificate, u(q_ind) = half-width / sqrt(3) (rectangular); nu_eff by Welch-Satterthwaite, truncated; k the
95.45 % two-sided quantile of Student's t (JCGM 100:2008 G.3), computed here by bisection on a numerically
integrated t density. U = k u_c; reported U = max(U, CMC) (ILAC P14). Adjustment: weighted mean error with
w = 1/u^2 and the full covariance (q_ref shared between points, JCGM 102:2011 6.2.1.3); C_new = C_old / (1 + Ew/100);
as left E' = 100 ((1 + E/100) s - 1), U' = s U with s = C_new / C_old. MPE = 0.5 % + 100 b / v with b = 1 mm/s,
v = q / (pi D^2 / 4), D = 100 mm; simple acceptance: conforms when |E| <= MPE.

Run: python3 app/src/test/scripts/certificate_expected.py
"""
import math
import numpy as np

Q_REF = [[10.012, 9.995, 10.004], [25.010, 24.985, 25.003], [60.02, 59.97, 60.01]]
Q_IND = [[10.101, 10.080, 10.096], [25.062, 25.041, 25.066], [60.09, 60.05, 60.11]]
U_REF, K_REF = 0.01, 2.0          # reference meter certificate, m3/h
HALF_IND = 0.005                  # display resolution half-width, m3/h
CMC = 0.052                       # % of reading
OLD = 1.0245
P = 0.9545


def t_pdf(x, nu):
    c = math.gamma((nu + 1) / 2) / (math.sqrt(nu * math.pi) * math.gamma(nu / 2))
    return c * (1 + x * x / nu) ** (-(nu + 1) / 2)


def t_central(k, nu):
    # P(|T| <= k) by Simpson's rule
    n = 4000
    xs = np.linspace(0, k, n + 1)
    ys = np.array([t_pdf(x, nu) for x in xs])
    h = k / n
    return 2 * h / 3 * (ys[0] + ys[-1] + 4 * ys[1:-1:2].sum() + 2 * ys[2:-1:2].sum())


def k_for(nu):
    if nu > 1e6:
        lo, hi = 0.0, 10.0
        f = lambda k: math.erf(k / math.sqrt(2))
    else:
        lo, hi = 0.0, 20.0
        f = lambda k: t_central(k, nu)
    for _ in range(60):
        mid = (lo + hi) / 2
        if f(mid) < P:
            lo = mid
        else:
            hi = mid
    return (lo + hi) / 2


u_ref = U_REF / K_REF
u_ind = HALF_IND / math.sqrt(3)
points = []
for refs, inds in zip(Q_REF, Q_IND):
    refs, inds = np.array(refs), np.array(inds)
    n = len(refs)
    e_runs = 100 * (inds / refs - 1)
    e = e_runs.mean()
    qr, qi = refs.mean(), inds.mean()
    s = e_runs.std(ddof=1)
    u_r = s / math.sqrt(n)
    c_ref = -100 * qi / qr ** 2
    c_ind = 100 / qr
    uc2 = (c_ref * u_ref) ** 2 + (c_ind * u_ind) ** 2 + u_r ** 2
    uc = math.sqrt(uc2)
    nu_eff = uc ** 4 / (u_r ** 4 / (n - 1))
    k = k_for(math.floor(nu_eff))
    U = k * uc
    mpe = 0.5 + 100 * 1e-3 / ((refs.mean() / 3600) / (math.pi * 0.1 ** 2 / 4))
    points.append(dict(q=qr, qi_found=qr * (1 + e / 100), e=e, uc=uc, nu=nu_eff, k=k, U=U, Urep=max(U, CMC),
                       c_ref=c_ref, mpe=mpe))

m = len(points)
cov = np.zeros((m, m))
for i, a in enumerate(points):
    for j, b in enumerate(points):
        cov[i, j] = a['c_ref'] * b['c_ref'] * u_ref ** 2 if i != j else a['uc'] ** 2
w = np.array([1 / p['uc'] ** 2 for p in points])
ew = (w * np.array([p['e'] for p in points])).sum() / w.sum()
u_ew = math.sqrt(w @ cov @ w) / w.sum()
new = OLD / (1 + ew / 100)
scale = new / OLD
for p in points:
    p['e_left'] = 100 * ((1 + p['e'] / 100) * scale - 1)
    p['U_left'] = scale * p['U']
    p['Urep_left'] = max(p['U_left'], CMC)
    p['conforms_left'] = abs(p['e_left']) <= p['mpe']
    p['conforms_found'] = abs(p['e']) <= p['mpe']

for i, p in enumerate(points):
    print("P%d q=%.6f E=%.6f uc=%.6f nu_eff=%.2f k=%.4f U=%.6f Urep=%.4f E_left=%.6f U_left=%.6f Urep_left=%.4f "
          "MPE=%.4f conforms_found=%s conforms_left=%s" % (i + 1, p['q'], p['e'], p['uc'], p['nu'], p['k'], p['U'],
          p['Urep'], p['e_left'], p['U_left'], p['Urep_left'], p['mpe'], p['conforms_found'], p['conforms_left']))
print("Ew=%.6f u(Ew)=%.6f C_new=%.9f scale=%.10f" % (ew, u_ew, new, scale))
