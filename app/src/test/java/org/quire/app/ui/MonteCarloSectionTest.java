package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import javax.swing.JLabel;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.montecarlo.MonteCarloOutcome;
import org.quire.app.ui.montecarlo.MonteCarloRunner;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;

/**
 * The Monte Carlo section against the {@link MonteCarloRunner} seam, with a stand-in runner that exists only in
 * this test: it reports progress in steps, honours Cancel, and returns an outcome shaped like the GUM result.
 */
class MonteCarloSectionTest extends GuiTestSupport {
    private final CountDownLatch started = new CountDownLatch(1);
    private volatile boolean hold;
    private final List<Long> reported = new ArrayList<>();

    private final MonteCarloRunner standIn = new MonteCarloRunner() {
        @Override
        public MonteCarloOutcome run(Budget budget, GumResult gum, Progress progress) throws InterruptedException {
            started.countDown();
            long planned = budget.settings().trials();
            for (int step = 1; step <= 10 || hold; step++) {
                if (progress.cancelRequested()) {
                    throw new InterruptedException("cancelled");
                }
                Thread.sleep(10);
                progress.trialsDone(Math.min(planned, planned * step / 10), planned);
                synchronized (reported) {
                    reported.add(planned * step / 10);
                }
            }
            List<MonteCarloOutcome.OutputOutcome> outs = new ArrayList<>();
            for (OutputResult o : gum.outputs()) {
                double lo = o.estimate() - o.expandedUncertainty();
                double hi = o.estimate() + o.expandedUncertainty();
                long[] counts = {1, 4, 9, 14, 9, 4, 1};
                outs.add(new MonteCarloOutcome.OutputOutcome(o.name(), o.unit(), o.estimate(), o.standardUncertainty(),
                        o.coverageProbability(), lo, hi, false,
                        new MonteCarloOutcome.Histogram(lo - o.standardUncertainty(), hi + o.standardUncertainty(), counts),
                        new MonteCarloOutcome.GumComparison(o.standardUncertainty() / 20, 0, 0, true)));
            }
            return new MonteCarloOutcome(planned, budget.settings().seed(), false, outs);
        }
    };

    @Override
    Optional<MonteCarloRunner> runner() {
        return Optional.of(standIn);
    }

    @Test
    void runShowsProgressHistogramAndVerdictOfEachOutput() throws Exception {
        BudgetEditor ed = openDemo();
        onEdt(() -> { ed.runMonteCarlo(); return null; });
        waitFor("the verdict of E", () -> WorkbenchEditingTest.find(ed, "mcVerdict:E") != null);
        String verdict = onEdt(() -> ((JLabel) WorkbenchEditingTest.find(ed, "mcVerdict:E")).getText());
        assertTrue(verdict.contains("GUM result confirmed"), verdict);
        assertTrue(onEdt(() -> WorkbenchEditingTest.find(ed, "mcVerdict:q")) != null, "q has its own verdict");
        synchronized (reported) {
            assertTrue(reported.size() >= 10, "progress was reported");
        }
    }

    @Test
    void cancelStopsTheRunAndSaysSo() throws Exception {
        hold = true;
        BudgetEditor ed = openDemo();
        onEdt(() -> { ed.runMonteCarlo(); return null; });
        assertTrue(started.await(5, TimeUnit.SECONDS), "the run started");
        Thread.sleep(50);
        JLabel[] state = new JLabel[1];
        onEdt(() -> {
            javax.swing.JButton cancel = (javax.swing.JButton) WorkbenchEditingTest.find(ed, "mcCancel");
            assertTrue(cancel.isEnabled(), "Cancel is enabled while running");
            cancel.doClick();
            return null;
        });
        waitFor("the run to end", () -> !((javax.swing.JButton) WorkbenchEditingTest.find(ed, "mcCancel")).isEnabled());
        assertTrue(WorkbenchEditingTest.find(ed, "mcVerdict:E") == null, "no result shown after a cancel");
        assertTrue(state.length == 1);
    }
}
