package org.quire.app.report;

import java.util.ArrayList;
import java.util.List;
import org.quire.app.common.Cautions;
import org.quire.app.report.ReportModel.Block;
import org.quire.app.report.ReportModel.ChartBlock;
import org.quire.app.report.ReportModel.Equations;
import org.quire.app.report.ReportModel.Notices;
import org.quire.app.report.ReportModel.Paragraph;
import org.quire.app.report.ReportModel.Part;
import org.quire.app.report.ReportModel.Statement;
import org.quire.app.report.ReportModel.TableBlock;
import org.quire.app.report.Table.Align;
import org.quire.app.report.Table.Cell;
import org.quire.app.report.Table.Column;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.Correlation;
import org.quire.engine.budget.EvaluationSettings;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.OutputQuantity;
import org.quire.engine.gum.Contribution;
import org.quire.engine.gum.CorrelationTerm;
import org.quire.engine.gum.Figures;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.gum.Rounding;
import org.quire.engine.io.EngineVersion;
import org.quire.engine.montecarlo.CoverageInterval;
import org.quire.engine.montecarlo.GumComparison;
import org.quire.engine.montecarlo.MonteCarloOutcome;
import org.quire.engine.montecarlo.Phrase;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.model.Formula;
import org.quire.engine.units.Units;
import org.quire.engine.model.ModelException;

/**
 * Builds the {@link ReportModel} of a budget: purpose and notes, the model typeset, the inputs with their
 * sources and bases, per output the budget table (x_i, u(x_i), c_i, u_i(y), ν_i, share) with the correlation
 * terms, a chart of the contributions and the result rounded per JCGM 100:2008 7.2.6, then the Monte Carlo
 * summary, further sections, settings, warnings, revision history, and the cautions.
 *
 * <p>References: JCGM 100:2008 7.2 (reporting uncertainty: 7.2.1 what to give, 7.2.3 the expanded uncertainty
 * with k and p, 7.2.6 rounding to at most two significant digits); JCGM 100:2008 5.1.3 and 5.2.2 (the rows
 * and correlation terms of the budget).
 *
 * <p>Stateless and thread-safe.
 */
public final class ReportBuilder {
    private ReportBuilder() {
    }

    /** @return the report of {@code in} */
    public static ReportModel build(ReportInput in) {
        Budget b = in.budget();
        GumResult gum = in.gum();
        List<Part> parts = new ArrayList<>();
        parts.add(purpose(b));
        parts.add(model(b, in.library()));
        parts.add(inputs(b));
        if (!b.correlations().isEmpty()) {
            parts.add(correlations(b));
        }
        for (OutputResult o : gum.outputs()) {
            parts.add(output(o, gum.settings()));
        }
        if (gum.outputs().size() > 1) {
            parts.add(outputCorrelation(gum));
        }
        parts.add(monteCarlo(in.monteCarlo()));
        for (ReportSection s : in.sections()) {
            parts.add(new Part(s.heading(), s.ordered()));
        }
        parts.add(settings(gum.settings()));
        parts.add(warnings(gum));
        parts.add(revisions(in.document()));
        if (in.authorNotes()) {
            parts.add(authorNotes(b));
        }
        return new ReportModel(in.document(), EngineVersion.get(), parts, Cautions.TEXT);
    }

    private static Part purpose(Budget b) {
        List<Block> blocks = new ArrayList<>();
        if (b.notes().isBlank()) {
            blocks.add(new Paragraph("The budget gives no notes on its purpose."));
        } else {
            for (String p : b.notes().split("\\n\\s*\\n")) {
                blocks.add(new Paragraph(Typesetter.caption(p.strip())));
            }
        }
        List<List<Cell>> rows = new ArrayList<>();
        for (OutputQuantity o : b.outputs()) {
            rows.add(List.of(Cell.math(Typesetter.name(o.name())), Cell.math(Typesetter.caption(o.description())),
                    Cell.unit(o.unit())));
        }
        blocks.add(new TableBlock(new Table("measurands", "Measurands", List.of(
                Column.of("Quantity", "quantity", Align.LEFT, 1f),
                Column.of("Description", "description", Align.LEFT, 4f),
                Column.of("Unit", "unit", Align.LEFT, 1f)), rows)));
        return new Part("Purpose and notes", blocks);
    }

