package org.quire.app.review;

import java.util.ArrayList;
import java.util.List;
import org.quire.engine.budget.Budget;
import org.quire.engine.model.ModelCompiler;
import org.quire.engine.model.ModelProblem;

/**
 * The engine's dimension check as the checklist's unit checker: the problems the model has with the budget's
 * units that it does not have without them (inputs without a unit, sums of different dimensions, outputs whose
 * equation gives another dimension, unreadable units). Stateless and thread-safe.
 */
public final class EngineUnitChecker implements UnitChecker {
    private final org.quire.engine.model.FunctionLibrary library;

    /** @param library the function set the budget is evaluated with */
    public EngineUnitChecker(org.quire.engine.model.FunctionLibrary library) {
        this.library = java.util.Objects.requireNonNull(library, "library");
    }

    @Override
    public List<String> problems(Budget budget) {
        List<ModelProblem> with = ModelCompiler.check(budget.model(), budget.inputNames(), budget.outputNames(),
                library, budget.units());
        List<String> without = new ArrayList<>();
        for (ModelProblem p : ModelCompiler.check(budget.model(), budget.inputNames(), budget.outputNames(),
                library)) {
            without.add(p.toString());
        }
        List<String> out = new ArrayList<>();
        for (ModelProblem p : with) {
            if (!without.contains(p.toString())) {
                out.add(p.toString());
            }
        }
        return out;
    }
}
