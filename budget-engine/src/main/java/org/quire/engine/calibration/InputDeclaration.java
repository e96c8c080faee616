package org.quire.engine.calibration;

/**
 * How one input of the method behaves from one flow point to another, which fixes the covariance of the point
 * results (JCGM 102:2011 6.2.1.3; JCGM 100:2008 F.1.2.3 on results that share an input such as one reference
 * standard):
 * <ul>
 * <li>{@link Kind#SHARED}: the same quantity at every point (the calibration of the balance, the density of the
 *     calibration weights); its errors are fully correlated between points, r = 1.</li>
 * <li>{@link Kind#INDEPENDENT}: a fresh, independent value at each point (resolution, evaporation in one
 *     collection), r = 0.</li>
 * <li>{@link Kind#CORRELATED}: partly shared, with a stated coefficient 0 &lt; r &lt; 1 and its justification
 *     (a diverter whose timing error changes with the flow).</li>
 * </ul>
 * There is no default: every input must be declared, because a silent "shared" or "independent" changes the
 * uncertainty of anything computed from several points (the adjustment).
 *
 * @param kind shared, independent or correlated
 * @param coefficient the correlation between points: 1, 0, or the stated r
 * @param justification why (required for a correlated input; may be empty otherwise)
 */
public record InputDeclaration(Kind kind, double coefficient, String justification) {

    /** The three declarations, with the words the calibration file uses. */
    public enum Kind {
        SHARED("shared"), INDEPENDENT("independent"), CORRELATED("correlated");

        private final String word;

        Kind(String word) {
            this.word = word;
        }

        /** @return the word used in files and reports */
        public String word() {
            return word;
        }
    }

    /** Checks the components; use the factories. */
    public InputDeclaration {
        if (kind == null) {
            throw new IllegalArgumentException(CalibrationMessages.missing("kind of declaration"));
        }
        justification = justification == null ? "" : justification.strip();
        switch (kind) {
            case SHARED:
                coefficient = 1.0;
                break;
            case INDEPENDENT:
                coefficient = 0.0;
                break;
            default:
                if (!(coefficient > 0 && coefficient < 1)) {
                    throw new IllegalArgumentException(CalibrationMessages.correlationRange(coefficient));
                }
                if (justification.isEmpty()) {
                    throw new IllegalArgumentException(CalibrationMessages.blank("justification of the correlation"));
                }
        }
    }

    public static InputDeclaration shared() {
        return new InputDeclaration(Kind.SHARED, 1.0, "");
    }

    public static InputDeclaration independent() {
        return new InputDeclaration(Kind.INDEPENDENT, 0.0, "");
    }

    /**
     * @param r the correlation coefficient between points, strictly between 0 and 1
     * @param justification why the input is partly shared; not blank
     */
    public static InputDeclaration correlated(double r, String justification) {
        return new InputDeclaration(Kind.CORRELATED, r, justification);
    }

    /** @return a copy with a justification (also allowed for shared and independent inputs) */
    public InputDeclaration withJustification(String text) {
        return new InputDeclaration(kind, coefficient, text);
    }
}
