package org.quire.app.cli;

import jakarta.json.JsonObject;
import java.io.PrintStream;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Callable;
import org.quire.app.common.Cautions;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.EvaluationSettings;
import org.quire.engine.gum.Contribution;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.io.ResultJson;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Parameters;

/** {@code quire evaluate FILE}: the GUM budget table and results of every output of a budget. */
@Command(name = "evaluate", mixinStandardHelpOptions = true, sortOptions = false,
        description = "The GUM uncertainty budget (JCGM 100:2008) of every output: estimate, standard "
                + "uncertainty, sensitivity coefficients, contributions, effective degrees of freedom, coverage "
                + "factor and expanded uncertainty.",
        footerHeading = "%nExamples:%n",
        footer = {"  quire evaluate worked-examples/jcgm100-h1-end-gauge.json",
            "  quire evaluate budget.json --format json > result.json",
            "  quire evaluate budget.json --coverage 0.99 --higher-order"})
final class EvaluateCommand implements Callable<Integer> {
    @ParentCommand
    QuireCommand quire;

    @Parameters(paramLabel = "FILE", description = "the budget file (JSON)")
    String file;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "text, json or csv (default: ${DEFAULT-VALUE})")
    String format;

    @Mixin
    Options.Coverage coverage;

    @Option(names = "--k", paramLabel = "K", converter = Options.FiniteNumber.class,
            description = "a fixed coverage factor instead of one from the effective degrees of freedom")
    Double k;

    @Option(names = "--higher-order", description = "add the higher-order terms of JCGM 100:2008 5.1.2 note")
    boolean higherOrder;

    @Override
    public Integer call() throws Exception {
        return run(quire.out);
    }

    private int run(PrintStream out) throws Exception {
        if (!Set.of("text", "json", "csv").contains(format)) {
            throw new UsageException("--format must be text, json or csv, not '" + format + "'");
        }
        if (coverage.coverage != null && k != null) {
            throw new UsageException("give either --coverage or --k, not both");
        }
        Budget b = Files.loadBudget(file);
        EvaluationSettings s = coverage.apply(b.settings());
        try {
            if (k != null) {
                s = s.withCoverageFactor(k);
            }
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
        if (higherOrder) {
            s = s.withHigherOrder(true);
        }
        b = b.withSettings(s);
        GumResult r;
        try {
            r = GumEvaluator.evaluate(b, quire.engine.library());
        } catch (org.quire.engine.model.ModelException e) {
            throw Files.modelProblem(file, e);
        } catch (IllegalArgumentException e) {
            throw new Files.FileProblem(file, e.getMessage());
        }
        List<String> template = Files.templateFindings(file, b);
        switch (format) {
            case "json":
                JsonObject j = ResultJson.toJson(b.title(), r);
                if (!template.isEmpty()) {
                    jakarta.json.JsonArrayBuilder a = org.quire.engine.io.JsonSupport.JSON.createArrayBuilder();
                    template.forEach(a::add);
                    j = org.quire.engine.io.JsonSupport.JSON.createObjectBuilder(j).add("templateFindings", a).build();
                }
                out.print(BudgetJson.pretty(j));
                break;
            case "csv":
                out.print(csv(r));
                template.forEach(t -> quire.err.println("warning: " + t));
                break;
            default:
                out.print(BudgetTableText.format(b.title(), r));
                for (String t : template) {
                    out.println("Warning (template): " + t);
                }
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

    /** @return a number of a CSV table: 10 significant digits, {@code inf}, or empty for NaN */
    static String num(double v) {
        if (Double.isInfinite(v)) {
            return "inf";
        }
        if (Double.isNaN(v)) {
            return "";
        }
        return tenDigits(v);
    }

    /** The significant digits of {@link #num}. */
    private static final int DIGITS = 10;

    /**
     * {@code String.format(Locale.ROOT, "%.10g", v)} for a finite {@code v}, written directly (a batch writes
     * tens of thousands of numbers, and the formatter parses its pattern at every call): the shortest decimal
     * digits that give back {@code v} ({@link Double#toString}, the digits the formatter starts from) rounded
     * half up to 10 significant digits; then, as the formatter's {@code g} conversion, plain notation with 10
     * significant digits when the rounded magnitude is at least 10^-4 and below 10^10, otherwise
     * {@code d.ddddddddde+XX}.
     */
    static String tenDigits(double v) {
        StringBuilder out = new StringBuilder(24);
        if (Double.compare(v, 0.0) < 0) {
            out.append('-');
        }
        double a = Math.abs(v);
        char[] d = new char[DIGITS];
        int point; // a = 0.d1 d2 ... x 10^point, d1 not 0
        if (a == 0) {
            java.util.Arrays.fill(d, '0');
            point = 1;
        } else {
            String s = Double.toString(a);
            int e = s.indexOf('E');
            int exponent = e < 0 ? 0 : Integer.parseInt(s, e + 1, s.length(), 10);
            int end = e < 0 ? s.length() : e;
            int dot = s.indexOf('.');
            point = dot + exponent;
            int n = 0;
            boolean roundUp = false;
            boolean leading = true;
            for (int i = 0; i < end; i++) {
                char c = s.charAt(i);
                if (c == '.') {
                    continue;
                }
                if (leading && c == '0') {
                    point--;
                    continue;
                }
                leading = false;
                if (n < DIGITS) {
                    d[n++] = c;
                } else {
                    roundUp = c >= '5'; // half up, on the first digit dropped
                    break;
                }
            }
            while (n < DIGITS) {
                d[n++] = '0';
            }
            if (roundUp) {
                int i = DIGITS - 1;
                while (i >= 0 && d[i] == '9') {
                    d[i--] = '0';
                }
                if (i >= 0) {
                    d[i]++;
                } else {
                    d[0] = '1';
                    point++;
                }
            }
        }
        int exponent = point - 1; // of the rounded value, d1.d2 ... x 10^exponent
        if (a == 0 || (exponent >= -4 && exponent < DIGITS)) {
            if (a == 0) {
                out.append("0.");
                out.append(d, 0, DIGITS - 1);
            } else if (exponent >= 0) {
                out.append(d, 0, exponent + 1);
                if (exponent + 1 < DIGITS) {
                    out.append('.').append(d, exponent + 1, DIGITS - exponent - 1);
                }
            } else {
                out.append("0.");
                for (int i = 0; i < -exponent - 1; i++) {
                    out.append('0');
                }
                out.append(d, 0, DIGITS);
            }
        } else {
            out.append(d[0]).append('.').append(d, 1, DIGITS - 1).append('e').append(exponent < 0 ? '-' : '+');
            int x = Math.abs(exponent);
            if (x < 10) {
                out.append('0');
            }
            out.append(x);
        }
        return out.toString();
    }
}
