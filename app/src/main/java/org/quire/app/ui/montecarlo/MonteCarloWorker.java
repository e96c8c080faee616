package org.quire.app.ui.montecarlo;

import java.util.List;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.Consumer;
import org.quire.app.ui.common.GuardedWorker;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumResult;
import org.quire.engine.montecarlo.MonteCarloOutcome;
import org.quire.engine.montecarlo.ProgressListener;

/**
 * Runs a {@link MonteCarloRunner} off the event thread, publishing progress and passing Cancel to the engine
 * through its {@link ProgressListener}.
 */
final class MonteCarloWorker extends GuardedWorker<MonteCarloOutcome, long[]> {
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
        return runner.run(budget, gum, new ProgressListener() {
            @Override
            public void progress(long done, long planned) {
                publish(new long[] {done, planned});
            }

            @Override
            public boolean cancelRequested() {
                return cancel.get() || isCancelled() || Thread.currentThread().isInterrupted();
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
    protected void received(List<long[]> chunks) {
        onProgress.accept(chunks.get(chunks.size() - 1));
    }
}
