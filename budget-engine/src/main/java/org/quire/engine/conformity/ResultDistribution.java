package org.quire.engine.conformity;

/**
 * The probability distribution assigned to the measurand given a measured error y and its standard uncertainty
 * u, for computing the probability of conformity.
 *
 * <p>References: JCGM 106:2012 clause 7 (normal PDF, and the scaled and shifted t distribution for a Type A
 * evaluation with few degrees of freedom).
 */
public enum ResultDistribution {
    /** Normal N(y, u^2). */
    NORMAL("normal distribution"),
    /** Scaled and shifted t with the point's effective degrees of freedom (normal when they are infinite). */
    SCALED_T("scaled and shifted t distribution with the effective degrees of freedom");

    private final String description;

    ResultDistribution(String description) {
        this.description = description;
    }

    /** @return the phrase used in decision statements */
    public String description() {
        return description;
    }
}
