package org.quire.engine.calibration;

/**
 * A calibration that cannot be evaluated as it stands, with the place in the calibration at fault written as
 * the path of the calibration file's fields: {@code declarations}, {@code asFound[1].runs[2]} (indices from
 * 0), {@code cmc}, {@code conformity}, {@code adjustment}, {@code method}. A run also names its source row in
 * the message. Immutable.
 */
public final class CalibrationException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;
    private final String location;

    public CalibrationException(String location, String message) {
        super(message);
        this.location = location == null ? "" : location;
    }

    public CalibrationException(String location, String message, Throwable cause) {
        super(message, cause);
        this.location = location == null ? "" : location;
    }

    /** @return the path of the field at fault, e.g. {@code asFound[1].runs[0]}; empty when the whole */
    public String location() {
        return location;
    }
}
