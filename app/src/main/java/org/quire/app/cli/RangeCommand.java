package org.quire.app.cli;

import java.io.PrintStream;
import java.util.Locale;
import java.util.Set;
import org.quire.app.common.Cautions;
import org.quire.engine.budget.Budget;
import org.quire.engine.conformity.PointDecision;
import org.quire.engine.gum.FlowRange;
import org.quire.engine.gum.FlowRangeResult;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Parameters;

/** {@code quire range FILE}: a budget evaluated at each of its flow points, with the conformity decisions. */
@Command(name = "range", mixinStandardHelpOptions = true, sortOptions = false,
        description = "The budget evaluated at each of its flow points: flow, y, u, U and relative U, the "
                + "correlation of the point results (shared inputs correlate them) and, when the file gives "
                + "maximum permissible errors and a decision rule, the conformity decision at each point "
                + "(JCGM 106:2012).",
        footerHeading = "%nExamples:%n",
        footer = {"  quire range worked-examples/tarrow-vale-emf-six-point.json",
            "  quire range budget.json --format csv > range.csv"})
final class RangeCommand implements Callable<Integer> {
    @ParentCommand
    QuireCommand quire;

    @Parameters(paramLabel = "FILE", description = "the budget file (JSON) with flow points")
    String file;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "text or csv (default: ${DEFAULT-VALUE})")
    String format;

    @Override
    public Integer call() throws Exception {
        PrintStream out = quire.out;
        if (!Set.of("text", "csv").contains(format)) {
            throw new UsageException("--format must be text or csv, not '" + format + "'");
        }
        Budget b = Files.loadBudget(file);
        FlowRangeResult r;
        try {
            r = FlowRange.evaluate(b, quire.engine.library());
        } catch (org.quire.engine.model.ModelException e) {
            throw Files.modelProblem(file, e);
        } catch (IllegalArgumentException e) {
            throw new Files.FileProblem(file, e.getMessage());
        }
        out.print(format.equals("csv") ? csv(r) : text(b.title(), r));
        return 0;
    }

    static String text(String title, FlowRangeResult r) {
        StringBuilder s = new StringBuilder();
        if (!title.isEmpty()) {
            s.append(title).append("\n\n");
        }
        String fu = r.flowUnit().isEmpty() ? "" : " / " + r.flowUnit();
        String yu = r.unit().isEmpty() ? "" : " / " + r.unit();
        s.append(String.format(Locale.ROOT, "%-6s %12s %14s %12s %8s %8s %12s %10s%n", "point", "flow" + fu,
                r.output() + yu, "u", "nu_eff", "k", "U", "U/|y| %"));
        int i = 1;
        for (FlowRangeResult.Point p : r.points()) {
            s.append(String.format(Locale.ROOT, "%-6d %12s %14s %12s %8s %8.3f %12s %10s%n", i++, g(p.flow()),
                    g(p.estimate()), g(p.standardUncertainty()), FitCommand.dof(p.result().effectiveDof()),
                    p.result().coverageFactor(), g(p.expandedUncertainty()),
                    Double.isNaN(p.relativeExpandedUncertainty()) ? "-"
                            : String.format(Locale.ROOT, "%.4f", 100 * p.relativeExpandedUncertainty())));
        }
        s.append("\ncorrelation of the point results (shared inputs correlate them):\n");
        double[][] c = r.correlation();
        for (double[] row : c) {
            for (double v : row) {
                s.append(String.format(Locale.ROOT, " %7s", Double.isNaN(v) ? "-" : String.format(Locale.ROOT, "%.3f", v)));
            }
            s.append('\n');
        }
        if (r.conformity() != null) {
            s.append(String.format(Locale.ROOT, "%nconformity (%s, %s):%n", r.conformity().envelope().name(),
                    r.conformity().rule().kind().title()));
            s.append(String.format(Locale.ROOT, "%12s %10s %10s %10s %8s  %s%n", "flow" + fu, "error %", "U %", "MPE %",
                    "p_c", "decision"));
            for (PointDecision d : r.conformity().decisions()) {
                s.append(String.format(Locale.ROOT, "%12s %10.3f %10.3f %10s %8.4f  %s%n", g(d.point().flow()),
                        d.point().errorPercent(), d.expandedUncertainty(), d.limits().label(),
                        d.probabilityOfConformity(), d.decision().label()));
            }
            s.append("overall: ").append(r.conformity().overall().label()).append('\n');
            s.append(r.conformity().statement()).append('\n');
        }
        s.append('\n').append(Cautions.TEXT).append('\n');
        return s.toString();
    }

    static String csv(FlowRangeResult r) {
        StringBuilder s = new StringBuilder("flow,estimate,standard_uncertainty,effective_dof,coverage_factor,"
                + "expanded_uncertainty,relative_expanded_uncertainty");
        if (r.conformity() != null) {
            s.append(",probability_of_conformity,decision");
        }
        s.append('\n');
        for (int i = 0; i < r.points().size(); i++) {
            FlowRangeResult.Point p = r.points().get(i);
            s.append(String.join(",", EvaluateCommand.num(p.flow()), EvaluateCommand.num(p.estimate()),
                    EvaluateCommand.num(p.standardUncertainty()), EvaluateCommand.num(p.result().effectiveDof()),
                    EvaluateCommand.num(p.result().coverageFactor()), EvaluateCommand.num(p.expandedUncertainty()),
                    EvaluateCommand.num(p.relativeExpandedUncertainty())));
            if (r.conformity() != null) {
                PointDecision d = r.conformity().decisions().get(i);
                s.append(',').append(EvaluateCommand.num(d.probabilityOfConformity())).append(',')
                        .append(Csv.cell(d.decision().label()));
            }
            s.append('\n');
        }
        s.append("\ncorrelation\n");
        for (double[] row : r.correlation()) {
            StringBuilder line = new StringBuilder();
            for (double v : row) {
                if (line.length() > 0) {
                    line.append(',');
                }
                line.append(EvaluateCommand.num(v));
            }
            s.append(line).append('\n');
        }
        return s.toString();
    }

    private static String g(double v) {
        return FitCommand.g(v);
    }
}
