package org.quire.app.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.apache.commons.math3.special.Gamma;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.Figures;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.model.ModelException;
import org.quire.engine.montecarlo.BudgetSimulation;
import org.quire.engine.montecarlo.CoverageInterval;
import org.quire.engine.montecarlo.GumComparison;
import org.quire.engine.montecarlo.Histogram;
import org.quire.engine.montecarlo.MonteCarloResult;
import org.quire.engine.montecarlo.MonteCarloSettings;
import org.quire.engine.montecarlo.OutputSummary;
import org.quire.engine.montecarlo.ProgressListener;

/**
 * Turns a Monte Carlo run of a budget ({@link BudgetSimulation}) into the {@link MonteCarloSummary} a report and
 * a review use: per output the mean, the standard uncertainty, the probabilistically symmetric and the shortest
 * coverage intervals, the clause-8 comparison with the GUM result, and a histogram of the trials with the
 * distribution the GUM assigns to the output drawn over it (a normal distribution, or a scaled and shifted t
 * distribution with ν_eff degrees of freedom) and both the Monte Carlo and the GUM intervals marked.
 *
 * <p>References: JCGM 101:2008 7.6 (estimate and standard uncertainty), 7.7.1 and 7.7.2 (probabilistically
 * symmetric and shortest coverage intervals), 8.2 (comparison, d_low and d_high) with the numerical tolerance of
 * 7.9.2; JCGM 100:2008 G.3 and JCGM 101:2008 6.4.9.2 (the scaled and shifted t distribution,
 * g(η) = Γ((ν+1)/2) / (s √(νπ) Γ(ν/2)) · (1 + ((η − μ)/s)²/ν)^(−(ν+1)/2)).
 *
 * <p>Stateless and thread-safe.
 */
public final class MonteCarloReport {
    /** Points on the drawn GUM density curve. */
    static final int CURVE_POINTS = 241;

    private MonteCarloReport() {
    }

    /**
     * Runs the Monte Carlo method for a budget and summarizes it.
     *
     * @param budget the budget
     * @param model its compiled model
     * @param gum its GUM result (with the model and settings of {@code budget})
     * @param settings the Monte Carlo settings, e.g. {@link BudgetSimulation#settings} with trials and seed
     * @param listener progress and cancellation
     * @throws ModelException when a trial leaves a function's domain in a way the engine refuses
     */
    public static MonteCarloSummary run(Budget budget, CompiledModel model, GumResult gum, MonteCarloSettings settings,
            ProgressListener listener) throws ModelException {
        return summary(budget, gum, BudgetSimulation.run(budget, model, gum, settings, listener));
    }

    /** @return the summary of a finished run {@code o} of {@code budget}, whose GUM result is {@code gum} */
    public static MonteCarloSummary summary(Budget budget, GumResult gum, BudgetSimulation.Outcome o) {
        Objects.requireNonNull(o, "outcome");
        MonteCarloResult r = o.result();
        List<MonteCarloSummary.Output> outputs = new ArrayList<>();
        for (int k = 0; k < r.outputCount(); k++) {
            OutputSummary m = r.output(k);
            GumComparison c = o.comparisons().get(k);
            OutputResult g = gum.outputs().get(k);
            CoverageInterval sym = m.symmetricInterval();
            CoverageInterval sho = m.shortestInterval();
            double[] gi = c.gumInterval();
            String unit = g.unit();
            String u = unit.isEmpty() ? "" : " " + unit;
            String line = "δ = " + Figures.compact(c.tolerance(), 1) + u + ", d_low = " + Figures.sig(c.lowerDifference(), 2)
                    + u + ", d_high = " + Figures.sig(c.upperDifference(), 2) + u;
            outputs.add(new MonteCarloSummary.Output(o.outputNames().get(k), unit, m.mean(), m.standardUncertainty(),
                    sym.lower(), sym.upper(), sym.probability(), false, c.confirmed(), line,
                    histogram(o.outputNames().get(k), unit, m, g, sym, sho, gi, r.coverageProbability()),
                    sym.lower(), sym.upper(), sho.lower(), sho.upper(), gi[0], gi[1], c.tolerance(),
                    c.lowerDifference(), c.upperDifference()));
        }
        return new MonteCarloSummary(r.trials(), r.seed(), r.settings().adaptive(), outputs);
    }

    private static Chart.Histogram histogram(String name, String unit, OutputSummary m, OutputResult g,
            CoverageInterval sym, CoverageInterval sho, double[] gi, double p) {
        Histogram h = m.histogram();
        if (h == null || h.binCount() == 0 || h.total() == 0) {
            return null;
        }
        double[] e = h.edges();
        boolean increasing = true;
        for (int i = 1; i < e.length; i++) {
            increasing &= e[i] > e[i - 1] && Double.isFinite(e[i]);
        }
        if (!increasing || !Double.isFinite(e[0])) {
            return null; // an output that does not vary has no histogram to draw
        }
        String pct = Figures.probability(p) + " %";
        List<Chart.Interval> intervals = new ArrayList<>();
        intervals.add(new Chart.Interval("Monte Carlo " + pct + ", probabilistically symmetric", sym.lower(),
                sym.upper(), Chart.Tone.SECOND));
        intervals.add(new Chart.Interval("Monte Carlo " + pct + ", shortest", sho.lower(), sho.upper(),
                Chart.Tone.FOURTH));
        intervals.add(new Chart.Interval("GUM y ± U", gi[0], gi[1], Chart.Tone.THIRD));
        double lo = Math.min(e[0], gi[0]);
        double hi = Math.max(e[e.length - 1], gi[1]);
        double width = (e[e.length - 1] - e[0]) / h.binCount();
        double nu = g.dofUsed();
        double[] x = new double[CURVE_POINTS];
        double[] y = new double[CURVE_POINTS];
        for (int i = 0; i < CURVE_POINTS; i++) {
            x[i] = lo + (hi - lo) * i / (CURVE_POINTS - 1);
            y[i] = h.total() * width * density(x[i], g.estimate(), g.standardUncertainty(), nu);
        }
        String curve = Double.isInfinite(nu) || !(nu > 0)
                ? "GUM: normal distribution N(y, u^2)"
                : "GUM: scaled and shifted t distribution, ν_{eff} = " + Figures.dof(nu);
        String label = Typesetter.name(name).plain() + (unit.isEmpty() ? "" : " (" + unit + ")");
        return new Chart.Histogram("Distribution of " + Typesetter.name(name).plain() + " from " + h.total()
                + " trials, with the distribution the GUM assigns to it and the coverage intervals",
                label, e, h.counts(), null, "", x, y, curve, intervals);
    }

    /**
     * @return the probability density at {@code x} of the distribution the GUM framework assigns to an output with
     *     estimate {@code y} and standard uncertainty {@code u}: normal when ν is infinite, otherwise t with ν
     *     degrees of freedom scaled by u and shifted to y (JCGM 101:2008 6.4.9.2)
     */
    static double density(double x, double y, double u, double nu) {
        if (!(u > 0)) {
            return 0;
        }
        double t = (x - y) / u;
        if (Double.isInfinite(nu) || !(nu > 0)) {
            return Math.exp(-0.5 * t * t) / (u * Math.sqrt(2 * Math.PI));
        }
        double log = Gamma.logGamma((nu + 1) / 2) - Gamma.logGamma(nu / 2) - 0.5 * Math.log(nu * Math.PI)
                - (nu + 1) / 2 * Math.log1p(t * t / nu);
        return Math.exp(log) / u;
    }
}
