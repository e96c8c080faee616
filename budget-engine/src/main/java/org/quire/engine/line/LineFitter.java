package org.quire.engine.line;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;

/**
 * Fits a straight line y = a + b (x - x0) to a {@link CalibrationData} set by one of the {@link LineMethod}s.
 *
 * <p>Options are changed with the {@code with...} methods, each returning a new fitter: the reference
 * {@code x0} (default 0; JCGM 100 H.3 uses t0 = 20 °C, and x0 = the mean of x makes a and b uncorrelated for
 * ordinary least squares), the probability of the chi-squared check (default 0.95), and for generalized
 * distance regression the iteration limit (default 200) and relative tolerance (default 1e-10 of the standard
 * uncertainties). Immutable and thread-safe.
 *
 * <p>Algorithms (with t_i = x_i - x0):
 * <ul>
 *   <li>Ordinary least squares: b = sum (t_i - t̄)(y_i - ȳ) / S_tt, a = ȳ - b t̄, s^2 = sum r_i^2 / (n - 2),
 *   u^2(b) = s^2 / S_tt, u^2(a) = s^2 (1/n + t̄^2 / S_tt), cov(a, b) = -s^2 t̄ / S_tt.
 *   References: JCGM 100:2008 H.3.2 to H.3.3, equations H.13 to H.15.</li>
 *   <li>Weighted least squares, w_i = 1 / u(y_i): F^2 = sum w_i^2, g0 = sum w_i^2 t_i / F^2,
 *   h0 = sum w_i^2 y_i / F^2, g_i = w_i (t_i - g0), h_i = w_i (y_i - h0), G^2 = sum g_i^2,
 *   b = sum g_i h_i / G^2, a = h0 - b g0, u^2(a) = 1/F^2 + g0^2/G^2, u^2(b) = 1/G^2, cov(a, b) = -g0/G^2,
 *   chi^2 = sum w_i^2 r_i^2. References: ISO/TS 28037:2010 6.3, algorithm WLS1.</li>
 *   <li>Generalized distance regression: minimises sum [(x_i - X_i)^2 / u^2(x_i) + (y_i - a - b X_i)^2 /
 *   u^2(y_i)] over a, b and the footpoints X_i. Starting from the weighted least-squares line, each step
 *   computes s_i = (u^2(y_i) + b^2 u^2(x_i))^-1/2, the footpoints t*_i = (t_i u^2(y_i) + (y_i - a) b
 *   u^2(x_i)) s_i^2 and z_i = y_i - a - b t_i, and corrects a and b by the weighted least-squares solution of
 *   z_i on t*_i with weights s_i (the Gauss-Newton step). Uncertainties come from the same weighted system at
 *   the solution; chi^2 = sum s_i^2 z_i^2. References: ISO/TS 28037:2010 7.3, algorithm GDR1.</li>
 *   <li>Gauss-Markov regression: with U_y = L L^T (Cholesky), solves L f = y, L g0 = 1, L g1 = t and fits f by
 *   ordinary least squares on (g0, g1) with unit variance; cov(a, b) = (A^T A)^-1, chi^2 = |L^-1 r|^2.
 *   References: ISO/TS 28037:2010 8.3, algorithm GMR1.</li>
 * </ul>
 * The chi-squared quantile comes from Commons Math's {@link ChiSquaredDistribution}.
 */
public final class LineFitter {
    private static final int DEFAULT_ITERATIONS = 200;
    private static final double DEFAULT_TOLERANCE = 1e-10;

    private final LineMethod method;
    private final double referenceX;
    private final double probability;
    private final int maxIterations;
    private final double tolerance;

    private LineFitter(LineMethod method, double referenceX, double probability, int maxIterations,
            double tolerance) {
        this.method = method;
        this.referenceX = referenceX;
        this.probability = probability;
        this.maxIterations = maxIterations;
        this.tolerance = tolerance;
    }

    /** @return a fitter with the given method and the default options */
    public static LineFitter of(LineMethod method) {
        if (method == null) {
            throw new IllegalArgumentException(LineMessages.missing("line-fitting method"));
        }
        return new LineFitter(method, 0.0, 0.95, DEFAULT_ITERATIONS, DEFAULT_TOLERANCE);
    }

