"""Independent check of the ISO/TS 28037:2010 clause 6 example (worked-examples/iso-ts-28037-wls.json).

The example's data (x = 1..6, y = 3.2 4.3 7.6 8.6 11.7 12.8, u(y) = 0.5 0.5 0.5 1 1 1) are from memory, and so
are its printed a = 0.885, u(a) = 0.530 and chi2 = 4.131. The slope, its uncertainty, the covariance and an
inverse prediction are not recalled; this script computes them by hand from the weighted normal equations
(closed form with the sums S = sum w, Sx = sum w x, Sxx = sum w x^2, Sy, Sxy, w = 1/u(y)^2), which is not
the algorithm Quire uses (ISO/TS 28037 WLS1 with centred, weighted variables). Plain Python.
"""
import math

x = [1, 2, 3, 4, 5, 6]
y = [3.2, 4.3, 7.6, 8.6, 11.7, 12.8]
uy = [0.5, 0.5, 0.5, 1, 1, 1]
w = [1 / u ** 2 for u in uy]
S = sum(w)
Sx = sum(wi * xi for wi, xi in zip(w, x))
Sxx = sum(wi * xi * xi for wi, xi in zip(w, x))
Sy = sum(wi * yi for wi, yi in zip(w, y))
Sxy = sum(wi * xi * yi for wi, xi, yi in zip(w, x, y))
D = S * Sxx - Sx * Sx
b = (S * Sxy - Sx * Sy) / D
a = (Sxx * Sy - Sx * Sxy) / D
ua = math.sqrt(Sxx / D)
ub = math.sqrt(S / D)
cov = -Sx / D
chi2 = sum(wi * (yi - a - b * xi) ** 2 for wi, xi, yi in zip(w, x, y))
print("a = %.4f  u(a) = %.4f  b = %.4f  u(b) = %.4f  cov(a, b) = %.4f  chi2 = %.4f" % (a, ua, b, ub, cov, chi2))
# inverse use (ISO/TS 28037 6.6): x for a new indication y0 = 10 with u(y0) = 0.5
y0, u0 = 10.0, 0.5
x0 = (y0 - a) / b
ux0 = math.sqrt(u0 ** 2 + ua ** 2 + x0 ** 2 * ub ** 2 + 2 * x0 * cov) / abs(b)
print("inverse: y0 = 10, u(y0) = 0.5 -> x = %.4f, u(x) = %.4f" % (x0, ux0))
