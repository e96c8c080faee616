package org.quire.app.cli;

import java.io.PrintStream;
import java.util.Locale;
import java.util.Set;
import org.quire.app.Cautions;
import org.quire.app.Engine;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.EvaluationSettings;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.io.MonteCarloJson;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.montecarlo.BudgetSimulation;
import org.quire.engine.montecarlo.GumComparison;
import org.quire.engine.montecarlo.MonteCarloOutcome;
import org.quire.engine.montecarlo.MonteCarloResult;
import org.quire.engine.montecarlo.MonteCarloSettings;
import org.quire.engine.montecarlo.ProgressListener;

/**
 * {@code quire montecarlo FILE [--trials N] [--seed S] [--threads T] [--adaptive] [--coverage P]
 * [--format text|json]}: the Monte Carlo method (JCGM 101) for a budget and its comparison with the GUM result.
 */
final class MonteCarloCommand {
    static final String USAGE = "quire montecarlo FILE [--trials N] [--seed S] [--threads T] [--adaptive] "
            + "[--coverage P] [--format text|json]";

    private MonteCarloCommand() {
    }

    /** Reads the Monte Carlo options shared by several commands into budget settings. */
    static EvaluationSettings settings(Args a, EvaluationSettings s) throws UsageException {
        try {
            if (a.has("trials")) {
                long n = a.integer("trials", 0);
                if (n < 1) {
                    throw new UsageException("--trials must be a whole number of at least 1, not " + a.get("trials", ""));
                }
                s = s.withTrials(n);
            }
            if (a.has("seed")) {
                s = s.withSeed(a.integer("seed", 0));
            }
            if (a.has("coverage")) {
                double p = a.number("coverage", 0);
                s = s.withCoverageProbability(p > 1 && p < 100 ? p / 100 : p);
            }
            if (a.has("adaptive")) {
                s = s.withAdaptive(true);
            }
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
        return s;
    }

    static int threads(Args a) throws UsageException {
        long t = a.integer("threads", Runtime.getRuntime().availableProcessors());
        if (t < 1 || t > 1024) {
            throw new UsageException("--threads must be between 1 and 1024, not " + a.get("threads", ""));
        }
        return (int) t;
    }

    static int run(String[] argv, PrintStream out, PrintStream err) throws Exception {
        Args a = new Args(argv, 1, Set.of("trials", "seed", "threads", "coverage", "format"), Set.of("adaptive"));
        a.expectPositional(1, USAGE);
        String format = a.get("format", "text");
        if (!Set.of("text", "json").contains(format)) {
            throw new UsageException("--format must be text or json, not '" + format + "'");
        }
        String file = a.positional().get(0);
        Budget b = Files.loadBudget(file);
        b = b.withSettings(settings(a, b.settings()));
        int threads = threads(a);
        CompiledModel model;
        GumResult gum;
        try {
            model = b.compile(Engine.library());
            gum = GumEvaluator.evaluate(b, model, b.correlationMatrix(), b.settings());
        } catch (org.quire.engine.model.ModelException e) {
            throw Files.modelProblem(file, e);
        } catch (IllegalArgumentException e) {
            throw new Files.FileProblem(file, e.getMessage());
        }
        MonteCarloSettings ms = BudgetSimulation.settings(b.settings(), gum).withThreads(threads);
        boolean tty = System.console() != null;
        ProgressListener progress = new ProgressListener() {
            private int last = -1;

            @Override
            public void progress(long done, long planned) {
                int pct = planned > 0 ? (int) (100 * done / planned) : 0;
                if (tty && pct / 10 != last) {
                    last = pct / 10;
                    err.printf("\rMonte Carlo: %3d %%", pct);
                }
            }

            @Override
            public boolean cancelRequested() {
                return false;
            }
        };
        MonteCarloOutcome o = BudgetSimulation.run(b, model, gum, ms, progress);
        if (tty) {
            err.print("\r");
        }
        if (format.equals("json")) {
            out.print(BudgetJson.pretty(MonteCarloJson.toJson(o, true)));
            return 0;
        }
        out.print(text(b.title(), o));
        out.println();
        out.println(Cautions.TEXT);
        return 0;
    }

    static String text(String title, MonteCarloOutcome o) {
        MonteCarloResult r = o.result();
        StringBuilder s = new StringBuilder();
        s.append("Budget: ").append(title).append('\n');
        s.append(String.format(Locale.ROOT, "Monte Carlo method (JCGM 101): %d trials, seed %d, p = %s %%%s%n",
                r.trials(), r.seed(), BudgetTableText.g(100 * r.coverageProbability(), 4),
                r.settings().adaptive() ? ", adaptive: " + r.adaptiveRuns() + " runs"
                        + (r.stabilized() ? ", stabilized" : ", NOT stabilized") : ""));
        for (MonteCarloOutcome.Output m : o.outputs()) {
            GumComparison c = m.comparison();
            String unit = m.unit().isEmpty() ? "" : " " + m.unit();
            s.append('\n').append("Output ").append(m.name()).append(unit.isEmpty() ? "" : " /" + unit).append('\n');
            s.append(String.format(Locale.ROOT, "  mean                     %s%n", BudgetTableText.g(m.estimate(), 10)));
            s.append(String.format(Locale.ROOT, "  standard uncertainty     %s%n", m.hasStandardUncertainty()
                    ? BudgetTableText.g(m.standardUncertainty(), 5) : "not defined"));
            s.append(String.format(Locale.ROOT, "  symmetric interval       [%s, %s]%n",
                    BudgetTableText.g(m.symmetricInterval().lower(), 8), BudgetTableText.g(m.symmetricInterval().upper(), 8)));
            s.append(String.format(Locale.ROOT, "  shortest interval        [%s, %s]%n",
                    BudgetTableText.g(m.shortestInterval().lower(), 8), BudgetTableText.g(m.shortestInterval().upper(), 8)));
            s.append(String.format(Locale.ROOT, "  GUM interval             [%s, %s]%n",
                    BudgetTableText.g(m.gumInterval().lower(), 8), BudgetTableText.g(m.gumInterval().upper(), 8)));
            s.append(String.format(Locale.ROOT, "  comparison (JCGM 101 clause 8): %s%n", c.verdict().word()));
            s.append("  ").append(c.reason()).append('\n');
            m.summary().exclusionNote().ifPresent(n -> s.append("  note: ").append(n).append('\n'));
        }
        for (String n : o.notes()) {
            s.append("note: ").append(n).append('\n');
        }
        return s.toString();
    }
}
