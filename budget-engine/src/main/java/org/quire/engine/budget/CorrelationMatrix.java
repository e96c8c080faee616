package org.quire.engine.budget;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealVector;

/**
 * The one correlation matrix type of the engine, used by the GUM evaluation and by the Monte Carlo method alike:
 * a budget's inputs with its stated and computed coefficients ({@link #of(List, List)}), or any quantities
 * ({@link #of(double[][])}, {@link #identity(int)}, {@link #withCoefficient(int, int, double)}). Every factory
 * checks: square, symmetric, unit diagonal, every coefficient in [-1, 1], each pair given once, and positive
 * semi-definite by the one rule {@link #SEMIDEFINITE_TOLERANCE}, without which no covariance matrix (and no
 * Monte Carlo sampling) exists. A matrix accepted here can always be sampled: {@link #samplingFactor(int[])}.
 *
 * <p>References: JCGM 100:2008 5.2.2 (eq. 14), 5.2.3 and C.3.6 (coefficients from simultaneous observations,
 * eq. 17); JCGM 101:2008 6.4.8.1 (a covariance matrix must be positive semi-definite) and 6.4.8.4 (sampling with
 * a factor R with V = R R^T).
 *
 * <p>Immutable and thread-safe.
 */
public final class CorrelationMatrix {
    /**
     * The positive semi-definiteness rule: the smallest eigenvalue must be at least -1e-9 (the matrix has a unit
     * diagonal, so this is relative to its scale). Coefficients stated to 9 or more decimals, or computed from
     * readings, can make an exactly singular matrix (r12 = r13 = r23 = -0.5, or a perfect correlation of three
     * inputs) a few 1e-10 negative; such a matrix is accepted, and sampled as the nearest semi-definite one.
     */
    public static final double SEMIDEFINITE_TOLERANCE = 1e-9;
    private final List<String> names;
    /** the quantities correlated with at least one other, ascending; the others form an identity block */
    private final int[] members;
    /** per quantity, its position in {@link #members}, or -1 */
    private final int[] slot;
    /** the coefficients among the members (memory and checks grow with their number, not with all quantities) */
    private final double[][] r;
    private final boolean identity;

    /** @param m a checked square matrix (not copied) */
    private CorrelationMatrix(List<String> names, double[][] m) {
        int n = m.length;
        int[] slot = new int[n];
        int count = 0;
        for (int i = 0; i < n; i++) {
            boolean any = false;
            for (int j = 0; j < n && !any; j++) {
                any = j != i && m[i][j] != 0;
            }
            slot[i] = any ? count++ : -1;
        }
        int[] members = new int[count];
        for (int i = 0; i < n; i++) {
            if (slot[i] >= 0) {
                members[slot[i]] = i;
            }
        }
        double[][] sub = new double[count][count];
        for (int a = 0; a < count; a++) {
            for (int b = 0; b < count; b++) {
                sub[a][b] = m[members[a]][members[b]];
            }
        }
        this.names = names;
        this.members = members;
        this.slot = slot;
        this.r = sub;
        this.identity = count == 0;
    }

