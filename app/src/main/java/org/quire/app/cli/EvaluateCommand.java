package org.quire.app.cli;

import jakarta.json.JsonObject;
import java.io.PrintStream;
import java.util.Locale;
import java.util.Set;
import org.quire.app.Cautions;
import org.quire.app.Engine;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.EvaluationSettings;
import org.quire.engine.gum.Contribution;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.io.ResultJson;

/** {@code quire evaluate FILE [--format text|json|csv] [--coverage P | --k K] [--higher-order]}. */
final class EvaluateCommand {
    static final String USAGE = "quire evaluate FILE [--format text|json|csv] [--coverage P | --k K] [--higher-order]";

    private EvaluateCommand() {
    }

    static int run(String[] argv, PrintStream out) throws Exception {
        Args a = new Args(argv, 1, Set.of("format", "coverage", "k"), Set.of("higher-order"));
        a.expectPositional(1, USAGE);
        String format = a.get("format", "text");
        if (!Set.of("text", "json", "csv").contains(format)) {
            throw new UsageException("--format must be text, json or csv, not '" + format + "'");
        }
        if (a.has("coverage") && a.has("k")) {
            throw new UsageException("give either --coverage or --k, not both");
        }
        Budget b = Files.loadBudget(a.positional().get(0));
        EvaluationSettings s = b.settings();
        try {
            if (a.has("coverage")) {
                double p = a.number("coverage", 0);
                s = s.withCoverageProbability(p > 1 && p < 100 ? p / 100 : p);
            }
            if (a.has("k")) {
                s = s.withCoverageFactor(a.number("k", 0));
            }
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
        if (a.has("higher-order")) {
            s = s.withHigherOrder(true);
        }
        b = b.withSettings(s);
        GumResult r;
        try {
            r = GumEvaluator.evaluate(b, Engine.library());
        } catch (org.quire.engine.model.ModelException e) {
            throw Files.modelProblem(a.positional().get(0), e);
        } catch (IllegalArgumentException e) {
            throw new Files.FileProblem(a.positional().get(0), e.getMessage());
        }
        switch (format) {
            case "json":
                JsonObject j = ResultJson.toJson(b.title(), r);
                out.print(BudgetJson.pretty(j));
                break;
            case "csv":
                out.print(csv(r));
                break;
            default:
                out.print(BudgetTableText.format(b.title(), r));
                out.println();
                out.println(Cautions.TEXT);
        }
        return 0;
    }

    static String csv(GumResult r) {
        StringBuilder s = new StringBuilder();
        s.append("output,input,type,distribution,estimate,standard_uncertainty,sensitivity,contribution,dof,share\n");
        for (OutputResult o : r.outputs()) {
            for (Contribution c : o.contributions()) {
                s.append(String.join(",", Csv.cell(o.name()), Csv.cell(c.input()), c.type(), Csv.cell(c.distribution()),
                        num(c.estimate()), num(c.standardUncertainty()), num(c.sensitivity()), num(c.contribution()),
                        num(c.dof()), num(c.share()))).append('\n');
            }
        }
        s.append("\noutput,unit,estimate,standard_uncertainty,effective_dof,coverage_factor,coverage_probability,"
                + "expanded_uncertainty,relative_expanded_uncertainty\n");
        for (OutputResult o : r.outputs()) {
            s.append(String.join(",", Csv.cell(o.name()), Csv.cell(o.unit()), num(o.estimate()),
                    num(o.standardUncertainty()), num(o.effectiveDof()), num(o.coverageFactor()),
                    num(o.coverageProbability()), num(o.expandedUncertainty()), num(o.relativeExpandedUncertainty())))
                    .append('\n');
        }
        return s.toString();
    }

    static String num(double v) {
        if (Double.isInfinite(v)) {
            return "inf";
        }
        if (Double.isNaN(v)) {
            return "";
        }
        return String.format(Locale.ROOT, "%.10g", v);
    }
}
