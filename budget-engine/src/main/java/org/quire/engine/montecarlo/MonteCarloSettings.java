package org.quire.engine.montecarlo;

/**
 * The settings of a Monte Carlo run: number of trials, seed, coverage probability, threads and the adaptive
 * procedure.
 *
 * <p>Immutable and thread-safe; start from {@link #defaults()} and change one setting at a time with the
 * {@code with...} methods, each of which checks its argument and names it in the message when it is refused.
 *
 * <p>References: JCGM 101:2008 7.2 (number of trials M, at least 10^6 recommended), 7.7 and 7.8 (coverage
 * probability p), 7.9 (adaptive Monte Carlo procedure, n_dig significant decimal digits).
 */
public final class MonteCarloSettings {
    /** Default number of trials, 10^6 (JCGM 101:2008 7.2.1: often enough for a 95 % coverage interval). */
    public static final long DEFAULT_TRIALS = 1_000_000L;
    /**
     * Default seed of the random streams: a fixed value, so that two runs of the same budget with default
     * settings give identical results. Every result records the seed it used.
     */
    public static final long DEFAULT_SEED = 20080901L;
    /**
     * Default coverage probability: 2 Phi(2) - 1 = 0.954499736..., the probability that a normal quantity lies
     * within two standard deviations of its expectation (coverage factor k = 2; JCGM 100:2008 G.1.3, Table G.1).
     */
    public static final double DEFAULT_COVERAGE_PROBABILITY = 0.9544997361036416;
    /** Default number of significant decimal digits n_dig of the adaptive procedure (JCGM 101:2008 7.9.1). */
    public static final int DEFAULT_SIGNIFICANT_DIGITS = 2;
    /** Default largest number of trials of the adaptive procedure, 10^7. */
    public static final long DEFAULT_MAX_TRIALS = 10_000_000L;
    /** Largest number of trials that the output arrays (one {@code double[]} per output) can hold. */
    public static final long TRIALS_LIMIT = Integer.MAX_VALUE - 16L;

    private final long trials;
    private final long seed;
    private final double coverageProbability;
    private final int threads;
    private final boolean adaptive;
    private final int significantDigits;
    private final long maxTrials;
    private final boolean keepValues;

    private MonteCarloSettings(long trials, long seed, double coverageProbability, int threads, boolean adaptive,
            int significantDigits, long maxTrials, boolean keepValues) {
        this.trials = trials;
        this.seed = seed;
        this.coverageProbability = coverageProbability;
        this.threads = threads;
        this.adaptive = adaptive;
        this.significantDigits = significantDigits;
        this.maxTrials = maxTrials;
        this.keepValues = keepValues;
    }

    /**
     * @return 10^6 trials, seed {@link #DEFAULT_SEED}, p = {@link #DEFAULT_COVERAGE_PROBABILITY}, one thread
     *     per available processor, fixed number of trials, n_dig = 2 and at most 10^7 trials when adaptive,
     *     trial values not kept
     */
    public static MonteCarloSettings defaults() {
        return new MonteCarloSettings(DEFAULT_TRIALS, DEFAULT_SEED, DEFAULT_COVERAGE_PROBABILITY,
                Runtime.getRuntime().availableProcessors(), false, DEFAULT_SIGNIFICANT_DIGITS, DEFAULT_MAX_TRIALS,
                false);
    }

    /** @param trials the number of trials M of a run with a fixed number of trials, 1 .. {@link #TRIALS_LIMIT} */
    public MonteCarloSettings withTrials(long trials) {
        checkTrials(trials);
        return new MonteCarloSettings(trials, seed, coverageProbability, threads, adaptive, significantDigits,
                maxTrials, keepValues);
    }

    /** @param seed the seed from which every block's random stream is derived */
    public MonteCarloSettings withSeed(long seed) {
        return new MonteCarloSettings(trials, seed, coverageProbability, threads, adaptive, significantDigits,
                maxTrials, keepValues);
    }

    /** @param p the coverage probability of the coverage intervals, strictly between 0 and 1 */
    public MonteCarloSettings withCoverageProbability(double p) {
        if (!(p > 0.0 && p < 1.0)) {
            throw new IllegalArgumentException(Messages.coverageProbabilityOutside(p));
        }
        return new MonteCarloSettings(trials, seed, p, threads, adaptive, significantDigits, maxTrials,
                keepValues);
    }

