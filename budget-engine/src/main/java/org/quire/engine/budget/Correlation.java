package org.quire.engine.budget;

/**
 * A correlation coefficient r(x_i, x_j) between two input quantities, either stated or computed from their
 * simultaneous readings (JCGM 100:2008 5.2.2, eq. 14; 5.2.3, eq. 17).
 *
 * @param first name of one input
 * @param second name of the other input
 * @param r the coefficient, -1 &lt;= r &lt;= 1 (ignored when {@code fromReadings})
 * @param fromReadings whether r is computed from the two inputs' paired Type A readings
 * @param justification why the inputs are correlated (an assessor will ask)
 */
public record Correlation(String first, String second, double r, boolean fromReadings, String justification) {
    public Correlation {
        if (first == null || second == null || first.isEmpty() || second.isEmpty()) {
            throw new IllegalArgumentException("a correlation needs the names of two inputs");
        }
        if (first.equals(second)) {
            throw new IllegalArgumentException("a correlation joins two different inputs, not '" + first
                    + "' with itself");
        }
        if (!fromReadings && (!(r >= -1 && r <= 1))) {
            throw new IllegalArgumentException("correlation coefficient r(" + first + ", " + second
                    + ") must lie between -1 and 1, not " + r);
        }
        justification = justification == null ? "" : justification;
    }

    public static Correlation of(String first, String second, double r) {
        return new Correlation(first, second, r, false, "");
    }

    public static Correlation fromReadings(String first, String second) {
        return new Correlation(first, second, Double.NaN, true, "");
    }

    public Correlation withJustification(String text) {
        return new Correlation(first, second, r, fromReadings, text);
    }
}
