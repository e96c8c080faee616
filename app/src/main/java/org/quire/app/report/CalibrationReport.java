package org.quire.app.report;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.quire.app.common.Cautions;
import org.quire.app.report.ReportModel.Block;
import org.quire.app.report.ReportModel.Notices;
import org.quire.app.report.ReportModel.Paragraph;
import org.quire.app.report.ReportModel.Part;
import org.quire.app.report.ReportModel.Statement;
import org.quire.app.report.ReportModel.TableBlock;
import org.quire.app.report.Table.Align;
import org.quire.app.report.Table.Cell;
import org.quire.app.report.Table.Column;
import org.quire.engine.budget.Budget;
import org.quire.engine.calibration.AdjustmentResult;
import org.quire.engine.calibration.Calibration;
import org.quire.engine.calibration.CalibrationJson;
import org.quire.engine.calibration.CalibrationResult;
import org.quire.engine.calibration.CertificateDetails;
import org.quire.engine.calibration.InputDeclaration;
import org.quire.engine.calibration.PointConformity;
import org.quire.engine.calibration.PointResult;
import org.quire.engine.calibration.RunResult;
import org.quire.engine.calibration.SeriesResult;
import org.quire.engine.conformity.PointDecision;
import org.quire.engine.document.CanonicalJson;
import org.quire.engine.gum.Figures;
import org.quire.engine.io.EngineVersion;
import org.quire.engine.units.Units;

/**
 * The report of a meter calibration, from which an assessor can check every figure of its certificate: the
 * calibration's facts; the method's measurement model; how each input behaves between flow points; the results
 * table of the certificate itself (the same part, so the same figures by the same rule, {@link Figures}); the
 * statement of uncertainty; then, for every flow point of every series, its runs, its full budget labelled by the
 * point, its u_c, ν_eff, its own k and p, U, the CMC and the U reported, and its result stated as the
 * certificate states it; the correlation of the point errors of each series (from the engine's covariance of
 * the point results); the adjustment (the constants of the certificate, the weighted mean or the fitted line);
 * the conformity decisions with the rule; the findings; and, on request, the method's guidance for the author as
 * an appendix. It is a {@link ReportModel}, so the one PDF, HTML and CSV path renders it.
 *
 * <p>References: JCGM 100:2008 4.2 (Type A evaluation of the runs), 5.1 and G.4 (budget, ν_eff, k), 7.2
 * (reporting); JCGM 102:2011 6.2.1.3 (covariance of the point results); ISO/TS 28037:2010 (fitted line); JCGM
 * 106:2012 and ILAC G8:2019 (decision rules); EA-4/02 M:2022 5 (statement of U with k and p); ILAC P14:2020 (U not
 * below the CMC; clause from memory).
 *
 * <p>Stateless and thread-safe.
 */
public final class CalibrationReport {
    /** Shown for the revision and status of a calibration file, which records neither. */
    public static final String NOT_RECORDED = "not recorded (calibration file)";

    private CalibrationReport() {
    }

    /**
     * @param c the calibration
     * @param methodFile the method file as the calibration names it (part of its content), or null
     * @param date the report's date
     * @return the header facts of the calibration's report: laboratory, title, item, author and the SHA-256 of the
     *     calibration file's canonical content
     */
    public static DocumentInfo documentInfo(Calibration c, String methodFile, LocalDate date) {
        CertificateDetails d = c.details();
        String item = CertificateBuilder.join(d.item().type(), d.item().size(),
                d.item().serial().isEmpty() ? "" : "serial number " + d.item().serial());
        String title = c.title().isEmpty() ? "Calibration" + (item.isEmpty() ? "" : " of " + item) : c.title();
        return new DocumentInfo(d.laboratory().name(), title, item, NOT_RECORDED, NOT_RECORDED, date, d.author(),
                DocumentInfo.HASH_ALGORITHM, CanonicalJson.sha256(CalibrationJson.toJson(c, methodFile)), List.of());
    }

