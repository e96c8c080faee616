package org.quire.engine.montecarlo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.quire.engine.budget.Distribution;

/**
 * Runs one after another on the same workers (a batch of budgets, one pool of threads and one set of value
 * arrays) give, trial for trial, what each run gives on threads of its own (common practice for reproducible
 * parallel simulation, JCGM 101:2008 7.2 and C.3: the streams belong to the blocks, not to the threads), also
 * when runs of other sizes and models come between; closed workers refuse a run.
 */
class MonteCarloWorkersTest {
    private static final InputSampler MIXED = InputSampler.of(List.of(Distribution.Normal.of(1, 0.1),
            Distribution.Rectangular.of(-1, 1), Distribution.StudentT.of(0, 0.2, 5), Distribution.Arcsine.of(0, 2)));
    private static final InputSampler MASS = InputSampler.of(List.of(Distribution.Normal.of(100000, 0.050),
            Distribution.Normal.of(1.234, 0.020), Distribution.Rectangular.of(1.10, 1.30),
            Distribution.Rectangular.of(7.0e3, 9.0e3), Distribution.Rectangular.of(7.95e3, 8.05e3)));

    private static void assertSameResults(MonteCarloResult a, MonteCarloResult b) {
        assertEquals(a.outputCount(), b.outputCount());
        for (int k = 0; k < a.outputCount(); k++) {
            OutputSummary x = a.output(k);
            OutputSummary y = b.output(k);
            assertEquals(x.mean(), y.mean(), 0.0);
            assertEquals(x.standardUncertainty(), y.standardUncertainty(), 0.0);
            assertEquals(x.symmetricInterval(), y.symmetricInterval());
            assertEquals(x.shortestInterval(), y.shortestInterval());
            assertEquals(x.histogram(), y.histogram());
            assertEquals(x.percentiles(), y.percentiles());
        }
    }

    private static final ProgressListener NONE = ProgressListener.NONE;

    @Test
    void runsOnSharedWorkersEqualRunsOnTheirOwnThreads() {
        MonteCarloSettings big = MonteCarloSettings.defaults().withTrials(50_001).withSeed(7L).withThreads(2);
        MonteCarloSettings small = MonteCarloSettings.defaults().withTrials(9_000).withSeed(8L).withThreads(2);
        MonteCarloResult alone1 = MonteCarlo.run(TestModels.additive(4), MIXED, big);
        MonteCarloResult alone2 = MonteCarlo.run(TestModels.massCalibration(), MASS, small);
        MonteCarloResult alone3 = MonteCarlo.run(TestModels.additive(4), MIXED, big.withSeed(9L));
        try (MonteCarlo.Workers workers = MonteCarlo.Workers.of(2)) {
            // the first and third run have the same size, so the third reuses the first run's arrays
            assertSameResults(alone1, MonteCarlo.run(TestModels.additive(4), MIXED, big, NONE, workers));
            assertSameResults(alone2, MonteCarlo.run(TestModels.massCalibration(), MASS, small, NONE, workers));
            assertSameResults(alone3, MonteCarlo.run(TestModels.additive(4), MIXED, big.withSeed(9L), NONE,
                    workers));
            assertSameResults(alone1, MonteCarlo.run(TestModels.additive(4), MIXED, big, NONE, workers));
            // values kept by a run are its own: a later run on the same workers does not change them
            MonteCarloResult kept = MonteCarlo.run(TestModels.additive(4), MIXED, big.withKeepValues(true),
                    NONE, workers);
            double first = kept.values(0)[0];
            MonteCarlo.run(TestModels.additive(4), MIXED, big.withSeed(10L), NONE, workers);
            assertEquals(first, kept.values(0)[0], 0.0);
            assertEquals(2, workers.threads());
        }
    }

    private static java.util.Set<Thread> workerThreads() {
        return Thread.getAllStackTraces().keySet().stream()
                .filter(t -> t.isAlive() && t.getName().startsWith("quire-montecarlo-"))
                .collect(java.util.stream.Collectors.toSet());
    }

    @Test
    void closedWorkersRefuseARunAndLeaveNoThread() throws InterruptedException {
        java.util.Set<Thread> before = workerThreads();
        MonteCarlo.Workers workers = MonteCarlo.Workers.of(3);
        MonteCarlo.run(TestModels.additive(4), MIXED, MonteCarloSettings.defaults().withTrials(20_000),
                NONE, workers);
        java.util.Set<Thread> own = workerThreads();
        own.removeAll(before);
        assertTrue(!own.isEmpty(), "the run used the workers' own threads");
        workers.close();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> MonteCarlo.run(
                TestModels.additive(4), MIXED, MonteCarloSettings.defaults().withTrials(1000), NONE,
                workers));
        assertTrue(e.getMessage().contains("closed"), e.getMessage());
        for (Thread t : own) {
            t.join(10_000); // close() has waited for the pool to end; a thread may take a moment to be gone
            assertTrue(!t.isAlive(), "the workers' thread " + t.getName() + " has ended");
        }
        assertThrows(IllegalArgumentException.class, () -> MonteCarlo.Workers.of(0));
    }
}
