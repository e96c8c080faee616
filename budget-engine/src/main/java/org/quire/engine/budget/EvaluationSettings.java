package org.quire.engine.budget;

import java.util.Locale;

/**
 * How a budget is evaluated: the coverage probability or a fixed coverage factor, whether higher-order terms
 * are added, how non-integer effective degrees of freedom are treated, the Monte Carlo trials and seed, and the
 * number of significant digits for reporting.
 *
 * <p>Immutable and thread-safe; change with the {@code with...} methods.
 */
public final class EvaluationSettings {
    /** Default coverage probability: the 95.45 % that k = 2 gives for a normal distribution. */
    public static final double DEFAULT_COVERAGE = 0.9545;
    /** Default number of Monte Carlo trials (JCGM 101:2008 7.2.1 suggests 10^6). */
    public static final long DEFAULT_TRIALS = 1_000_000L;
    /** Default Monte Carlo seed; every result records the seed it used. */
    public static final long DEFAULT_SEED = 20_261_202L;

    /** What to do with a non-integer effective degrees of freedom before looking up t_p(nu). */
    public enum DofRounding {
        /** Truncate to the next lower integer, as JCGM 100:2008 G.4.1 note 1 and G.6.4 do. */
        TRUNCATE,
        /** Use the non-integer value directly in the t-distribution. */
        EXACT
    }

    private static final EvaluationSettings DEFAULT = new EvaluationSettings(DEFAULT_COVERAGE, Double.NaN, false,
            DofRounding.TRUNCATE, DEFAULT_TRIALS, DEFAULT_SEED, 2, false);

    private final double coverageProbability;
    private final double coverageFactor;
    private final boolean higherOrder;
    private final DofRounding dofRounding;
    private final long trials;
    private final long seed;
    private final int significantDigits;
    private final boolean adaptive;

    private EvaluationSettings(double coverageProbability, double coverageFactor, boolean higherOrder,
            DofRounding dofRounding, long trials, long seed, int significantDigits, boolean adaptive) {
        this.coverageProbability = coverageProbability;
        this.coverageFactor = coverageFactor;
        this.higherOrder = higherOrder;
        this.dofRounding = dofRounding;
        this.trials = trials;
        this.seed = seed;
        this.significantDigits = significantDigits;
        this.adaptive = adaptive;
    }

    /** @return the defaults: p = 95.45 %, first order, truncated nu_eff, 10^6 trials, 2 significant digits */
    public static EvaluationSettings defaults() {
        return DEFAULT;
    }

    /** @param p coverage probability in (0, 1); clears a fixed coverage factor */
    public EvaluationSettings withCoverageProbability(double p) {
        if (!(p > 0 && p < 1)) {
            throw new IllegalArgumentException("coverage probability must lie strictly between 0 and 1, not " + p);
        }
        return new EvaluationSettings(p, Double.NaN, higherOrder, dofRounding, trials, seed, significantDigits, adaptive);
    }

    /**
     * The largest coverage factor a budget may fix: above the largest value of JCGM 100:2008 Table G.2 (k = 235.80
     * for nu = 1, p = 99.73 %), so that no stated k is refused, while a factor that would make U overflow is.
     */
    public static final double MAX_COVERAGE_FACTOR = 1000;

    /** @param k a fixed coverage factor in (0, {@link #MAX_COVERAGE_FACTOR}] used instead of t_p(nu_eff) */
    public EvaluationSettings withCoverageFactor(double k) {
        if (!(k > 0) || !(k <= MAX_COVERAGE_FACTOR)) {
            throw new IllegalArgumentException("coverage factor k must be greater than 0 and at most "
                    + (int) MAX_COVERAGE_FACTOR + ", not " + k);
        }
        return new EvaluationSettings(coverageProbability, k, higherOrder, dofRounding, trials, seed, significantDigits, adaptive);
    }

    /** @param on whether to add the higher-order terms of JCGM 100:2008 5.1.2 note (uncorrelated inputs only) */
    public EvaluationSettings withHigherOrder(boolean on) {
        return new EvaluationSettings(coverageProbability, coverageFactor, on, dofRounding, trials, seed, significantDigits, adaptive);
    }

    public EvaluationSettings withDofRounding(DofRounding r) {
        return new EvaluationSettings(coverageProbability, coverageFactor, higherOrder, r, trials, seed, significantDigits, adaptive);
    }

    /** @param n number of Monte Carlo trials, at least 1 */
    public EvaluationSettings withTrials(long n) {
        if (n < 1) {
            throw new IllegalArgumentException("number of Monte Carlo trials must be at least 1, not " + n);
        }
        return new EvaluationSettings(coverageProbability, coverageFactor, higherOrder, dofRounding, n, seed, significantDigits, adaptive);
    }

    public EvaluationSettings withSeed(long s) {
        return new EvaluationSettings(coverageProbability, coverageFactor, higherOrder, dofRounding, trials, s, significantDigits, adaptive);
    }

    /** @param digits significant digits of reported uncertainties, 1 to 4 (JCGM 100:2008 7.2.6 suggests 2) */
    public EvaluationSettings withSignificantDigits(int digits) {
        if (digits < 1 || digits > 4) {
            throw new IllegalArgumentException("significant digits must be 1 to 4, not " + digits);
        }
        return new EvaluationSettings(coverageProbability, coverageFactor, higherOrder, dofRounding, trials, seed, digits, adaptive);
    }

    /** @param on whether the Monte Carlo method runs the adaptive procedure of JCGM 101:2008 7.9 */
    public EvaluationSettings withAdaptive(boolean on) {
        return new EvaluationSettings(coverageProbability, coverageFactor, higherOrder, dofRounding, trials, seed, significantDigits, on);
    }

    public double coverageProbability() { return coverageProbability; }
    /** @return the fixed coverage factor, or NaN when k comes from t_p(nu_eff) */
    public double coverageFactor() { return coverageFactor; }
    public boolean hasFixedCoverageFactor() { return !Double.isNaN(coverageFactor); }
    public boolean higherOrder() { return higherOrder; }
    public DofRounding dofRounding() { return dofRounding; }
    public long trials() { return trials; }
    public long seed() { return seed; }
    public int significantDigits() { return significantDigits; }
    public boolean adaptive() { return adaptive; }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof EvaluationSettings)) {
            return false;
        }
        EvaluationSettings s = (EvaluationSettings) o;
        return Double.compare(coverageProbability, s.coverageProbability) == 0
                && Double.compare(coverageFactor, s.coverageFactor) == 0 && higherOrder == s.higherOrder
                && dofRounding == s.dofRounding && trials == s.trials && seed == s.seed
                && significantDigits == s.significantDigits && adaptive == s.adaptive;
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(coverageProbability, coverageFactor, higherOrder, dofRounding, trials, seed,
                significantDigits, adaptive);
    }

    @Override
    public String toString() {
        return hasFixedCoverageFactor() ? String.format(Locale.ROOT, "k = %s", coverageFactor)
                : String.format(Locale.ROOT, "p = %s", coverageProbability);
    }
}