    /**
     * @param r the evaluated calibration
     * @param document the header facts ({@link #documentInfo})
     * @param guidance whether the method's notes on its inputs (the author's guidance) are added as an appendix
     * @param library the function set the calibration was evaluated with (the method's model is typeset with it)
     * @return the report
     */
    public static ReportModel build(CalibrationResult r, DocumentInfo document, boolean guidance,
            org.quire.engine.model.FunctionLibrary library) {
        String flowUnit = Units.display(r.flowUnit());
        List<Part> parts = new ArrayList<>();
        parts.add(facts(r));
        Budget method = firstBudget(r);
        if (method != null) {
            parts.add(ReportBuilder.model(method, library));
        }
        parts.add(declarations(r.calibration()));
        Part results = CertificateBuilder.results(r, flowUnit);
        List<Block> rb = new ArrayList<>();
        rb.add(new Paragraph("The results as the calibration certificate states them, by the same rule: each U to two "
                + "significant digits and the error to the same decimal place (JCGM 100:2008 7.2.6), k to three. The "
                + "budgets of the points below give every figure behind them."));
        rb.addAll(results.blocks());
        parts.add(new Part(results.heading(), rb));
        parts.add(CertificateBuilder.uncertainty(r, "in this report and on the certificate"));
        for (SeriesResult s : series(r)) {
            for (int i = 0; i < s.points().size(); i++) {
                parts.add(point(r, s, i, flowUnit));
            }
        }
        parts.add(correlation(r));
        if (r.adjustment() != null) {
            parts.add(adjustment(r, r.adjustment()));
        }
        Part conformity = CertificateBuilder.conformity(r, flowUnit);
        if (conformity != null) {
            parts.add(conformity(r, conformity, flowUnit));
        }
        parts.add(new Part("Findings", r.findings().isEmpty()
                ? List.of(new Paragraph("The evaluation raised no findings."))
                : List.of(Notices.of(r.findings()))));
        if (guidance && method != null) {
            parts.add(ReportBuilder.authorNotes(method));
        }
        return new ReportModel(document, EngineVersion.get(), parts, Cautions.TEXT);
    }

    private static List<SeriesResult> series(CalibrationResult r) {
        return r.asLeft() == null ? List.of(r.asFound()) : List.of(r.asFound(), r.asLeft());
    }

    /** @return the budget of the first point that has one: the method at that point's readings */
    private static Budget firstBudget(CalibrationResult r) {
        for (SeriesResult s : series(r)) {
            for (PointResult p : s.points()) {
                if (p.budget() != null) {
                    return p.budget();
                }
            }
        }
        return null;
    }