    private CorrelationMatrix(List<String> names, int[] members, int[] slot, double[][] sub) {
        this.names = names;
        this.members = members;
        this.slot = slot;
        this.r = sub;
        this.identity = members.length == 0;
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
        // the coefficients by pair (i < j), then the members: the inputs in at least one pair
        Map<Long, Double> pairs = new LinkedHashMap<>();
        for (Correlation c : correlations) {
            Integer a = index.get(c.first());
            Integer b = index.get(c.second());
            if (a == null || b == null) {
                String missing = a == null ? c.first() : c.second();
                throw new IllegalArgumentException("correlation between '" + c.first() + "' and '" + c.second()
                        + "': there is no input named '" + missing + "'"
                        + org.quire.engine.model.Suggest.hint(missing, names));
            }
            if (pairs.containsKey(pair(a, b))) {
                throw new IllegalArgumentException("the correlation between '" + c.first() + "' and '" + c.second()
                        + "' is given twice");
            }
            double v = c.fromReadings() ? fromReadings(inputs.get(a), inputs.get(b)) : c.r();
            if (inputs.get(a).evaluation().standardUncertainty() == 0
                    || inputs.get(b).evaluation().standardUncertainty() == 0) {
                throw new IllegalArgumentException("the correlation between '" + c.first() + "' and '"
                        + c.second() + "' involves an exactly known constant, which cannot be correlated");
            }
            pairs.put(pair(a, b), v);
        }
        addFitCorrelations(inputs, pairs);
        int[] slot = new int[n];
        Arrays.fill(slot, -1);
        boolean[] in = new boolean[n];
        for (Map.Entry<Long, Double> e : pairs.entrySet()) {
            if (e.getValue() != 0) {
                in[(int) (e.getKey() >>> 32)] = true;
                in[(int) (long) e.getKey()] = true;
            }
        }
        int count = 0;
        for (int i = 0; i < n; i++) {
            if (in[i]) {
                slot[i] = count++;
            }
        }
        int[] members = new int[count];
        for (int i = 0; i < n; i++) {
            if (slot[i] >= 0) {
                members[slot[i]] = i;
            }
        }
        double[][] sub = new double[count][count];
        for (int a = 0; a < count; a++) {
            sub[a][a] = 1;
        }
        for (Map.Entry<Long, Double> e : pairs.entrySet()) {
            int i = slot[(int) (e.getKey() >>> 32)];
            int j = slot[(int) (long) e.getKey()];
            if (i >= 0 && j >= 0) {
                sub[i][j] = e.getValue();
                sub[j][i] = e.getValue();
            }
        }
        CorrelationMatrix m = new CorrelationMatrix(List.copyOf(names), members, slot, sub);
        m.checkPositiveSemiDefinite();
        return m;
    }

    /** @return the key of the pair {i, j}: the smaller index in the high half */
    private static long pair(int i, int j) {
        return ((long) Math.min(i, j) << 32) | Math.max(i, j);
    }

    /**
     * @param size the number of quantities
     * @return the identity: no quantity correlated with another
     */
    public static CorrelationMatrix identity(int size) {
        if (size < 1) {
            throw new IllegalArgumentException("size of a correlation matrix must be at least 1, not " + size);
        }
        int[] slot = new int[size];
        Arrays.fill(slot, -1);
        return new CorrelationMatrix(numbered(size), new int[0], slot, new double[0][0]);
    }

