package org.quire.engine.line;

/**
 * One calibration point: the stimulus {@code x} (for a flow meter, the reference flow), the response
 * {@code y} (the meter's indication: electrode voltage, pulse frequency or indicated flow) and their standard
 * uncertainties.
 *
 * <p>An uncertainty of zero means "not stated"; each fitting method says which uncertainties it needs
 * positive (see {@link LineMethod}). Immutable and thread-safe.
 *
 * @param x stimulus value
 * @param y response value
 * @param ux standard uncertainty of {@code x}, zero if not stated
 * @param uy standard uncertainty of {@code y}, zero if not stated
 */
public record CalibrationPoint(double x, double y, double ux, double uy) {

    /** Checks the components; prefer {@link #of(double, double, double, double)}. */
    public CalibrationPoint {
        if (!Double.isFinite(x)) {
            throw new IllegalArgumentException(LineMessages.notFinite("x", x));
        }
        if (!Double.isFinite(y)) {
            throw new IllegalArgumentException(LineMessages.notFinite("y", y));
        }
        if (!Double.isFinite(ux)) {
            throw new IllegalArgumentException(LineMessages.notFinite("u(x)", ux));
        }
        if (!Double.isFinite(uy)) {
            throw new IllegalArgumentException(LineMessages.notFinite("u(y)", uy));
        }
        if (ux < 0) {
            throw new IllegalArgumentException(LineMessages.negative("u(x)", ux));
        }
        if (uy < 0) {
            throw new IllegalArgumentException(LineMessages.negative("u(y)", uy));
        }
    }

    /**
     * @return a point with both uncertainties stated
     * @throws IllegalArgumentException if a value is not finite or an uncertainty is negative
     */
    public static CalibrationPoint of(double x, double y, double ux, double uy) {
        return new CalibrationPoint(x, y, ux, uy);
    }

    /** @return a point without stated uncertainties (for ordinary least squares) */
    public static CalibrationPoint of(double x, double y) {
        return new CalibrationPoint(x, y, 0.0, 0.0);
    }
}
