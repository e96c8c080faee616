package org.quire.app.ui.inspector;

import java.util.ArrayList;
import java.util.List;
import org.quire.app.report.Chart;
import org.quire.app.ui.chart.ChartView;
import org.quire.app.ui.common.Fmt;
import org.quire.engine.budget.Distribution;
import org.quire.engine.budget.TypeB;

/**
 * A picture of an input's distribution: its probability density drawn over estimate ± 4 u (or a little beyond its
 * limits), with the estimate marked, drawn by the workbench's one chart code ({@link ChartView}) with axes, ticks,
 * axis titles and a legend. The density of each point is the engine's, over a step of the picture
 * ({@code Marginal.meanDensity}); a drawing of the shape only, no figure of the budget comes from here.
 */
final class DistributionPlot extends ChartView {
    private static final int POINTS = 240;

    DistributionPlot() {
        setName("distributionPlot");
        setPlotHeight(60f); // a sketch beside the parameters: the parameters come first
        setNaturalWidth(org.quire.app.report.ChartLayout.MIN_WIDTH); // the inspector's column is narrow
    }

    /** Shows the distribution of input {@code name} in {@code unit} (may be empty); null shows nothing. */
    void show(Distribution d, String name, String unit) {
        setChart(d == null ? null : chart(d, name, unit));
    }

    static Chart.Plot chart(Distribution d, String name, String unit) {
        double mean = d.mean();
        double u = d.standardUncertainty();
        double lo;
        double hi;
        double[] lim = limits(d);
        if (lim != null) {
            double pad = 0.15 * (lim[1] - lim[0]);
            lo = lim[0] - pad;
            hi = lim[1] + pad;
        } else if (d instanceof Distribution.Exponential) {
            lo = -0.2 * mean;
            hi = 5 * mean;
        } else if (u > 0) {
            lo = mean - 4 * u;
            hi = mean + 4 * u;
        } else {
            lo = mean - 1;
            hi = mean + 1;
        }
        String shape = TypeB.DISTRIBUTIONS.contains(d.shape()) ? TypeB.screenName(d.shape()) : d.shape();
        // a dimensionless input ("1") has no unit to show on the axes
        String u1 = unit == null || unit.isBlank() || unit.strip().equals("1") ? "" : unit.strip().replace(' ', '*');
        String xLabel = name + (u1.isEmpty() ? "" : " (" + u1 + ")");
        String yLabel = "probability density" + (u1.isEmpty() ? "" : " (1/" + u1 + ")");
        List<Chart.Series> series = new ArrayList<>();
        double peak = 0;
        if (!(d instanceof Distribution.Constant) && u > 0) {
            org.quire.engine.montecarlo.Marginal m = org.quire.engine.montecarlo.Marginal.of(d);
            double[] x = new double[POINTS + 1];
            double[] y = new double[POINTS + 1];
            double h = (hi - lo) / POINTS;
            for (int i = 0; i <= POINTS; i++) {
                x[i] = lo + h * i;
                y[i] = m.meanDensity(x[i], h); // the engine's density, over a step of the picture
                peak = Math.max(peak, y[i]);
            }
            series.add(new Chart.Series(shape + " distribution", x, y, null, Chart.Style.LINE, Chart.Tone.FIRST));
        }
        String mark = "estimate x = " + Fmt.num(mean) + ", u(x) = " + Fmt.working(u);
        series.add(new Chart.Series(mark, new double[] {mean, mean}, new double[] {0, peak > 0 ? peak : 1}, null,
                Chart.Style.DASHED, Chart.Tone.SECOND));
        return new Chart.Plot("The " + shape + " distribution of " + name, xLabel, peak > 0 ? yLabel
                : "a constant: no spread", false, series, List.of(0.0));
    }

    private static double[] limits(Distribution d) {
        if (d instanceof Distribution.Rectangular) {
            return new double[] {((Distribution.Rectangular) d).lower(), ((Distribution.Rectangular) d).upper()};
        }
        if (d instanceof Distribution.Triangular) {
            return new double[] {((Distribution.Triangular) d).lower(), ((Distribution.Triangular) d).upper()};
        }
        if (d instanceof Distribution.Arcsine) {
            return new double[] {((Distribution.Arcsine) d).lower(), ((Distribution.Arcsine) d).upper()};
        }
        if (d instanceof Distribution.Trapezoidal) {
            return new double[] {((Distribution.Trapezoidal) d).lower(), ((Distribution.Trapezoidal) d).upper()};
        }
        if (d instanceof Distribution.CurvilinearTrapezoid) {
            Distribution.CurvilinearTrapezoid c = (Distribution.CurvilinearTrapezoid) d;
            return new double[] {c.lower() - c.d(), c.upper() + c.d()};
        }
        return null;
    }
}
