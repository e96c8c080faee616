package org.quire.engine.montecarlo;

/**
 * A coverage interval [lower, upper] for an output with its coverage probability and the rule that chose it.
 *
 * <p>Immutable and thread-safe.
 *
 * <p>References: JCGM 101:2008 3.12 to 3.15 (coverage interval, probabilistically symmetric and shortest
 * coverage intervals), 7.7 (their computation from the sorted values).
 *
 * @param lower the lower end y_low
 * @param upper the upper end y_high
 * @param probability the coverage probability p
 * @param kind the rule that chose the interval
 */
public record CoverageInterval(double lower, double upper, double probability, Kind kind) {
    /** How the interval was chosen among those with the coverage probability. */
    public enum Kind {
        /** Equal probability (1 - p)/2 below and above; JCGM 101:2008 7.7.2. */
        PROBABILISTICALLY_SYMMETRIC,
        /** The shortest interval containing a fraction p of the values; JCGM 101:2008 7.7.3. */
        SHORTEST
    }

    /** Checks the arguments. */
    public CoverageInterval {
        if (Double.isNaN(lower) || Double.isNaN(upper)) {
            throw new IllegalArgumentException(Messages.notFinite("coverage interval end", Double.NaN));
        }
        if (upper < lower) {
            throw new IllegalArgumentException(
                    "coverage interval upper end (" + upper + ") must not be below its lower end (" + lower + ")");
        }
        if (!(probability > 0.0 && probability < 1.0)) {
            throw new IllegalArgumentException(Messages.coverageProbabilityOutside(probability));
        }
        if (kind == null) {
            throw new IllegalArgumentException(Messages.nullArgument("kind of coverage interval"));
        }
    }

    /** @return the checked interval */
    public static CoverageInterval of(double lower, double upper, double probability, Kind kind) {
        return new CoverageInterval(lower, upper, probability, kind);
    }

    /** @return upper - lower */
    public double width() {
        return upper - lower;
    }
}
