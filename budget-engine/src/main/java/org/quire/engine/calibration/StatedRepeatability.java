package org.quire.engine.calibration;

/**
 * A repeatability stated instead of the runs' own scatter: a pooled standard deviation of a single run from an
 * earlier, larger study of the same rig and meter type (JCGM 100:2008 4.2.4), with its degrees of freedom and
 * where it comes from. Needed for a point with one run, whose own scatter is undefined.
 *
 * @param standardDeviation the pooled standard deviation of one run's error, in the error's unit (%), positive
 * @param dof its degrees of freedom, positive
 * @param source where it comes from (a study, a control chart); not blank
 */
public record StatedRepeatability(double standardDeviation, double dof, String source) {

    /** Checks the components; prefer {@link #of}. */
    public StatedRepeatability {
        if (!Double.isFinite(standardDeviation) || !(standardDeviation > 0)) {
            throw new IllegalArgumentException(CalibrationMessages.notPositive("stated repeatability s",
                    standardDeviation));
        }
        if (!(dof > 0) || Double.isNaN(dof)) {
            throw new IllegalArgumentException(CalibrationMessages.notPositive("degrees of freedom of the stated "
                    + "repeatability", dof));
        }
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException(CalibrationMessages.blank("source of the stated repeatability"));
        }
        source = source.strip();
    }

    public static StatedRepeatability of(double standardDeviation, double dof, String source) {
        return new StatedRepeatability(standardDeviation, dof, source);
    }
}
