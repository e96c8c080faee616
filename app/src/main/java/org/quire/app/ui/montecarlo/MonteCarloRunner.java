package org.quire.app.ui.montecarlo;

import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumResult;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.model.ModelException;
import org.quire.engine.montecarlo.BudgetSimulation;
import org.quire.engine.montecarlo.MonteCarloCancelledException;
import org.quire.engine.montecarlo.MonteCarloOutcome;
import org.quire.engine.montecarlo.ProgressListener;

/**
 * How the workbench runs the Monte Carlo method (JCGM 101:2008): {@link #engine(FunctionLibrary)} in the
 * application; a test may pass another that reports progress in steps or holds a run to test Cancel. Every runner
 * returns the engine's {@link MonteCarloOutcome}, which the workbench only shows.
 *
 * <p>The workbench calls {@link #run} on a background thread, never on the event thread, with an immutable budget
 * snapshot; implementations must be thread-safe, must not touch Swing, and must stop with a
 * {@link MonteCarloCancelledException} soon after {@link ProgressListener#cancelRequested()} turns true.
 */
@FunctionalInterface
public interface MonteCarloRunner {

    /**
     * @param budget the budget snapshot (its model compiles: the GUM evaluation succeeded)
     * @param gum the GUM result of the same snapshot, for the comparison of JCGM 101:2008 clause 8
     * @param listener where to report progress and read the cancel flag
     * @return the engine's outcome
     * @throws ModelException when the model cannot be evaluated
     * @throws MonteCarloCancelledException when cancelled
     */
    MonteCarloOutcome run(Budget budget, GumResult gum, ProgressListener listener) throws ModelException;

    /**
     * @param library the function library the GUM evaluation of the same workbench uses, so that both methods
     *     evaluate the same model
     * @return the engine's {@link BudgetSimulation} with the budget's own settings (trials, seed, adaptive)
     */
    static MonteCarloRunner engine(FunctionLibrary library) {
        return (budget, gum, listener) -> BudgetSimulation.run(budget, budget.compile(library), gum,
                BudgetSimulation.settings(budget.settings(), gum), listener);
    }
}
