package org.quire.engine.gum;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.Correlation;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.OutputQuantity;
import org.quire.engine.budget.TypeB;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.model.ModelException;
import org.quire.engine.montecarlo.BudgetSimulation;
import org.quire.engine.montecarlo.GumComparison;
import org.quire.engine.montecarlo.MonteCarloOutcome;
import org.quire.engine.montecarlo.ProgressListener;

/**
 * Higher-order terms of the law of propagation (JCGM 100:2008 5.1.2 note) for correlated normal inputs, and a
 * model whose first-order sensitivity coefficients all vanish at the estimates.
 *
 * <p>Independent check: the exact variance of the product of two correlated normal variables,
 * Var(X1 X2) = mu1^2 s2^2 + mu2^2 s1^2 + 2 mu1 mu2 rho s1 s2 + s1^2 s2^2 (1 + rho^2) (G. W. Bohrnstedt,
 * A. S. Goldberger, On the exact covariance of products of random variables, J. Am. Stat. Assoc. 64 (1969)
 * 1439-1442); the last term is what the second-order terms add, and the third derivatives of X1 X2 vanish. And
 * the variance of X^2 for X ~ N(0, s^2), 2 s^4 (the chi-squared distribution with one degree of freedom has
 * variance 2).
 */
class HigherOrderAndFirstOrderZeroTest {
    private static final FunctionLibrary LIBRARY = FunctionLibrary.standard();

    private static InputQuantity normal(String name, double x, double u) {
        return InputQuantity.of(name, TypeB.of("normal", Map.of("estimate", x, "standardUncertainty", u)));
    }

    private static InputQuantity rectangular(String name, double x, double u) {
        double a = u * Math.sqrt(3);
        return InputQuantity.of(name, TypeB.of("rectangular", Map.of("lower", x - a, "upper", x + a)));
    }

    @Test
    void higherOrderTermsOfCorrelatedNormalInputsMatchTheExactVarianceOfAProduct() throws ModelException {
        double mu1 = 2.0;
        double s1 = 0.3;
        double mu2 = -1.5;
        double s2 = 0.4;
        double rho = 0.6;
        Budget b = Budget.of("y = a * c", List.of(new OutputQuantity("y", "1", "product")),
                List.of(normal("a", mu1, s1), normal("c", mu2, s2)))
                .withCorrelations(List.of(Correlation.of("a", "c", rho)));
        b = b.withSettings(b.settings().withHigherOrder(true));
        OutputResult y = GumEvaluator.evaluate(b, LIBRARY).output("y");
        double exact = mu1 * mu1 * s2 * s2 + mu2 * mu2 * s1 * s1 + 2 * mu1 * mu2 * rho * s1 * s2
                + s1 * s1 * s2 * s2 * (1 + rho * rho);
        assertEquals(HigherOrderTerms.INCLUDED, y.higherOrderTerms());
        assertEquals(s1 * s1 * s2 * s2 * (1 + rho * rho), y.higherOrderVariance(), 1e-14);
        assertEquals(Math.sqrt(exact), y.standardUncertainty(), 1e-13);
    }

    @Test
    void higherOrderTermsWithCorrelatedNonNormalInputsAreStatedAsNotIncludedInTheResult() throws ModelException {
        Budget b = Budget.of("y = a * c", List.of(new OutputQuantity("y", "1", "product")),
                List.of(rectangular("a", 2.0, 0.3), normal("c", -1.5, 0.4)))
                .withCorrelations(List.of(Correlation.of("a", "c", 0.6)));
        b = b.withSettings(b.settings().withHigherOrder(true));
        GumResult r = GumEvaluator.evaluate(b, LIBRARY);
        OutputResult y = r.output("y");
        assertEquals(HigherOrderTerms.NOT_INCLUDED, y.higherOrderTerms());
        assertEquals(0.0, y.higherOrderVariance(), 0);
        // first order only: JCGM 100:2008 eq. (13)
        double first = 2.0 * 2.0 * 0.16 + 1.5 * 1.5 * 0.09 + 2 * 2.0 * -1.5 * 0.6 * 0.3 * 0.4;
        assertEquals(Math.sqrt(first), y.standardUncertainty(), 1e-13);
        assertTrue(r.warnings().stream().anyMatch(w -> w.startsWith("higher-order terms were not included")));
    }

    @Test
    void whenTheFirstOrderLawGivesZeroMonteCarloCompletesAndTheGumResultIsNotValidated() throws ModelException {
        // Y = X^2 with x = 0: dY/dX = 0 at the estimate (JCGM 101:2008 clause 9 discusses such a case, from memory 9.4)
        Budget b = Budget.of("y = x^2", List.of(new OutputQuantity("y", "1", "square")),
                List.of(normal("x", 0.0, 0.1)));
        CompiledModel m = b.compile(LIBRARY);
        GumResult gum = GumEvaluator.evaluate(b, m, b.correlationMatrix(), b.settings());
        OutputResult y = gum.output("y");
        assertEquals(0.0, y.standardUncertainty(), 0);
        String w = y.warnings().get(0);
        assertTrue(w.contains("the first-order law of propagation gives zero"), w);
        assertTrue(w.contains("higher-order terms") && w.contains("Monte Carlo"), w);
        assertFalse(w.contains("no input with an uncertainty affects this output"), w);

        MonteCarloOutcome o = BudgetSimulation.run(b, m, gum, BudgetSimulation.settings(
                b.settings().withTrials(200_000).withSeed(3L), gum), ProgressListener.NONE);
        MonteCarloOutcome.Output out = o.output(0);
        assertEquals(GumComparison.Verdict.NOT_VALIDATED, out.comparison().verdict());
        assertTrue(out.comparison().firstOrderZero());
        assertTrue(out.comparison().reason().contains("first-order law of propagation gives u(y) = 0"),
                out.comparison().reason());
        assertTrue(Double.isNaN(out.comparison().tolerance()));
        assertEquals(0, out.gumBinProbabilities().length, "no GUM curve for a point");
        // Monte Carlo: Y = 0.01 chi^2_1, mean 0.01, standard deviation 0.01 sqrt 2; SE of u about
        // u sqrt((kurtosis - 1)/(4M)) with the kurtosis 15 of chi^2_1: 0.0142 x 0.0042, so 5 SE = 0.0003
        assertEquals(0.01, out.estimate(), 5 * 0.0142 / Math.sqrt(200_000));
        assertEquals(0.01 * Math.sqrt(2), out.standardUncertainty(), 0.0003);

        // with the higher-order terms the GUM gives u = sqrt(2) s^2 = 0.01 sqrt 2 exactly
        Budget h = b.withSettings(b.settings().withHigherOrder(true));
        assertEquals(0.01 * Math.sqrt(2), GumEvaluator.evaluate(h, LIBRARY).output("y").standardUncertainty(), 1e-15);
    }
}
