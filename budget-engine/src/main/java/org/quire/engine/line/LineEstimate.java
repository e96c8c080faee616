package org.quire.engine.line;

/**
 * A value obtained from a calibration line (a response predicted at x, or a stimulus inferred from an
 * indication) with its standard uncertainty and degrees of freedom. Immutable and thread-safe.
 *
 * @param value the estimate
 * @param standardUncertainty its standard uncertainty, not negative
 * @param dof degrees of freedom of the standard uncertainty ({@link Double#POSITIVE_INFINITY} when the
 *     uncertainties used are taken as exactly known)
 */
public record LineEstimate(double value, double standardUncertainty, double dof) {

    /** Checks the components. */
    public LineEstimate {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(LineMessages.notFinite("value", value));
        }
        if (!Double.isFinite(standardUncertainty) || standardUncertainty < 0) {
            throw new IllegalArgumentException(
                    LineMessages.fmt("standard uncertainty must be finite and not negative, not %s", standardUncertainty));
        }
        if (!(dof > 0)) {
            throw new IllegalArgumentException(LineMessages.fmt("degrees of freedom must be positive, not %s", dof));
        }
    }

    /** @return the checked estimate */
    public static LineEstimate of(double value, double standardUncertainty, double dof) {
        return new LineEstimate(value, standardUncertainty, dof);
    }
}
