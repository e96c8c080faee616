package org.quire.app.report;

import java.util.ArrayList;
import java.util.List;
import org.quire.engine.gum.Figures;
import org.quire.engine.montecarlo.CoverageInterval;
import org.quire.engine.montecarlo.Histogram;
import org.quire.engine.montecarlo.MonteCarloOutcome;

/**
 * The histogram chart of one output of the engine's {@link MonteCarloOutcome}: the trials' histogram, the number
 * of trials the GUM's distribution for the output expects in each bin drawn over it (a normal distribution, or a
 * scaled and shifted t with the degrees of freedom the GUM result used; the engine computes the probabilities),
 * and the probabilistically symmetric, shortest and GUM intervals marked. Drawing data only: every figure is the
 * engine's.
 *
 * <p>References: JCGM 101:2008 7.5 (histogram), 7.7 (coverage intervals), clause 8 (comparison); JCGM 100:2008
 * G.3 (the t distribution of the GUM result).
 *
 * <p>Stateless and thread-safe.
 */
public final class MonteCarloReport {
    private MonteCarloReport() {
    }

    /** @return the chart of output {@code o}, or null when the output does not vary (no bins to draw) */
    public static Chart.Histogram histogram(MonteCarloOutcome.Output o) {
        Histogram h = o.histogram();
        if (h.binCount() == 0 || h.total() == 0) {
            return null;
        }
        double[] e = h.edges();
        for (int i = 1; i < e.length; i++) {
            if (!(e[i] > e[i - 1])) {
                return null; // an output that does not vary has no histogram to draw
            }
        }
        CoverageInterval sym = o.symmetricInterval();
        CoverageInterval sho = o.shortestInterval();
        CoverageInterval gum = o.gumInterval();
        String pct = Figures.probability(sym.probability()) + " %";
        List<Chart.Interval> intervals = new ArrayList<>();
        intervals.add(new Chart.Interval("Monte Carlo " + pct + ", probabilistically symmetric", sym.lower(),
                sym.upper(), Chart.Tone.SECOND));
        intervals.add(new Chart.Interval("Monte Carlo " + pct + ", shortest", sho.lower(), sho.upper(),
                Chart.Tone.FOURTH));
        intervals.add(new Chart.Interval("GUM y ± U", gum.lower(), gum.upper(), Chart.Tone.THIRD));
        double[] expected = o.gumExpectedCounts();
        double[] x = null;
        double[] y = null;
        String curve = "";
        if (expected.length == h.binCount()) {
            x = new double[expected.length];
            y = expected;
            for (int i = 0; i < x.length; i++) {
                x[i] = 0.5 * (e[i] + e[i + 1]);
            }
            curve = o.gumDistributionNormal()
                    ? "GUM: normal distribution N(y, u²), trials expected per bin"
                    : "GUM: scaled and shifted t distribution, ν = " + Figures.dof(o.gumDistributionDof())
                            + ", trials expected per bin";
        }
        String name = Typesetter.name(o.name()).plain();
        String label = name + (o.unit().isEmpty() ? "" : " (" + o.unit() + ")");
        return new Chart.Histogram("Distribution of " + name + " from " + Figures.count(h.total())
                + " trials, with the distribution the GUM assigns to it and the coverage intervals",
                label, e, h.counts(), null, "", x, y, curve, intervals);
    }
}
