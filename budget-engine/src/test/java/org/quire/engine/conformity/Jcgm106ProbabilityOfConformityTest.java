package org.quire.engine.conformity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * JCGM 106:2012 clause 7: probability of conformity p_c = Phi((T_U - y)/u) - Phi((T_L - y)/u), and with a
 * scaled and shifted t distribution. Standard-normal values Phi(1) = 0.8413, Phi(2) = 0.9772, Phi(3) = 0.9987
 * from the standard normal table (from memory; four printed decimals, tolerance half a unit per term).
 */
class Jcgm106ProbabilityOfConformityTest {

    private static final double PHI1 = 0.8413;   // standard normal table, from memory
    private static final double PHI2 = 0.9772;   // standard normal table, from memory
    private static final double PHI3 = 0.9987;   // standard normal table, from memory
    private static final double TABLE = 0.00005; // half a unit in the fourth decimal, per table value

    @Test
    void oneSidedUpperLimitOneStandardUncertaintyAway() {
        // T_U - y = u, no lower limit: p_c = Phi(1)
        assertEquals(PHI1, ConformityProbability.normal(0.0, 1.0, Double.NEGATIVE_INFINITY, 1.0), TABLE);
        // scale invariance: y = 0.3 %, u = 0.25 %, T_U = 0.55 %
        assertEquals(PHI1, ConformityProbability.normal(0.3, 0.25, Double.NEGATIVE_INFINITY, 0.55), TABLE);
    }

    @Test
    void twoSidedIntervalCentredOnTheResult() {
        // JCGM 106:2012 7.2 formula with T_L = y - 2u, T_U = y + 2u: p_c = Phi(2) - Phi(-2) = 2 Phi(2) - 1
        assertEquals(2 * PHI2 - 1, ConformityProbability.normal(0.5, 0.5, -0.5, 1.5), 2 * TABLE);
    }

    @Test
    void twoSidedIntervalOffCentre() {
        // T_L = y - 3u, T_U = y + u: p_c = Phi(1) - Phi(-3) = Phi(1) + Phi(3) - 1
        assertEquals(PHI1 + PHI3 - 1, ConformityProbability.normal(0.0, 0.4, -1.2, 0.4), 2 * TABLE);
        // result outside the interval: T_U = y - u, T_L = y - 2u: p_c = Phi(-1) - Phi(-2) = Phi(2) - Phi(1)
        assertEquals(PHI2 - PHI1, ConformityProbability.normal(2.0, 1.0, 0.0, 1.0), 2 * TABLE);
    }

    @Test
    void guardBandOfOneExpandedUncertaintyLeavesAboutTwoPercentRisk() {
        // y at the acceptance limit T_U - 2u with a wide tolerance: 1 - p_c = 1 - Phi(2)
        double pc = ConformityProbability.normal(8.0, 1.0, -100.0, 10.0);
        assertEquals(1 - PHI2, 1 - pc, TABLE);
    }

    @Test
    void scaledTWithTenDegreesOfFreedom() {
        // JCGM 100:2008 Table G.2 (check values, read): t_95(10) = 2.23, two-sided; printed to two decimals,
        // the density of t_10 near 2.23 (about 0.04) turns +-0.005 into +-0.0004 in p_c
        assertEquals(0.95, ConformityProbability.scaledT(0.0, 1.0, 10, -2.23, 2.23), 0.0005);
        // t_99(10) = 3.17 (same table)
        assertEquals(0.99, ConformityProbability.scaledT(1.0, 0.5, 10, 1.0 - 3.17 * 0.5, 1.0 + 3.17 * 0.5), 0.0003);
        // infinite degrees of freedom is the normal distribution
        assertEquals(ConformityProbability.normal(0.1, 0.3, -0.5, 0.5),
                ConformityProbability.scaledT(0.1, 0.3, Double.POSITIVE_INFINITY, -0.5, 0.5), 0.0);
    }

    @Test
    void badArgumentsAreNamed() {
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> ConformityProbability.normal(0, 0, -1, 1)).getMessage().startsWith("standard uncertainty"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> ConformityProbability.normal(0, 1, 1, -1)).getMessage().contains("must not be below"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> ConformityProbability.scaledT(0, 1, 0, -1, 1)).getMessage().startsWith("degrees of freedom"));
    }
}