    static Part model(Budget b, org.quire.engine.model.FunctionLibrary library) {
        List<MathText> lines = new ArrayList<>();
        List<Block> blocks = new ArrayList<>();
        try {
            CompiledModel m = b.compile(library);
            for (Formula.Line l : m.lines()) {
                lines.add(Typesetter.equation(l));
            }
        } catch (ModelException e) {
            // The budget was evaluated before the report is built, so its model compiles; show it as written.
            for (String l : b.model().split("\n")) {
                if (!l.isBlank()) {
                    lines.add(MathText.upright(l.strip()));
                }
            }
        }
        blocks.add(new Equations(lines));
        return new Part("Measurement model", blocks);
    }

    private static Part inputs(Budget b) {
        List<List<Cell>> rows = new ArrayList<>();
        List<List<Cell>> sources = new ArrayList<>();
        for (InputQuantity q : b.inputs()) {
            var e = q.evaluation();
            rows.add(List.of(Cell.math(Typesetter.name(q.name())), Cell.math(Typesetter.caption(q.description())),
                    Cell.number(Figures.estimate(e.estimate()), e.estimate()), Cell.unit(q.unit()),
                    Cell.text(e.type()), Cell.text(e.distribution().shape()),
                    Cell.number(Figures.sig(e.standardUncertainty(), 3), e.standardUncertainty()),
                    Cell.number(Figures.dof(e.dof()), e.dof())));
            sources.add(List.of(Cell.math(Typesetter.name(q.name())),
                    Cell.math(Typesetter.caption(q.source().isBlank() ? "not stated" : q.source())),
                    Cell.math(Typesetter.caption(e.basis()))));
        }
        List<Block> blocks = new ArrayList<>();
        blocks.add(new TableBlock(new Table("inputs", "Input quantities", List.of(
                Column.of("X_i", "quantity", Align.LEFT, 0.9f),
                Column.of("Description", "description", Align.LEFT, 3f),
                Column.of("x_i", "estimate", Align.RIGHT, 1.6f),
                Column.of("Unit", "unit", Align.LEFT, 0.8f),
                Column.of("Type", "evaluation_type", Align.LEFT, 0.6f),
                Column.of("Distribution", "distribution", Align.LEFT, 1.3f),
                Column.of("u(x_i)", "standard_uncertainty", Align.RIGHT, 1.4f),
                Column.of("ν_i", "dof", Align.RIGHT, 0.6f)), rows)));
        List<Column> sourceColumns = List.of(
                Column.of("X_i", "quantity", Align.LEFT, 0.9f),
                Column.of("Source", "source", Align.LEFT, 3.5f),
                Column.of("Basis of u(x_i)", "basis", Align.LEFT, 3.5f));
        blocks.add(new TableBlock(new Table("sources", "Sources and bases of the input values", sourceColumns,
                sources)));
        return new Part("Input quantities", blocks);
    }

    /**
     * The inputs' notes, which hold the author's guidance (a template's instructions for filling in each input):
     * for the author, so only in an appendix on request.
     */
    static Part authorNotes(Budget b) {
        List<List<Cell>> rows = new ArrayList<>();
        for (InputQuantity q : b.inputs()) {
            if (!q.notes().isBlank()) {
                rows.add(List.of(Cell.math(Typesetter.name(q.name())), Cell.text(q.notes())));
            }
        }
        if (rows.isEmpty()) {
            return new Part("Appendix: notes on the inputs", List.of(new Paragraph("The inputs carry no notes.")));
        }
        return new Part("Appendix: notes on the inputs", List.of(new Paragraph("The author's notes and guidance on "
                + "each input, as written in the budget; they are not part of the evaluation."),
                new TableBlock(new Table("input-notes", "Notes on the inputs", List.of(
                        Column.of("X_i", "quantity", Align.LEFT, 0.9f),
                        Column.of("Notes", "notes", Align.LEFT, 7f)), rows))));
    }

