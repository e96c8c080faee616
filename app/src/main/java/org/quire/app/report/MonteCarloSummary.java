package org.quire.app.report;

import java.util.List;
import java.util.Objects;

/**
 * What a report and a review need of a Monte Carlo evaluation (JCGM 101:2008): per output the estimate,
 * standard uncertainty and coverage interval from the trials, whether it agrees with the GUM result in the
 * sense of JCGM 101:2008 clause 8, and optionally the histogram of the trials.
 *
 * <p>This is the seam to org.quire.engine.montecarlo: its result is turned into one of these. Nothing here
 * computes anything.
 *
 * @param trials the number of trials M
 * @param seed the seed of the random-number generator
 * @param adaptive whether the adaptive procedure of JCGM 101:2008 7.9 chose M
 * @param outputs one per output, in budget order
 *
 * <p>Immutable and thread-safe.
 */
public record MonteCarloSummary(long trials, long seed, boolean adaptive, List<Output> outputs) {
    public MonteCarloSummary {
        if (trials < 1) {
            throw new IllegalArgumentException("trials must be at least 1, not " + trials);
        }
        outputs = List.copyOf(outputs);
    }

    /**
     * @param name the output's name
     * @param unit its unit
     * @param estimate the mean of the trials
     * @param standardUncertainty their standard deviation
     * @param low the lower end of the coverage interval
     * @param high the upper end
     * @param coverageProbability p of the interval
     * @param shortest whether the interval is the shortest (JCGM 101:2008 7.7.2) rather than probabilistically
     *     symmetric (7.7.1)
     * @param agreesWithGum whether the GUM interval is validated (JCGM 101:2008 8.2 with the numerical
     *     tolerance of 8.2.2)
     * @param comparison one line saying what was compared, e.g. "d_low = 0.0004, d_high = 0.0004, delta = 0.0005"
     * @param histogram the distribution of the trials, or null when not kept
     * @param symmetricLow lower end of the probabilistically symmetric interval (JCGM 101:2008 7.7.1), NaN when
     *     not known
     * @param symmetricHigh its upper end
     * @param shortestLow lower end of the shortest interval (JCGM 101:2008 7.7.2), NaN when not known
     * @param shortestHigh its upper end
     * @param gumLow lower end of the GUM interval y - U_p compared with, NaN when not known
     * @param gumHigh its upper end y + U_p
     * @param tolerance the numerical tolerance delta of the comparison (JCGM 101:2008 7.9.2), NaN when not known
     * @param lowerDifference d_low (JCGM 101:2008 8.2)
     * @param upperDifference d_high
     */
    public record Output(String name, String unit, double estimate, double standardUncertainty, double low,
            double high, double coverageProbability, boolean shortest, boolean agreesWithGum, String comparison,
            Chart.Histogram histogram, double symmetricLow, double symmetricHigh, double shortestLow,
            double shortestHigh, double gumLow, double gumHigh, double tolerance, double lowerDifference,
            double upperDifference) {

        /** An output with one coverage interval and the comparison as a line of text. */
        public Output(String name, String unit, double estimate, double standardUncertainty, double low,
                double high, double coverageProbability, boolean shortest, boolean agreesWithGum, String comparison,
                Chart.Histogram histogram) {
            this(name, unit, estimate, standardUncertainty, low, high, coverageProbability, shortest, agreesWithGum,
                    comparison, histogram, shortest ? Double.NaN : low, shortest ? Double.NaN : high,
                    shortest ? low : Double.NaN, shortest ? high : Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Double.NaN, Double.NaN);
        }

        public Output {
            Objects.requireNonNull(name, "name");
            unit = unit == null ? "" : unit;
            comparison = comparison == null ? "" : comparison;
            if (!(high >= low)) {
                throw new IllegalArgumentException("coverage interval of '" + name + "' has its upper end " + high
                        + " below its lower end " + low);
            }
        }

        /** @return whether both intervals and the clause-8 figures are known (not only one interval) */
        public boolean complete() {
            return Double.isFinite(symmetricLow) && Double.isFinite(shortestLow) && Double.isFinite(gumLow)
                    && Double.isFinite(tolerance);
        }
    }

    /** @return the output of that name, or null */
    public Output output(String name) {
        for (Output o : outputs) {
            if (o.name().equals(name)) {
                return o;
            }
        }
        return null;
    }
}
