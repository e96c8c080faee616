package org.quire.app.compare;

import java.util.Objects;

/**
 * The effect of the changes on one output: its estimate and expanded uncertainty in A and in B.
 *
 * @param name the output's name
 * @param unit its unit in B (or in A when B lacks the output)
 * @param estimateA y in A, NaN when A has no such output or could not be evaluated
 * @param estimateB y in B, likewise
 * @param expandedA U in A, likewise
 * @param expandedB U in B, likewise
 * @param coverageFactorA k in A, likewise
 * @param coverageFactorB k in B, likewise
 */
public record OutputEffect(String name, String unit, double estimateA, double estimateB, double expandedA,
        double expandedB, double coverageFactorA, double coverageFactorB) {
    public OutputEffect {
        Objects.requireNonNull(name, "name");
        unit = unit == null ? "" : unit;
    }

    /** @return 100 (U_B / U_A - 1), NaN when either is missing or U_A is zero */
    public double changePercent() {
        if (!(expandedA > 0) || Double.isNaN(expandedB)) {
            return Double.NaN;
        }
        return 100 * (expandedB / expandedA - 1);
    }

    /** @return whether U, y or k differ */
    public boolean changed() {
        return Double.compare(expandedA, expandedB) != 0 || Double.compare(estimateA, estimateB) != 0
                || Double.compare(coverageFactorA, coverageFactorB) != 0;
    }
}
