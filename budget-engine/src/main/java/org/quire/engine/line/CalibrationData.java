package org.quire.engine.line;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A calibration data set: a name, the units of {@code x} and {@code y}, at least three
 * {@link CalibrationPoint}s and, optionally, the covariance matrix of the {@code y} values (needed by
 * {@link LineMethod#GAUSS_MARKOV}).
 *
 * <p>The checking factory {@link #of} rejects fewer than three points and data sets whose {@code x} values are
 * all equal; {@link #withCovariance} rejects a matrix of the wrong size, with non-finite entries, that is not
 * symmetric, whose diagonal is not positive, or whose diagonal disagrees with a stated {@code u(y)}. Points are
 * numbered from 1 in messages. Immutable and thread-safe; the covariance matrix is copied in and out.
 */
public final class CalibrationData {

    /** Relative agreement required between a stated u(y) and the square root of the covariance diagonal. */
    private static final double DIAGONAL_AGREEMENT = 1e-6;
    /** Relative tolerance of the symmetry check of the covariance matrix. */
    private static final double SYMMETRY_TOLERANCE = 1e-12;

    private final String name;
    private final String xUnit;
    private final String yUnit;
    private final List<CalibrationPoint> points;
    private final double[][] covariance;

    private CalibrationData(String name, String xUnit, String yUnit, List<CalibrationPoint> points,
            double[][] covariance) {
        this.name = name;
        this.xUnit = xUnit;
        this.yUnit = yUnit;
        this.points = points;
        this.covariance = covariance;
    }

    /**
     * @param name the data set's name, e.g. {@code "TV-EM-07 electrode signal, 2026-03"}
     * @param xUnit unit of x (a unit expression, or empty for a dimensionless quantity)
     * @param yUnit unit of y (a unit expression, or empty for a dimensionless quantity)
     * @param points the calibration points, at least three, not all with the same x
     * @return the checked data set, without a covariance matrix
     * @throws IllegalArgumentException naming the argument or the point (numbered from 1) that is wrong
     */
    public static CalibrationData of(String name, String xUnit, String yUnit, List<CalibrationPoint> points) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException(LineMessages.blank("data set name"));
        }
        if (xUnit == null) {
            throw new IllegalArgumentException(LineMessages.missing("unit of x"));
        }
        if (yUnit == null) {
            throw new IllegalArgumentException(LineMessages.missing("unit of y"));
        }
        if (points == null) {
            throw new IllegalArgumentException(LineMessages.missing("list of points"));
        }
        List<CalibrationPoint> copy = new ArrayList<>(points.size());
        for (int i = 0; i < points.size(); i++) {
            CalibrationPoint p = points.get(i);
            if (p == null) {
                throw new IllegalArgumentException(LineMessages.row(i + 1, "the point is missing"));
            }
            copy.add(p);
        }
        if (copy.size() < 3) {
            throw new IllegalArgumentException(LineMessages.tooFewPoints(copy.size()));
        }
        double x1 = copy.get(0).x();
        if (copy.stream().allMatch(p -> p.x() == x1)) {
            throw new IllegalArgumentException(LineMessages.allXEqual(copy.size(), x1));
        }
        return new CalibrationData(name.strip(), xUnit.strip(), yUnit.strip(), List.copyOf(copy), null);
    }

    /**
     * @param matrix the covariance matrix of the y values, n x n, symmetric, with positive diagonal; where a
     *     point states {@code u(y) > 0}, the diagonal entry must equal its square (relative agreement 1e-6)
     * @return a copy of this data set with the covariance matrix (positive definiteness is checked when a
     *     line is fitted)
     * @throws IllegalArgumentException naming the entry or point that is wrong
     */
    public CalibrationData withCovariance(double[][] matrix) {
        int n = points.size();
        if (matrix == null) {
            throw new IllegalArgumentException(LineMessages.missing("covariance matrix"));
        }
        if (matrix.length != n) {
            throw new IllegalArgumentException(LineMessages.covarianceShape(n, matrix.length));
        }
        double[][] copy = new double[n][];
        for (int i = 0; i < n; i++) {
            if (matrix[i] == null || matrix[i].length != n) {
                throw new IllegalArgumentException(
                        LineMessages.covarianceRow(i + 1, n, matrix[i] == null ? 0 : matrix[i].length));
            }
            copy[i] = matrix[i].clone();
            for (int j = 0; j < n; j++) {
                if (!Double.isFinite(copy[i][j])) {
                    throw new IllegalArgumentException(LineMessages.covarianceEntry(i + 1, j + 1, copy[i][j]));
                }
            }
        }
        for (int i = 0; i < n; i++) {
            double vii = copy[i][i];
            if (!(vii > 0)) {
                throw new IllegalArgumentException(LineMessages.varianceNotPositive(i + 1, vii));
            }
            double uy = points.get(i).uy();
            if (uy > 0 && Math.abs(uy - Math.sqrt(vii)) > DIAGONAL_AGREEMENT * uy) {
                throw new IllegalArgumentException(LineMessages.varianceDisagrees(i + 1, uy, vii));
            }
            for (int j = 0; j < i; j++) {
                double scale = Math.max(Math.abs(copy[i][j]), Math.abs(copy[j][i]));
                if (Math.abs(copy[i][j] - copy[j][i]) > SYMMETRY_TOLERANCE * scale) {
                    throw new IllegalArgumentException(
                            LineMessages.covarianceAsymmetric(i + 1, j + 1, copy[i][j], copy[j][i]));
                }
            }
        }
        return new CalibrationData(name, xUnit, yUnit, points, copy);
    }

    /** @return a copy of this data set under another name */
    public CalibrationData withName(String newName) {
        CalibrationData renamed = of(newName, xUnit, yUnit, points);
        return covariance == null ? renamed : new CalibrationData(renamed.name, xUnit, yUnit, points, covariance);
    }

    /** @return the data set's name */
    public String name() {
        return name;
    }

    /** @return the unit of x, empty for a dimensionless quantity */
    public String xUnit() {
        return xUnit;
    }

    /** @return the unit of y, empty for a dimensionless quantity */
    public String yUnit() {
        return yUnit;
    }

    /** @return the points, unmodifiable, in the order given */
    public List<CalibrationPoint> points() {
        return points;
    }

    /** @return the number of points */
    public int size() {
        return points.size();
    }

    /** @return a copy of the covariance matrix of the y values, if one was given */
    public Optional<double[][]> covariance() {
        if (covariance == null) {
            return Optional.empty();
        }
        double[][] out = new double[covariance.length][];
        for (int i = 0; i < out.length; i++) {
            out[i] = covariance[i].clone();
        }
        return Optional.of(out);
    }

    /** @return whether a covariance matrix of the y values was given */
    public boolean hasCovariance() {
        return covariance != null;
    }

    double covarianceEntry(int i, int j) {
        return covariance[i][j];
    }

    @Override
    public boolean equals(Object o) {
        if (this == o) {
            return true;
        }
        if (!(o instanceof CalibrationData)) {
            return false;
        }
        CalibrationData d = (CalibrationData) o;
        return name.equals(d.name) && xUnit.equals(d.xUnit) && yUnit.equals(d.yUnit) && points.equals(d.points)
                && java.util.Arrays.deepEquals(covariance, d.covariance);
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, xUnit, yUnit, points, java.util.Arrays.deepHashCode(covariance));
    }

    @Override
    public String toString() {
        return LineMessages.fmt("CalibrationData[%s, %d points, x in %s, y in %s%s]", name, points.size(),
                xUnit.isEmpty() ? "1" : xUnit, yUnit.isEmpty() ? "1" : yUnit,
                covariance == null ? "" : ", with covariance");
    }
}
