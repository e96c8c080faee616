package org.quire.app.ui.montecarlo;

import java.util.List;

/**
 * What a Monte Carlo run returns to the workbench: per output its estimate, standard uncertainty, coverage
 * interval, histogram and comparison with the GUM result. Every figure is the engine's; the workbench only
 * shows them.
 *
 * @param trials trials made (JCGM 101:2008 7.2)
 * @param seed the seed of the random generator used, so the run can be repeated
 * @param adaptive whether the adaptive procedure of JCGM 101:2008 7.9 decided the number of trials
 * @param outputs one per output, in the budget's order
 */
public record MonteCarloOutcome(long trials, long seed, boolean adaptive, List<OutputOutcome> outputs) {
    public MonteCarloOutcome {
        if (trials < 1) {
            throw new IllegalArgumentException("a Monte Carlo outcome needs at least one trial, not " + trials);
        }
        outputs = List.copyOf(outputs);
    }

    /**
     * The Monte Carlo result for one output.
     *
     * @param name the output's name
     * @param unit its unit
     * @param estimate the average of the model values (JCGM 101:2008 7.6, eq. 22)
     * @param standardUncertainty their standard deviation (eq. 23)
     * @param coverageProbability p of the interval
     * @param lower lower end of the coverage interval (7.7)
     * @param upper upper end of the coverage interval
     * @param shortest whether the interval is the shortest one (7.7.2) rather than probabilistically symmetric
     * @param histogram the model values binned for display
     * @param comparison the check of the GUM result against this one (clause 8), or null when not made
     * @param otherLower lower end of the other coverage interval (the shortest when the first is symmetric), or NaN
     * @param otherUpper its upper end, or NaN
     * @param gumCounts the GUM distribution of the output (normal, or scaled t with the degrees of freedom the
     *     GUM result used) as expected counts in each histogram bin, for drawing over the histogram; or null
     */
    public record OutputOutcome(String name, String unit, double estimate, double standardUncertainty,
            double coverageProbability, double lower, double upper, boolean shortest, Histogram histogram,
            GumComparison comparison, double otherLower, double otherUpper, double[] gumCounts) {

        public OutputOutcome {
            gumCounts = gumCounts == null ? null : gumCounts.clone();
        }

        /** An outcome with one coverage interval and no GUM curve. */
        public OutputOutcome(String name, String unit, double estimate, double standardUncertainty,
                double coverageProbability, double lower, double upper, boolean shortest, Histogram histogram,
                GumComparison comparison) {
            this(name, unit, estimate, standardUncertainty, coverageProbability, lower, upper, shortest, histogram,
                    comparison, Double.NaN, Double.NaN, null);
        }

        /** @return the GUM distribution as expected counts per histogram bin, or null when not given */
        @Override
        public double[] gumCounts() {
            return gumCounts == null ? null : gumCounts.clone();
        }
    }

    /**
     * Counts of model values in equal bins between {@code lower} and {@code upper}.
     *
     * @param lower left edge of the first bin
     * @param upper right edge of the last bin
     * @param counts the count of each bin
     */
    public record Histogram(double lower, double upper, long[] counts) {
        public Histogram {
            if (!(upper > lower) || counts.length == 0) {
                throw new IllegalArgumentException("a histogram needs upper > lower and at least one bin");
            }
            counts = counts.clone();
        }

        @Override
        public long[] counts() {
            return counts.clone();
        }
    }

    /**
     * The validation of the GUM uncertainty framework by the Monte Carlo method (JCGM 101:2008 8.2).
     *
     * @param numericalTolerance delta, from the significant digits of u(y) (8.2.1)
     * @param lowDifference d_low = |y - U_p - y_low| (8.2.2)
     * @param highDifference d_high = |y + U_p - y_high|
     * @param gumValidated whether both differences are at most delta
     */
    public record GumComparison(double numericalTolerance, double lowDifference, double highDifference,
            boolean gumValidated) {
    }
}
