package org.quire.engine.montecarlo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.OutputQuantity;
import org.quire.engine.budget.TypeA;
import org.quire.engine.budget.TypeB;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.model.ModelException;

/**
 * The one Monte Carlo outcome: the GUM distribution's probability per histogram bin, the GUM interval, the
 * verdict with its reason, and a standard uncertainty that is not defined.
 *
 * <p>Expected bin probabilities are computed here independently of the engine's distribution functions: the
 * normal density exp(-z^2/2)/sqrt(2 pi) integrated by composite Simpson's rule (error far below 1e-10 with 200
 * panels a bin), and the closed form of the t distribution function with 2 degrees of freedom,
 * F(t) = 1/2 + t / (2 sqrt(2 + t^2)) (N. L. Johnson, S. Kotz, N. Balakrishnan, Continuous Univariate
 * Distributions, vol. 2, 2nd ed., Wiley 1995, ch. 28, from memory; it follows by integrating the density
 * (1 + t^2/2)^(-3/2) / (2 sqrt 2)).
 */
class MonteCarloOutcomeTest {
    private static final FunctionLibrary LIBRARY = FunctionLibrary.standard();

    private static MonteCarloOutcome run(Budget b, long trials) throws ModelException {
        CompiledModel m = b.compile(LIBRARY);
        GumResult gum = GumEvaluator.evaluate(b, m, b.correlationMatrix(), b.settings());
        MonteCarloSettings s = BudgetSimulation.settings(b.settings().withTrials(trials).withSeed(11L), gum);
        return BudgetSimulation.run(b, m, gum, s, ProgressListener.NONE);
    }

    private static double simpsonNormal(double a, double b, double mu, double sd) {
        int n = 200;
        double h = (b - a) / n;
        double s = 0;
        for (int i = 0; i <= n; i++) {
            double z = (a + i * h - mu) / sd;
            double f = Math.exp(-0.5 * z * z) / (sd * Math.sqrt(2 * Math.PI));
            s += f * (i == 0 || i == n ? 1 : i % 2 == 1 ? 4 : 2);
        }
        return s * h / 3;
    }

    private static double t2(double t) {
        return 0.5 + t / (2 * Math.sqrt(2 + t * t));
    }

    @Test
    void theGumNormalDistributionIsGivenPerHistogramBin() throws ModelException {
        Budget b = Budget.of("y = a + c", List.of(new OutputQuantity("y", "1", "sum")),
                List.of(InputQuantity.of("a", TypeB.of("normal", Map.of("estimate", 1.0, "standardUncertainty", 0.3))),
                        InputQuantity.of("c", TypeB.of("normal", Map.of("estimate", 2.0, "standardUncertainty", 0.4)))));
        // 10^6 trials as in JCGM 101:2008 9.2.2: SE of an interval end about 0.0014, below delta = 0.005
        MonteCarloOutcome o = run(b, 1_000_000);
        MonteCarloOutcome.Output y = o.output(0);
        // GUM: y = 3.0, u = sqrt(0.3^2 + 0.4^2) = 0.5 (JCGM 100:2008 eq. 10), normal (every nu infinite)
        assertEquals(3.0, y.comparison().gumEstimate(), 1e-12);
        assertEquals(0.5, y.comparison().gumStandardUncertainty(), 1e-12);
        assertTrue(y.gumDistributionNormal());
        double[] e = y.histogram().edges();
        double[] p = y.gumBinProbabilities();
        assertEquals(e.length - 1, p.length);
        for (int i = 0; i < p.length; i++) {
            assertEquals(simpsonNormal(e[i], e[i + 1], 3.0, 0.5), p[i], 1e-9, "bin " + i);
        }
        double[] counts = y.gumExpectedCounts();
        assertEquals(p[p.length / 2] * y.histogram().total(), counts[p.length / 2], 1e-9);
        // GUM interval y +- k u with the budget's default p = 95.45 %: k = 2.000 (JCGM 100:2008 Table G.1)
        assertEquals(3.0 - 2.000 * 0.5, y.gumInterval().lower(), 0.0005 * 0.5);
        assertEquals(3.0 + 2.000 * 0.5, y.gumInterval().upper(), 0.0005 * 0.5);
        // a linear model of normal inputs: the GUM result is exact (JCGM 101:2008 9.2.2); verdict and reason agree
        assertEquals(GumComparison.Verdict.VALIDATED, y.comparison().verdict());
        assertTrue(y.comparison().reason().startsWith("the GUM result is validated"), y.comparison().reason());
        assertTrue(y.hasStandardUncertainty());
    }

    @Test
    void aTypeAInputWithTwoDegreesOfFreedomLeavesTheMonteCarloStandardUncertaintyUndefined() throws ModelException {
        // three readings: nu = 2, t_2 has no finite variance (JCGM 101:2008 6.4.9: variance nu s^2/(nu - 2))
        Budget b = Budget.of("y = x", List.of(new OutputQuantity("y", "1", "reading")),
                List.of(InputQuantity.of("x", TypeA.ofReadings(10.1, 10.3, 10.2))));
        MonteCarloOutcome o = run(b, 50_000);
        MonteCarloOutcome.Output y = o.output(0);
        assertFalse(y.hasStandardUncertainty());
        assertTrue(Double.isNaN(y.standardUncertainty()));
        assertTrue(y.standardUncertaintyNote().orElseThrow().contains("no finite variance"));
        assertTrue(o.notes().stream().anyMatch(n -> n.contains("no finite variance")));
        // the GUM side keeps its own: s = 0.1, u = 0.1/sqrt(3), nu_eff = 2 (JCGM 100:2008 4.2, G.4)
        double u = 0.1 / Math.sqrt(3);
        assertEquals(u, y.comparison().gumStandardUncertainty(), 1e-12);
        assertEquals(2.0, y.gumDistributionDof(), 0);
        double[] e = y.histogram().edges();
        double[] p = y.gumBinProbabilities();
        for (int i = 0; i < p.length; i++) {
            assertEquals(t2((e[i + 1] - 10.2) / u) - t2((e[i] - 10.2) / u), p[i], 1e-12, "bin " + i);
        }
        // the coverage interval is still defined: for y = x it is that of t_2 (JCGM 101:2008 6.4.9.4 form),
        // 10.2 +- t_{0.975, 2} u with t_{0.975, 2} = 4.303 (JCGM 100:2008 Table G.2); SE of an end at M = 5e4 is
        // sqrt(p(1-p)/M)/g with g the density there, about 0.003 for u = 0.0577
        assertEquals(10.2 - 4.303 * u, y.symmetricInterval().lower(), 0.02);
        assertEquals(10.2 + 4.303 * u, y.symmetricInterval().upper(), 0.02);
    }
}
