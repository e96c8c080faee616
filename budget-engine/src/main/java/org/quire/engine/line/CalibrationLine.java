package org.quire.engine.line;

import java.util.Objects;

/**
 * A calibration data set together with how its straight line is fitted: the {@link LineMethod} and the
 * reference x0 of y = a + b (x - x0), either a stated value or the mean of the data set's x values. This is
 * what a budget file's {@code dataSets} entry holds; its name is the data set's name.
 *
 * <p>Immutable and thread-safe.
 *
 * <p>References: ISO/TS 28037:2010 clauses 6 to 8 (the methods); JCGM 100:2008 H.3 (x0 = t0, and x0 = the
 * mean of x, which makes intercept and slope uncorrelated for ordinary least squares, H.3.5).
 */
public final class CalibrationLine {
    private final CalibrationData data;
    private final LineMethod method;
    private final double referenceX;
    private final boolean referenceAtMean;

    private CalibrationLine(CalibrationData data, LineMethod method, double referenceX, boolean referenceAtMean) {
        this.data = data;
        this.method = method;
        this.referenceX = referenceX;
        this.referenceAtMean = referenceAtMean;
    }

    /**
     * @param data the calibration data
     * @param method the fitting method
     * @param referenceX the reference x0 (0 for y = a + b x)
     * @return the checked line definition
     * @throws IllegalArgumentException for a missing argument or a non-finite x0
     */
    public static CalibrationLine of(CalibrationData data, LineMethod method, double referenceX) {
        check(data, method);
        if (!Double.isFinite(referenceX)) {
            throw new IllegalArgumentException(LineMessages.notFinite("reference x0", referenceX));
        }
        return new CalibrationLine(data, method, referenceX, false);
    }

    /** @return a line definition whose x0 is the mean of the data set's x values */
    public static CalibrationLine atMeanX(CalibrationData data, LineMethod method) {
        check(data, method);
        double s = 0;
        for (CalibrationPoint p : data.points()) {
            s += p.x();
        }
        return new CalibrationLine(data, method, s / data.size(), true);
    }

    private static void check(CalibrationData data, LineMethod method) {
        if (data == null) {
            throw new IllegalArgumentException(LineMessages.missing("calibration data"));
        }
        if (method == null) {
            throw new IllegalArgumentException(LineMessages.missing("line-fitting method"));
        }
    }

    /** @return a copy with another method (x0 chosen the same way) */
    public CalibrationLine withMethod(LineMethod m) {
        return referenceAtMean ? atMeanX(data, m) : of(data, m, referenceX);
    }

    /** @return a copy with a stated x0 */
    public CalibrationLine withReferenceX(double x0) {
        return of(data, method, x0);
    }

    /** @return a copy with x0 at the mean of x */
    public CalibrationLine withReferenceAtMeanX() {
        return atMeanX(data, method);
    }

    /** @return the data set's name */
    public String name() {
        return data.name();
    }

    public CalibrationData data() {
        return data;
    }

    public LineMethod method() {
        return method;
    }

    /** @return x0 (the mean of x when {@link #referenceAtMeanX()}) */
    public double referenceX() {
        return referenceX;
    }

    /** @return whether x0 is the mean of the x values rather than a stated value */
    public boolean referenceAtMeanX() {
        return referenceAtMean;
    }

    /**
     * Fits the line with the default options of {@link LineFitter}.
     *
     * @throws IllegalArgumentException when the data lack what the method needs (message names the point)
     * @throws ArithmeticException when generalized distance regression does not converge
     */
    public LineFit fit() {
        return LineFitter.of(method).withReferenceX(referenceX).fit(data);
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof CalibrationLine)) {
            return false;
        }
        CalibrationLine l = (CalibrationLine) o;
        return data.equals(l.data) && method == l.method && referenceAtMean == l.referenceAtMean
                && Double.compare(referenceX, l.referenceX) == 0;
    }

    @Override
    public int hashCode() {
        return Objects.hash(data, method, referenceX, referenceAtMean);
    }

    @Override
    public String toString() {
        return LineMessages.fmt("CalibrationLine[%s, %s, x0 = %s%s]", data.name(), method.abbreviation(), referenceX,
                referenceAtMean ? " (mean of x)" : "");
    }
}
