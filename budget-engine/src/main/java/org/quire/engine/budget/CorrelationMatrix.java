package org.quire.engine.budget;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealVector;

/**
 * The correlation matrix of a budget's inputs, built from its stated and computed coefficients and checked:
 * symmetric by construction, unit diagonal, every coefficient in [-1, 1], each pair given once, and positive
 * semi-definite, without which no covariance matrix (and no Monte Carlo sampling) exists.
 *
 * <p>References: JCGM 100:2008 5.2.2 (eq. 14), 5.2.3 and C.3.6 (coefficients from simultaneous observations,
 * eq. 17); JCGM 101:2008 6.4.8.1 (a covariance matrix must be positive semi-definite).
 *
 * <p>Immutable and thread-safe.
 */
public final class CorrelationMatrix {
    /** Eigenvalues above -EPS count as zero: rounding in stated coefficients must not refuse a valid matrix. */
    private static final double EPS = 1e-9;
    private final List<String> names;
    private final double[][] r;
    private final boolean identity;

    private CorrelationMatrix(List<String> names, double[][] r, boolean identity) {
        this.names = names;
        this.r = r;
        this.identity = identity;
    }

    /**
     * @param inputs the budget's inputs (their order is the matrix's order)
     * @param correlations the coefficients
     * @return the checked matrix
     * @throws IllegalArgumentException naming the offending inputs or pairs
     */
    public static CorrelationMatrix of(List<InputQuantity> inputs, List<Correlation> correlations) {
        int n = inputs.size();
        Map<String, Integer> index = new HashMap<>();
        List<String> names = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            index.put(inputs.get(i).name(), i);
            names.add(inputs.get(i).name());
        }
        double[][] r = new double[n][n];
        for (int i = 0; i < n; i++) {
            r[i][i] = 1;
        }
        boolean[][] set = new boolean[n][n];
        for (Correlation c : correlations) {
            Integer a = index.get(c.first());
            Integer b = index.get(c.second());
            if (a == null || b == null) {
                String missing = a == null ? c.first() : c.second();
                throw new IllegalArgumentException("correlation between '" + c.first() + "' and '" + c.second()
                        + "': there is no input named '" + missing + "'"
                        + org.quire.engine.model.Suggest.hint(missing, names));
            }
            if (set[a][b]) {
                throw new IllegalArgumentException("the correlation between '" + c.first() + "' and '" + c.second()
                        + "' is given twice");
            }
            double v = c.fromReadings() ? fromReadings(inputs.get(a), inputs.get(b)) : c.r();
            if (inputs.get(a).evaluation().standardUncertainty() == 0
                    || inputs.get(b).evaluation().standardUncertainty() == 0) {
                throw new IllegalArgumentException("the correlation between '" + c.first() + "' and '"
                        + c.second() + "' involves an exactly known constant, which cannot be correlated");
            }
            r[a][b] = v;
            r[b][a] = v;
            set[a][b] = true;
            set[b][a] = true;
        }
        boolean fitPairs = addFitCorrelations(inputs, r, set);
        CorrelationMatrix m = new CorrelationMatrix(List.copyOf(names), r, correlations.isEmpty() && !fitPairs);
        m.checkPositiveSemiDefinite();
        return m;
    }

    /**
     * Joins the intercept and slope of one fitted line with the fit's r(a, b) (JCGM 100:2008 H.3.4, where r(y1,
     * y2) enters eq. H.16). A stated coefficient for such a pair is refused: the fit fixes it. Two inputs that are
     * the same parameter of the same fit are refused: they are one quantity.
     *
     * @return whether any pair was joined
     */
    private static boolean addFitCorrelations(List<InputQuantity> inputs, double[][] r, boolean[][] set) {
        boolean any = false;
        for (int a = 0; a < inputs.size(); a++) {
            if (!(inputs.get(a).evaluation() instanceof FitParameter)) {
                continue;
            }
            FitParameter pa = (FitParameter) inputs.get(a).evaluation();
            for (int b = a + 1; b < inputs.size(); b++) {
                if (!(inputs.get(b).evaluation() instanceof FitParameter)) {
                    continue;
                }
                FitParameter pb = (FitParameter) inputs.get(b).evaluation();
                if (!pa.line().equals(pb.line())) {
                    continue;
                }
                String pair = "'" + inputs.get(a).name() + "' and '" + inputs.get(b).name() + "'";
                if (pa.parameter() == pb.parameter()) {
                    throw new IllegalArgumentException("inputs " + pair + " are both the " + pa.parameter().label()
                            + " of data set '" + pa.dataSet() + "'; use one input for one quantity");
                }
                double v = pa.correlationWith(pb);
                if (set[a][b]) {
                    throw new IllegalArgumentException(String.format(Locale.ROOT, "the correlation between %s is "
                            + "fixed by the fit of data set '%s' (r = %.6f); remove the stated correlation", pair,
                            pa.dataSet(), v));
                }
                r[a][b] = v;
                r[b][a] = v;
                set[a][b] = true;
                set[b][a] = true;
                any = true;
            }
        }
        return any;
    }

    /**
     * r(q, w) = s(q, w) / (s(q) s(w)) from paired readings; JCGM 100:2008 5.2.3 eq. (17) with C.3.6.
     */
    static double fromReadings(InputQuantity a, InputQuantity b) {
        String pair = "'" + a.name() + "' and '" + b.name() + "'";
        if (!(a.evaluation() instanceof TypeA) || !(b.evaluation() instanceof TypeA)
                || ((TypeA) a.evaluation()).readings() == null || ((TypeA) b.evaluation()).readings() == null) {
            throw new IllegalArgumentException("the correlation between " + pair
                    + " is to be computed from readings, so both must be Type A evaluations with their readings");
        }
        double[] x = ((TypeA) a.evaluation()).readings();
        double[] y = ((TypeA) b.evaluation()).readings();
        if (x.length != y.length) {
            throw new IllegalArgumentException("the correlation between " + pair
                    + " needs simultaneous readings, but they have " + x.length + " and " + y.length + " readings");
        }
        double mx = 0;
        double my = 0;
        for (int k = 0; k < x.length; k++) {
            mx += x[k];
            my += y[k];
        }
        mx /= x.length;
        my /= y.length;
        double sxy = 0;
        double sxx = 0;
        double syy = 0;
        for (int k = 0; k < x.length; k++) {
            sxy += (x[k] - mx) * (y[k] - my);
            sxx += (x[k] - mx) * (x[k] - mx);
            syy += (y[k] - my) * (y[k] - my);
        }
        return sxy / Math.sqrt(sxx * syy);
    }

    private void checkPositiveSemiDefinite() {
        if (identity || names.size() < 2) {
            return;
        }
        EigenDecomposition e = new EigenDecomposition(new Array2DRowRealMatrix(r, false));
        double[] ev = e.getRealEigenvalues();
        int worst = 0;
        for (int k = 1; k < ev.length; k++) {
            if (ev[k] < ev[worst]) {
                worst = k;
            }
        }
        if (ev[worst] >= -EPS) {
            return;
        }
        RealVector v = e.getEigenvector(worst);
        List<Integer> involved = new ArrayList<>();
        for (int i = 0; i < names.size(); i++) {
            if (Math.abs(v.getEntry(i)) > 0.15) {
                involved.add(i);
            }
        }
        List<String> pairs = new ArrayList<>();
        for (int a = 0; a < involved.size(); a++) {
            for (int b = a + 1; b < involved.size(); b++) {
                int i = involved.get(a);
                int j = involved.get(b);
                if (r[i][j] != 0) {
                    pairs.add(String.format(Locale.ROOT, "r(%s, %s) = %s", names.get(i), names.get(j), r[i][j]));
                }
            }
        }
        throw new IllegalArgumentException(String.format(Locale.ROOT,
                "the correlation matrix is not positive semi-definite (smallest eigenvalue %.3g): these coefficients "
                        + "cannot hold together: %s", ev[worst], String.join(", ", pairs)));
    }

    /** @return the input names in matrix order */
    public List<String> names() {
        return names;
    }

    /** @return r(x_i, x_j) */
    public double get(int i, int j) {
        return r[i][j];
    }

    /** @return a copy of the matrix */
    public double[][] toArray() {
        double[][] c = new double[r.length][];
        for (int i = 0; i < r.length; i++) {
            c[i] = r[i].clone();
        }
        return c;
    }

    /** @return whether no two inputs are correlated */
    public boolean isIdentity() {
        if (identity) {
            return true; // no coefficient stated and no fitted line: nothing to scan
        }
        for (int i = 0; i < r.length; i++) {
            for (int j = i + 1; j < r.length; j++) {
                if (r[i][j] != 0) {
                    return false;
                }
            }
        }
        return true;
    }
}
