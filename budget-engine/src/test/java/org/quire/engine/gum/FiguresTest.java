package org.quire.engine.gum;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Number formatting in reports (common practice: powers of ten outside 10⁻³ ... 10⁶, ISO 80000-1 7.3.2 from memory). */
class FiguresTest {

    @Test
    void significantDigitsWithPowersOfTen() {
        assertEquals("2.50 × 10⁻⁵", Figures.sig(2.5e-5, 3));
        assertEquals("−5.75 × 10⁻⁴", Figures.sig(-5.75e-4, 3));
        assertEquals("0.0289", Figures.sig(0.028867513, 3));
        assertEquals("575", Figures.sig(575.0, 3));
        assertEquals("1.23 × 10⁶", Figures.sig(1_234_567, 3));
        assertEquals("∞", Figures.sig(Double.POSITIVE_INFINITY, 3));
    }

    @Test
    void estimatesAsEntered() {
        assertEquals("50.000623", Figures.estimate(50.000623));
        assertEquals("0.000215", Figures.estimate(0.000215));
        assertEquals("−0.1", Figures.estimate(-0.1));
        assertEquals("1.15 × 10⁻⁵", Figures.estimate(1.15e-5));
        assertEquals("100\u202f000", Figures.estimate(1e5));
    }

    @Test
    void degreesOfFreedomAndProbabilities() {
        assertEquals("∞", Figures.dof(Double.POSITIVE_INFINITY));
        assertEquals("16", Figures.dof(16));
        assertEquals("25.6", Figures.dof(25.6));
        assertEquals("95.45", Figures.probability(0.9545));
        assertEquals("99", Figures.probability(0.99));
    }

    @Test
    void statedResultsRoundTheEstimateToTheUncertaintysLastDigit() {
        // JCGM 100:2008 7.2.6: U to two significant digits, y to the same decimal place; worked by hand
        assertEquals("−0.11 ± 0.24", Figures.statedResult(-0.1149, 0.2361, 2));
        assertEquals("100.02147 ± 0.00079", Figures.statedResult(100.021466, 0.000788, 2));
        assertEquals("12 345.7 ± 1.2", Figures.statedResult(12345.678, 1.23, 2), "digit groups as elsewhere");
        assertEquals("2.5 \u00b1 \u221e", Figures.statedResult(2.5, Double.POSITIVE_INFINITY, 2), "no rounding to U = inf");
        assertEquals("2.5 \u00b1 \u2013", Figures.statedResult(2.5, Double.NaN, 2), "nor to an undefined U");
    }
}