    /**
     * @param coefficients a square, symmetric matrix with unit diagonal; copied. The quantities are named by
     *     their position, 1 .. n, in messages.
     * @return the checked matrix
     * @throws IllegalArgumentException naming the offending entry, or the smallest eigenvalue and the pairs
     *     involved when the matrix is not positive semi-definite
     */
    public static CorrelationMatrix of(double[][] coefficients) {
        if (coefficients == null) {
            throw new IllegalArgumentException("correlation matrix must not be null");
        }
        int n = coefficients.length;
        if (n < 1) {
            throw new IllegalArgumentException("size of a correlation matrix must be at least 1, not 0");
        }
        double[][] m = new double[n][];
        for (int i = 0; i < n; i++) {
            if (coefficients[i] == null || coefficients[i].length != n) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "correlation matrix must be square: "
                        + "it has %d rows but row %d has %d entries", n, i + 1,
                        coefficients[i] == null ? 0 : coefficients[i].length));
            }
            m[i] = coefficients[i].clone();
        }
        return checked(numbered(n), m);
    }

    /**
     * @return a copy with r(i, j) = r(j, i) = {@code coefficient}
     * @throws IllegalArgumentException when an index is outside the matrix, i == j with a coefficient other than
     *     1, or the result is not positive semi-definite
     */
    public CorrelationMatrix withCoefficient(int i, int j, double coefficient) {
        int n = slot.length;
        if (i < 0 || i >= n || j < 0 || j >= n) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "%s index %d is outside 0..%d",
                    i < 0 || i >= n ? "row" : "column", i < 0 || i >= n ? i : j, n - 1));
        }
        double[][] m = toArray();
        m[i][j] = coefficient;
        m[j][i] = coefficient;
        return checked(names, m);
    }

    private static List<String> numbered(int n) {
        List<String> names = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            names.add(String.valueOf(i + 1));
        }
        return List.copyOf(names);
    }

    private static CorrelationMatrix checked(List<String> names, double[][] m) {
        int n = m.length;
        for (int i = 0; i < n; i++) {
            if (m[i][i] != 1.0) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "correlation matrix entry (%d, %d) "
                        + "on the diagonal must be 1, not %s", i + 1, i + 1, m[i][i]));
            }
            for (int j = 0; j < n; j++) {
                double v = m[i][j];
                if (!(v >= -1.0 && v <= 1.0)) {
                    throw new IllegalArgumentException(String.format(Locale.ROOT, "correlation coefficient (%d, %d) "
                            + "must lie in [-1, 1], not %s", i + 1, j + 1, v));
                }
                if (m[j][i] != v) {
                    throw new IllegalArgumentException(String.format(Locale.ROOT, "correlation matrix is not "
                            + "symmetric: entry (%d, %d) is %s but entry (%d, %d) is %s", i + 1, j + 1, v, j + 1,
                            i + 1, m[j][i]));
                }
            }
        }
        CorrelationMatrix c = new CorrelationMatrix(names, m);
        c.checkPositiveSemiDefinite();
        return c;
    }

    /**
     * Joins the intercept and slope of one fitted line with the fit's r(a, b) (JCGM 100:2008 H.3.4, where r(y1,
     * y2) enters eq. H.16). A stated coefficient for such a pair is refused: the fit fixes it. Two inputs that are
     * the same parameter of the same fit are refused: they are one quantity.
     *
     */
    private static void addFitCorrelations(List<InputQuantity> inputs, Map<Long, Double> pairs) {
        List<Integer> fits = new ArrayList<>();
        for (int a = 0; a < inputs.size(); a++) {
            if (inputs.get(a).evaluation() instanceof FitParameter) {
                fits.add(a);
            }
        }
        for (int x = 0; x < fits.size(); x++) {
            int a = fits.get(x);
            FitParameter pa = (FitParameter) inputs.get(a).evaluation();
            for (int y = x + 1; y < fits.size(); y++) {
                int b = fits.get(y);
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
                if (pairs.containsKey(pair(a, b))) {
                    throw new IllegalArgumentException(String.format(Locale.ROOT, "the correlation between %s is "
                            + "fixed by the fit of data set '%s' (r = %.6f); remove the stated correlation", pair,
                            pa.dataSet(), v));
                }
                pairs.put(pair(a, b), v);
            }
        }
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
        // the quantities outside the members form an identity block, whose eigenvalues are all 1
        EigenDecomposition e = new EigenDecomposition(new Array2DRowRealMatrix(r, false));
        double[] ev = e.getRealEigenvalues();
        int worst = 0;
        for (int k = 1; k < ev.length; k++) {
            if (ev[k] < ev[worst]) {
                worst = k;
            }
        }
        if (ev[worst] >= -SEMIDEFINITE_TOLERANCE) {
            return;
        }
        RealVector v = e.getEigenvector(worst);
        List<Integer> involved = new ArrayList<>();
        for (int i = 0; i < members.length; i++) {
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
                    pairs.add(String.format(Locale.ROOT, "r(%s, %s) = %s", names.get(members[i]),
                            names.get(members[j]), r[i][j]));
                }
            }
        }
        throw new IllegalArgumentException(String.format(Locale.ROOT,
                "the correlation matrix is not positive semi-definite (smallest eigenvalue %.3g, below the "
                        + "tolerance -1e-9): these coefficients cannot hold together: %s", ev[worst],
                String.join(", ", pairs)));
    }

    /**
     * A lower-triangular factor L of the correlation matrix of the quantities {@code members} (in that order),
     * L L^T = R_members, for drawing correlated standard normals z = L e (JCGM 101:2008 6.4.8.4). Zero pivots
     * of a singular matrix are allowed. A matrix within {@link #SEMIDEFINITE_TOLERANCE} of semi-definite but with a
     * slightly negative eigenvalue is first replaced by the nearest semi-definite correlation matrix (negative
     * eigenvalues set to zero, then rescaled to a unit diagonal), which changes no coefficient by more than about
     * the tolerance.
     *
     * <p>References: G. H. Golub, C. F. Van Loan, Matrix Computations, 4th ed., 4.2 (Cholesky, outer-product
     * form); N. J. Higham, Computing the nearest correlation matrix, IMA J. Numer. Anal. 22 (2002) 329-343 (the
     * eigenvalue clipping is its first step).
     *
     * @param members indices of the quantities, each once
     * @return the factor, {@code members.length} square
     */
    public double[][] samplingFactor(int[] members) {
        int k = members.length;
        double[][] sub = new double[k][k];
        for (int a = 0; a < k; a++) {
            for (int b = 0; b < k; b++) {
                sub[a][b] = get(members[a], members[b]);
            }
        }
        double[][] l = choleskyOrNull(sub);
        if (l != null) {
            return l;
        }
        EigenDecomposition e = new EigenDecomposition(new Array2DRowRealMatrix(sub, false));
        double[] ev = e.getRealEigenvalues();
        double[][] clipped = new double[k][k];
        for (int q = 0; q < k; q++) {
            double lambda = Math.max(0.0, ev[q]);
            RealVector v = e.getEigenvector(q);
            for (int a = 0; a < k; a++) {
                for (int b = 0; b < k; b++) {
                    clipped[a][b] += lambda * v.getEntry(a) * v.getEntry(b);
                }
            }
        }
        for (int a = 0; a < k; a++) {
            for (int b = 0; b < k; b++) {
                clipped[a][b] = a == b ? 1.0 : clipped[a][b] / Math.sqrt(clipped[a][a] * clipped[b][b]);
            }
        }
        for (int a = 0; a < k; a++) {
            clipped[a][a] = 1.0;
        }
        l = choleskyOrNull(clipped);
        if (l == null) {
            throw new IllegalStateException("no sampling factor for a correlation matrix accepted as positive "
                    + "semi-definite: " + Arrays.deepToString(sub));
        }
        return l;
    }

    /** Lower-triangular L with L L^T = m, allowing zero pivots of a semi-definite matrix; null when there is none. */
    private static double[][] choleskyOrNull(double[][] m) {
        int n = m.length;
        double[][] l = new double[n][n];
        double tol = 1e-10 * n;
        for (int j = 0; j < n; j++) {
            double d = m[j][j];
            for (int k = 0; k < j; k++) {
                d -= l[j][k] * l[j][k];
            }
            if (d < -tol) {
                return null;
            }
            if (d <= tol) {
                for (int i = j + 1; i < n; i++) {
                    double v = m[i][j];
                    for (int k = 0; k < j; k++) {
                        v -= l[i][k] * l[j][k];
                    }
                    if (Math.abs(v) > Math.sqrt(tol)) {
                        return null;
                    }
                }
                continue;
            }
            double ljj = Math.sqrt(d);
            l[j][j] = ljj;
            for (int i = j + 1; i < n; i++) {
                double v = m[i][j];
                for (int k = 0; k < j; k++) {
                    v -= l[i][k] * l[j][k];
                }
                l[i][j] = v / ljj;
            }
        }
        return l;
    }

    /** @return the number of quantities */
    public int size() {
        return slot.length;
    }

    /** @return the input names in matrix order */
    public List<String> names() {
        return names;
    }

    /** @return r(x_i, x_j) */
    public double get(int i, int j) {
        if (i == j) {
            if (i < 0 || i >= slot.length) {
                throw new ArrayIndexOutOfBoundsException(i);
            }
            return 1.0;
        }
        int a = slot[i];
        int b = slot[j];
        return a < 0 || b < 0 ? 0.0 : r[a][b];
    }

    /**
     * @return the quantities correlated with at least one other, ascending (a copy): every coefficient r(i, j),
     *     i != j, outside these pairs is zero
     */
    public int[] correlated() {
        return members.clone();
    }

    /** @return a copy of the matrix */
    public double[][] toArray() {
        int n = slot.length;
        double[][] c = new double[n][n];
        for (int i = 0; i < n; i++) {
            c[i][i] = 1.0;
        }
        for (int a = 0; a < members.length; a++) {
            for (int b = 0; b < members.length; b++) {
                c[members[a]][members[b]] = r[a][b];
            }
        }
        return c;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof CorrelationMatrix c && slot.length == c.slot.length && Arrays.equals(members, c.members)
                && Arrays.deepEquals(r, c.r);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * slot.length + Arrays.hashCode(members)) + Arrays.deepHashCode(r);
    }

    @Override
    public String toString() {
        return "CorrelationMatrix" + Arrays.deepToString(toArray());
    }

    /** @return whether no two inputs are correlated */
    public boolean isIdentity() {
        return identity;
    }
}