    private static Part correlations(Budget b) {
        List<List<Cell>> rows = new ArrayList<>();
        double[][] r = null;
        try {
            r = b.correlationMatrix().toArray();
        } catch (IllegalArgumentException e) {
            // The budget was evaluated, so its matrix is valid; without it the stated r is shown.
        }
        List<String> names = b.inputNames();
        for (Correlation c : b.correlations()) {
            double v = c.r();
            if (r != null) {
                v = r[names.indexOf(c.first())][names.indexOf(c.second())];
            }
            rows.add(List.of(Cell.math(Typesetter.name(c.first())), Cell.math(Typesetter.name(c.second())),
                    Cell.number(Figures.sig(v, 3), v), Cell.text(c.fromReadings() ? "from simultaneous readings" : "stated"),
                    Cell.text(c.justification().isBlank() ? "not stated" : c.justification())));
        }
        return new Part("Correlated inputs", List.of(new TableBlock(new Table("correlations",
                "Correlation coefficients r(x_i, x_j) (JCGM 100:2008 5.2.2)", List.of(
                Column.of("X_i", "first", Align.LEFT, 1f),
                Column.of("X_j", "second", Align.LEFT, 1f),
                Column.of("r(x_i, x_j)", "r", Align.RIGHT, 1f),
                Column.of("Origin", "origin", Align.LEFT, 2f),
                Column.of("Justification", "justification", Align.LEFT, 4f)), rows))));
    }

