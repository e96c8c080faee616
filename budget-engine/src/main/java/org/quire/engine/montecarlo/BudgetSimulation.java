package org.quire.engine.montecarlo;

import java.util.ArrayList;
import java.util.List;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.Distribution;
import org.quire.engine.budget.EvaluationSettings;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.model.CompiledModel;

/**
 * The Monte Carlo method applied to a budget: every input drawn from the distribution its evaluation states,
 * correlated inputs together, the compiled model evaluated for every trial, and each output's result compared
 * with the GUM result.
 *
 * <p>References: JCGM 101:2008 clause 7 (the propagation), 7.9 (adaptive procedure), clause 8 (comparison
 * with the GUM uncertainty framework; the numerical tolerance from the budget's significant digits).
 *
 * <p>Stateless and thread-safe.
 */
public final class BudgetSimulation {
    private BudgetSimulation() {
    }

    /**
     * One Monte Carlo run of a budget with its GUM comparison.
     *
     * @param result the Monte Carlo result
     * @param comparisons per output, in output order: the clause-8 comparison with the GUM result
     * @param outputNames the output names
     */
    public record Outcome(MonteCarloResult result, List<GumComparison> comparisons, List<String> outputNames) {
        public Outcome {
            comparisons = List.copyOf(comparisons);
            outputNames = List.copyOf(outputNames);
        }
    }

    /** @return the Monte Carlo settings that a budget's evaluation settings ask for */
    public static MonteCarloSettings settings(EvaluationSettings s, GumResult gum) {
        double p = s.coverageProbability();
        if (s.hasFixedCoverageFactor() && !gum.outputs().isEmpty()) {
            p = gum.outputs().get(0).coverageProbability();
        }
        MonteCarloSettings m = MonteCarloSettings.defaults().withSeed(s.seed()).withCoverageProbability(p)
                .withSignificantDigits(s.significantDigits()).withAdaptive(s.adaptive());
        if (s.adaptive()) {
            m = m.withMaxTrials(Math.max(s.trials(), m.adaptiveRunLength() * 2));
        } else {
            m = m.withTrials(s.trials());
        }
        return m;
    }

    /** @return the joint distribution of the budget's inputs */
    public static InputSampler sampler(Budget budget) {
        List<Distribution> d = new ArrayList<>();
        for (InputQuantity q : budget.inputs()) {
            d.add(q.evaluation().distribution());
        }
        org.quire.engine.budget.CorrelationMatrix r = budget.correlationMatrix();
        if (r.isIdentity()) {
            return InputSampler.of(d);
        }
        return InputSampler.of(d, CorrelationMatrix.of(r.toArray()));
    }

    /**
     * Runs the Monte Carlo method for a budget whose model is compiled and whose GUM result is known.
     *
     * @param settings the Monte Carlo settings (see {@link #settings})
     * @param listener progress and cancellation
     * @throws MonteCarloCancelledException when the listener asks to stop
     */
    public static Outcome run(Budget budget, CompiledModel model, GumResult gum, MonteCarloSettings settings,
            ProgressListener listener) {
        MonteCarloResult r = MonteCarlo.run(model, sampler(budget), settings, listener);
        List<GumComparison> cmp = new ArrayList<>();
        for (int k = 0; k < r.outputCount(); k++) {
            OutputResult g = gum.outputs().get(k);
            cmp.add(GumComparison.of(r.output(k), g.estimate(), g.standardUncertainty(), g.expandedUncertainty(),
                    settings.significantDigits()));
        }
        return new Outcome(r, cmp, model.outputNames());
    }
}
