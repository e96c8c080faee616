package org.quire.engine.calibration;

/**
 * The meter's calibration constant as found: the number the meter multiplies its primary signal by (an
 * electromagnetic meter turns its electrode voltage into flow with it, by Faraday's law); its indication is
 * proportional to the constant, so changing it from C_old to C_new scales every indication by C_new / C_old.
 * Also called the meter factor or, for a pulse output, related to the K-factor; the name says which.
 *
 * @param name what the meter calls it, e.g. "calibration constant"; not blank
 * @param unit its unit as text (may be empty for a number)
 * @param asFound the value found in the meter, positive
 */
public record CalibrationConstant(String name, String unit, double asFound) {

    /** Checks the components; prefer {@link #of}. */
    public CalibrationConstant {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException(CalibrationMessages.blank("name of the calibration constant"));
        }
        name = name.strip();
        unit = unit == null ? "" : unit.strip();
        if (!Double.isFinite(asFound) || !(asFound > 0)) {
            throw new IllegalArgumentException(CalibrationMessages.notPositive("as-found calibration constant", asFound));
        }
    }

    public static CalibrationConstant of(String name, String unit, double asFound) {
        return new CalibrationConstant(name, unit, asFound);
    }

    /** @return a copy with another as-found value */
    public CalibrationConstant withAsFound(double v) {
        return new CalibrationConstant(name, unit, v);
    }
}