    private static Part output(OutputResult o, EvaluationSettings s) {
        int digits = s.significantDigits();
        String unit = o.unit();
        MathText y = Typesetter.name(o.name());
        List<Block> blocks = new ArrayList<>();
        String key = fileKey(o.name());
        blocks.add(new TableBlock(budgetTable(o, "budget-" + key, MathText.concat(MathText.upright("Uncertainty budget of "), y,
                MathText.upright(unit.isEmpty() ? "" : " (contributions in " + Units.display(unit) + ")")))));
        if (!o.correlationTerms().isEmpty()) {
            List<List<Cell>> terms = new ArrayList<>();
            for (CorrelationTerm t : o.correlationTerms()) {
                terms.add(List.of(Cell.math(Typesetter.name(t.first())), Cell.math(Typesetter.name(t.second())),
                        Cell.number(Figures.sig(t.r(), 3), t.r()), Cell.number(Figures.sig(t.variance(), 3), t.variance())));
            }
            blocks.add(new TableBlock(new Table("correlation-terms-" + key, MathText.concat(MathText.upright(
                    "Correlation terms in the combined variance of "), y, MathText.upright(" (JCGM 100:2008 5.2.2, eq. 16)")),
                    List.of(
                    Column.of("X_i", "first", Align.LEFT, 1f),
                    Column.of("X_j", "second", Align.LEFT, 1f),
                    Column.of("r(x_i, x_j)", "r", Align.RIGHT, 1f),
                    Column.of("term in u_c^2(y)", "variance", Align.RIGHT, 1.5f)), terms)));
        }
        if (o.higherOrderTerms() == org.quire.engine.gum.HigherOrderTerms.INCLUDED) {
            blocks.add(new Paragraph("Higher-order terms (JCGM 100:2008 5.1.2, note) add "
                    + Figures.sig(o.higherOrderVariance(), 3) + (unit.isEmpty() ? "" : " (" + Units.display(unit) + ")²")
                    + " to the combined variance of " + y.plain() + "."));
        } else if (o.higherOrderTerms() == org.quire.engine.gum.HigherOrderTerms.NOT_INCLUDED) {
            blocks.add(new Paragraph("Higher-order terms (JCGM 100:2008 5.1.2, note) were asked for but are "
                    + o.higherOrderTerms().text() + "; u_c(" + y.plain() + ") is the first-order result."));
        }
        Chart.Ranking ranking = Chart.Ranking.of(o, "Contributions u_i(y) to the standard uncertainty of " + y.plain()
                + ", largest first, with the cumulative share of the combined variance"
                + (o.correlationTerms().isEmpty() ? "" : "; the correlation terms are not shown"
                + (o.correlationVariance() < 0 ? ", and as they are negative the shares add up to more than 100 %" : "")));
        if (!ranking.labels().isEmpty()) {
            blocks.add(new ChartBlock(ranking));
        }
        double big = o.expandedUncertainty();
        String ru = Rounding.uncertainty(o.standardUncertainty(), digits).toPlainString();
        String rU = Rounding.uncertainty(big, digits).toPlainString();
        String ry = Rounding.estimate(o.estimate(), big, digits).toPlainString();
        // the whole number used for k (JCGM 100:2008 G.4.1 note 1), shown where it differs from ν_eff as printed
        String used = Double.isInfinite(o.effectiveDof()) || o.dofUsed() == o.effectiveDof()
                || Figures.sig(o.dofUsed(), 3).equals(Figures.sig(o.effectiveDof(), 3)) ? ""
                : " (" + Figures.dof(o.dofUsed()) + " used)";
        List<List<Cell>> res = new ArrayList<>();
        res.add(List.of(Cell.text("estimate"), Cell.math(y), Cell.number(ry, o.estimate()), Cell.unit(unit)));
        res.add(List.of(Cell.text("combined standard uncertainty"), Cell.math(Typesetter.label("u_c")),
                Cell.number(ru, o.standardUncertainty()), Cell.unit(unit)));
        res.add(List.of(Cell.text("effective degrees of freedom (Welch–Satterthwaite)"),
                Cell.math(Typesetter.label("ν_{eff}")),
                Cell.number(Double.isInfinite(o.effectiveDof()) ? "∞" : Figures.sig(o.effectiveDof(), 3) + used,
                        o.effectiveDof()), Cell.text("")));
        res.add(List.of(Cell.text("coverage factor"), Cell.math(Typesetter.label("k")),
                Cell.number(Figures.coverageFactor(o.coverageFactor()), o.coverageFactor()), Cell.text("")));
        res.add(List.of(Cell.text("coverage probability"), Cell.math(Typesetter.label("p")),
                Cell.number(Figures.probability(o.coverageProbability()), 100 * o.coverageProbability()),
                Cell.text("%")));
        res.add(List.of(Cell.text("expanded uncertainty"), Cell.math(Typesetter.label("U = k u_c")),
                Cell.number(rU, big), Cell.unit(unit)));
        if (Figures.relativeUncertaintyMeaningful(unit, o.estimate(), big)) {
            double rel = o.relativeExpandedUncertainty();
            res.add(List.of(Cell.text("relative expanded uncertainty"), Cell.math(Typesetter.label("U/|y|")),
                    Cell.number(Figures.sig(100 * rel, 2), 100 * rel), Cell.text("%")));
        }
        blocks.add(new TableBlock(new Table("result-" + key, MathText.concat(MathText.upright("Result for "), y,
                MathText.upright(", uncertainties rounded to " + digits + " significant digit" + (digits == 1 ? "" : "s")
                + " (JCGM 100:2008 7.2.6)")), List.of(
                Column.of("Figure", "figure", Align.LEFT, 3f),
                Column.of("Symbol", "symbol", Align.LEFT, 1.2f),
                Column.of("Value", "value", Align.RIGHT, 1.6f),
                Column.of("Unit", "unit", Align.LEFT, 0.8f)), res)));
        blocks.add(new Statement(statement(o, digits)));
        if (!o.warnings().isEmpty()) {
            blocks.add(new Notices(o.warnings().stream().map(Typesetter::caption).toList()));
        }
        return new Part(MathText.concat(MathText.upright("Uncertainty budget of "), y), blocks);
    }

