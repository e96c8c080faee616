package org.quire.engine.montecarlo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Collections;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;
import org.quire.engine.budget.CorrelationMatrix;
import org.quire.engine.budget.Distribution;
import org.quire.engine.model.BlockEvaluator;

/**
 * How a run behaves (common practice for reproducible parallel simulation, JCGM 101:2008 7.2 and C.3): the
 * same seed gives bit-identical results with any number of threads, different seeds differ, cancellation
 * stops promptly and leaves no thread, bad settings are refused with clear messages, and trials that leave
 * a function's domain are counted, excluded and reported.
 */
class MonteCarloRunBehaviourTest {
    private static final InputSampler MIXED = InputSampler.of(List.of(Distribution.Normal.of(1, 0.1),
            Distribution.Rectangular.of(-1, 1), Distribution.StudentT.of(0, 0.2, 5), Distribution.Arcsine.of(0, 2)));

    private static MonteCarloResult run(MonteCarloSettings s) {
        return MonteCarlo.run(TestModels.additive(4), MIXED, s);
    }

    @Test
    void sameSeedGivesBitIdenticalResultsWithOneTwoAndFiveThreads() {
        MonteCarloSettings s = MonteCarloSettings.defaults().withTrials(100_003).withSeed(12345L)
                .withKeepValues(true);
        MonteCarloResult one = run(s.withThreads(1));
        MonteCarloResult two = run(s.withThreads(2));
        MonteCarloResult five = run(s.withThreads(5));
        for (MonteCarloResult other : List.of(two, five)) {
            assertArrayEquals(one.values(0), other.values(0));
            OutputSummary a = one.output(0);
            OutputSummary b = other.output(0);
            assertEquals(a.mean(), b.mean(), 0.0);
            assertEquals(a.standardUncertainty(), b.standardUncertainty(), 0.0);
            assertEquals(a.shortestInterval(), b.shortestInterval());
            assertEquals(a.symmetricInterval(), b.symmetricInterval());
            assertEquals(a.histogram(), b.histogram());
            assertEquals(a.percentiles(), b.percentiles());
        }
        assertEquals(12345L, one.seed());
    }

    @Test
    void runsThatReuseSpareArraysGiveTheSameResultsAsTheFirst() {
        // the value arrays of one run are taken by the next run of the same size (SpareArrays): a run after runs
        // of other seeds, kept values or not, fixed or adaptive, must equal the first run of its seed bit for bit
        MonteCarloSettings s = MonteCarloSettings.defaults().withTrials(50_001).withSeed(777L);
        MonteCarloResult first = run(s.withKeepValues(true));
        for (int r = 0; r < 3; r++) {
            run(s.withSeed(r));
            run(s.withSeed(r).withKeepValues(true));
        }
        MonteCarloResult kept = run(s.withKeepValues(true));
        MonteCarloResult notKept = run(s);
        assertArrayEquals(first.values(0), kept.values(0));
        for (MonteCarloResult other : List.of(kept, notKept)) {
            assertEquals(first.output(0).toString(), other.output(0).toString());
            assertEquals(first.output(0).histogram(), other.output(0).histogram());
            assertEquals(first.output(0).percentiles(), other.output(0).percentiles());
        }
        MonteCarloSettings adaptive = MonteCarloSettings.defaults().withAdaptive(true).withSeed(778L);
        MonteCarloResult a = run(adaptive);
        run(adaptive.withSeed(1));
        MonteCarloResult b = run(adaptive);
        assertEquals(a.trials(), b.trials());
        assertEquals(a.output(0).toString(), b.output(0).toString());
        assertEquals(a.output(0).percentiles(), b.output(0).percentiles());
    }

    @Test
    void differentSeedsGiveDifferentValues() {
        MonteCarloSettings s = MonteCarloSettings.defaults().withTrials(10_000).withKeepValues(true);
        MonteCarloResult a = run(s.withSeed(1));
        MonteCarloResult b = run(s.withSeed(2));
        assertNotEquals(a.output(0).mean(), b.output(0).mean());
        assertTrue(a.values(0)[0] != b.values(0)[0]);
        assertEquals(MonteCarloSettings.DEFAULT_SEED, run(MonteCarloSettings.defaults().withTrials(10)).seed());
    }

