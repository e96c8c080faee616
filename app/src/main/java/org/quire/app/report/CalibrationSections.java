package org.quire.app.report;

import java.util.ArrayList;
import java.util.List;
import org.quire.app.report.ReportModel.Block;
import org.quire.app.report.ReportModel.ChartBlock;
import org.quire.app.report.ReportModel.Paragraph;
import org.quire.app.report.ReportModel.Statement;
import org.quire.app.report.ReportModel.TableBlock;
import org.quire.app.report.Table.Align;
import org.quire.app.report.Table.Cell;
import org.quire.app.report.Table.Column;
import org.quire.engine.budget.Budget;
import org.quire.engine.conformity.ConformityAssessment;
import org.quire.engine.conformity.MpeEnvelope;
import org.quire.engine.conformity.MpeLimits;
import org.quire.engine.conformity.MpeZone;
import org.quire.engine.conformity.PointDecision;
import org.quire.engine.gum.Figures;
import org.quire.engine.gum.FlowRange;
import org.quire.engine.gum.FlowRangeResult;
import org.quire.engine.line.CalibrationLine;
import org.quire.engine.line.CalibrationPoint;
import org.quire.engine.line.Consistency;
import org.quire.engine.line.LineFit;
import org.quire.engine.line.LineMethod;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.model.ModelException;
import org.quire.engine.units.Units;

/**
 * The report sections of a budget's calibration lines, flow range and conformity decisions: for each data set
 * the fitted line (method, a, b, their uncertainties, covariance and correlation, the chi-squared check and its
 * verdict), the residuals and a plot of the standardized residuals; for the flow points the uncertainty at each
 * flow, a chart of U (and, for an output that is not already relative, U/|y|) against flow, the correlation of
 * the point results, and, with maximum permissible errors, the decision at each point, a chart of the errors
 * with their U and the limits, and the decision rule as a certificate states it.
 *
 * <p>References: ISO/TS 28037:2010 clauses 6 to 8 (straight-line calibration functions, the chi-squared check at
 * the 95 % quantile, standardized residuals); JCGM 100:2008 H.3 (fitted line, residuals); JCGM 102:2011 6.2.1.3
 * (covariance of the point results); JCGM 106:2012 clauses 7 to 9 and ILAC G8:2019 (decision rules, probability
 * of conformity, specific risks).
 *
 * <p>Stateless and thread-safe.
 */
public final class CalibrationSections {
    private CalibrationSections() {
    }

    /**
     * @return the sections for every data set of {@code budget} and, when it has flow points, for the flow range;
     *     empty when it has neither
     * @throws ModelException when the model does not compile
     * @throws IllegalArgumentException naming the point or column when the flow points cannot be evaluated
     */
    public static List<ReportSection> of(Budget budget, FunctionLibrary library) throws ModelException {
        List<ReportSection> out = new ArrayList<>();
        for (CalibrationLine line : budget.dataSets()) {
            out.add(fit(line));
        }
        if (budget.flowPoints() != null) {
            out.add(flowRange(FlowRange.evaluate(budget, library), budget.settings().significantDigits()));
        }
        return out;
    }

    /** @return the section of one fitted calibration line */
    public static ReportSection fit(CalibrationLine line) {
        return fit(line.name(), line.fit());
    }

