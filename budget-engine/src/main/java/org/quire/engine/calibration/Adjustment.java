package org.quire.engine.calibration;

import org.quire.engine.line.LineMethod;

/**
 * How the meter's calibration constant is adjusted from the as-found points.
 * <ul>
 * <li>{@link Kind#NONE}: not adjusted; the as-found results are also the as-left results.</li>
 * <li>{@link Kind#WEIGHTED_MEAN}: the weighted mean error E_w = sum w_p E_p / sum w_p with w_p = 1 / u^2(E_p)
 *     is removed: C_new = C_old / (1 + E_w / 100).</li>
 * <li>{@link Kind#FITTED_SLOPE}: a straight line of indicated flow against reference flow is fitted by
 *     Gauss-Markov regression with the full covariance of the points (ISO/TS 28037:2010 clause 8); its slope b
 *     is the gain of the meter: C_new = C_old / b.</li>
 * <li>{@link Kind#CHOSEN}: the user dials in a constant of their own choice.</li>
 * </ul>
 *
 * @param kind the kind
 * @param chosenConstant the constant chosen by the user (kind CHOSEN), NaN otherwise
 */
public record Adjustment(Kind kind, double chosenConstant) {

    /** The kinds of adjustment, with the words the calibration file uses. */
    public enum Kind {
        NONE("none"), WEIGHTED_MEAN("weighted-mean-error"), FITTED_SLOPE("fitted-slope"), CHOSEN("chosen-constant");

        private final String word;

        Kind(String word) {
            this.word = word;
        }

        public String word() {
            return word;
        }

        /** @return the kind as screens, reports and the command line name it: the word with spaces */
        public String text() {
            return word.replace('-', ' ');
        }

        /** @return the kind written {@code word}, or null */
        public static Kind byWord(String word) {
            for (Kind k : values()) {
                if (k.word.equals(word)) {
                    return k;
                }
            }
            return null;
        }
    }

    /** Checks the components; use the factories. */
    public Adjustment {
        if (kind == null) {
            throw new IllegalArgumentException(CalibrationMessages.missing("kind of adjustment"));
        }
        if (kind == Kind.CHOSEN) {
            if (!Double.isFinite(chosenConstant) || !(chosenConstant > 0)) {
                throw new IllegalArgumentException(CalibrationMessages.notPositive("chosen calibration constant",
                        chosenConstant));
            }
        } else {
            chosenConstant = Double.NaN;
        }
    }

    public static Adjustment none() {
        return new Adjustment(Kind.NONE, Double.NaN);
    }

    public static Adjustment weightedMeanError() {
        return new Adjustment(Kind.WEIGHTED_MEAN, Double.NaN);
    }

    public static Adjustment fittedSlope() {
        return new Adjustment(Kind.FITTED_SLOPE, Double.NaN);
    }

    /** @param constant the constant the user dials in, positive */
    public static Adjustment chosen(double constant) {
        return new Adjustment(Kind.CHOSEN, constant);
    }

    /** @return whether the constant is changed */
    public boolean changesConstant() {
        return kind != Kind.NONE;
    }

    /** @return the line-fitting method of a fitted-slope adjustment */
    public static LineMethod lineMethod() {
        return LineMethod.GAUSS_MARKOV;
    }
}
