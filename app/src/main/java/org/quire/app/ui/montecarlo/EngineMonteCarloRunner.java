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
            CoverageInterval other = ci.kind() == CoverageInterval.Kind.SHORTEST ? s.symmetricInterval()
                    : s.shortestInterval();
            outs.add(new MonteCarloOutcome.OutputOutcome(o.outputNames().get(k), gum.outputs().get(k).unit(),
                    s.mean(), s.standardUncertainty(), ci.probability(), ci.lower(), ci.upper(),
                    ci.kind() == CoverageInterval.Kind.SHORTEST,
                    new MonteCarloOutcome.Histogram(edges[0], edges[edges.length - 1], h.counts()),
                    new MonteCarloOutcome.GumComparison(c.tolerance(), c.lowerDifference(), c.upperDifference(),
                            c.confirmed()), other.lower(), other.upper(),
                    gumCounts(gum.outputs().get(k), edges, s.validTrials())));
        }
        return new MonteCarloOutcome(o.result().trials(), o.result().seed(), budget.settings().adaptive(), outs);
    }

    /**
     * The GUM distribution of an output, a normal distribution or, for finite degrees of freedom, a scaled and
     * shifted t distribution (JCGM 100:2008 G.3), as the number of trials expected in each histogram bin.
     */
    static double[] gumCounts(org.quire.engine.gum.OutputResult g, double[] edges, long trials) {
        double u = g.standardUncertainty();
        if (!(u > 0)) {
            return null;
        }
        org.apache.commons.math3.distribution.AbstractRealDistribution d = Double.isInfinite(g.dofUsed())
                ? new org.apache.commons.math3.distribution.NormalDistribution(null, 0, 1)
                : new org.apache.commons.math3.distribution.TDistribution(null, g.dofUsed());
        double[] out = new double[edges.length - 1];
        for (int i = 0; i < out.length; i++) {
            double lo = (edges[i] - g.estimate()) / u;
            double hi = (edges[i + 1] - g.estimate()) / u;
            out[i] = trials * (d.cumulativeProbability(hi) - d.cumulativeProbability(lo));
        }
        return out;
    }
}
