package org.quire.engine.budget;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.TDistribution;

/**
 * Coverage factors k_p = t_p(nu) from the t-distribution for a two-sided coverage probability p.
 *
 * <p>References: JCGM 100:2008 G.3 and Table G.2 (t_p(nu) such that the interval -t_p ... +t_p encompasses
 * the fraction p of the t-distribution); for nu = infinity the normal distribution, JCGM 100:2008 G.2.
 * Non-integer nu are allowed (the t-distribution is defined for any nu > 0).
 *
 * <p>Thread-safe. The factors last computed are remembered (a pure function of p and nu), so that a batch of
 * many evaluations with the same nu inverts the t-distribution once per nu.
 */
public final class CoverageFactor {
    private static final double TOLERANCE = 1e-12;
    /** Remembered factors beyond this many are forgotten all at once. */
    private static final int REMEMBERED = 4096;
    private static final java.util.concurrent.ConcurrentHashMap<Key, Double> FACTORS =
            new java.util.concurrent.ConcurrentHashMap<>();

    private record Key(double p, double dof) {
    }

    private CoverageFactor() {
    }

    /**
     * @param p coverage probability, 0 &lt; p &lt; 1
     * @param dof degrees of freedom, &gt; 0; {@link Double#POSITIVE_INFINITY} for the normal distribution
     * @return t_p(nu)
     */
    public static double of(double p, double dof) {
        if (!(p > 0 && p < 1)) {
            throw new IllegalArgumentException("coverage probability must lie strictly between 0 and 1, not " + p);
        }
        if (!(dof > 0) || Double.isNaN(dof)) {
            throw new IllegalArgumentException("degrees of freedom must be positive, not " + dof);
        }
        Key key = new Key(p, dof);
        Double known = FACTORS.get(key);
        if (known != null) {
            return known;
        }
        double q = 0.5 * (1 + p);
        double k = Double.isInfinite(dof) || dof > 1e7
                ? new NormalDistribution(null, 0, 1, TOLERANCE).inverseCumulativeProbability(q)
                : new TDistribution(null, dof, TOLERANCE).inverseCumulativeProbability(q);
        if (FACTORS.size() >= REMEMBERED) {
            FACTORS.clear();
        }
        FACTORS.put(key, k);
        return k;
    }

    /**
     * @param k coverage factor &gt; 0
     * @param dof degrees of freedom (infinity for the normal distribution)
     * @return the two-sided coverage probability that {@code k} gives for a t-distribution with {@code dof}
     */
    public static double probability(double k, double dof) {
        if (!(k > 0) || Double.isInfinite(k)) {
            throw new IllegalArgumentException("coverage factor must be positive and finite, not " + k);
        }
        if (Double.isInfinite(dof) || dof > 1e7) {
            return 2 * new NormalDistribution(null, 0, 1, TOLERANCE).cumulativeProbability(k) - 1;
        }
        return 2 * new TDistribution(null, dof, TOLERANCE).cumulativeProbability(k) - 1;
    }
}