    /**
     * @return the budget table of one result: x_i, unit, u(x_i), c_i, u_i(y), ν_i and the share of u_c²(y) of each
     *     input (JCGM 100:2008 5.1.3, 5.1.6 and G.4.1)
     */
    static Table budgetTable(OutputResult o, String key, MathText caption) {
        List<List<Cell>> rows = new ArrayList<>();
        for (Contribution c : o.contributions()) {
            rows.add(List.of(Cell.math(Typesetter.name(c.input())),
                    Cell.number(Figures.estimate(c.estimate()), c.estimate()), Cell.unit(c.unit()),
                    Cell.number(Figures.sig(c.standardUncertainty(), 3), c.standardUncertainty()),
                    Cell.number(Figures.sig(c.sensitivity(), 3), c.sensitivity()),
                    Cell.number(Figures.sig(c.contribution(), 3), c.contribution()),
                    Cell.number(Figures.dof(c.dof()), c.dof()),
                    Cell.number(Figures.percent(c.share()), Figures.sharePercent(c.share()))));
        }
        return new Table(key, caption, List.of(
                Column.of("X_i", "quantity", Align.LEFT, 1f),
                Column.of("x_i", "estimate", Align.RIGHT, 1.6f),
                Column.of("Unit", "unit", Align.LEFT, 0.8f),
                Column.of("u(x_i)", "standard_uncertainty", Align.RIGHT, 1.3f),
                Column.of("c_i", "sensitivity", Align.RIGHT, 1.3f),
                Column.of("u_i(y)", "contribution", Align.RIGHT, 1.3f),
                Column.of("ν_i", "dof", Align.RIGHT, 0.6f),
                Column.of("share (%)", "share_percent", Align.RIGHT, 0.8f)), rows);
    }

    /**
     * @return e.g. "l = (50.000838 ± 0.000092) mm, k = 2.92, p = 99 %", the result as JCGM 100:2008 7.2.4 states it
     */
    public static MathText statement(OutputResult o, int digits) {
        List<MathText.Run> runs = new ArrayList<>(Typesetter.name(o.name()).runs());
        String unit = o.unit().isEmpty() ? "" : " " + Units.display(o.unit());
        String text = " = (" + org.quire.engine.gum.Figures.statedResult(o.estimate(), o.expandedUncertainty(), digits) + ")" + unit;
        runs.add(new MathText.Run(text.replace("(-", "(−"), false, MathText.Shift.BASE));
        runs.add(new MathText.Run(", ", false, MathText.Shift.BASE));
        runs.add(new MathText.Run("k", true, MathText.Shift.BASE));
        runs.add(new MathText.Run(" = " + Figures.coverageFactor(o.coverageFactor()) + ", ", false, MathText.Shift.BASE));
        runs.add(new MathText.Run("p", true, MathText.Shift.BASE));
        runs.add(new MathText.Run(" = " + Figures.probability(o.coverageProbability()) + " %", false, MathText.Shift.BASE));
        return MathText.of(runs);
    }

    private static Part outputCorrelation(GumResult gum) {
        List<Column> cols = new ArrayList<>();
        cols.add(Column.of("", "output", Align.LEFT, 1f));
        for (OutputResult o : gum.outputs()) {
            cols.add(new Column(Typesetter.name(o.name()), o.name(), Align.RIGHT, 1f));
        }
        List<List<Cell>> rows = new ArrayList<>();
        double[][] r = gum.correlation();
        for (int k = 0; k < gum.outputs().size(); k++) {
            List<Cell> row = new ArrayList<>();
            row.add(Cell.math(Typesetter.name(gum.outputs().get(k).name())));
            for (int l = 0; l < gum.outputs().size(); l++) {
                row.add(Cell.number(Figures.sig(r[k][l], 3), r[k][l]));
            }
            rows.add(row);
        }
        return new Part("Correlation of the outputs", List.of(new TableBlock(new Table("output-correlation",
                "Correlation coefficients of the outputs (JCGM 102:2011 6.2.1.3)", cols, rows))));
    }

