package org.quire.engine.conformity;

/**
 * A measured error of a meter at one flow, in percent of the reading, with its standard uncertainty, coverage
 * factor and effective degrees of freedom; optionally the liquid's temperature. Immutable and thread-safe.
 *
 * @param flow the flow of the test point, in the envelope's flow unit
 * @param temperature the liquid's temperature, °C, or NaN when not stated
 * @param errorPercent the measured error (indication - reference) / reference x 100
 * @param standardUncertainty standard uncertainty of the error, percentage points, positive
 * @param coverageFactor the coverage factor k of the reported expanded uncertainty U = k u, positive
 * @param dof effective degrees of freedom of u, positive ({@link Double#POSITIVE_INFINITY} for a normal
 *     distribution)
 */
public record MeasuredError(double flow, double temperature, double errorPercent, double standardUncertainty,
        double coverageFactor, double dof) {

    /** Checks the components; prefer {@link #of}. */
    public MeasuredError {
        if (!Double.isFinite(flow)) {
            throw new IllegalArgumentException(ConformityMessages.notFinite("flow", flow));
        }
        if (Double.isInfinite(temperature)) {
            throw new IllegalArgumentException(ConformityMessages.notFinite("temperature", temperature));
        }
        if (!Double.isFinite(errorPercent)) {
            throw new IllegalArgumentException(ConformityMessages.notFinite("measured error", errorPercent));
        }
        if (!Double.isFinite(standardUncertainty) || !(standardUncertainty > 0)) {
            throw new IllegalArgumentException(ConformityMessages.notPositive("standard uncertainty", standardUncertainty));
        }
        if (!Double.isFinite(coverageFactor) || !(coverageFactor > 0)) {
            throw new IllegalArgumentException(ConformityMessages.notPositive("coverage factor", coverageFactor));
        }
        if (!(dof > 0)) {
            throw new IllegalArgumentException(ConformityMessages.notPositive("degrees of freedom", dof));
        }
    }

    /** @return a point with a normal distribution (infinite degrees of freedom) and no stated temperature */
    public static MeasuredError of(double flow, double errorPercent, double standardUncertainty,
            double coverageFactor) {
        return new MeasuredError(flow, Double.NaN, errorPercent, standardUncertainty, coverageFactor,
                Double.POSITIVE_INFINITY);
    }

    /** @return a point with the given effective degrees of freedom and no stated temperature */
    public static MeasuredError of(double flow, double errorPercent, double standardUncertainty,
            double coverageFactor, double dof) {
        return new MeasuredError(flow, Double.NaN, errorPercent, standardUncertainty, coverageFactor, dof);
    }

    /** @return this point with the liquid's temperature stated */
    public MeasuredError withTemperature(double celsius) {
        if (!Double.isFinite(celsius)) {
            throw new IllegalArgumentException(ConformityMessages.notFinite("temperature", celsius));
        }
        return new MeasuredError(flow, celsius, errorPercent, standardUncertainty, coverageFactor, dof);
    }

    /** @return the expanded uncertainty U = k u, percentage points */
    public double expandedUncertainty() {
        return coverageFactor * standardUncertainty;
    }
}
