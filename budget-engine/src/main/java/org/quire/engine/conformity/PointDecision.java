package org.quire.engine.conformity;

/**
 * The decision for one measured error: the limits that apply, the guard band and acceptance limits, the
 * probability of conformity and the decision with its specific risk. Immutable and thread-safe.
 *
 * @param point the measured error
 * @param zone the name of the envelope zone that applied (empty when limits were given directly)
 * @param limits the maximum permissible error at the point
 * @param expandedUncertainty U = k u, percentage points
 * @param guardBand w (0 for simple acceptance and for the probability rule), percentage points
 * @param acceptanceLower lower acceptance limit, % (NaN when no result can be accepted)
 * @param acceptanceUpper upper acceptance limit, % (NaN when no result can be accepted)
 * @param probabilityOfConformity p_c under the rule's distribution (JCGM 106:2012 clause 7)
 * @param decision the rule's decision
 * @param specificRisk for "conforms" the specific risk of false acceptance 1 - p_c, for "does not conform"
 *     the specific risk of false rejection p_c, NaN when undecided
 */
public record PointDecision(MeasuredError point, String zone, MpeLimits limits, double expandedUncertainty,
        double guardBand, double acceptanceLower, double acceptanceUpper, double probabilityOfConformity,
        Decision decision, double specificRisk) {

    /** @return the lower tolerance limit T_L, % */
    public double lowerTolerance() {
        return limits.lowerTolerance();
    }

    /** @return the upper tolerance limit T_U, % */
    public double upperTolerance() {
        return limits.upperTolerance();
    }
}