    private static Part facts(CalibrationResult r) {
        Calibration c = r.calibration();
        CertificateDetails d = c.details();
        List<List<Cell>> rows = new ArrayList<>();
        rows.add(fact("laboratory", CertificateBuilder.join(d.laboratory().name(), d.laboratory().address(),
                d.laboratory().accreditation())));
        rows.add(fact("customer", CertificateBuilder.join(d.customer().name(), d.customer().address())));
        rows.add(fact("item calibrated", CertificateBuilder.join(d.item().type(), d.item().size(),
                d.item().serial().isEmpty() ? "" : "serial number " + d.item().serial())));
        rows.add(fact("date of calibration", d.date() == null ? "" : d.date().toString()));
        rows.add(fact("method", r.methodTitle() + "; template " + c.method().id() + ", version "
                + c.method().version() + ", SHA-256 " + c.method().contentHash()));
        rows.add(fact("error of indication", c.errorOutput() + " (" + r.errorUnit() + " of the reading)"));
        rows.add(fact("flow", c.flowOutput() + " (" + r.flowUnit() + ")"));
        rows.add(fact("repeatability", c.repeatability().text()));
        rows.add(fact("reference standards", String.join(", ", d.referenceStandards())));
        rows.add(fact("performed by", d.author()));
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Paragraph("The calibration of one meter across its flow range: the runs of the rig at each "
                + "flow point, evaluated with the method below; the adjustment of the meter's constant; the results as "
                + "found and as left with the laboratory's CMC; and the conformity decisions. The reference standards "
                + "are named here by their identifiers in the laboratory's register; the certificate states their "
                + "calibrations and due dates."));
        blocks.add(new TableBlock(new Table("calibration", "The calibration", List.of(
                Column.of("", "item", Align.LEFT, 1.6f), Column.of("", "value", Align.LEFT, 5f)), rows)));
        List<List<Cell>> env = new ArrayList<>();
        for (CertificateDetails.Condition e : d.environment()) {
            env.add(List.of(Cell.text(e.quantity()), Cell.text(e.value()), Cell.unit(e.unit())));
        }
        if (!env.isEmpty()) {
            blocks.add(new TableBlock(new Table("calibration-environment", "Environmental conditions during the "
                    + "calibration", List.of(Column.of("Quantity", "quantity", Align.LEFT, 3f),
                    Column.of("Value", "value", Align.RIGHT, 1.5f), Column.of("Unit", "unit", Align.LEFT, 1f)), env)));
        }
        return new Part("Calibration", blocks);
    }

    private static List<Cell> fact(String key, String value) {
        return List.of(Cell.text(key), Cell.text(value == null || value.isBlank() ? DocumentInfo.NOT_STATED : value));
    }

    private static Part declarations(Calibration c) {
        List<List<Cell>> rows = new ArrayList<>();
        for (Map.Entry<String, InputDeclaration> e : c.declarations().entrySet()) {
            InputDeclaration d = e.getValue();
            rows.add(List.of(Cell.math(Typesetter.name(e.getKey())), Cell.text(d.kind().word()),
                    Cell.number(Figures.compact(d.coefficient(), 3), d.coefficient()),
                    Cell.text(d.justification().isBlank() ? "–" : d.justification())));
        }
        return new Part("Inputs between flow points", List.of(new Paragraph(Typesetter.words("How each input of the method behaves "
                + "between the flow points: a shared input is the same quantity at every point (r = 1), an "
                + "independent one is drawn afresh at each (r = 0). These give the covariance of the point errors "
                + "(JCGM 102:2011 6.2.1.3): ", "cov(E_p, E_q) = Σ_i c_{pi} u_{pi} c_{qi} u_{qi} r_i", ".")),
                new TableBlock(new Table("declarations", "Declared behaviour of the inputs between points", List.of(
                        Column.of("X_i", "quantity", Align.LEFT, 1f),
                        Column.of("Between points", "declaration", Align.LEFT, 1.3f),
                        Column.of("r", "r", Align.RIGHT, 0.6f),
                        Column.of("Justification", "justification", Align.LEFT, 5f)), rows))));
    }

    /** @return the part of one point of one series: its runs, its budget, its figures and its stated result */
    private static Part point(CalibrationResult r, SeriesResult s, int i, String flowUnit) {
        PointResult p = s.points().get(i);
        String phase = s.phase().label();
        String errorName = r.calibration().errorOutput();
        MathText e = Typesetter.name(errorName);
        String key = "point-" + ReportBuilder.fileKey(p.label()) + "-" + phaseKey(s.phase());
        String at = p.label() + " at " + Figures.sig(p.flow(), 4) + " " + flowUnit;
        List<Block> blocks = new ArrayList<>();
        List<List<Cell>> runs = new ArrayList<>();
        for (int j = 0; j < p.runs().size(); j++) {
            RunResult run = p.runs().get(j);
            runs.add(List.of(Cell.number(Integer.toString(j + 1), j + 1),
                    run.sourceRow() > 0 ? Cell.number(Integer.toString(run.sourceRow()), run.sourceRow())
                            : Cell.text("–"),
                    Cell.number(Figures.compact(run.flow(), 6), run.flow()),
                    Cell.number(Figures.sig(run.error(), 4), run.error())));
        }
        if (s.phase() == SeriesResult.Phase.AS_LEFT_PREDICTED) {
            blocks.add(new Paragraph(Typesetter.words("Predicted from the as-found point and the new constant: every "
                    + "indication is scaled by ", "s = C_{new} / C_{old}", ", so ", "E′ = 100 [(1 + E/100) s − 1]",
                    " and ", "U′ = s U", ", with the ", "k", " and ", "ν_{eff}", " of the as-found point; no runs were "
                    + "made after the adjustment.")));
        }
        blocks.add(new TableBlock(new Table(key + "-runs", MathText.concat(MathText.upright("Runs of " + at + ", "
                + phase + ": flow and error "), e, MathText.upright(" of each run")), List.of(
                Column.of("Run", "run", Align.RIGHT, 0.6f),
                Column.of("Row", "source_row", Align.RIGHT, 0.6f),
                Column.of("flow (" + r.flowUnit().strip() + ")", "flow", Align.RIGHT, 1.4f),
                new Column(MathText.concat(e, MathText.upright(" (%)")), "error_percent", Align.RIGHT, 1.4f)),
                runs)));
        if (p.result() != null) {
            blocks.add(new TableBlock(ReportBuilder.budgetTable(p.result(), key + "-budget", MathText.concat(
                    MathText.upright("Uncertainty budget of "), e, MathText.upright(" at " + at + ", " + phase
                            + " (contributions in %)")))));
        }
        List<List<Cell>> f = new ArrayList<>();
        f.add(row("error of indication, mean of the runs", Typesetter.name(errorName), Figures.sig(p.error(), 5),
                p.error(), "%"));
        if (!Double.isNaN(p.runStandardDeviation())) {
            f.add(row("standard deviation of the runs' errors", Typesetter.label("s"),
                    Figures.working(p.runStandardDeviation()), p.runStandardDeviation(), "%"));
        }
        f.add(row(p.statedRepeatability() ? "repeatability (stated, replaces the runs' scatter)"
                : "repeatability of the result (Type A, JCGM 100:2008 4.2)", Typesetter.label("u(R)"),
                Figures.working(p.repeatabilityUncertainty()), p.repeatabilityUncertainty(), "%"));
        f.add(row("degrees of freedom of the repeatability", Typesetter.label("ν_R"), Figures.dof(p.repeatabilityDof()),
                p.repeatabilityDof(), ""));
        f.add(row("combined standard uncertainty", Typesetter.label("u_c"), Figures.working(p.standardUncertainty()),
                p.standardUncertainty(), "%"));
        f.add(row("effective degrees of freedom (Welch–Satterthwaite)", Typesetter.label("ν_{eff}"),
                Double.isInfinite(p.effectiveDof()) ? "∞" : Figures.sig(p.effectiveDof(), 3), p.effectiveDof(), ""));
        f.add(row("coverage factor of this point", Typesetter.label("k"), Figures.coverageFactor(p.coverageFactor()),
                p.coverageFactor(), ""));
        double prob = p.result() != null ? p.result().coverageProbability() : Double.NaN;
        if (!Double.isNaN(prob)) {
            f.add(row("coverage probability", Typesetter.label("p"), Figures.probability(prob), 100 * prob, "%"));
        }
        f.add(row("expanded uncertainty evaluated", Typesetter.label("U = k u_c"),
                Figures.working(p.expandedUncertainty()), p.expandedUncertainty(), "%"));
        if (!Double.isNaN(p.cmc())) {
            f.add(row("the laboratory's CMC at this flow", Typesetter.label("CMC"), Figures.working(p.cmc()), p.cmc(),
                    "%"));
        }
        f.add(row("expanded uncertainty reported" + (p.raisedToCmc() ? " (the CMC: U is below it)" : ""),
                Typesetter.label("U"), Figures.working(p.reportedExpandedUncertainty()),
                p.reportedExpandedUncertainty(), "%"));
        blocks.add(new TableBlock(new Table(key + "-result", "Result at " + at + ", " + phase, List.of(
                Column.of("Figure", "figure", Align.LEFT, 3.2f),
                Column.of("Symbol", "symbol", Align.LEFT, 1.1f),
                Column.of("Value", "value", Align.RIGHT, 1.3f),
                Column.of("Unit", "unit", Align.LEFT, 0.6f)), f)));
        blocks.add(new Statement(stated(p, s.phase(), errorName)));
        if (!p.notes().isEmpty()) {
            blocks.add(Notices.of(p.notes()));
        }
        if (p.monteCarlo() != null) {
            Part mc = ReportBuilder.monteCarlo(p.monteCarlo());
            blocks.addAll(mc.blocks());
        }
        return new Part(MathText.upright("Flow point " + at + ", " + phase), blocks);
    }

    /**
     * @return the result of a point as the certificate states it, e.g. "P1, as found: E = (0.397 ± 0.052) %,
     *     k = 2.00, p = 95.45 %", with the same {@link Figures} rule as the certificate
     */
    static MathText stated(PointResult p, SeriesResult.Phase phase, String errorName) {
        double u = p.reportedExpandedUncertainty();
        List<MathText.Run> runs = new ArrayList<>();
        runs.add(new MathText.Run(p.label() + ", " + phase.label() + ": ", false, MathText.Shift.BASE));
        runs.addAll(Typesetter.name(errorName).runs());
        runs.add(new MathText.Run(" = (" + Figures.statedValue(p.error(), u) + " ± " + Figures.stated(u) + ") %, ",
                false, MathText.Shift.BASE));
        runs.add(new MathText.Run("k", true, MathText.Shift.BASE));
        runs.add(new MathText.Run(" = " + Figures.coverageFactor(p.coverageFactor()), false, MathText.Shift.BASE));
        if (p.result() != null) {
            runs.add(new MathText.Run(", ", false, MathText.Shift.BASE));
            runs.add(new MathText.Run("p", true, MathText.Shift.BASE));
            runs.add(new MathText.Run(" = " + Figures.probability(p.result().coverageProbability()) + " %", false,
                    MathText.Shift.BASE));
        }
        if (p.raisedToCmc()) {
            runs.add(new MathText.Run("; U is the CMC", false, MathText.Shift.BASE));
        }
        return MathText.of(runs);
    }

    private static List<Cell> row(String figure, MathText symbol, String shown, double value, String unit) {
        return List.of(Cell.text(figure), Cell.math(symbol), Cell.number(shown, value), Cell.text(unit));
    }

    private static String phaseKey(SeriesResult.Phase phase) {
        return phase == SeriesResult.Phase.AS_FOUND ? "as-found"
                : phase == SeriesResult.Phase.AS_LEFT_MEASURED ? "as-left" : "as-left-predicted";
    }

    private static Part correlation(CalibrationResult r) {
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Paragraph("Inputs shared by all points (such as the balance's calibration) correlate the point "
                + "errors; the coefficients follow from the covariance of the point results, which the declarations "
                + "above give (JCGM 102:2011 6.2.1.3). They matter wherever points are combined: the weighted mean "
                + "error of the adjustment, a fitted line."));
        String name = r.calibration().errorOutput();
        for (SeriesResult s : series(r)) {
            double[][] c = s.correlation();
            int m = s.points().size();
            List<Column> cols = new ArrayList<>();
            cols.add(Column.of("", "point", Align.LEFT, 0.8f));
            for (int j = 0; j < m; j++) {
                cols.add(Column.of(s.points().get(j).label(), "point_" + ReportBuilder.fileKey(s.points().get(j).label()),
                        Align.RIGHT, 1f));
            }
            List<List<Cell>> rows = new ArrayList<>();
            for (int i = 0; i < m; i++) {
                List<Cell> row = new ArrayList<>();
                row.add(Cell.text(s.points().get(i).label()));
                for (int j = 0; j < m; j++) {
                    row.add(Cell.number(Double.isNaN(c[i][j]) ? "–" : Figures.compact(c[i][j], 3), c[i][j]));
                }
                rows.add(row);
            }
            blocks.add(new TableBlock(new Table("correlation-" + phaseKey(s.phase()), MathText.concat(MathText.upright(
                    "Correlation coefficients r("), CalibrationSections.indexed(name, "p"), MathText.upright(", "),
                    CalibrationSections.indexed(name, "q"), MathText.upright(") of the point errors, " + s.phase().label()
                            + " (JCGM 102:2011 6.2.1.3)")), cols, rows)));
        }
        return new Part("Correlation of the point errors", blocks);
    }

    private static Part adjustment(CalibrationResult r, AdjustmentResult a) {
        List<Block> blocks = new ArrayList<>(CertificateBuilder.adjustment(a).blocks());
        List<List<Cell>> rows = new ArrayList<>();
        rows.add(List.of(Cell.text("error removed by the adjustment"), Cell.number(Figures.sig(a.errorRemoved(), 5)
                + " %", a.errorRemoved())));
        if (!Double.isNaN(a.errorRemovedUncertainty())) {
            rows.add(List.of(Cell.text("its standard uncertainty, with the full covariance of the points"),
                    Cell.number(Figures.working(a.errorRemovedUncertainty()) + " %", a.errorRemovedUncertainty())));
        }
        blocks.add(new TableBlock(new Table("adjustment-error", "The error the adjustment removes", List.of(
                Column.of("", "item", Align.LEFT, 3f), Column.of("Value", "value", Align.RIGHT, 2f)), rows)));
        if (!a.weights().isEmpty()) {
            List<List<Cell>> w = new ArrayList<>();
            for (int i = 0; i < a.weights().size(); i++) {
                PointResult p = r.asFound().points().get(i);
                double wi = a.weights().get(i);
                w.add(List.of(Cell.text(p.label()), Cell.number(Figures.sig(p.error(), 5), p.error()),
                        Cell.number(Figures.working(p.standardUncertainty()), p.standardUncertainty()),
                        Cell.number(Figures.working(wi), wi)));
            }
            blocks.add(new Paragraph(Typesetter.words("Weighted mean error ", "E_w = Σ w_p E_p / Σ w_p", " with ",
                    "w_p = 1 / u_c^2(E_p)", ", each point's own ", "u_c", " (not the CMC); its uncertainty uses the "
                    + "full covariance of the points, so a shared reference does not average away; ",
                    "C_{new} = C_{old} / (1 + E_w / 100)", ".")));
            blocks.add(new TableBlock(new Table("adjustment-weights", "Weights of the as-found points", List.of(
                    Column.of("Point", "point", Align.LEFT, 0.8f),
                    Column.of("E_p (%)", "error_percent", Align.RIGHT, 1.2f),
                    Column.of("u_c(E_p) (%)", "standard_uncertainty_percent", Align.RIGHT, 1.2f),
                    Column.of("w_p / Σ w", "normalized_weight", Align.RIGHT, 1.2f)), w)));
        }
        if (a.fit() != null) {
            ReportSection fit = CalibrationSections.fit("adjustment line", a.fit());
            blocks.addAll(fit.ordered());
        }
        return new Part("Adjustment", blocks);
    }

    private static Part conformity(CalibrationResult r, Part certificatePart, String flowUnit) {
        List<Block> blocks = new ArrayList<>(certificatePart.blocks());
        for (SeriesResult s : series(r)) {
            if (s.conformity() == null) {
                continue;
            }
            List<List<Cell>> rows = new ArrayList<>();
            for (int i = 0; i < s.conformity().points().size(); i++) {
                PointConformity pc = s.conformity().points().get(i);
                PointDecision d = pc.decision();
                String acc = Double.isNaN(d.acceptanceLower()) ? "none"
                        : Figures.compact(d.acceptanceLower(), 4) + " … " + Figures.compact(d.acceptanceUpper(), 4);
                rows.add(List.of(Cell.text(pc.label()),
                        Cell.number(Figures.compact(d.point().flow(), 5), d.point().flow()),
                        Cell.number(Figures.sig(d.point().errorPercent(), 4), d.point().errorPercent()),
                        Cell.number(Figures.stated(d.expandedUncertainty()), d.expandedUncertainty()),
                        Cell.number(Figures.working(pc.mpe()), pc.mpe()),
                        Cell.text(acc),
                        Cell.number(String.format(java.util.Locale.ROOT, "%.4f", d.probabilityOfConformity()),
                                d.probabilityOfConformity()),
                        Cell.text(pc.ratioMet() ? "yes" : "no"),
                        Cell.text(d.decision().label())));
            }
            blocks.add(new TableBlock(new Table("conformity-" + phaseKey(s.phase()), "Conformity " + s.phase().label()
                    + " against " + s.conformity().limitsName() + " (" + s.conformity().rule().kind().title()
                    + "; JCGM 106:2012)", List.of(
                    Column.of("Point", "point", Align.LEFT, 0.6f),
                    Column.of("flow (" + r.flowUnit().strip() + ")", "flow", Align.RIGHT, 1f),
                    Column.of("E (%)", "error_percent", Align.RIGHT, 0.8f),
                    Column.of("U (%)", "expanded_uncertainty_percent", Align.RIGHT, 0.7f),
                    Column.of("MPE (%)", "mpe_percent", Align.RIGHT, 0.7f),
                    Column.of("acceptance (%)", "acceptance_interval", Align.LEFT, 1.3f),
                    Column.of("p_c", "probability_of_conformity", Align.RIGHT, 0.7f),
                    Column.of("U ≤ MPE/" + Figures.compact(s.conformity().points().get(0).uncertaintyRatio(), 3),
                            "ratio_met", Align.LEFT, 0.9f),
                    Column.of("Decision", "decision", Align.LEFT, 1.4f)), rows)));
            blocks.add(new Paragraph("Overall, " + s.phase().label() + ": " + s.conformity().overall().label() + "."));
        }
        return new Part("Conformity", blocks);
    }
}
