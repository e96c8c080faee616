package org.quire.engine.montecarlo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The one-sentence explanation of a GUM result that the Monte Carlo check does not validate. */
class GumComparisonExplanationTest {
    private static final double K95 = 1.959963984540054; // Phi^-1(0.975), JCGM 100:2008 Table G.1

    @Test
    void aDominantRectangularInputGivesANarrowerMonteCarloInterval() {
        // JCGM 101:2008 9.2.4 (printed figures): u(y) = 10.1, GUM interval [-19.9, 19.9], Monte Carlo [-17.0, 17.0],
        // not validated with n_dig = 2
        double u = Math.sqrt(103.0);
        GumComparison c = GumComparison.of(CoverageInterval.of(-17.0, 17.0, 0.95,
                CoverageInterval.Kind.PROBABILISTICALLY_SYMMETRIC), 0.0, u, K95 * u, 2);
        assertEquals(GumComparison.Verdict.NOT_VALIDATED, c.verdict());
        assertTrue(c.explanation().startsWith("The Monte Carlo interval is narrower than the GUM interval at both "
                + "ends"), c.explanation());
        assertTrue(c.explanation().contains("rectangular"), c.explanation());
    }

    @Test
    void widerAndShiftedIntervalsAreToldApart() {
        // constructed intervals around y = 0, U = 1.96 (u = 1, n_dig = 2: delta = 0.005)
        GumComparison wider = GumComparison.of(CoverageInterval.of(-2.3, 2.3, 0.95,
                CoverageInterval.Kind.PROBABILISTICALLY_SYMMETRIC), 0.0, 1.0, 1.96, 2);
        assertTrue(wider.explanation().startsWith("The Monte Carlo interval is wider"), wider.explanation());
        GumComparison higher = GumComparison.of(CoverageInterval.of(-1.80, 2.20, 0.95,
                CoverageInterval.Kind.PROBABILISTICALLY_SYMMETRIC), 0.0, 1.0, 1.96, 2);
        assertTrue(higher.explanation().startsWith("The Monte Carlo interval lies higher"), higher.explanation());
        GumComparison lower = GumComparison.of(CoverageInterval.of(-2.20, 1.80, 0.95,
                CoverageInterval.Kind.PROBABILISTICALLY_SYMMETRIC), 0.0, 1.0, 1.96, 2);
        assertTrue(lower.explanation().startsWith("The Monte Carlo interval lies lower"), lower.explanation());
    }

    @Test
    void aValidatedResultNeedsNoExplanation() {
        // JCGM 101:2008 9.2.3: GUM [-3.92, 3.92], Monte Carlo [-3.88, 3.88], validated (d = 0.04 <= delta = 0.05)
        GumComparison c = GumComparison.of(CoverageInterval.of(-3.88, 3.88, 0.95,
                CoverageInterval.Kind.PROBABILISTICALLY_SYMMETRIC), 0.0, 2.0, K95 * 2.0, 2);
        assertEquals(GumComparison.Verdict.VALIDATED, c.verdict());
        assertEquals("", c.explanation());
    }
}
