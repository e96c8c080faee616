package org.quire.engine.montecarlo;

import java.util.Arrays;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;

/**
 * A matrix of correlation coefficients between quantities (inputs of a model, or outputs of a run): symmetric,
 * unit diagonal, entries in [-1, 1] and positive semi-definite.
 *
 * <p>Immutable and thread-safe. Built by {@link #identity(int)} or {@link #of(double[][])} and changed with
 * {@link #withCoefficient(int, int, double)}; every factory checks the matrix and refuses one that is not
 * positive semi-definite, since no set of quantities can have such correlation coefficients.
 *
 * <p>References: JCGM 101:2008 6.4.8 (multivariate Gaussian: the covariance matrix must be symmetric positive
 * semi-definite and is factored as V = R<sup>T</sup>R); JCGM 100:2008 5.2.2 (correlation coefficient).
 */
public final class CorrelationMatrix {
    /** Tolerance on pivots and eigenvalues when testing for semi-definiteness (relative to a unit diagonal). */
    static final double SEMIDEFINITE_TOLERANCE = 1e-10;

    private final double[][] r;

    private CorrelationMatrix(double[][] r) {
        this.r = r;
    }

    /**
     * @param size the number of quantities
     * @return the identity: no quantity correlated with another
     */
    public static CorrelationMatrix identity(int size) {
        if (size < 1) {
            throw new IllegalArgumentException("size of a correlation matrix must be at least 1, not " + size);
        }
        double[][] m = new double[size][size];
        for (int i = 0; i < size; i++) {
            m[i][i] = 1.0;
        }
        return new CorrelationMatrix(m);
    }

    /**
     * @param coefficients a square, symmetric matrix with unit diagonal; copied
     * @return the checked matrix
     * @throws IllegalArgumentException naming the offending entry, or the smallest eigenvalue when the matrix is
     *     not positive semi-definite
     */
    public static CorrelationMatrix of(double[][] coefficients) {
        if (coefficients == null) {
            throw new IllegalArgumentException(Messages.nullArgument("correlation matrix"));
        }
        int n = coefficients.length;
        if (n < 1) {
            throw new IllegalArgumentException("size of a correlation matrix must be at least 1, not 0");
        }
        double[][] m = new double[n][];
        for (int i = 0; i < n; i++) {
            if (coefficients[i] == null || coefficients[i].length != n) {
                throw new IllegalArgumentException(
                        Messages.matrixNotSquare(n, i, coefficients[i] == null ? 0 : coefficients[i].length));
            }
            m[i] = coefficients[i].clone();
        }
        check(m);
        return new CorrelationMatrix(m);
    }

    /**
     * @return a copy with r(i, j) = r(j, i) = {@code coefficient}
     * @throws IllegalArgumentException when an index is outside the matrix, i == j with a coefficient other than
     *     1, or the result is not positive semi-definite
     */
    public CorrelationMatrix withCoefficient(int i, int j, double coefficient) {
        int n = r.length;
        if (i < 0 || i >= n) {
            throw new IllegalArgumentException(Messages.indexOutside("row", i, n));
        }
        if (j < 0 || j >= n) {
            throw new IllegalArgumentException(Messages.indexOutside("column", j, n));
        }
        double[][] m = toArray();
        m[i][j] = coefficient;
        m[j][i] = coefficient;
        check(m);
        return new CorrelationMatrix(m);
    }

    private static void check(double[][] m) {
        int n = m.length;
        for (int i = 0; i < n; i++) {
            if (m[i][i] != 1.0) {
                throw new IllegalArgumentException(Messages.diagonalNotOne(i, m[i][i]));
            }
            for (int j = 0; j < n; j++) {
                double v = m[i][j];
                if (!(v >= -1.0 && v <= 1.0)) {
                    throw new IllegalArgumentException(Messages.coefficientOutside(i, j, v));
                }
                if (m[j][i] != v) {
                    throw new IllegalArgumentException(Messages.notSymmetric(i, j, v, m[j][i]));
                }
            }
        }
        if (choleskyOrNull(m) == null) {
            double smallest = Arrays.stream(new EigenDecomposition(MatrixUtils.createRealMatrix(m))
                    .getRealEigenvalues()).min().orElse(Double.NaN);
            throw new IllegalArgumentException(Messages.notPositiveSemiDefinite(smallest));
        }
    }

    /**
     * Lower-triangular L with L L<sup>T</sup> = m, allowing zero pivots of a semi-definite matrix.
     *
     * <p>References: JCGM 101:2008 6.4.8.4 (Cholesky factor used to draw correlated normals); G. H. Golub,
     * C. F. Van Loan, Matrix Computations, 4th ed., 4.2 (Cholesky, outer-product form).
     *
     * @return the factor, or {@code null} when m is not positive semi-definite within the tolerance
     */
    static double[][] choleskyOrNull(double[][] m) {
        int n = m.length;
        double[][] l = new double[n][n];
        double tol = SEMIDEFINITE_TOLERANCE * n;
        for (int j = 0; j < n; j++) {
            double d = m[j][j];
            for (int k = 0; k < j; k++) {
                d -= l[j][k] * l[j][k];
            }
            if (d < -tol) {
                return null;
            }
            if (d <= tol) {
                // zero pivot: the rest of the column must vanish too (the matrix is singular but semi-definite)
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
        return r.length;
    }

    /** @return r(i, j) */
    public double coefficient(int i, int j) {
        return r[i][j];
    }

    /** @return true when some off-diagonal coefficient is non-zero */
    public boolean hasCorrelation() {
        for (int i = 0; i < r.length; i++) {
            for (int j = 0; j < i; j++) {
                if (r[i][j] != 0.0) {
                    return true;
                }
            }
        }
        return false;
    }

    /** @return a copy of the coefficients */
    public double[][] toArray() {
        double[][] m = new double[r.length][];
        for (int i = 0; i < r.length; i++) {
            m[i] = r[i].clone();
        }
        return m;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof CorrelationMatrix c && Arrays.deepEquals(r, c.r);
    }

    @Override
    public int hashCode() {
        return Arrays.deepHashCode(r);
    }

    @Override
    public String toString() {
        return "CorrelationMatrix" + Arrays.deepToString(r);
    }
}