    /**
     * @param name the data set's name
     * @param f the fitted line
     * @return the section of one fitted calibration line
     */
    public static ReportSection fit(String name, LineFit f) {
        String xu = f.data().xUnit();
        String yu = f.data().yUnit();
        String key = ReportBuilder.fileKey(name);
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Paragraph("The data set '" + name + "' (" + f.data().size() + " points) is fitted by the straight "
                + "line y = a + b (x − x0) with x0 = " + Figures.estimate(f.referenceX()) + (xu.isEmpty() ? "" : " " + xu)
                + ", by " + f.method().title() + " (" + f.method().abbreviation() + ")"
                + (f.iterations() > 0 ? ", " + f.iterations() + " iterations" : "") + ". "
                + (f.method() == LineMethod.ORDINARY_LEAST_SQUARES
                        ? "u(a) and u(b) come from the scatter of the residuals (Type A, ν = " + f.dof() + ")."
                        : "u(a) and u(b) come from the stated uncertainties of the points (infinite degrees of "
                                + "freedom).")));
        List<List<Cell>> p = new ArrayList<>();
        p.add(row("intercept (zero offset)", "a", f.intercept(), 8, yu));
        p.add(row("standard uncertainty of a", "u(a)", f.interceptUncertainty(), 4, yu));
        p.add(row("slope (meter factor)", "b", f.slope(), 8, ratio(yu, xu)));
        p.add(row("standard uncertainty of b", "u(b)", f.slopeUncertainty(), 4, ratio(yu, xu)));
        p.add(row("covariance of a and b", "cov(a, b)", f.covariance(), 4, ""));
        p.add(row("correlation coefficient of a and b", "r(a, b)", f.correlation(), 5, ""));
        if (f.method() == LineMethod.ORDINARY_LEAST_SQUARES) {
            p.add(row("standard deviation of the residuals", "s", f.residualStandardDeviation(), 4, yu));
        }
        p.add(List.of(Cell.text("degrees of freedom of the check"), Cell.math(Typesetter.label("ν = n − 2")),
                Cell.number(Integer.toString(f.dof()), f.dof()), Cell.text("")));
        if (f.consistency() != Consistency.NOT_ASSESSED) {
            p.add(row("observed chi-squared", "χ^2_{obs}", f.chiSquared(), 4, ""));
            p.add(row(Figures.probability(f.consistencyProbability()) + " % quantile of χ²(ν)", "χ^2_{ν}",
                    f.chiSquaredQuantile(), 4, ""));
        }
        p.add(List.of(Cell.text("verdict of the chi-squared check"), Cell.text(""),
                Cell.text(f.consistency().label()), Cell.text("")));
        Table params = new Table("fit-" + key, "Fitted line of '" + name + "' (ISO/TS 28037:2010; "
                + "JCGM 100:2008 H.3)", List.of(
                Column.of("Figure", "figure", Align.LEFT, 3f),
                Column.of("Symbol", "symbol", Align.LEFT, 1.3f),
                Column.of("Value", "value", Align.RIGHT, 1.8f),
                Column.of("Unit", "unit", Align.LEFT, 1f)), p);
        blocks.add(new TableBlock(params));
        switch (f.consistency()) {
            case CONSISTENT:
                blocks.add(new Paragraph("χ²_obs = " + Figures.sig(f.chiSquared(), 3) + " does not exceed the "
                        + Figures.probability(f.consistencyProbability()) + " % quantile " + Figures.sig(f.chiSquaredQuantile(), 3)
                        + " of χ²(" + f.dof() + "): the residuals are consistent with the stated uncertainties "
                        + "(ISO/TS 28037:2010 6.3)."));
                break;
            case INCONSISTENT:
                blocks.add(new Paragraph("χ²_obs = " + Figures.sig(f.chiSquared(), 3) + " exceeds the "
                        + Figures.probability(f.consistencyProbability()) + " % quantile " + Figures.sig(f.chiSquaredQuantile(), 3)
                        + " of χ²(" + f.dof() + "): the straight line or the stated uncertainties are in doubt "
                        + "(ISO/TS 28037:2010 6.3)."));
                break;
            default:
                blocks.add(new Paragraph("No chi-squared check: the points do not all state u(y)."));
        }
        f.notes().forEach(n -> blocks.add(new Paragraph("Note: " + n)));
        double[] r = f.residuals();
        double[] z = f.standardizedResiduals();
        List<List<Cell>> rows = new ArrayList<>();
        double[] xs = new double[r.length];
        for (int i = 0; i < r.length; i++) {
            CalibrationPoint pt = f.data().points().get(i);
            xs[i] = pt.x();
            rows.add(List.of(Cell.number(Integer.toString(i + 1), i + 1), Cell.number(Figures.estimate(pt.x()), pt.x()),
                    Cell.number(Figures.estimate(pt.y()), pt.y()), Cell.number(Figures.sig(pt.ux(), 3), pt.ux()),
                    Cell.number(Figures.sig(pt.uy(), 3), pt.uy()), Cell.number(Figures.sig(r[i], 3), r[i]),
                    Cell.number(Figures.compact(z[i], 3), z[i])));
        }
        Table residuals = new Table("residuals-" + key, "Points and residuals r_i = y_i − a − b (x_i − x0) of '"
                + name + "'", List.of(
                Column.of("i", "point", Align.RIGHT, 0.4f),
                Column.of("x_i" + unitSuffix(xu), "x", Align.RIGHT, 1.2f),
                Column.of("y_i" + unitSuffix(yu), "y", Align.RIGHT, 1.2f),
                Column.of("u(x_i)", "u_x", Align.RIGHT, 1f),
                Column.of("u(y_i)", "u_y", Align.RIGHT, 1f),
                Column.of("r_i", "residual", Align.RIGHT, 1.1f),
                Column.of("standardized r_i", "standardized_residual", Align.RIGHT, 1.2f)), rows);
        boolean log = positive(xs) && max(xs) / min(xs) > 20;
        Chart plot = new Chart.Plot("Standardized residuals of '" + name + "' against x; the dashed lines mark "
                + "±2 (common practice: a point beyond them deserves a look)", "x" + unitSuffix(xu)
                + (log ? ", logarithmic scale" : ""), "standardized residual", log,
                List.of(new Chart.Series("standardized residual", xs, z, null, Chart.Style.POINTS, Chart.Tone.FIRST)),
                List.of(0.0, -2.0, 2.0));
        blocks.add(new TableBlock(residuals));
        blocks.add(new ChartBlock(plot));
        return ReportSection.of("fit-" + key, "Calibration line " + name, blocks);
    }

    /**
     * @param digits significant digits of the reported uncertainties (JCGM 100:2008 7.2.6)
     * @return the section of a flow-range evaluation: the table over the points, every point's own budget labelled
     *     by its flow with its result stated with its own coverage factor, the correlation of the point results, and
     *     the conformity decisions when it has them
     */
    public static ReportSection flowRange(FlowRangeResult r, int digits) {
        String fu = r.flowUnit();
        String yu = r.unit();
        String y = Typesetter.name(r.output()).plain();
        boolean relativeAlready = true;
        for (FlowRangeResult.Point p : r.points()) {
            relativeAlready &= !Figures.relativeUncertaintyMeaningful(yu, p.estimate(), p.expandedUncertainty());
        }
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Paragraph("The budget is evaluated at each of its " + r.points().size() + " flow points for the output "
                + y + ". Inputs read afresh at each point are independent between points; inputs shared by all "
                + "points (such as the reference's calibration) correlate the point results (JCGM 102:2011 6.2.1.3)."));
        List<List<Cell>> rows = new ArrayList<>();
        int m = r.points().size();
        double[] q = new double[m];
        double[] big = new double[m];
        double[] rel = new double[m];
        boolean relOk = !relativeAlready;
        List<Block> pointBudgets = new ArrayList<>();
        for (int i = 0; i < m; i++) {
            FlowRangeResult.Point p = r.points().get(i);
            q[i] = p.flow();
            big[i] = p.expandedUncertainty();
            rel[i] = 100 * p.relativeExpandedUncertainty();
            relOk &= Figures.relativeUncertaintyMeaningful(yu, p.estimate(), p.expandedUncertainty());
            rows.add(List.of(Cell.number(Integer.toString(i + 1), i + 1), Cell.number(Figures.estimate(p.flow()), p.flow()),
                    Cell.number(Figures.sig(p.estimate(), 5), p.estimate()),
                    Cell.number(Figures.sig(p.standardUncertainty(), 4), p.standardUncertainty()),
                    Cell.number(Figures.dof(p.result().dofUsed()), p.result().dofUsed()),
                    Cell.number(Figures.coverageFactor(p.result().coverageFactor()), p.result().coverageFactor()),
                    Cell.number(Figures.sig(p.expandedUncertainty(), 4), p.expandedUncertainty()),
                    Cell.number(!Figures.relativeUncertaintyMeaningful(yu, p.estimate(), p.expandedUncertainty()) ? "–"
                            : Figures.sig(rel[i], 3), rel[i])));
            if (relativeAlready) {
                rows.set(i, rows.get(i).subList(0, 7));
            }
            MathText label = MathText.upright("point " + (i + 1) + " at " + Figures.estimate(p.flow())
                    + (fu.isBlank() ? "" : " " + Units.display(fu)));
            pointBudgets.add(new TableBlock(ReportBuilder.budgetTable(p.result(), "flow-point-" + (i + 1) + "-budget",
                    MathText.concat(MathText.upright("Uncertainty budget of "), Typesetter.name(r.output()),
                            MathText.upright(" at flow "), label, MathText.upright(yu.isBlank() ? ""
                                    : " (contributions in " + Units.display(yu) + ")")))));
            pointBudgets.add(new Statement(MathText.concat(label, MathText.upright(": "),
                    ReportBuilder.statement(p.result(), digits))));
        }
        List<Column> columns = new ArrayList<>(List.of(
                Column.of("Point", "point", Align.RIGHT, 0.6f),
                Column.of("flow" + unitSuffix(fu), "flow", Align.RIGHT, 1.2f),
                Column.of("y" + unitSuffix(yu), "estimate", Align.RIGHT, 1.2f),
                Column.of("u_c(y)", "standard_uncertainty", Align.RIGHT, 1.1f),
                Column.of("ν_{eff}", "effective_dof", Align.RIGHT, 0.7f),
                Column.of("k", "coverage_factor", Align.RIGHT, 0.6f),
                Column.of("U", "expanded_uncertainty", Align.RIGHT, 1.1f)));
        if (!relativeAlready) {
            columns.add(Column.of("U/|y| (%)", "relative_expanded_uncertainty_percent", Align.RIGHT, 1f));
        }
        blocks.add(new TableBlock(new Table("flow-range", MathText.concat(MathText.upright("Uncertainty of "),
                Typesetter.name(r.output()), MathText.upright(" across the flow range" + (yu.strip().equals("%")
                        ? " (in % of the reading, so U is relative to the reading already)" : ""))), columns, rows)));
        boolean log = positive(q) && max(q) / min(q) > 20;
        String flowAxis = "flow" + unitSuffix(fu) + (log ? ", logarithmic scale" : "");
        blocks.add(new ChartBlock(new Chart.Plot("Expanded uncertainty U of " + y + " against flow" + (yu.strip().equals("%")
                ? "; " + y + " is an error in % of the reading, so U is relative to the reading already" : ""),
                flowAxis, "U" + unitSuffix(yu), log,
                List.of(new Chart.Series("U" + unitSuffix(yu), q, big, null, Chart.Style.LINE_POINTS, Chart.Tone.FIRST)),
                List.of())));
        if (relOk) {
            blocks.add(new ChartBlock(new Chart.Plot("Relative expanded uncertainty U/|y| of " + y + " against flow",
                    flowAxis, "U/|y| (%)", log, List.of(new Chart.Series("U/|y| (%)", q, rel, null,
                            Chart.Style.LINE_POINTS, Chart.Tone.FIRST)), List.of())));
        }
        double[][] c = r.correlation();
        List<Column> cc = new ArrayList<>();
        cc.add(Column.of("", "point", Align.LEFT, 0.8f));
        for (int j = 0; j < m; j++) {
            cc.add(new Column(indexed(r.output(), j + 1), "point_" + (j + 1), Align.RIGHT, 1f));
        }
        List<List<Cell>> cr = new ArrayList<>();
        for (int i = 0; i < m; i++) {
            List<Cell> row = new ArrayList<>();
            row.add(Cell.math(indexed(r.output(), i + 1)));
            for (int j = 0; j < m; j++) {
                row.add(Cell.number(Double.isNaN(c[i][j]) ? "–" : Figures.compact(c[i][j], 3), c[i][j]));
            }
            cr.add(row);
        }
        blocks.add(new TableBlock(new Table("flow-range-correlation", MathText.concat(MathText.upright(
                "Correlation coefficients of the point results r("), indexed(r.output(), "p"), MathText.upright(", "),
                indexed(r.output(), "q"), MathText.upright(") (JCGM 102:2011 6.2.1.3)")), cc, cr)));
        blocks.add(new Paragraph("The budget of each flow point follows, with its result stated with its own coverage "
                + "factor."));
        blocks.addAll(pointBudgets);
        ConformityAssessment a = r.conformity();
        if (a != null) {
            conformity(r, a, y, fu, blocks);
        }
        return ReportSection.of("flow-range", "Flow range" + (a != null ? " and conformity" : ""), blocks);
    }

    private static void conformity(FlowRangeResult r, ConformityAssessment a, String y, String fu, List<Block> blocks) {
        List<List<Cell>> rows = new ArrayList<>();
        int m = a.decisions().size();
        for (int i = 0; i < m; i++) {
            PointDecision d = a.decisions().get(i);
            String acc = Double.isNaN(d.acceptanceLower()) ? "none"
                    : Figures.compact(d.acceptanceLower(), 4) + " … " + Figures.compact(d.acceptanceUpper(), 4);
            rows.add(List.of(Cell.number(Figures.estimate(d.point().flow()), d.point().flow()),
                    Cell.text(d.zone()),
                    Cell.number(Figures.compact(d.point().errorPercent(), 4), d.point().errorPercent()),
                    Cell.number(Figures.sig(d.expandedUncertainty(), 4), d.expandedUncertainty()),
                    Cell.text(d.limits().label()),
                    Cell.text(acc),
                    Cell.number(String.format(java.util.Locale.ROOT, "%.4f", d.probabilityOfConformity()),
                            d.probabilityOfConformity()),
                    Cell.text(d.decision().label()),
                    Cell.number(Double.isNaN(d.specificRisk()) ? "–" : Figures.sig(100 * d.specificRisk(), 2),
                            100 * d.specificRisk())));
        }
        blocks.add(new TableBlock(new Table("conformity", "Conformity decisions against " + a.envelope().name() + " ("
                + a.rule().kind().title() + "; JCGM 106:2012)", List.of(
                Column.of("flow" + unitSuffix(fu), "flow", Align.RIGHT, 1f),
                Column.of("Zone", "zone", Align.LEFT, 1f),
                new Column(MathText.concat(Typesetter.name(y), MathText.upright(" (%)")), "error_percent", Align.RIGHT, 0.8f),
                Column.of("U (%)", "expanded_uncertainty_percent", Align.RIGHT, 0.8f),
                Column.of("MPE (%)", "mpe", Align.LEFT, 0.9f),
                Column.of("acceptance (%)", "acceptance_interval", Align.LEFT, 1.3f),
                Column.of("p_c", "probability_of_conformity", Align.RIGHT, 0.8f),
                Column.of("Decision", "decision", Align.LEFT, 1.3f),
                Column.of("specific risk (%)", "specific_risk_percent", Align.RIGHT, 0.9f)), rows)));
        blocks.add(new Paragraph("Overall decision: " + a.overall().label() + ". The specific risk is that of false "
                + "acceptance for a point that conforms and of false rejection for one that does not (JCGM 106:2012 "
                + "9.5)."));
        blocks.add(new Statement(Typesetter.prose(a.statement())));
        blocks.add(new ChartBlock(CalibrationCharts.flowRange(r)));
    }

    /** Adds the upper and lower limits of the envelope, zone by zone, over the plotted flows. */
    static void envelope(MpeEnvelope env, double temperature, double[] q, boolean log,
            List<Chart.Series> series) {
        double lo = min(q);
        double hi = max(q);
        double from = log ? lo / 1.15 : lo - 0.04 * (hi - lo);
        double to = log ? hi * 1.15 : hi + 0.04 * (hi - lo);
        List<Double> xs = new ArrayList<>();
        List<Double> up = new ArrayList<>();
        List<Double> down = new ArrayList<>();
        for (MpeZone z : env.zones()) {
            double a = Math.max(z.flowFrom(), from);
            double b = Math.min(z.flowTo(), to);
            if (!(b > a) || (log && !(a > 0))) {
                continue;
            }
            MpeLimits l;
            try {
                l = z.limitsAt(temperature);
            } catch (IllegalArgumentException e) {
                continue; // no limits for this temperature in this zone; the decisions table says so per point
            }
            xs.add(a);
            xs.add(b);
            up.add(l.upperTolerance());
            up.add(l.upperTolerance());
            down.add(l.lowerTolerance());
            down.add(l.lowerTolerance());
        }
        if (xs.isEmpty()) {
            return;
        }
        double[] x = xs.stream().mapToDouble(Double::doubleValue).toArray();
        series.add(new Chart.Series("upper MPE", x, up.stream().mapToDouble(Double::doubleValue).toArray(),
                null, Chart.Style.DASHED, Chart.Tone.SECOND));
        series.add(new Chart.Series("lower MPE", x, down.stream().mapToDouble(Double::doubleValue).toArray(), null,
                Chart.Style.DASHED, Chart.Tone.SECOND));
    }

    /** @return the quantity's symbol with the point number added to its subscript, e.g. E₁ or q_cal,1 */
    static MathText indexed(String name, int i) {
        return indexed(name, Integer.toString(i));
    }

    /** @return the quantity's symbol with an index added to its subscript; its plain form is e.g. {@code E[3]} */
    static MathText indexed(String name, String index) {
        List<MathText.Run> runs = new ArrayList<>(Typesetter.name(name).runs());
        boolean sub = runs.stream().anyMatch(x -> x.shift() == MathText.Shift.SUB);
        runs.add(new MathText.Run((sub ? "," : "") + index, index.length() == 1 && Character.isLetter(index.charAt(0)),
                MathText.Shift.SUB));
        return MathText.of(runs, name + "[" + index + "]");
    }

    private static List<Cell> row(String figure, String symbol, double v, int digits, String unit) {
        return List.of(Cell.text(figure), Cell.math(Typesetter.label(symbol)), Cell.number(Figures.sig(v, digits), v),
                Cell.text(unit));
    }

    private static String ratio(String yu, String xu) {
        if (yu.equals(xu)) {
            return "1";
        }
        return yu.isEmpty() && xu.isEmpty() ? "" : (yu.isEmpty() ? "1" : yu) + "/(" + (xu.isEmpty() ? "1" : xu) + ")";
    }

    private static String unitSuffix(String unit) {
        return unit == null || unit.isBlank() ? "" : " (" + unit + ")";
    }

    static boolean positive(double[] v) {
        for (double d : v) {
            if (!(d > 0)) {
                return false;
            }
        }
        return v.length > 0;
    }

    static double min(double[] v) {
        double m = Double.POSITIVE_INFINITY;
        for (double d : v) {
            m = Math.min(m, d);
        }
        return m;
    }

    static double max(double[] v) {
        double m = Double.NEGATIVE_INFINITY;
        for (double d : v) {
            m = Math.max(m, d);
        }
        return m;
    }
}