    /**
     * @param threads the number of worker threads, at least 1; the results do not depend on it
     */
    public MonteCarloSettings withThreads(int threads) {
        if (threads < 1) {
            throw new IllegalArgumentException(Messages.threadsNotPositive(threads));
        }
        return new MonteCarloSettings(trials, seed, coverageProbability, threads, adaptive, significantDigits,
                maxTrials, keepValues);
    }

    /**
     * @param adaptive true to run the adaptive procedure of JCGM 101:2008 7.9 (the number of trials then follows
     *     from {@link #significantDigits()} and {@link #maxTrials()}), false for a fixed number of trials
     */
    public MonteCarloSettings withAdaptive(boolean adaptive) {
        return new MonteCarloSettings(trials, seed, coverageProbability, threads, adaptive, significantDigits,
                maxTrials, keepValues);
    }

    /**
     * @param digits n_dig, the number of significant decimal digits of u(y) regarded as meaningful (1 .. 15);
     *     used by the adaptive procedure
     */
    public MonteCarloSettings withSignificantDigits(int digits) {
        if (digits < 1 || digits > 15) {
            throw new IllegalArgumentException(Messages.significantDigitsOutside(digits));
        }
        return new MonteCarloSettings(trials, seed, coverageProbability, threads, adaptive, digits, maxTrials,
                keepValues);
    }

    /** @param maxTrials the most trials the adaptive procedure may use, 1 .. {@link #TRIALS_LIMIT} */
    public MonteCarloSettings withMaxTrials(long maxTrials) {
        checkTrials(maxTrials);
        return new MonteCarloSettings(trials, seed, coverageProbability, threads, adaptive, significantDigits,
                maxTrials, keepValues);
    }

    /**
     * @param keepValues true to keep every trial's output values, in trial order, in the result (for scatter
     *     plots or export; costs a second copy of the values while the summaries are computed)
     */
    public MonteCarloSettings withKeepValues(boolean keepValues) {
        return new MonteCarloSettings(trials, seed, coverageProbability, threads, adaptive, significantDigits,
                maxTrials, keepValues);
    }

    private static void checkTrials(long n) {
        if (n <= 0) {
            throw new IllegalArgumentException(Messages.trialsNotPositive(n));
        }
        if (n > TRIALS_LIMIT) {
            throw new IllegalArgumentException(Messages.trialsTooMany(n, TRIALS_LIMIT));
        }
    }

    /**
     * The number of trials in each run of the adaptive procedure: M = max(J, 10^4), J the smallest integer not
     * less than 100 / (1 - p); JCGM 101:2008 7.9.4 b).
     */
    public long adaptiveRunLength() {
        long j = (long) Math.ceil(100.0 / (1.0 - coverageProbability) - 1e-9);
        return Math.max(j, 10_000L);
    }

    /** @return the number of trials of a run with a fixed number of trials */
    public long trials() {
        return trials;
    }

    /** @return the seed */
    public long seed() {
        return seed;
    }

    /** @return the coverage probability p */
    public double coverageProbability() {
        return coverageProbability;
    }

    /** @return the number of worker threads */
    public int threads() {
        return threads;
    }

    /** @return true for the adaptive procedure */
    public boolean adaptive() {
        return adaptive;
    }

    /** @return n_dig */
    public int significantDigits() {
        return significantDigits;
    }

    /** @return the most trials the adaptive procedure may use */
    public long maxTrials() {
        return maxTrials;
    }

    /** @return true when the result keeps every trial's output values */
    public boolean keepValues() {
        return keepValues;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof MonteCarloSettings s && s.trials == trials && s.seed == seed
                && Double.compare(s.coverageProbability, coverageProbability) == 0 && s.threads == threads
                && s.adaptive == adaptive && s.significantDigits == significantDigits && s.maxTrials == maxTrials
                && s.keepValues == keepValues;
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(trials, seed, coverageProbability, threads, adaptive, significantDigits,
                maxTrials, keepValues);
    }

    @Override
    public String toString() {
        return "MonteCarloSettings[trials=" + trials + ", seed=" + seed + ", p=" + coverageProbability
                + ", threads=" + threads + ", adaptive=" + adaptive + ", nDig=" + significantDigits
                + ", maxTrials=" + maxTrials + ", keepValues=" + keepValues + "]";
    }
}