    static Part monteCarlo(MonteCarloOutcome mc) {
        List<Block> blocks = new ArrayList<>();
        if (mc == null) {
            blocks.add(new Paragraph("The Monte Carlo method (JCGM 101:2008) was not run for this report, so the GUM "
                    + "result above is not validated by it (JCGM 101:2008 clause 8)."));
            return new Part("Monte Carlo method", blocks);
        }
        blocks.add(new Paragraph("Propagation of distributions with " + Figures.count(mc.trials()) + " trials"
                + (mc.adaptive() ? " (number chosen by the adaptive procedure, JCGM 101:2008 7.9)" : "")
                + ", seed " + mc.seed() + "."));
        List<List<Cell>> rows = new ArrayList<>();
        List<List<Cell>> cmp = new ArrayList<>();
        for (MonteCarloOutcome.Output o : mc.outputs()) {
            MathText y = Typesetter.name(o.name());
            GumComparison c = o.comparison();
            double uForDigits = o.hasStandardUncertainty() ? o.standardUncertainty() : c.gumStandardUncertainty();
            int d = decimals(uForDigits);
            CoverageInterval sym = o.symmetricInterval();
            CoverageInterval sho = o.shortestInterval();
            CoverageInterval gum = o.gumInterval();
            rows.add(List.of(Cell.math(y), Cell.number(fixed(o.estimate(), d), o.estimate()),
                    o.hasStandardUncertainty()
                            ? Cell.number(Figures.sig(o.standardUncertainty(), 3), o.standardUncertainty())
                            : Cell.text("not defined"),
                    Cell.number(fixed(sym.lower(), d), sym.lower()), Cell.number(fixed(sym.upper(), d), sym.upper()),
                    Cell.number(fixed(sho.lower(), d), sho.lower()), Cell.number(fixed(sho.upper(), d), sho.upper()),
                    Cell.number(Figures.probability(sym.probability()), 100 * sym.probability()),
                    Cell.unit(o.unit())));
            cmp.add(List.of(Cell.math(y), Cell.number(fixed(gum.lower(), d), gum.lower()),
                    Cell.number(fixed(gum.upper(), d), gum.upper()),
                    Double.isNaN(c.tolerance()) ? Cell.text("–")
                            : Cell.number(Figures.compact(c.tolerance(), 1), c.tolerance()),
                    Cell.number(Figures.sig(c.lowerDifference(), 2), c.lowerDifference()),
                    Cell.number(Figures.sig(c.upperDifference(), 2), c.upperDifference()),
                    Cell.text(c.verdict().outcome())));
        }
        blocks.add(new TableBlock(new Table("monte-carlo", "Monte Carlo estimate, standard uncertainty and coverage "
                + "intervals (JCGM 101:2008 7.6, 7.7.1 probabilistically symmetric, 7.7.2 shortest)", List.of(
                Column.of("Y", "output", Align.LEFT, 0.7f),
                Column.of("y", "estimate", Align.RIGHT, 1.3f),
                Column.of("u(y)", "standard_uncertainty", Align.RIGHT, 1.1f),
                Column.of("symmetric y_{low}", "symmetric_low", Align.RIGHT, 1.3f),
                Column.of("symmetric y_{high}", "symmetric_high", Align.RIGHT, 1.3f),
                Column.of("shortest y_{low}", "shortest_low", Align.RIGHT, 1.3f),
                Column.of("shortest y_{high}", "shortest_high", Align.RIGHT, 1.3f),
                Column.of("p (%)", "coverage_percent", Align.RIGHT, 0.6f),
                Column.of("Unit", "unit", Align.LEFT, 0.6f)), rows)));
        blocks.add(new TableBlock(new Table("monte-carlo-comparison", "Validation of the GUM result: ends of the GUM "
                + "interval y ± U against the probabilistically symmetric Monte Carlo interval (JCGM 101:2008 8.2; "
                + "δ by 7.9.2 from u(y))", List.of(
                Column.of("Y", "output", Align.LEFT, 0.7f),
                Column.of("GUM y − U", "gum_low", Align.RIGHT, 1.3f),
                Column.of("GUM y + U", "gum_high", Align.RIGHT, 1.3f),
                Column.of("δ", "tolerance", Align.RIGHT, 0.9f),
                Column.of("d_{low}", "d_low", Align.RIGHT, 0.9f),
                Column.of("d_{high}", "d_high", Align.RIGHT, 0.9f),
                Column.of("GUM result", "verdict", Align.LEFT, 1.3f)), cmp)));
        for (MonteCarloOutcome.Output o : mc.outputs()) {
            String why = o.comparison().explanation();
            blocks.add(new Paragraph(MathText.concat(MathText.upright("For "), Typesetter.name(o.name()),
                    MathText.upright(": "), sentence(o.comparison().reasonPhrases()),
                    MathText.upright("." + (why.isEmpty() ? "" : " " + why)))));
        }
        for (String n : mc.notes()) {
            blocks.add(new Paragraph("Note: " + n + "."));
        }
        for (MonteCarloOutcome.Output o : mc.outputs()) {
            Chart.Histogram h = MonteCarloReport.histogram(o);
            if (h != null) {
                blocks.add(new ChartBlock(h));
            }
        }
        return new Part("Monte Carlo method", blocks);
    }

