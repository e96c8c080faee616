package org.quire.engine.montecarlo;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Collections;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.quire.engine.budget.Distribution;

/**
 * JCGM 101:2008 9.2, the additive model Y = X1 + X2 + X3 + X4 with estimates 0 (values from memory and
 * recomputed exactly, see the check values). The GUM gives u(y) = sqrt(sum u^2) and the 95 % interval
 * y +- 1.96 u(y) in every case.
 *
 * <p>Monte Carlo tolerances: with M trials the standard error of u(y) is about u / sqrt(2M) and that of an
 * interval end is sqrt(p(1 - p)/M) / g(end), g the density of Y there (recomputed by numerical convolution:
 * 0.0584 / 2 for 9.2.2, 0.0328 for 9.2.3, 0.0163 for 9.2.4). Each tolerance is about 4 to 5 such standard errors
 * (or the printed rounding, whichever is larger).
 */
class Jcgm101AdditiveModelTest {
    private static final double K95 = 1.959963984540054; // Phi^-1(0.975), JCGM 100:2008 Table G.1

    private static MonteCarloResult run(List<Distribution> inputs, long trials) {
        MonteCarloSettings s = MonteCarloSettings.defaults().withTrials(trials).withCoverageProbability(0.95)
                .withSeed(9_2L);
        return MonteCarlo.run(TestModels.additive(4), InputSampler.of(inputs), s);
    }

    @Test
    void clause922NormalInputsGiveTwoAndPlusMinus392AndConfirmTheGum() {
        // JCGM 101:2008 9.2.2: Monte Carlo u(y) = 2.00, shortest 95 % interval [-3.92, 3.92]
        OutputSummary y = run(Collections.nCopies(4, Distribution.Normal.of(0, 1)), 1_000_000).output(0);
        assertEquals(0.0, y.mean(), 0.01);           // SE 2/1000 = 0.002
        assertEquals(2.00, y.standardUncertainty(), 0.007); // SE 2/sqrt(2e6) = 0.0014; printed +-0.005
        // symmetric ends: SE 0.0054, tolerance 5 SE; the shortest interval of a symmetric output slides by a few
        // hundredths between seeds (its width is flat in its position), so its ends get 0.05 and its width,
        // which is well determined (SE under 0.005), 0.02
        assertEquals(-3.92, y.symmetricInterval().lower(), 0.027);
        assertEquals(3.92, y.symmetricInterval().upper(), 0.027);
        assertEquals(-3.92, y.shortestInterval().lower(), 0.05);
        assertEquals(3.92, y.shortestInterval().upper(), 0.05);
        assertEquals(7.84, y.shortestInterval().width(), 0.02);
        // JCGM 101:2008 9.2.2 and 8.2: the GUM result [-3.92, 3.92] is validated; n_dig = 2 gives delta = 0.05
        GumComparison c = GumComparison.of(y, 0.0, 2.0, K95 * 2.0, 2);
        assertEquals(0.05, c.tolerance(), 1e-15);
        assertEquals(GumComparison.Verdict.VALIDATED, c.verdict());
    }

    @Test
    void clause923RectangularInputsGiveShortestPlusMinus388AndConfirmTheGum() {
        // JCGM 101:2008 9.2.3: each X_i rectangular with u = 1, i.e. on [-sqrt 3, sqrt 3]
        double a = Math.sqrt(3.0);
        OutputSummary y = run(Collections.nCopies(4, Distribution.Rectangular.of(-a, a)), 2_000_000).output(0);
        assertEquals(2.00, y.standardUncertainty(), 0.005); // SE < 2/sqrt(4e6) = 0.001; printed +-0.005
        // shortest interval +-3.88 (exact 3.8794); an end slides by up to about 0.03 between seeds (see below)
        assertEquals(-3.8794, y.shortestInterval().lower(), 0.05);
        assertEquals(3.8794, y.shortestInterval().upper(), 0.05);
        assertEquals(2 * 3.8794, y.shortestInterval().width(), 0.02);
        // JCGM 101:2008 9.2.3: the GUM interval [-3.92, 3.92] is validated: d = 0.04 <= delta = 0.05 (n_dig = 2).
        // Compared with the probabilistically symmetric interval, whose ends have SE 0.0034 here; the shortest
        // interval of this symmetric output slides by several hundredths from run to run (its width is flat in
        // its position), too much for a margin of 0.01.
        assertEquals(-3.8794, y.symmetricInterval().lower(), 0.017);
        assertEquals(3.8794, y.symmetricInterval().upper(), 0.017);
        GumComparison c = GumComparison.of(y, 0.0, 2.0, K95 * 2.0, 2);
        assertEquals(GumComparison.Verdict.VALIDATED, c.verdict());
        assertEquals(0.04, c.lowerDifference(), 0.017);
        assertEquals(0.04, c.upperDifference(), 0.017);
    }

    @Test
    void clause924DominantRectangularGivesShortestPlusMinus170AndDoesNotConfirmTheGum() {
        // JCGM 101:2008 9.2.4: X1..X3 rectangular with u = 1, X4 rectangular with u = 10
        double a = Math.sqrt(3.0);
        List<Distribution> inputs = List.of(Distribution.Rectangular.of(-a, a), Distribution.Rectangular.of(-a, a),
                Distribution.Rectangular.of(-a, a), Distribution.Rectangular.of(-10 * a, 10 * a));
        OutputSummary y = run(inputs, 1_000_000).output(0);
        double gumU = Math.sqrt(103.0); // 10.149: u(y) = 10.1 as printed
        assertEquals(10.1, y.standardUncertainty(), 0.05); // printed rounding; SE about 0.006
        // shortest interval +-17.0 (exact 17.016); SE of an end at M = 1e6: 0.0096
        assertEquals(-17.016, y.shortestInterval().lower(), 0.05);
        assertEquals(17.016, y.shortestInterval().upper(), 0.05);
        // JCGM 101:2008 9.2.4: the GUM interval [-19.9, 19.9] is not validated. With n_dig = 2, u(y) = 10 x 10^0
        // and delta = 0.5 < d = 2.87; with n_dig = 1 the tolerance would be 5 (u = 1 x 10^1) and would pass, so
        // the verdict of the standard needs n_dig = 2 (7.9.2 and 8.2, recomputed here).
        GumComparison c2 = GumComparison.of(y, 0.0, gumU, K95 * gumU, 2);
        assertEquals(0.5, c2.tolerance(), 1e-15);
        assertEquals(GumComparison.Verdict.NOT_VALIDATED, c2.verdict());
        assertEquals(19.89 - 17.016, c2.lowerDifference(), 0.06);
        GumComparison c1 = GumComparison.of(y, 0.0, gumU, K95 * gumU, 1);
        assertEquals(5.0, c1.tolerance(), 1e-15);
        assertEquals(GumComparison.Verdict.VALIDATED, c1.verdict());
    }
}
