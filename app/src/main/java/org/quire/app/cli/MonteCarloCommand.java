package org.quire.app.cli;

import java.io.PrintStream;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.Callable;
import org.quire.app.common.Cautions;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.EvaluationSettings;
import org.quire.engine.gum.Figures;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.io.MonteCarloJson;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.units.Units;
import org.quire.engine.montecarlo.BudgetSimulation;
import org.quire.engine.montecarlo.CoverageInterval;
import org.quire.engine.montecarlo.GumComparison;
import org.quire.engine.montecarlo.MonteCarloOutcome;
import org.quire.engine.montecarlo.MonteCarloResult;
import org.quire.engine.montecarlo.MonteCarloSettings;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Parameters;

/** {@code quire montecarlo FILE}: the Monte Carlo method (JCGM 101) for a budget and its comparison with the GUM. */
@Command(name = "montecarlo", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"The Monte Carlo method of JCGM 101:2008 for a budget: mean, standard uncertainty, "
                + "probabilistically symmetric and shortest coverage intervals of every output, and the "
                + "comparison with the GUM result (JCGM 101:2008 clause 8).",
            "On a terminal a progress line on stderr shows the rate and the time left."},
        footerHeading = "%nExamples:%n",
        footer = {"  quire montecarlo worked-examples/jcgm101-9.3-mass-calibration.json --trials 1e6",
            "  quire montecarlo budget.json --trials 1e7 --seed 7 --threads 2",
            "  quire montecarlo budget.json --adaptive --format json > mc.json"})
final class MonteCarloCommand implements Callable<Integer> {
    @ParentCommand
    QuireCommand quire;

    @Parameters(paramLabel = "FILE", description = "the budget file (JSON)")
    String file;

    @Mixin
    Options.Trials trials;

    @Mixin
    Options.Coverage coverage;

    @Option(names = "--adaptive", description = "the adaptive procedure of JCGM 101:2008 7.9")
    boolean adaptive;

    @Mixin
    Options.Threads threads;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "text or json (default: ${DEFAULT-VALUE})")
    String format;

    @Mixin
    Options.Quiet quiet;

    @Override
    public Integer call() throws Exception {
        PrintStream out = quire.out;
        if (!Set.of("text", "json").contains(format)) {
            throw new UsageException("--format must be text or json, not '" + format + "'");
        }
        Budget b = Files.loadBudget(file);
        EvaluationSettings settings = coverage.apply(trials.apply(b.settings()));
        b = b.withSettings(adaptive ? settings.withAdaptive(true) : settings);
        int threadCount = threads.count();
        CompiledModel model;
        GumResult gum;
        try {
            model = b.compile(quire.engine.library());
            gum = GumEvaluator.evaluate(b, model, b.correlationMatrix(), b.settings());
        } catch (org.quire.engine.model.ModelException e) {
            throw Files.modelProblem(file, e);
        } catch (IllegalArgumentException e) {
            throw new Files.FileProblem(file, e.getMessage());
        }
        MonteCarloSettings ms;
        try {
            ms = BudgetSimulation.settings(b.settings(), gum).withThreads(threadCount);
        } catch (IllegalArgumentException e) {
            throw new Files.FileProblem(file, e.getMessage());
        }
        ProgressLine progress = ProgressLine.forTerminal(quire.err, "Monte Carlo", "trials", quiet.quiet);
        MonteCarloOutcome o;
        try {
            o = BudgetSimulation.run(b, model, gum, ms, progress);
        } catch (org.quire.engine.montecarlo.MonteCarloProblem e) {
            throw new Files.FileProblem(file, e.getMessage());
        } finally {
            progress.finish();
        }
        java.util.List<String> template = Files.templateFindings(file, b);
        if (format.equals("json")) {
            jakarta.json.JsonObject j = MonteCarloJson.toJson(o, true);
            if (!template.isEmpty()) {
                jakarta.json.JsonArrayBuilder a = org.quire.engine.io.JsonSupport.JSON.createArrayBuilder();
                template.forEach(a::add);
                j = org.quire.engine.io.JsonSupport.JSON.createObjectBuilder(j).add("templateFindings", a).build();
            }
            out.print(BudgetJson.pretty(j));
            return 0;
        }
        out.print(text(b.title(), o));
        for (String t : template) {
            out.println("Warning (template): " + t);
        }
        out.println();
        out.println(Cautions.TEXT);
        return 0;
    }

    /**
     * The Monte Carlo result by the engine's one rule for figures, as the workbench's Monte Carlo section shows it:
     * u(y) rounded to the budget's significant digits, the mean and the interval ends to its decimal place
     * ({@link Figures#intervalEnd}, JCGM 101:2008 7.9), the trial count in groups of three.
     */
    static String text(String title, MonteCarloOutcome o) {
        MonteCarloResult r = o.result();
        StringBuilder s = new StringBuilder();
        s.append("Budget: ").append(title).append('\n');
        s.append(String.format(Locale.ROOT, "Monte Carlo method (JCGM 101): %s trials, seed %d, p = %s %%%s%n",
                Figures.count(r.trials()), r.seed(), Figures.probability(r.coverageProbability()),
                r.settings().adaptive() ? ", adaptive: " + r.adaptiveRuns() + " runs"
                        + (r.stabilized() ? ", stabilized" : ", NOT stabilized") : ""));
        for (MonteCarloOutcome.Output m : o.outputs()) {
            GumComparison c = m.comparison();
            int digits = c.significantDigits();
            String shownUnit = Units.display(m.unit());
            String unit = m.unit().isEmpty() ? "" : " " + shownUnit;
            double u = m.hasStandardUncertainty() ? m.standardUncertainty() : Double.NaN;
            s.append('\n').append("Output ").append(m.name()).append(unit.isEmpty() ? "" : " [" + shownUnit + "]").append('\n');
            s.append(String.format(Locale.ROOT, "  estimate (mean)             y = %s%s%n",
                    Figures.intervalEnd(m.estimate(), u, digits), unit));
            s.append(String.format(Locale.ROOT, "  standard uncertainty     u(y) = %s%n", m.hasStandardUncertainty()
                    ? BudgetTableText.uncertainty(u, digits) + unit : "not defined"));
            interval(s, "probabilistically symmetric", m.symmetricInterval(), u, digits, unit);
            interval(s, "shortest", m.shortestInterval(), u, digits, unit);
            interval(s, "GUM y \u00b1 U", m.gumInterval(), u, digits, unit);
            s.append(String.format(Locale.ROOT, "  comparison (JCGM 101:2008 8): %s%n", c.verdict().statement()));
            if (!c.explanation().isEmpty()) {
                s.append("  ").append(c.explanation()).append('\n');
            }
            s.append("  ").append(c.reason()).append('\n');
            m.summary().exclusionNote().ifPresent(n -> s.append("  note: ").append(n).append('\n'));
        }
        for (String n : o.notes()) {
            s.append("note: ").append(n).append('\n');
        }
        return s.toString();
    }

    private static void interval(StringBuilder s, String label, CoverageInterval i, double u, int digits, String unit) {
        s.append(String.format(Locale.ROOT, "  %-27s %s %%: [%s, %s]%s%n", label, Figures.probability(i.probability()),
                Figures.intervalEnd(i.lower(), u, digits), Figures.intervalEnd(i.upper(), u, digits), unit));
    }
}
