package org.quire.app.ui.document;

import java.util.List;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumResult;

/**
 * The engine's answer for one budget snapshot: the GUM result when the budget can be evaluated, and every
 * problem found on the way.
 *
 * @param budget the snapshot evaluated
 * @param result the GUM result, or null when an error stopped the evaluation
 * @param problems model problems (with their places), correlation and evaluation problems, result warnings
 * @param millis how long the engine took
 */
public record Recalculation(Budget budget, GumResult result, List<Problem> problems, long millis) {
    public Recalculation {
        problems = List.copyOf(problems);
    }

    /** @return whether any problem is an error */
    public boolean hasErrors() {
        return problems.stream().anyMatch(p -> p.severity() == Problem.Severity.ERROR);
    }
}
