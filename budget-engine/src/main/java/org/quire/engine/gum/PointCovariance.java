package org.quire.engine.gum;

import java.util.List;
import org.quire.engine.budget.CorrelationMatrix;

/**
 * The covariance of the results of one measurement model evaluated at several points (flow points of a flow
 * range or of a calibration), from each point's GUM result and a statement of how each input behaves between
 * points.
 *
 * <p>With c_pi the sensitivity coefficient and u_pi the standard uncertainty of input i at point p, r_ij the
 * correlation of inputs i and j within a point, and rho_i the correlation of input i between two points (1 for
 * an input shared by all points, such as one reference standard; 0 for one independent at each point; a stated
 * value between), the stacked model y = (f(x_1), ..., f(x_m)) has U_y = C U_x C^T (JCGM 102:2011 6.2.1.3), so
 *
 * <pre>
 *   cov(y_p, y_q) = sum_i sum_j c_pi u_pi c_qj u_qj r_ij rho_ij     (p != q)
 * </pre>
 *
 * with rho_ii = rho_i and, for i != j, rho_ij = rho_i when rho_i = rho_j and 0 otherwise (a within-point
 * correlation between inputs that behave differently between points has no stacked counterpart, and callers
 * refuse it). The diagonal is each point's own u_c^2(y_p) (JCGM 100:2008 5.1.2, 5.2.2, eq. 16), which includes
 * any higher-order terms of its evaluation.
 *
 * <p>References: JCGM 102:2011 6.2.1.3; JCGM 100:2008 5.2 and F.1.2.3 (correlation of results that share an
 * input).
 *
 * <p>Stateless and thread-safe.
 */
public final class PointCovariance {
    private PointCovariance() {
    }

    /**
     * @param points the GUM result of the same output at each point; their contributions list the same inputs
     *     in the same order
     * @param r the within-point correlation of the inputs, in that order
     * @param between rho_i per input, in that order, each in [0, 1]
     * @return the m x m covariance matrix of the point results
     * @throws IllegalArgumentException when the points do not list the same inputs or the sizes differ
     */
    public static double[][] of(List<OutputResult> points, CorrelationMatrix r, double[] between) {
        int m = points.size();
        int n = between.length;
        double[][] cu = new double[m][n];
        for (int p = 0; p < m; p++) {
            List<Contribution> rows = points.get(p).contributions();
            if (rows.size() != n) {
                throw new IllegalArgumentException("point " + (p + 1) + " lists " + rows.size() + " inputs, expected "
                        + n);
            }
            for (int i = 0; i < n; i++) {
                if (p > 0 && !rows.get(i).input().equals(points.get(0).contributions().get(i).input())) {
                    throw new IllegalArgumentException("point " + (p + 1) + " lists input '" + rows.get(i).input()
                            + "' where point 1 lists '" + points.get(0).contributions().get(i).input() + "'");
                }
                cu[p][i] = rows.get(i).sensitivity() * rows.get(i).standardUncertainty();
            }
        }
        double[][] cov = new double[m][m];
        for (int p = 0; p < m; p++) {
            double up = points.get(p).standardUncertainty();
            cov[p][p] = up * up;
            for (int q = p + 1; q < m; q++) {
                double s = 0;
                for (int i = 0; i < n; i++) {
                    if (between[i] == 0 || cu[p][i] == 0) {
                        continue;
                    }
                    for (int j = 0; j < n; j++) {
                        if (between[j] != between[i] || cu[q][j] == 0) {
                            continue;
                        }
                        double rij = i == j ? 1 : r.get(i, j);
                        s += cu[p][i] * cu[q][j] * rij * between[i];
                    }
                }
                cov[p][q] = s;
                cov[q][p] = s;
            }
        }
        return cov;
    }

    /** @return the correlation matrix of a covariance matrix (NaN where a variance is zero; clamped to [-1, 1]) */
    public static double[][] correlation(double[][] cov) {
        int m = cov.length;
        double[][] corr = new double[m][m];
        for (int p = 0; p < m; p++) {
            for (int q = 0; q < m; q++) {
                double d = Math.sqrt(cov[p][p] * cov[q][q]);
                corr[p][q] = p == q ? 1 : d > 0 ? Math.max(-1, Math.min(1, cov[p][q] / d)) : Double.NaN;
            }
        }
        return corr;
    }
}
