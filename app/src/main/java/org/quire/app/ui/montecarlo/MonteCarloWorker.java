package org.quire.app.ui.montecarlo;

import java.util.List;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.Consumer;
import javax.swing.SwingWorker;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumResult;

/**
 * Runs a {@link MonteCarloRunner} off the event thread, publishing progress and passing Cancel to the runner
 * through its {@link MonteCarloRunner.Progress}.
 */
final class MonteCarloWorker extends SwingWorker<MonteCarloOutcome, long[]> {
    private final MonteCarloRunner runner;
    private final Budget budget;
    private final GumResult gum;
    private final Consumer<long[]> onProgress;
    private final AtomicBoolean cancel = new AtomicBoolean();

    MonteCarloWorker(MonteCarloRunner runner, Budget budget, GumResult gum, Consumer<long[]> onProgress) {
        this.runner = runner;
        this.budget = budget;
        this.gum = gum;
        this.onProgress = onProgress;
    }

    @Override
    protected MonteCarloOutcome doInBackground() throws Exception {
        return runner.run(budget, gum, new MonteCarloRunner.Progress() {
            @Override
            public void trialsDone(long done, long planned) {
                publish(new long[] {done, planned});
            }

            @Override
            public boolean cancelRequested() {
                return cancel.get() || isCancelled();
            }
        });
    }

    /** Asks the runner to stop. */
    void requestCancel() {
        cancel.set(true);
        cancel(true);
    }

    Budget budget() { return budget; }

    @Override
    protected void process(List<long[]> chunks) {
        onProgress.accept(chunks.get(chunks.size() - 1));
    }
}
