package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import javax.swing.JLabel;
import org.junit.jupiter.api.Test;
import org.quire.app.common.Engine;
import org.quire.app.ui.montecarlo.MonteCarloRunner;
import org.quire.app.ui.montecarlo.MonteCarloSection;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.budget.Budget;
import org.quire.engine.montecarlo.ProgressListener;

/**
 * The Monte Carlo section with a stand-in runner that exists only in this test: it reports progress in steps,
 * honours Cancel, and then returns the engine's outcome of a short run.
 */
class MonteCarloSectionTest extends GuiTestSupport {
    private final CountDownLatch started = new CountDownLatch(1);
    private volatile boolean hold;
    private final List<Long> reported = new ArrayList<>();

    private final MonteCarloRunner standIn = (budget, gum, progress) -> {
        started.countDown();
        long planned = budget.settings().trials();
        for (int step = 1; step <= 10 || hold; step++) {
            if (progress.cancelRequested()) {
                throw new CancellationException("cancelled by the test");
            }
            try {
                Thread.sleep(10);
            } catch (InterruptedException e) {
                throw new CancellationException("interrupted");
            }
            progress.progress(Math.min(planned, planned * step / 10), planned);
            synchronized (reported) {
                reported.add(planned * step / 10);
            }
        }
        // then the engine itself, with few trials, so that what is shown is the engine's outcome
        Budget small = budget.withSettings(budget.settings().withTrials(2_000));
        return MonteCarloRunner.engine(Engine.standard().library()).run(small, gum, ProgressListener.NONE);
    };

    @Override
    MonteCarloRunner runner() {
        return standIn;
    }

    @Test
    void runShowsProgressHistogramAndVerdictOfEachOutput() throws Exception {
        BudgetEditor ed = openDemo();
        onEdt(() -> { ed.runMonteCarlo(); return null; });
        waitFor("the verdict of E", () -> WorkbenchEditingTest.find(ed, "mcVerdict:E") != null);
        JLabel label = onEdt(() -> (JLabel) WorkbenchEditingTest.find(ed, "mcVerdict:E"));
        String verdict = onEdt(label::getText);
        assertTrue(label.getClientProperty(MonteCarloSection.VERDICT) != null, "the engine's verdict is shown");
        assertTrue(verdict.contains("symmetric") && verdict.contains("shortest") && verdict.contains("GUM y"),
                "both Monte Carlo intervals and the GUM interval are shown: " + verdict);
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
        onEdt(() -> {
            javax.swing.JButton cancel = (javax.swing.JButton) WorkbenchEditingTest.find(ed, "mcCancel");
            assertTrue(cancel.isEnabled(), "Cancel is enabled while running");
            cancel.doClick();
            return null;
        });
        waitFor("the run to end", () -> !((javax.swing.JButton) WorkbenchEditingTest.find(ed, "mcCancel")).isEnabled());
        assertTrue(WorkbenchEditingTest.find(ed, "mcVerdict:E") == null, "no result shown after a cancel");
        String state = onEdt(() -> ((JLabel) WorkbenchEditingTest.find(ed, "mcState")).getText());
        assertTrue(state.startsWith("The run was cancelled"), state);
    }
}
