package org.quire.engine.line;

import java.util.Locale;

/**
 * The error messages of the calibration-line package, kept in one place so that the same problem is always
 * worded the same way.
 */
final class LineMessages {
    private LineMessages() {
    }

    static String fmt(String pattern, Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }

    static String notFinite(String what, double value) {
        return fmt("%s must be a finite number, not %s", what, value);
    }

    static String negative(String what, double value) {
        return fmt("%s must not be negative, not %s", what, value);
    }

    static String row(int row, String message) {
        return fmt("point %d: %s", row, message);
    }

    static String line(int line, String message) {
        return fmt("line %d: %s", line, message);
    }

    static String blank(String what) {
        return what + " must not be blank";
    }

    static String missing(String what) {
        return what + " is missing";
    }

    static String tooFewPoints(int n) {
        return fmt("a calibration line needs at least 3 points, got %d", n);
    }

    static String allXEqual(int n, double x) {
        return fmt("all %d points have x = %s; the slope cannot be determined", n, x);
    }

    static String uncertaintyNeeded(String method, String quantity, double value) {
        return fmt("%s needs a positive %s, got %s", method, quantity, value);
    }

    static String covarianceShape(int n, int rows) {
        return fmt("the covariance matrix of the y values must be %d x %d, but it has %d rows", n, n, rows);
    }

    static String covarianceRow(int row, int n, int cols) {
        return fmt("row %d of the covariance matrix has %d entries, expected %d", row, cols, n);
    }

    static String covarianceEntry(int i, int j, double v) {
        return fmt("covariance entry (%d, %d) must be a finite number, not %s", i, j, v);
    }

    static String covarianceAsymmetric(int i, int j, double vij, double vji) {
        return fmt("the covariance matrix must be symmetric: entry (%d, %d) = %s but entry (%d, %d) = %s",
                i, j, vij, j, i, vji);
    }

    static String varianceNotPositive(int i, double v) {
        return fmt("the variance of y at point %d (covariance entry (%d, %d)) must be positive, not %s", i, i, i, v);
    }

    static String varianceDisagrees(int i, double uy, double v) {
        return fmt("point %d: u(y) = %s disagrees with the covariance matrix, whose diagonal gives u(y) = %s",
                i, uy, Math.sqrt(v));
    }

    static String notPositiveDefinite(int i) {
        return fmt("the covariance matrix of the y values is not positive definite (Cholesky factorisation fails at"
                + " point %d); check correlations of magnitude 1 or more", i);
    }

    static String covarianceNeeded() {
        return "Gauss-Markov regression needs a covariance matrix of the y values; the data set has none";
    }

    static String noConvergence(int iterations, double da, double db) {
        return fmt("generalized distance regression did not converge within the limit of %d iterations (last increments: intercept"
                + " %s, slope %s)", iterations, da, db);
    }

    static String probability(String what, double p) {
        return fmt("%s must lie strictly between 0 and 1, not %s", what, p);
    }

    static String zeroSlope() {
        return "the slope of the line is zero: the line cannot be inverted to give x for an indication y";
    }
}