    /**
     * @return an engine's sentence set for reading: its symbols typeset as names ({@code d_low} as d with subscript
     *     low, {@code delta} as δ), its numbers by the figures rule
     */
    public static MathText sentence(List<Phrase> phrases) {
        List<MathText> out = new ArrayList<>();
        for (Phrase p : phrases) {
            out.add(switch (p.kind()) {
                case WORDS -> Typesetter.prose(p.text());
                case SYMBOL -> Typesetter.name(p.text());
                case NUMBER -> MathText.upright(Figures.working(p.value()));
            });
        }
        return MathText.concat(out.toArray(new MathText[0]));
    }

    /** @return the decimals that show two digits beyond the first significant digit of {@code u} */
    private static int decimals(double u) {
        if (!(u > 0) || !Double.isFinite(u)) {
            return 6;
        }
        return Math.max(0, Math.min(12, 3 - (int) Math.floor(Math.log10(u))));
    }

    private static String fixed(double v, int decimals) {
        if (!Double.isFinite(v)) {
            return Figures.sig(v, 3);
        }
        String t = new java.math.BigDecimal(v).setScale(decimals, java.math.RoundingMode.HALF_EVEN).toPlainString();
        return t.startsWith("-") ? "−" + t.substring(1) : t;
    }

    private static Part settings(EvaluationSettings s) {
        List<List<Cell>> rows = new ArrayList<>();
        rows.add(List.of(Cell.text("coverage"), Cell.math(Typesetter.label(s.hasFixedCoverageFactor()
                ? "fixed coverage factor k = " + Figures.estimate(s.coverageFactor())
                : "coverage probability p = " + Figures.probability(s.coverageProbability()) + " %, k = t_p(ν_{eff})"))));
        rows.add(List.of(Cell.text("effective degrees of freedom"), Cell.text(
                s.dofRounding() == EvaluationSettings.DofRounding.TRUNCATE
                        ? "truncated to a whole number (JCGM 100:2008 G.4.1 note 1)" : "used as computed")));
        rows.add(List.of(Cell.text("higher-order terms"), Cell.text(s.higherOrder()
                ? "added (JCGM 100:2008 5.1.2 note)" : "not added (first-order law of propagation)")));
        rows.add(List.of(Cell.text("significant digits of reported uncertainties"),
                Cell.number(Integer.toString(s.significantDigits()), s.significantDigits())));
        return new Part("Evaluation settings", List.of(new TableBlock(new Table("settings", "Evaluation settings",
                List.of(Column.of("Setting", "setting", Align.LEFT, 2f), Column.of("Value", "value", Align.LEFT, 4f)),
                rows))));
    }

