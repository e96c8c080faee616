package org.quire.engine.montecarlo;

import java.util.Optional;

/**
 * What a Monte Carlo run says about one output: estimate, standard uncertainty, coverage intervals, histogram,
 * percentiles, and how many trials gave no finite value.
 *
 * <p>Trials in which the model left a function's domain (NaN) or overflowed (an infinite value) are excluded
 * from every figure here; {@link #excludedTrials()} counts them and {@link #exclusionNote()} says so in a
 * sentence for the report.
 *
 * <p>Immutable and thread-safe.
 *
 * <p>References: JCGM 101:2008 7.5 (discrete representation of the distribution function), 7.6 (estimate and
 * standard uncertainty, eqs. (20) and (21)), 7.7 (coverage intervals from the sorted values).
 */
public final class OutputSummary {
    /** Percentiles that set the histogram's range (central 99.9 %) and bin width (the interquartile range). */
    private static final double[] HISTOGRAM_CUTS = {0.0005, 0.25, 0.75, 0.9995};
    private final int index;
    private final long trials;
    private final long validTrials;
    private final double mean;
    private final double standardUncertainty;
    private final double minimum;
    private final double maximum;
    private final CoverageInterval symmetricInterval;
    private final CoverageInterval shortestInterval;
    private final Histogram histogram;
    private final Percentiles percentiles;

    private OutputSummary(int index, long trials, long validTrials, double mean, double standardUncertainty,
            double minimum, double maximum, CoverageInterval symmetricInterval, CoverageInterval shortestInterval,
            Histogram histogram, Percentiles percentiles) {
        this.index = index;
        this.trials = trials;
        this.validTrials = validTrials;
        this.mean = mean;
        this.standardUncertainty = standardUncertainty;
        this.minimum = minimum;
        this.maximum = maximum;
        this.symmetricInterval = symmetricInterval;
        this.shortestInterval = shortestInterval;
        this.histogram = histogram;
        this.percentiles = percentiles;
    }

    /**
     * Summarises output {@code index}. The values array is reordered in place (finite values first, then the
     * two tails sorted); pass a copy to keep the trial order.
     *
     * @param values the output's value in every trial
     * @param trials the number of trials, {@code values[0..trials-1]}
     * @param moments the moments of these values combined in block order, which give the estimate, the standard
     *     uncertainty and the number of finite values
     * @param p the coverage probability
     */
    static OutputSummary summarize(int index, double[] values, int trials, Moments moments, double p) {
        int m = 0;
        if (moments.count[index] == trials) {
            m = trials; // the moments counted every value as finite: nothing to move
        } else {
            for (int t = 0; t < trials; t++) {
                double v = values[t];
                if (Double.isFinite(v)) {
                    values[m++] = v;
                }
            }
        }
        if (m == 0) {
            throw new MonteCarloProblem(Messages.noValidTrials(index, trials));
        }
        double[] a = values;
        int q = coverageCount(m, p);
        int tail = m - q; // JCGM 101:2008 7.7.3: the shortest interval starts at one of the m - q smallest values
        int[] more = concat(Percentiles.ranks(Percentiles.STANDARD, m), Percentiles.ranks(HISTOGRAM_CUTS, m));
        OrderStatistics sorted = OrderStatistics.of(a, m, Math.max(tail, 1), more);
        double min = a[0];
        double max = a[m - 1];

        CoverageInterval symmetric;
        CoverageInterval shortest;
        if (m == 1) {
            symmetric = CoverageInterval.of(min, max, p, CoverageInterval.Kind.PROBABILISTICALLY_SYMMETRIC);
            shortest = CoverageInterval.of(min, max, p, CoverageInterval.Kind.SHORTEST);
        } else {
            // 7.7.2: r = (M - q)/2 when that is an integer, else (M - q + 1)/2 (1-based); interval [y_(r), y_(r+q)]
            int r = Math.max(1, (tail + 1) / 2);
            symmetric = CoverageInterval.of(a[r - 1], a[r - 1 + q], p,
                    CoverageInterval.Kind.PROBABILISTICALLY_SYMMETRIC);
            // 7.7.3: the r* with the smallest y_(r+q) - y_(r), r = 1 .. M - q; the first one when tied
            int best = 0;
            double bestWidth = a[q] - a[0];
            for (int i = 1; i < tail; i++) {
                double w = a[i + q] - a[i];
                if (w < bestWidth) {
                    bestWidth = w;
                    best = i;
                }
            }
            shortest = CoverageInterval.of(a[best], a[best + q], p, CoverageInterval.Kind.SHORTEST);
        }

        Percentiles percentiles = Percentiles.fromOrderStatistics(sorted, m, Percentiles.STANDARD);
        Percentiles cuts = Percentiles.fromOrderStatistics(sorted, m, HISTOGRAM_CUTS);
        Histogram histogram = histogram(a, m, min, max, cuts);
        return new OutputSummary(index, trials, m, moments.mean[index], moments.standardUncertainty(index), min,
                max, symmetric, shortest, histogram, percentiles);
    }

