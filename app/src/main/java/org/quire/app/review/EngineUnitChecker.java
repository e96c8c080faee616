package org.quire.app.review;

import java.util.ArrayList;
import java.util.List;
import org.quire.app.common.Engine;
import org.quire.engine.budget.Budget;
import org.quire.engine.model.ModelCompiler;
import org.quire.engine.model.ModelProblem;

/**
 * The engine's dimension check as the checklist's unit checker: the problems the model has with the budget's
 * units that it does not have without them (inputs without a unit, sums of different dimensions, outputs whose
 * equation gives another dimension, unreadable units). Stateless and thread-safe.
 */
public final class EngineUnitChecker implements UnitChecker {

    @Override
    public List<String> problems(Budget budget) {
        List<ModelProblem> with = ModelCompiler.check(budget.model(), budget.inputNames(), budget.outputNames(),
                Engine.library(), budget.units());
        List<String> without = new ArrayList<>();
        for (ModelProblem p : ModelCompiler.check(budget.model(), budget.inputNames(), budget.outputNames(),
                Engine.library())) {
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
