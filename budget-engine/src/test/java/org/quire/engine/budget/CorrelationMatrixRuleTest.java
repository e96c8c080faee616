package org.quire.engine.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.montecarlo.BudgetSimulation;
import org.quire.engine.montecarlo.MonteCarloOutcome;
import org.quire.engine.montecarlo.ProgressListener;

/**
 * One positive semi-definiteness rule for the GUM evaluation and the Monte Carlo method: the matrix with
 * r12 = r13 = r23 = r has the eigenvalues 1 + 2r and 1 - r (twice) (common practice: the equicorrelation matrix),
 * so r = -0.5000000002 gives a smallest eigenvalue of -4e-10, within the stated tolerance -1e-9, and
 * r = -0.5001 gives -2e-4, beyond it.
 */
class CorrelationMatrixRuleTest {
    private static Budget sum(double r) {
        Map<String, Double> n = Map.of("estimate", 1.0, "standardUncertainty", 0.1);
        return Budget.of("y = a + b + c", List.of(new OutputQuantity("y", "1", "sum")),
                List.of(InputQuantity.of("a", TypeB.of("normal", n)), InputQuantity.of("b", TypeB.of("normal", n)),
                        InputQuantity.of("c", TypeB.of("normal", n))))
                .withCorrelations(List.of(Correlation.of("a", "b", r), Correlation.of("a", "c", r),
                        Correlation.of("b", "c", r)));
    }

    @Test
    void aMatrixAcceptedForTheGumEvaluationIsAlsoSampledByMonteCarlo() throws Exception {
        Budget b = sum(-0.5000000002);
        FunctionLibrary lib = FunctionLibrary.standard();
        CompiledModel m = b.compile(lib);
        GumResult gum = GumEvaluator.evaluate(b, m, b.correlationMatrix(), b.settings());
        // JCGM 100:2008 eq. (13): u^2 = 3 (0.01) + 6 r (0.01) = 0.03 (1 + 2r), practically zero
        assertEquals(0.0, gum.output("y").standardUncertainty(), 1e-5);
        MonteCarloOutcome o = BudgetSimulation.run(b, m, gum, BudgetSimulation.settings(
                b.settings().withTrials(20_000).withSeed(1L), gum), ProgressListener.NONE);
        // the sum of equicorrelated inputs with r = -1/2 does not vary: every trial gives 3 within rounding
        assertEquals(3.0, o.output(0).estimate(), 1e-6);
        assertTrue(o.output(0).summary().standardUncertainty() < 1e-4, o.output(0).toString());
    }

    @Test
    void aMatrixBeyondTheToleranceIsRefusedTheSameWayEverywhere() {
        Budget b = sum(-0.5001);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, b::correlationMatrix);
        assertTrue(e.getMessage().contains("not positive semi-definite (smallest eigenvalue -0.0002"), e.getMessage());
        IllegalArgumentException f = assertThrows(IllegalArgumentException.class, () -> CorrelationMatrix.of(
                new double[][] {{1, -0.5001, -0.5001}, {-0.5001, 1, -0.5001}, {-0.5001, -0.5001, 1}}));
        assertEquals(e.getMessage().replace("r(a, b)", "r(1, 2)").replace("r(a, c)", "r(1, 3)")
                .replace("r(b, c)", "r(2, 3)"), f.getMessage());
        assertTrue(CorrelationMatrix.SEMIDEFINITE_TOLERANCE == 1e-9);
    }
}
