package org.quire.engine.validate;

import jakarta.json.JsonObject;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.EvaluationSettings;

/**
 * A computation a worked example's checks can point into: the GUM evaluation, the Monte Carlo method, a
 * coverage factor, a line fit, a function value. It returns JSON; a check names a path into it.
 */
@FunctionalInterface
public interface Computation {

    /**
     * @param budget the example's budget, or null when the file holds checks only
     * @param arguments the check's {@code arguments} object (empty when absent)
     * @param settings the budget's settings with the check's overrides applied
     * @return the computed figures as JSON
     * @throws Exception with a message saying what went wrong
     */
    JsonObject compute(Budget budget, JsonObject arguments, EvaluationSettings settings) throws Exception;

    /**
     * As {@link #compute(Budget, JsonObject, EvaluationSettings)}, for computations that read files named
     * relative to the example file.
     *
     * @param folder the example file's folder
     */
    default JsonObject compute(Budget budget, JsonObject arguments, EvaluationSettings settings,
            java.nio.file.Path folder) throws Exception {
        return compute(budget, arguments, settings);
    }
}
