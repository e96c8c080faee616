package org.quire.app.report;

import java.util.ArrayList;
import java.util.List;
import org.quire.engine.calibration.AdjustmentResult;
import org.quire.engine.calibration.CalibrationResult;
import org.quire.engine.calibration.PointResult;
import org.quire.engine.calibration.SeriesResult;
import org.quire.engine.conformity.ConformityAssessment;
import org.quire.engine.gum.FlowRangeResult;
import org.quire.engine.line.CalibrationPoint;
import org.quire.engine.line.LineFit;

/**
 * The charts of a meter calibration and of a budget's flow range, for the certificate, the report and the
 * workbench alike: the error curve against flow and the residuals of a fitted line. Only the engine's figures are
 * drawn.
 *
 * <p>Stateless and thread-safe.
 */
public final class CalibrationCharts {
    private CalibrationCharts() {
    }

    /**
     * @return the errors of every series against flow with the reported expanded uncertainty U as bars, the
     *     maximum permissible error at each point as dashed limits (when a specification is given), and the
     *     zero line
     */
    public static Chart.Plot errorCurve(CalibrationResult r) {
        List<Chart.Series> series = new ArrayList<>();
        boolean log = false;
        SeriesResult shownLimits = null;
        for (SeriesResult s : r.asLeft() == null ? List.of(r.asFound()) : List.of(r.asFound(), r.asLeft())) {
            int n = s.points().size();
            double[] q = new double[n];
            double[] e = new double[n];
            double[] u = new double[n];
            for (int i = 0; i < n; i++) {
                PointResult p = s.points().get(i);
                q[i] = p.flow();
                e[i] = p.error();
                u[i] = p.reportedExpandedUncertainty();
            }
            log = log || positive(q) && max(q) / min(q) > 20;
            series.add(new Chart.Series("error " + s.phase().label() + " with its U", q, e, u, Chart.Style.POINTS,
                    s == r.asFound() ? Chart.Tone.FIRST : Chart.Tone.THIRD));
            if (s.conformity() != null) {
                shownLimits = s;
            }
        }
        if (shownLimits != null) {
            int n = shownLimits.points().size();
            double[] q = new double[n];
            double[] up = new double[n];
            double[] down = new double[n];
            for (int i = 0; i < n; i++) {
                q[i] = shownLimits.points().get(i).flow();
                up[i] = shownLimits.conformity().points().get(i).mpe();
                down[i] = -up[i];
            }
            series.add(new Chart.Series("MPE (" + shownLimits.conformity().limitsName() + ")", q, up, null,
                    Chart.Style.DASHED, Chart.Tone.SECOND));
            series.add(new Chart.Series("\u2212MPE", q, down, null, Chart.Style.DASHED, Chart.Tone.SECOND));
        }
        String flow = "flow (" + r.flowUnit().strip().replace(' ', '*') + ")" + (log ? ", logarithmic scale" : "");
        return new Chart.Plot("Errors of the meter against flow with their reported expanded uncertainties"
                + (shownLimits == null ? "" : " and the maximum permissible errors"), flow, "error (%)", log, series,
                List.of(0.0));
    }

    /**
     * @return the tabulated output of a flow-range evaluation against flow with its expanded uncertainty U as bars
     *     and, when the budget asks for conformity decisions, the maximum permissible errors of the envelope zone
     *     by zone as dashed limits and the zero line
     */
    public static Chart.Plot flowRange(FlowRangeResult r) {
        int m = r.points().size();
        double[] q = new double[m];
        double[] y = new double[m];
        double[] big = new double[m];
        for (int i = 0; i < m; i++) {
            FlowRangeResult.Point p = r.points().get(i);
            q[i] = p.flow();
            y[i] = p.estimate();
            big[i] = p.expandedUncertainty();
        }
        boolean log = positive(q) && max(q) / min(q) > 20;
        String fu = r.flowUnit().strip();
        String flowAxis = "flow" + (fu.isEmpty() ? "" : " (" + fu.replace(' ', '*') + ")") + (log ? ", logarithmic scale" : "");
        String name = Typesetter.name(r.output()).plain();
        String yu = r.unit().strip();
        String yAxis = name + (yu.isEmpty() ? "" : " (" + yu.replace(' ', '*') + ")");
        List<Chart.Series> series = new ArrayList<>();
        series.add(new Chart.Series((r.conformity() != null ? "error " : "") + name + " with its U", q, y, big,
                Chart.Style.POINTS, Chart.Tone.FIRST));
        ConformityAssessment a = r.conformity();
        if (a == null) {
            return new Chart.Plot(name + " against flow with its expanded uncertainty U at each flow point", flowAxis,
                    yAxis, log, series, List.of());
        }
        CalibrationSections.envelope(a.envelope(), a.decisions().get(0).point().temperature(), q, log, series);
        return new Chart.Plot("Errors of the meter with their expanded uncertainties and the maximum permissible "
                + "errors (" + a.envelope().name() + ")", flowAxis, yAxis, log, series, List.of(0.0));
    }

    /** @return the residuals of the line fitted for the adjustment against its abscissae, or null when none */
    public static Chart.Plot residuals(CalibrationResult r) {
        AdjustmentResult adj = r.adjustment();
        if (adj == null || adj.fit() == null) {
            return null;
        }
        LineFit fit = adj.fit();
        List<CalibrationPoint> pts = fit.data().points();
        double[] x = new double[pts.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = pts.get(i).x();
        }
        return new Chart.Plot("Residuals of the fitted line of indicated against reference flow (ISO/TS 28037)",
                "reference flow (" + fit.data().xUnit().strip().replace(' ', '*') + ")", "residual ("
                        + fit.data().yUnit().strip().replace(' ', '*') + ")", false,
                List.of(new Chart.Series("residual", x, fit.residuals(), null, Chart.Style.POINTS, Chart.Tone.FIRST)),
                List.of(0.0));
    }

    private static boolean positive(double[] v) {
        return CalibrationSections.positive(v);
    }

    private static double min(double[] v) {
        return CalibrationSections.min(v);
    }

    private static double max(double[] v) {
        return CalibrationSections.max(v);
    }
}
