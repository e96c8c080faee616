package org.quire.engine.conformity;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.TDistribution;

/**
 * The probability of conformity: the probability that the measurand lies within the tolerance interval
 * [T_L, T_U] given the measured value y and its standard uncertainty u. Stateless and thread-safe.
 *
 * <p>References: JCGM 106:2012 clause 7 (7.2, normal PDF): p_c = Phi((T_U - y)/u) - Phi((T_L - y)/u); with a
 * scaled and shifted t distribution with nu degrees of freedom, Phi is replaced by the t distribution
 * function F_nu. The distributions come from Commons Math.
 */
public final class ConformityProbability {
    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0.0, 1.0);

    private ConformityProbability() {
    }

    /**
     * @param y measured value
     * @param u its standard uncertainty, positive
     * @param lower lower tolerance limit T_L (may be negative infinity for a one-sided tolerance)
     * @param upper upper tolerance limit T_U, not below T_L (may be positive infinity)
     * @return p_c for a normal distribution N(y, u^2)
     */
    public static double normal(double y, double u, double lower, double upper) {
        return scaledT(y, u, Double.POSITIVE_INFINITY, lower, upper);
    }

    /**
     * @param dof degrees of freedom of the t distribution, positive; infinity gives the normal distribution
     * @return p_c for a scaled and shifted t distribution t_nu(y, u^2)
     * @see #normal(double, double, double, double)
     */
    public static double scaledT(double y, double u, double dof, double lower, double upper) {
        if (!Double.isFinite(y)) {
            throw new IllegalArgumentException(ConformityMessages.notFinite("measured value", y));
        }
        if (!Double.isFinite(u) || !(u > 0)) {
            throw new IllegalArgumentException(ConformityMessages.notPositive("standard uncertainty", u));
        }
        if (!(dof > 0)) {
            throw new IllegalArgumentException(ConformityMessages.notPositive("degrees of freedom", dof));
        }
        if (Double.isNaN(lower) || Double.isNaN(upper) || upper < lower) {
            throw new IllegalArgumentException(ConformityMessages.fmt(
                    "upper tolerance limit %s must not be below lower tolerance limit %s", upper, lower));
        }
        return cdf(dof, (upper - y) / u) - cdf(dof, (lower - y) / u);
    }

    /** @return the standard normal (dof infinite) or Student t distribution function at z */
    static double cdf(double dof, double z) {
        if (z == Double.POSITIVE_INFINITY) {
            return 1.0;
        }
        if (z == Double.NEGATIVE_INFINITY) {
            return 0.0;
        }
        if (Double.isInfinite(dof)) {
            return STANDARD_NORMAL.cumulativeProbability(z);
        }
        return new TDistribution(null, dof).cumulativeProbability(z);
    }
}