    /** @return a fitter for the line y = a + b (x - x0) */
    public LineFitter withReferenceX(double x0) {
        if (!Double.isFinite(x0)) {
            throw new IllegalArgumentException(LineMessages.notFinite("reference x0", x0));
        }
        return new LineFitter(method, x0, probability, maxIterations, tolerance);
    }

    /** @return a fitter whose chi-squared check uses the quantile at probability p (0 &lt; p &lt; 1) */
    public LineFitter withConsistencyProbability(double p) {
        if (!(p > 0 && p < 1)) {
            throw new IllegalArgumentException(LineMessages.probability("consistency probability", p));
        }
        return new LineFitter(method, referenceX, p, maxIterations, tolerance);
    }

    /** @return a fitter allowing at most {@code n} Gauss-Newton iterations (generalized distance regression) */
    public LineFitter withIterationLimit(int n) {
        if (n < 1) {
            throw new IllegalArgumentException(LineMessages.fmt("iteration limit must be at least 1, not %d", n));
        }
        return new LineFitter(method, referenceX, probability, n, tolerance);
    }

    /**
     * @return a fitter whose Gauss-Newton iteration stops when both increments are at most {@code tol} times
     *     the standard uncertainties of a and b
     */
    public LineFitter withTolerance(double tol) {
        if (!(tol > 0 && tol < 1)) {
            throw new IllegalArgumentException(LineMessages.probability("tolerance", tol));
        }
        return new LineFitter(method, referenceX, probability, maxIterations, tol);
    }

    /** @return the method */
    public LineMethod method() {
        return method;
    }

    /** @return the reference x0 */
    public double referenceX() {
        return referenceX;
    }

    /**
     * Fits the line.
     *
     * @param data the calibration data
     * @return the fitted line
     * @throws IllegalArgumentException when the data lack what the method needs (a positive u(y) at some
     *     point, a covariance matrix, a positive definite covariance matrix); the message names the point
     * @throws ArithmeticException when generalized distance regression does not converge
     */
    public LineFit fit(CalibrationData data) {
        if (data == null) {
            throw new IllegalArgumentException(LineMessages.missing("calibration data"));
        }
        List<CalibrationPoint> pts = data.points();
        int n = pts.size();
        double[] t = new double[n];
        double[] y = new double[n];
        double[] ux = new double[n];
        double[] uy = new double[n];
        boolean anyUx = false;
        boolean allUy = true;
        for (int i = 0; i < n; i++) {
            CalibrationPoint p = pts.get(i);
            t[i] = p.x() - referenceX;
            y[i] = p.y();
            ux[i] = p.ux();
            uy[i] = p.uy();
            anyUx |= ux[i] > 0;
            allUy &= uy[i] > 0;
            if (method.needsUy() && !(uy[i] > 0)) {
                throw new IllegalArgumentException(
                        LineMessages.row(i + 1, LineMessages.uncertaintyNeeded(method.title(), "u(y)", uy[i])));
            }
        }
        List<String> notes = new ArrayList<>();
        if (anyUx && !method.usesUx()) {
            notes.add("u(x) is stated but not used by " + method.title() + ": x is taken as exact");
        }
        switch (method) {
            case ORDINARY_LEAST_SQUARES:
                if (allUy) {
                    notes.add("u(y) is used only for the chi-squared check; u(a) and u(b) come from the scatter s");
                }
                return ols(data, t, y, allUy ? uy : null, notes);
            case WEIGHTED_LEAST_SQUARES:
                return wls(data, t, y, uy, notes);
            case GENERALIZED_DISTANCE:
                return gdr(data, t, y, ux, uy, notes);
            case GAUSS_MARKOV:
                return gmr(data, t, y, notes);
            default:
                throw new IllegalStateException(method.name());
        }
    }

    private double quantile(int nu) {
        return new ChiSquaredDistribution(null, nu).inverseCumulativeProbability(probability);
    }

