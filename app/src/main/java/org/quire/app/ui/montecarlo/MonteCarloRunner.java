package org.quire.app.ui.montecarlo;

import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumResult;
import org.quire.engine.model.ModelException;

/**
 * The seam through which the workbench runs the Monte Carlo method (JCGM 101:2008) without knowing how it is
 * done. The Monte Carlo integration implements this interface and registers the implementation as a service
 * ({@code META-INF/services/org.quire.app.ui.montecarlo.MonteCarloRunner}); the workbench finds it with
 * {@link java.util.ServiceLoader} and, when none is installed, says so in the Monte Carlo section.
 *
 * <p>The workbench calls {@link #run} on a background thread (a {@code SwingWorker}), never on the event thread,
 * with an immutable budget snapshot. Implementations must be thread-safe, must not touch Swing, must report
 * progress now and then (at least every few hundred milliseconds) and must stop soon after
 * {@link Progress#cancelRequested()} turns true or the thread is interrupted. The number of trials, the seed
 * and the adaptive procedure come from {@link Budget#settings()}; the seed used is reported back.
 */
public interface MonteCarloRunner {

    /** Progress reports and the cancel flag, offered by the workbench. Thread-safe. */
    interface Progress {
        /** @param done trials completed so far; @param planned trials planned (may grow in the adaptive method) */
        void trialsDone(long done, long planned);

        /** @return whether the engineer pressed Cancel */
        boolean cancelRequested();
    }

    /**
     * Runs the Monte Carlo method on a budget.
     *
     * @param budget the budget snapshot (its model compiles: the GUM evaluation succeeded)
     * @param gum the GUM result of the same snapshot, for the comparison of JCGM 101:2008 clause 8
     * @param progress where to report progress and read the cancel flag
     * @return the outcome of every output
     * @throws ModelException when a trial leaves a function's domain (say which input values did it)
     * @throws InterruptedException when cancelled; the workbench then shows the run as cancelled
     */
    MonteCarloOutcome run(Budget budget, GumResult gum, Progress progress)
            throws ModelException, InterruptedException;
}