    @Test
    void cancellationStopsPromptlyAndLeavesNoWorkerThread() {
        AtomicLong lastDone = new AtomicLong();
        AtomicInteger calls = new AtomicInteger();
        BlockEvaluator slow = new BlockEvaluator() {
            @Override public int inputCount() { return 4; }
            @Override public int outputCount() { return 1; }
            @Override
            public Session newSession(int maxBlock) {
                return (x, n, y) -> {
                    try {
                        Thread.sleep(5);
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                    }
                    System.arraycopy(x[0], 0, y[0], 0, n);
                };
            }
        };
        ProgressListener cancelAfterFirstReport = new ProgressListener() {
            @Override
            public void progress(long done, long planned) {
                lastDone.set(done);
                calls.incrementAndGet();
                assertEquals(10_000_000L, planned);
            }

            @Override
            public boolean cancelRequested() {
                return calls.get() >= 2;
            }
        };
        MonteCarloSettings s = MonteCarloSettings.defaults().withTrials(10_000_000).withThreads(2);
        long start = System.nanoTime();
        MonteCarloCancelledException e = assertThrows(MonteCarloCancelledException.class,
                () -> MonteCarlo.run(slow, MIXED, s, cancelAfterFirstReport));
        double seconds = (System.nanoTime() - start) / 1e9;
        assertTrue(seconds < 5, "cancellation took " + seconds + " s");
        assertTrue(e.trialsDone() < 10_000_000L);
        assertTrue(e.getMessage().contains("cancelled after"), e.getMessage());
        boolean left = Thread.getAllStackTraces().keySet().stream()
                .anyMatch(t -> t.getName().startsWith("quire-montecarlo-") && t.isAlive());
        assertTrue(!left, "a worker thread outlived the run");
    }

