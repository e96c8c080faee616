package org.quire.app.ui.montecarlo;

import java.util.ArrayList;
import java.util.List;
import org.quire.app.Engine;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumResult;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.model.ModelException;
import org.quire.engine.montecarlo.BudgetSimulation;
import org.quire.engine.montecarlo.CoverageInterval;
import org.quire.engine.montecarlo.MonteCarloCancelledException;
import org.quire.engine.montecarlo.OutputSummary;
import org.quire.engine.montecarlo.ProgressListener;

/**
 * The workbench's Monte Carlo runner: the engine's {@link BudgetSimulation} (JCGM 101:2008), with the
 * comparison of clause 8 against the GUM result. No Swing here; thread-safe and stateless.
 */
public final class EngineMonteCarloRunner implements MonteCarloRunner {

    @Override
    public MonteCarloOutcome run(Budget budget, GumResult gum, Progress progress)
            throws ModelException, InterruptedException {
        CompiledModel model = budget.compile(Engine.library());
        ProgressListener listener = new ProgressListener() {
            @Override
            public void progress(long done, long planned) {
                progress.trialsDone(done, planned);
            }

            @Override
            public boolean cancelRequested() {
                return progress.cancelRequested() || Thread.currentThread().isInterrupted();
            }
        };
        BudgetSimulation.Outcome o;
        try {
            o = BudgetSimulation.run(budget, model, gum, BudgetSimulation.settings(budget.settings(), gum), listener);
        } catch (MonteCarloCancelledException e) {
            throw new InterruptedException("Monte Carlo run cancelled after " + e.trialsDone() + " trials");
        }
        List<MonteCarloOutcome.OutputOutcome> outs = new ArrayList<>();
        for (int k = 0; k < o.result().outputCount(); k++) {
            OutputSummary s = o.result().output(k);
            CoverageInterval ci = o.comparisons().get(k).monteCarloInterval();
            org.quire.engine.montecarlo.Histogram h = s.histogram();
            double[] edges = h.edges();
            org.quire.engine.montecarlo.GumComparison c = o.comparisons().get(k);
            outs.add(new MonteCarloOutcome.OutputOutcome(o.outputNames().get(k), gum.outputs().get(k).unit(),
                    s.mean(), s.standardUncertainty(), ci.probability(), ci.lower(), ci.upper(),
                    ci.kind() == CoverageInterval.Kind.SHORTEST,
                    new MonteCarloOutcome.Histogram(edges[0], edges[edges.length - 1], h.counts()),
                    new MonteCarloOutcome.GumComparison(c.tolerance(), c.lowerDifference(), c.upperDifference(),
                            c.confirmed())));
        }
        return new MonteCarloOutcome(o.result().trials(), o.result().seed(), budget.settings().adaptive(), outs);
    }
}