    private LineFit ols(CalibrationData data, double[] t, double[] y, double[] uy, List<String> notes) {
        int n = t.length;
        double tm = 0;
        double ym = 0;
        for (int i = 0; i < n; i++) {
            tm += t[i];
            ym += y[i];
        }
        tm /= n;
        ym /= n;
        double stt = 0;
        double sty = 0;
        for (int i = 0; i < n; i++) {
            stt += (t[i] - tm) * (t[i] - tm);
            sty += (t[i] - tm) * (y[i] - ym);
        }
        double b = sty / stt;
        double a = ym - b * tm;
        double[] r = new double[n];
        double ss = 0;
        for (int i = 0; i < n; i++) {
            r[i] = y[i] - a - b * t[i];
            ss += r[i] * r[i];
        }
        double s2 = ss / (n - 2);
        double s = Math.sqrt(s2);
        double[] z = new double[n];
        double chi2 = Double.NaN;
        if (uy != null) {
            chi2 = 0;
        }
        for (int i = 0; i < n; i++) {
            z[i] = s > 0 ? r[i] / s : 0.0;
            if (uy != null) {
                chi2 += (r[i] / uy[i]) * (r[i] / uy[i]);
            }
        }
        double ub2 = s2 / stt;
        double ua2 = s2 * (1.0 / n + tm * tm / stt);
        double cov = -s2 * tm / stt;
        return new LineFit(data, method, referenceX, a, b, Math.sqrt(ua2), Math.sqrt(ub2), cov, r, z, chi2,
                quantile(n - 2), probability, s, 0, notes);
    }

    /** Weighted least squares of y on t with weights w (w_i = 1/u(y_i)): {a, b, u2a, u2b, cov}. */
    private static double[] weighted(double[] t, double[] y, double[] w) {
        int n = t.length;
        double f2 = 0;
        double g0 = 0;
        double h0 = 0;
        for (int i = 0; i < n; i++) {
            double w2 = w[i] * w[i];
            f2 += w2;
            g0 += w2 * t[i];
            h0 += w2 * y[i];
        }
        g0 /= f2;
        h0 /= f2;
        double gg = 0;
        double gh = 0;
        for (int i = 0; i < n; i++) {
            double gi = w[i] * (t[i] - g0);
            double hi = w[i] * (y[i] - h0);
            gg += gi * gi;
            gh += gi * hi;
        }
        double b = gh / gg;
        double a = h0 - b * g0;
        return new double[] {a, b, 1.0 / f2 + g0 * g0 / gg, 1.0 / gg, -g0 / gg};
    }