    @Test
    void badSettingsAreRefusedWithTheValueNamed() {
        MonteCarloSettings d = MonteCarloSettings.defaults();
        IllegalArgumentException t0 = assertThrows(IllegalArgumentException.class, () -> d.withTrials(0));
        assertTrue(t0.getMessage().contains("number of trials") && t0.getMessage().contains("0"), t0.getMessage());
        assertThrows(IllegalArgumentException.class, () -> d.withTrials(-5));
        IllegalArgumentException p1 = assertThrows(IllegalArgumentException.class,
                () -> d.withCoverageProbability(1.0));
        assertTrue(p1.getMessage().contains("coverage probability") && p1.getMessage().contains("1.0"),
                p1.getMessage());
        assertThrows(IllegalArgumentException.class, () -> d.withCoverageProbability(0.0));
        assertThrows(IllegalArgumentException.class, () -> d.withCoverageProbability(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> d.withCoverageProbability(-0.5));
        IllegalArgumentException th = assertThrows(IllegalArgumentException.class, () -> d.withThreads(0));
        assertTrue(th.getMessage().contains("threads"), th.getMessage());
        assertThrows(IllegalArgumentException.class, () -> d.withSignificantDigits(0));
        assertThrows(IllegalArgumentException.class, () -> d.withMaxTrials(0));
        IllegalArgumentException big = assertThrows(IllegalArgumentException.class,
                () -> d.withTrials(3_000_000_000L));
        assertTrue(big.getMessage().contains("3000000000"), big.getMessage());
        IllegalArgumentException mismatch = assertThrows(IllegalArgumentException.class,
                () -> MonteCarlo.run(TestModels.additive(3), MIXED, d.withTrials(10)));
        assertTrue(mismatch.getMessage().contains("3 input(s) but 4"), mismatch.getMessage());
    }

    @Test
    void trialsOutsideTheDomainAreCountedExcludedAndReported() {
        // Y1 = sqrt(X1) with X1 ~ N(0, 1): half the trials give NaN (binomial, SE sqrt(M/4) = 158 at M = 10^5)
        InputSampler in = InputSampler.of(List.of(Distribution.Normal.of(0, 1), Distribution.Normal.of(0, 1)));
        MonteCarloResult r = MonteCarlo.run(TestModels.squareRootAndSum(), in,
                MonteCarloSettings.defaults().withTrials(100_000).withSeed(7));
        OutputSummary y1 = r.output(0);
        assertEquals(50_000, y1.excludedTrials(), 5 * 158);
        assertEquals(100_000, y1.trials());
        assertTrue(y1.exclusionNote().orElseThrow().contains("were excluded"));
        assertTrue(r.notes().get(0).startsWith("output 1:"), r.notes().toString());
        // E[sqrt(|Z|)] for Z ~ N(0,1) is 2^(1/4) Gamma(3/4)/sqrt(pi) = 0.8222 (recomputed); sd about 0.35
        assertEquals(0.8222, y1.mean(), 5 * 0.35 / Math.sqrt(50_000));
        assertTrue(y1.minimum() >= 0);
        assertEquals(y1.validTrials(), y1.histogram().total());
        assertEquals(0, r.output(1).excludedTrials());
        // the correlation uses the trials where both outputs are finite: sqrt(X1) and X1 + X2 with X1 > 0
        assertTrue(r.outputCorrelation(0, 1) > 0.2 && r.outputCorrelation(0, 1) < 0.8);
    }

    @Test
    void outputCorrelationFollowsTheModel() {
        // Y1 = X1, Y2 = X2 with X1, X2 ~ N(0, 1) correlated 0.5; identity model, M = 10^5: SE (1 - r^2)/sqrt(M)
        InputSampler in = InputSampler.of(Collections.nCopies(2, Distribution.Normal.of(0, 1)),
                CorrelationMatrix.identity(2).withCoefficient(0, 1, 0.5));
        MonteCarloResult r = MonteCarlo.run(TestModels.identity(2), in,
                MonteCarloSettings.defaults().withTrials(100_000).withSeed(3));
        assertEquals(0.5, r.outputCorrelation(0, 1), 5 * 0.75 / Math.sqrt(100_000));
        assertEquals(r.outputCorrelation(0, 1), r.outputCorrelation()[1][0], 0.0);
    }

    @Test
    void modelExceptionsReachTheCallerUnchanged() {
        BlockEvaluator failing = new BlockEvaluator() {
            @Override public int inputCount() { return 4; }
            @Override public int outputCount() { return 1; }
            @Override
            public Session newSession(int maxBlock) {
                return (x, n, y) -> {
                    throw new ArithmeticException("model fault in line 3");
                };
            }
        };
        ArithmeticException e = assertThrows(ArithmeticException.class,
                () -> MonteCarlo.run(failing, MIXED, MonteCarloSettings.defaults().withTrials(50_000)));
        assertEquals("model fault in line 3", e.getMessage());
    }

    @Test
    void valuesAreOnlyAvailableWhenKept() {
        MonteCarloResult r = run(MonteCarloSettings.defaults().withTrials(100));
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> r.values(0));
        assertTrue(e.getMessage().contains("withKeepValues"), e.getMessage());
    }

    @Test
    void histogramOfAHeavyTailedOutputCoversTheCentralRange() {
        // Student t with 1 degree of freedom (Cauchy): extreme values are counted outside the bins
        InputSampler in = InputSampler.of(List.of(Distribution.StudentT.of(0, 1, 1)));
        MonteCarloResult r = MonteCarlo.run(TestModels.additive(1), in,
                MonteCarloSettings.defaults().withTrials(100_000).withSeed(11));
        Histogram h = r.output(0).histogram();
        assertTrue(h.countBelow() > 0 && h.countAbove() > 0);
        assertEquals(100_000, h.total());
        assertTrue(h.binCount() >= 10 && h.binCount() <= 200);
        // the central 99.9 %: the Cauchy quantile at 0.9995 is tan(0.4995 pi) = 636.6 (recomputed)
        double[] edges = h.edges();
        assertEquals(636.6, edges[edges.length - 1], 636.6 * 0.3);
    }
}
