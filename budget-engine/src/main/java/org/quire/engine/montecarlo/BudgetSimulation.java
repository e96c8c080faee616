package org.quire.engine.montecarlo;

import java.util.ArrayList;
import java.util.List;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.Distribution;
import org.quire.engine.budget.EvaluationSettings;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.model.BlockEvaluator;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.units.Conversion;

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

    /** @return the Monte Carlo settings that a budget's evaluation settings ask for */
    /** The smallest coverage probability the Monte Carlo method is run with (common practice). */
    public static final double MIN_COVERAGE_PROBABILITY = 0.5;

    /**
     * @throws IllegalArgumentException when the coverage probability (stated, or following from a stated coverage
     *     factor) is below {@link #MIN_COVERAGE_PROBABILITY}, or too close to 1 for the number of trials
     */
    public static MonteCarloSettings settings(EvaluationSettings s, GumResult gum) {
        double p = s.coverageProbability();
        if (s.hasFixedCoverageFactor() && !gum.outputs().isEmpty()) {
            p = gum.outputs().get(0).coverageProbability();
        }
        String from = s.hasFixedCoverageFactor() ? " (from the coverage factor k = " + s.coverageFactor() + ")" : "";
        if (!(p >= MIN_COVERAGE_PROBABILITY && p < 1)) {
            throw new IllegalArgumentException("the Monte Carlo method needs a coverage probability of at least "
                    + MIN_COVERAGE_PROBABILITY + " and below 1, not " + p + from + "; a coverage interval holds the "
                    + "larger part of the output's distribution (common practice)");
        }
        if (s.trials() * (1 - p) < 1) {
            throw new IllegalArgumentException("with " + s.trials() + " trials no coverage interval for p = " + p
                    + from + " can be formed: its ends are order statistics and need at least " + (long) Math.ceil(1
                    / (1 - p)) + " trials (JCGM 101:2008 7.7; 7.2.2 recommends at least 10^4 / (1 - p))");
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
        return InputSampler.of(d, r);
    }

    /**
     * Runs the Monte Carlo method for a budget whose model is compiled and whose GUM result is known.
     *
     * @param settings the Monte Carlo settings (see {@link #settings})
     * @param listener progress and cancellation
     * @throws MonteCarloCancelledException when the listener asks to stop
     */
    public static MonteCarloOutcome run(Budget budget, CompiledModel model, GumResult gum,
            MonteCarloSettings settings, ProgressListener listener) throws org.quire.engine.model.ModelException {
        return run(budget, model, gum, settings, listener, null);
    }

    /**
     * As {@link #run(Budget, CompiledModel, GumResult, MonteCarloSettings, ProgressListener)}, on the threads and
     * arrays of {@code workers} (a batch of budgets run one after another), or on threads of its own when null.
     */
    public static MonteCarloOutcome run(Budget budget, CompiledModel model, GumResult gum,
            MonteCarloSettings settings, ProgressListener listener, MonteCarlo.Workers workers)
            throws org.quire.engine.model.ModelException {
        Conversion[] shown = org.quire.engine.gum.GumEvaluator.displayConversions(budget, model);
        MonteCarloResult r = MonteCarlo.run(displayed(model, shown), sampler(budget), settings, listener, workers);
        List<MonteCarloOutcome.Output> outputs = new ArrayList<>();
        for (int k = 0; k < r.outputCount(); k++) {
            OutputResult g = gum.outputs().get(k);
            GumComparison c = GumComparison.of(r.output(k), g.estimate(), g.standardUncertainty(),
                    g.expandedUncertainty(), settings.significantDigits());
            double nu = g.dofUsed() > 0 ? g.dofUsed() : Double.POSITIVE_INFINITY;
            outputs.add(MonteCarloOutcome.Output.of(model.outputNames().get(k), g.unit(), r.output(k), c, nu,
                    undefinedStandardUncertainty(budget, g)));
        }
        return MonteCarloOutcome.of(r, outputs);
    }

    /**
     * Why an output has no standard uncertainty, or null when it has one: it depends on an input drawn from a t
     * distribution with nu &lt;= 2 degrees of freedom, which has no finite variance (JCGM 101:2008 6.4.9: the
     * variance of t_nu(mu, s^2) is nu s^2 / (nu - 2), for nu &gt; 2 only), so the spread of the trial values
     * settles on no value as M grows. An input counts when its sensitivity coefficient is not zero, or when
     * every first-order coefficient vanishes (then which inputs matter is not known from the GUM result).
     */
    static String undefinedStandardUncertainty(Budget budget, OutputResult g) {
        for (InputQuantity q : budget.inputs()) {
            if (q.evaluation().distribution() instanceof Distribution.StudentT t && t.dof() <= 2) {
                org.quire.engine.gum.Contribution c = g.contribution(q.name());
                if (!(g.standardUncertainty() > 0) || c == null || c.sensitivity() != 0) {
                    return Messages.standardUncertaintyUndefined(q.name(), t.dof());
                }
            }
        }
        return null;
    }

    /**
     * The model with each output converted, as a point, into its display unit, so that the Monte Carlo
     * summaries are in the same units as the GUM result they are compared with.
     */
    static BlockEvaluator displayed(CompiledModel model, Conversion[] shown) {
        boolean any = false;
        for (Conversion c : shown) {
            any |= c != null && !c.isIdentity();
        }
        if (!any) {
            return model;
        }
        return new BlockEvaluator() {
            @Override
            public int inputCount() {
                return model.inputCount();
            }

            @Override
            public int outputCount() {
                return model.outputCount();
            }

            @Override
            public Session newSession(int maxBlock) {
                Session s = model.newSession(maxBlock);
                return (in, n, out) -> {
                    s.evaluate(in, n, out);
                    for (int k = 0; k < shown.length; k++) {
                        if (shown[k] != null && !shown[k].isIdentity()) {
                            double[] o = out[k];
                            for (int t = 0; t < n; t++) {
                                o[t] = shown[k].point(o[t]);
                            }
                        }
                    }
                };
            }
        };
    }
}