    private static Part warnings(GumResult gum) {
        List<MathText> all = new ArrayList<>();
        for (String w : gum.warnings()) {
            all.add(Typesetter.caption(w));
        }
        for (OutputResult o : gum.outputs()) {
            for (String w : o.warnings()) {
                all.add(MathText.concat(Typesetter.name(o.name()), MathText.upright(": "), Typesetter.caption(w)));
            }
        }
        if (all.isEmpty()) {
            return new Part("Warnings", List.of(new Paragraph("The evaluation raised no warnings.")));
        }
        return new Part("Warnings", List.of(new Notices(all)));
    }

    private static Part revisions(DocumentInfo d) {
        if (d.revisions().isEmpty()) {
            String why = d.revision().equals(DocumentInfo.NOT_RECORDED_V1)
                    ? "No revision history is recorded: the file is of format version 1, which keeps none. The content "
                    + "hash in the header is that of the document as read; such a file records no creation time, so "
                    + "its modification time stands in for it until the file is saved in format version 2."
                    : d.hasRevisions() ? "No change of status has been recorded for this document yet."
                    : "No revision history is recorded for this budget.";
            return new Part("Revision history", List.of(new Paragraph(why)));
        }
        List<List<Cell>> rows = new ArrayList<>();
        List<List<Cell>> approvals = new ArrayList<>();
        for (RevisionEntry r : d.revisions()) {
            rows.add(List.of(Cell.text(r.revision()), Cell.text(r.date()), Cell.text(r.author()),
                    Cell.text(r.status()), Cell.text(r.hash().length() > 16 ? r.hash().substring(0, 16) + "…" : r.hash()),
                    Cell.text(r.summary())));
            if (r.status().equals("approved") && !r.hash().isEmpty()) {
                approvals.add(List.of(Cell.text(r.revision()), Cell.text(r.author() + ", " + r.date()),
                        Cell.text(r.hash())));
            }
        }
        List<Block> blocks = new ArrayList<>();
        blocks.add(new TableBlock(new Table("revisions", "Revision history: every change of status, oldest first",
                List.of(Column.of("Revision", "revision", Align.LEFT, 0.95f), Column.of("Date", "date", Align.LEFT, 1.85f),
                        Column.of("By", "by", Align.LEFT, 1.2f), Column.of("Status", "status", Align.LEFT, 0.9f),
                        Column.of("Hash", "hash", Align.LEFT, 1.75f), Column.of("Change", "change", Align.LEFT, 2.95f)),
                rows)));
        if (approvals.isEmpty()) {
            blocks.add(new Paragraph("No revision of this document has been approved."));
        } else {
            blocks.add(new TableBlock(new Table("approvals", "Approved revisions with the " + d.hashAlgorithm()
                    + " hash of the content approved; an approved revision stays readable after later changes",
                    List.of(Column.of("Revision", "revision", Align.LEFT, 0.95f),
                            Column.of("Approved by, on", "approved_by_on", Align.LEFT, 2.3f),
                            Column.of("Content hash", "content_hash", Align.LEFT, 6.4f)), approvals)));
        }
        return new Part("Revision history", blocks);
    }

    /** @return a name made safe for a file or table key: lower case, other characters as '-' */
    static String fileKey(String name) {
        String k = name.toLowerCase(java.util.Locale.ROOT).replaceAll("[^a-z0-9._-]", "-");
        return k.isEmpty() || !Character.isLetterOrDigit(k.charAt(0)) ? "q" + k : k;
    }
}