    private LineFit wls(CalibrationData data, double[] t, double[] y, double[] uy, List<String> notes) {
        int n = t.length;
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = 1.0 / uy[i];
        }
        double[] p = weighted(t, y, w);
        double[] r = new double[n];
        double[] z = new double[n];
        double chi2 = 0;
        for (int i = 0; i < n; i++) {
            r[i] = y[i] - p[0] - p[1] * t[i];
            z[i] = w[i] * r[i];
            chi2 += z[i] * z[i];
        }
        return new LineFit(data, method, referenceX, p[0], p[1], Math.sqrt(p[2]), Math.sqrt(p[3]), p[4], r, z,
                chi2, quantile(n - 2), probability, Double.NaN, 0, notes);
    }

    private LineFit gdr(CalibrationData data, double[] t, double[] y, double[] ux, double[] uy,
            List<String> notes) {
        int n = t.length;
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = 1.0 / uy[i];
        }
        double[] p = weighted(t, y, w);
        double a = p[0];
        double b = p[1];
        double[] s = new double[n];
        double[] foot = new double[n];
        double[] z = new double[n];
        double[] step = null;
        int it = 0;
        while (true) {
            for (int i = 0; i < n; i++) {
                double vy = uy[i] * uy[i];
                double vx = ux[i] * ux[i];
                double s2 = 1.0 / (vy + b * b * vx);
                s[i] = Math.sqrt(s2);
                foot[i] = (t[i] * vy + (y[i] - a) * b * vx) * s2;
                z[i] = y[i] - a - b * t[i];
            }
            if (step != null && Math.abs(step[0]) <= tolerance * Math.sqrt(step[2])
                    && Math.abs(step[1]) <= tolerance * Math.sqrt(step[3])) {
                break;
            }
            if (it == maxIterations) {
                throw new ArithmeticException(LineMessages.noConvergence(it, step[0], step[1]));
            }
            step = weighted(foot, z, s);
            a += step[0];
            b += step[1];
            it++;
        }
        // uncertainties of the Gauss-Newton system at the solution
        double[] zero = new double[n];
        double[] u = weighted(foot, zero, s);
        double[] r = new double[n];
        double[] std = new double[n];
        double chi2 = 0;
        for (int i = 0; i < n; i++) {
            r[i] = z[i];
            std[i] = s[i] * z[i];
            chi2 += std[i] * std[i];
        }
        return new LineFit(data, method, referenceX, a, b, Math.sqrt(u[2]), Math.sqrt(u[3]), u[4], r, std, chi2,
                quantile(n - 2), probability, Double.NaN, it, notes);
    }

    private LineFit gmr(CalibrationData data, double[] t, double[] y, List<String> notes) {
        if (!data.hasCovariance()) {
            throw new IllegalArgumentException(LineMessages.covarianceNeeded());
        }
        int n = t.length;
        double[][] l = cholesky(data, n);
        double[] ones = new double[n];
        java.util.Arrays.fill(ones, 1.0);
        double[] f = forward(l, y);
        double[] g0 = forward(l, ones);
        double[] g1 = forward(l, t);
        // normal equations of the transformed problem, solved in closed form for two parameters
        double s00 = 0;
        double s01 = 0;
        double s11 = 0;
        double c0 = 0;
        double c1 = 0;
        for (int i = 0; i < n; i++) {
            s00 += g0[i] * g0[i];
            s01 += g0[i] * g1[i];
            s11 += g1[i] * g1[i];
            c0 += g0[i] * f[i];
            c1 += g1[i] * f[i];
        }
        double det = s00 * s11 - s01 * s01;
        double a = (s11 * c0 - s01 * c1) / det;
        double b = (s00 * c1 - s01 * c0) / det;
        double ua2 = s11 / det;
        double ub2 = s00 / det;
        double cov = -s01 / det;
        double[] r = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = y[i] - a - b * t[i];
        }
        double[] std = forward(l, r);
        double chi2 = 0;
        for (double v : std) {
            chi2 += v * v;
        }
        return new LineFit(data, method, referenceX, a, b, Math.sqrt(ua2), Math.sqrt(ub2), cov, r, std, chi2,
                quantile(n - 2), probability, Double.NaN, 0, notes);
    }

    /** Cholesky factor of the covariance matrix, computed on the correlation matrix for scale independence. */
    private static double[][] cholesky(CalibrationData data, int n) {
        double[] sd = new double[n];
        for (int i = 0; i < n; i++) {
            sd[i] = Math.sqrt(data.covarianceEntry(i, i));
        }
        double[][] l = new double[n][n];
        for (int j = 0; j < n; j++) {
            double d = 1.0;
            for (int k = 0; k < j; k++) {
                d -= l[j][k] * l[j][k];
            }
            if (!(d > 1e-12)) {
                throw new IllegalArgumentException(LineMessages.notPositiveDefinite(j + 1));
            }
            l[j][j] = Math.sqrt(d);
            for (int i = j + 1; i < n; i++) {
                double v = data.covarianceEntry(i, j) / (sd[i] * sd[j]);
                for (int k = 0; k < j; k++) {
                    v -= l[i][k] * l[j][k];
                }
                l[i][j] = v / l[j][j];
            }
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j <= i; j++) {
                l[i][j] *= sd[i];
            }
        }
        return l;
    }

    /** Solves L v = rhs for lower-triangular L. */
    private static double[] forward(double[][] l, double[] rhs) {
        int n = rhs.length;
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            double acc = rhs[i];
            for (int k = 0; k < i; k++) {
                acc -= l[i][k] * v[k];
            }
            v[i] = acc / l[i][i];
        }
        return v;
    }
}
