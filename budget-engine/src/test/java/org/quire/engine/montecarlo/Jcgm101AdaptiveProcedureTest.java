package org.quire.engine.montecarlo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Collections;
import org.junit.jupiter.api.Test;
import org.quire.engine.budget.Distribution;

/** JCGM 101:2008 7.9, the adaptive Monte Carlo procedure, on the additive model of 9.2.2. */
class Jcgm101AdaptiveProcedureTest {
    private static final InputSampler NORMALS = InputSampler.of(Collections.nCopies(4, Distribution.Normal.of(0, 1)));

    @Test
    void runLengthIsTheLargerOfTenThousandAndHundredOverOneMinusP() {
        // JCGM 101:2008 7.9.4 b): M = max(J, 10^4), J the smallest integer >= 100/(1 - p)
        assertEquals(10_000, MonteCarloSettings.defaults().withCoverageProbability(0.95).adaptiveRunLength());
        assertEquals(100_000, MonteCarloSettings.defaults().withCoverageProbability(0.999).adaptiveRunLength());
        assertEquals(20_000, MonteCarloSettings.defaults().withCoverageProbability(0.995).adaptiveRunLength());
    }

    @Test
    void stabilisesWithRunsOfTenThousandAndMeetsTheTolerance() {
        // JCGM 101:2008 7.9.4: stop when twice the standard deviation of the run means of y, u(y) and the interval
        // ends is within delta of u(y); n_dig = 2 and u = 2.0 give delta = 0.05 (7.9.2)
        MonteCarloSettings s = MonteCarloSettings.defaults().withAdaptive(true).withSignificantDigits(2)
                .withCoverageProbability(0.95).withSeed(79L);
        MonteCarloResult r = MonteCarlo.run(TestModels.additive(4), NORMALS, s);
        assertTrue(r.stabilized());
        assertTrue(r.adaptiveRuns() >= 2);
        assertEquals(r.adaptiveRuns() * 10_000L, r.trials());
        assertEquals(r.trials(), r.output(0).validTrials());
        // the results are then good to about delta: u = 2.00, symmetric 95 % interval +-3.92 (9.2.2)
        assertEquals(2.0, r.output(0).standardUncertainty(), 0.05);
        assertEquals(3.92, r.output(0).symmetricInterval().upper(), 0.1);
        assertTrue(r.notes().isEmpty(), r.notes().toString());
    }

    @Test
    void moreDigitsNeedMoreTrials() {
        // delta shrinks tenfold per digit, so the number of runs grows about a hundredfold (7.9.4)
        MonteCarloSettings s = MonteCarloSettings.defaults().withAdaptive(true).withCoverageProbability(0.95)
                .withSeed(80L);
        MonteCarloResult one = MonteCarlo.run(TestModels.additive(4), NORMALS, s.withSignificantDigits(1));
        MonteCarloResult two = MonteCarlo.run(TestModels.additive(4), NORMALS, s.withSignificantDigits(2));
        assertTrue(two.trials() > 5 * one.trials(), one.trials() + " vs " + two.trials());
    }

    @Test
    void stopsAtTheMaximumAndSaysSo() {
        MonteCarloSettings s = MonteCarloSettings.defaults().withAdaptive(true).withSignificantDigits(4)
                .withCoverageProbability(0.95).withMaxTrials(50_000);
        MonteCarloResult r = MonteCarlo.run(TestModels.additive(4), NORMALS, s);
        assertFalse(r.stabilized());
        assertEquals(50_000, r.trials());
        assertTrue(r.notes().stream().anyMatch(n -> n.contains("maximum of 50000 trials")), r.notes().toString());
    }

    @Test
    void maximumBelowTwoRunsIsRefused() {
        MonteCarloSettings s = MonteCarloSettings.defaults().withAdaptive(true).withCoverageProbability(0.95)
                .withMaxTrials(15_000);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> MonteCarlo.run(TestModels.additive(4), NORMALS, s));
        assertTrue(e.getMessage().contains("15000") && e.getMessage().contains("10000"), e.getMessage());
    }
}