    /**
     * q = pM when pM is an integer, otherwise the integer part of pM + 1/2 (JCGM 101:2008 7.7.1), kept within
     * 1 .. M - 1 so that both interval ends are values.
     */
    static int coverageCount(int m, double p) {
        long q = (long) Math.floor(p * m + 0.5);
        if (m < 2) {
            return 0;
        }
        return (int) Math.max(1, Math.min(q, m - 1L));
    }

    private static Histogram histogram(double[] a, int m, double min, double max, Percentiles cuts) {
        double lo = min;
        double hi = max;
        double centralLo = cuts.value(0);
        double centralHi = cuts.value(3);
        if (max - min > 2.0 * (centralHi - centralLo) && centralHi > centralLo) {
            lo = centralLo;
            hi = centralHi;
        }
        double iqr = cuts.value(2) - cuts.value(1);
        int bins;
        if (!(hi > lo)) {
            bins = 1;
        } else if (iqr > 0) {
            double width = 2.0 * iqr / Math.cbrt(m);
            bins = (int) Math.max(10, Math.min(200, Math.ceil((hi - lo) / width)));
        } else {
            bins = 10;
        }
        return Histogram.build(a, m, lo, hi, bins);
    }

    private static int[] concat(int[] x, int[] y) {
        int[] r = java.util.Arrays.copyOf(x, x.length + y.length);
        System.arraycopy(y, 0, r, x.length, y.length);
        return r;
    }

    /** @return the output's position among the model's outputs, from 0 */
    public int index() {
        return index;
    }

    /** @return the trials run, M */
    public long trials() {
        return trials;
    }

    /** @return the trials that gave a finite value, from which every figure here is computed */
    public long validTrials() {
        return validTrials;
    }

    /** @return the trials excluded because they gave NaN or an infinite value */
    public long excludedTrials() {
        return trials - validTrials;
    }

    /** @return a sentence for the report when trials were excluded */
    public Optional<String> exclusionNote() {
        return excludedTrials() == 0 ? Optional.empty()
                : Optional.of(Messages.excluded(excludedTrials(), trials));
    }

    /** @return the estimate y, the mean of the values (JCGM 101:2008 7.6, eq. (20)) */
    public double mean() {
        return mean;
    }

    /** @return the standard uncertainty u(y), the standard deviation of the values (7.6, eq. (21)) */
    public double standardUncertainty() {
        return standardUncertainty;
    }

    /** @return the smallest value */
    public double minimum() {
        return minimum;
    }

    /** @return the largest value */
    public double maximum() {
        return maximum;
    }

    /** @return the median of the values */
    public double median() {
        for (int i = 0; i < percentiles.size(); i++) {
            if (percentiles.probability(i) == 0.5) {
                return percentiles.value(i);
            }
        }
        throw new IllegalStateException("the percentiles lack the median");
    }

    /** @return the probabilistically symmetric coverage interval (JCGM 101:2008 7.7.2) */
    public CoverageInterval symmetricInterval() {
        return symmetricInterval;
    }

    /** @return the shortest coverage interval (JCGM 101:2008 7.7.3) */
    public CoverageInterval shortestInterval() {
        return shortestInterval;
    }

    /** @return the coverage interval of the given kind */
    public CoverageInterval interval(CoverageInterval.Kind kind) {
        return kind == CoverageInterval.Kind.SHORTEST ? shortestInterval : symmetricInterval;
    }

    /** @return the histogram of the values */
    public Histogram histogram() {
        return histogram;
    }

    /** @return the percentiles at 0, 0.1 %, 0.5 %, 1 %, 2.5 %, 5 %, 10 %, 20 % ... 90 %, 95 % ... 99.9 %, 100 % */
    public Percentiles percentiles() {
        return percentiles;
    }

    @Override
    public String toString() {
        return "OutputSummary[" + index + ": y=" + mean + ", u=" + standardUncertainty + ", shortest=["
                + shortestInterval.lower() + ", " + shortestInterval.upper() + "], symmetric=["
                + symmetricInterval.lower() + ", " + symmetricInterval.upper() + "], excluded="
                + excludedTrials() + "]";
    }
}
