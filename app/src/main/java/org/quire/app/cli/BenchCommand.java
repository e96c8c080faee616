package org.quire.app.cli;

import java.io.InputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.montecarlo.BudgetSimulation;
import org.quire.engine.montecarlo.MonteCarloSettings;
import org.quire.engine.montecarlo.ProgressListener;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;

/**
 * {@code quire bench [--trials N] [--threads T] [--runs R]}: the Monte Carlo benchmark on the Tarrow Vale
 * benchmark budget (13 inputs, 2 outputs). Warm-up runs first, of N trials each, until the best of the last
 * {@value #SETTLE} is no more than 1 % faster than the best before them ({@value #WARM_UP_LEAST} to
 * {@value #WARM_UP_LIMIT} runs), then R timed runs; each timed run covers
 * sampling, model evaluation and the summaries of both outputs (mean, standard deviation, both coverage
 * intervals). The last line gives the median run. With {@code --budget-inputs N}: open, evaluate and save a
 * generated budget of N inputs.
 */
@Command(name = "bench", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Measure Monte Carlo throughput on the Tarrow Vale benchmark budget (13 inputs, 2 outputs): "
                + "warm-up runs of N trials until the times settle (6 to 30 runs), then R timed runs; the last line "
                + "gives the median run as "
                + "trials_per_second=...",
            "With --budget-inputs N: the time to open, evaluate (GUM) and save a generated budget of N inputs."},
        footerHeading = "%nExamples:%n",
        footer = {"  quire bench --trials 2000000", "  quire bench --trials 1e7 --threads 1 --runs 5",
            "  quire bench --budget-inputs 500"})
final class BenchCommand implements Callable<Integer> {
    static final String BUDGET = "tarrow-vale-benchmark.json";
    /** The fewest and the most warm-up runs before the timed ones. */
    static final int WARM_UP_LEAST = 6;
    static final int WARM_UP_LIMIT = 30;
    /** The last runs of the warm-up whose best is compared with the best before them. */
    static final int SETTLE = 3;

    @ParentCommand
    QuireCommand quire;

    @Option(names = "--trials", paramLabel = "N", converter = Options.WholeNumber.class, defaultValue = "2000000",
            description = "Monte Carlo trials per timed run (default: ${DEFAULT-VALUE})")
    long trials;

    @Mixin
    Options.Threads threads;

    @Option(names = "--runs", paramLabel = "R", converter = Options.WholeNumber.class,
            description = "timed runs (1 to 100; default 3, or 5 with --budget-inputs)")
    Long runs;

    @Option(names = "--budget-inputs", paramLabel = "N", converter = Options.WholeNumber.class,
            description = "time open, evaluate and save of a generated budget of N inputs (1 to 5000) instead")
    Long budgetInputs;

    static Budget benchmarkBudget() throws Exception {
        Path local = Path.of("worked-examples", BUDGET);
        if (java.nio.file.Files.isRegularFile(local)) {
            return BudgetJson.read(local);
        }
        try (InputStream in = BenchCommand.class.getResourceAsStream("/worked-examples/" + BUDGET)) {
            if (in == null) {
                throw new UsageException("the benchmark budget " + BUDGET + " is missing from this build");
            }
            return BudgetJson.read(new String(in.readAllBytes(), StandardCharsets.UTF_8));
        }
    }

    @Override
    public Integer call() throws Exception {
        PrintStream out = quire.out;
        if (budgetInputs != null) {
            return documentBench(out);
        }
        if (trials < 1 || trials > MonteCarloSettings.TRIALS_LIMIT) {
            throw new UsageException("--trials must be between 1 and " + MonteCarloSettings.TRIALS_LIMIT + ", not "
                    + trials);
        }
        int threads = this.threads.count();
        long runs = this.runs == null ? 3 : this.runs;
        if (runs < 1 || runs > 100) {
            throw new UsageException("--runs must be between 1 and 100");
        }
        Budget b = benchmarkBudget();
        CompiledModel model = b.compile(quire.engine.library());
        GumResult gum = GumEvaluator.evaluate(b, model, b.correlationMatrix(), b.settings());
        MonteCarloSettings base = BudgetSimulation.settings(b.settings(), gum).withThreads(threads).withTrials(trials);
        // warm-up at the timed size until the just-in-time compiler has done its work: until the best of the last
        // SETTLE runs is no more than 1 % faster than the best of all runs before them (at least WARM_UP_LEAST
        // runs, at most WARM_UP_LIMIT), so that the timed runs measure compiled code and not the compiler's
        // progress; a slow run (a pause, other load) neither ends the warm-up nor holds it back
        List<Double> times = new ArrayList<>();
        while (times.size() < WARM_UP_LIMIT) {
            long t0 = System.nanoTime();
            BudgetSimulation.run(b, model, gum, base.withSeed(times.size() + 1), ProgressListener.NONE);
            times.add((System.nanoTime() - t0) / 1e9);
            int n = times.size();
            if (n >= WARM_UP_LEAST) {
                double before = Collections.min(times.subList(0, n - SETTLE));
                double recent = Collections.min(times.subList(n - SETTLE, n));
                if (recent > 0.99 * before) {
                    break;
                }
            }
        }
        int warmUps = times.size();
        out.printf(Locale.ROOT, "warm-up: %d runs of %d trials%n", warmUps, trials);
        double[] seconds = new double[(int) runs];
        for (int r = 0; r < runs; r++) {
            long t0 = System.nanoTime();
            org.quire.engine.montecarlo.MonteCarloOutcome o = BudgetSimulation.run(b, model, gum,
                    base.withSeed(100 + r), ProgressListener.NONE);
            seconds[r] = (System.nanoTime() - t0) / 1e9;
            out.printf(Locale.ROOT, "run %d: %.3f s, u(E) = %.5g %%, u(q) = %.5g m^3/h%n", r + 1, seconds[r],
                    o.result().output(0).standardUncertainty(), o.result().output(1).standardUncertainty());
        }
        double[] sorted = seconds.clone();
        Arrays.sort(sorted);
        double median = sorted[sorted.length / 2];
        out.printf(Locale.ROOT, "trials_per_second=%.0f seconds=%.4f trials=%d threads=%d%n", trials / median, median,
                trials, threads);
        return 0;
    }

    /** @return one round of the document benchmark: open, evaluate and save in ms, and u_c of the first output */
    private double[] documentRound(Path file) throws Exception {
        long t0 = System.nanoTime();
        org.quire.engine.document.BudgetDocument d = org.quire.engine.document.DocumentStore.open(file);
        long t1 = System.nanoTime();
        GumResult g = GumEvaluator.evaluate(d.budget(), quire.engine.library());
        long t2 = System.nanoTime();
        org.quire.engine.document.DocumentStore.save(d.withResults(org.quire.engine.document.ResultSnapshot.of(
                org.quire.engine.io.ResultJson.toJson(d.budget().title(), g), java.time.Instant.now())), file);
        long t3 = System.nanoTime();
        return new double[] {(t1 - t0) / 1e6, (t2 - t1) / 1e6, (t3 - t2) / 1e6,
            g.outputs().get(0).standardUncertainty()};
    }

    /**
     * Opens, evaluates (GUM) and saves a generated budget of N inputs, R times after warm-up rounds that end when
     * the evaluation time settles ({@value #WARM_UP_LEAST} to {@value #WARM_UP_LIMIT} rounds); prints
     * the median of each step and, last, {@code open_ms=.. evaluate_ms=.. save_ms=.. first_evaluate_ms=..
     * inputs=N}, where {@code first_evaluate_ms} is the first GUM evaluation in this JVM (cold: class loading
     * and interpretation included).
     */
    private int documentBench(PrintStream out) throws Exception {
        long n = budgetInputs;
        if (n < 1 || n > 5000) {
            throw new UsageException("--budget-inputs must be between 1 and 5000");
        }
        long runs = this.runs == null ? 5 : this.runs;
        if (runs < 1 || runs > 100) {
            throw new UsageException("--runs must be between 1 and 100");
        }
        Path dir = java.nio.file.Files.createTempDirectory("quire-bench");
        Path file = dir.resolve("large.json");
        try {
            org.quire.engine.document.BudgetDocument doc = org.quire.engine.document.BudgetDocument.newDraft(
                    LargeBudget.of((int) n), "bench", java.time.Instant.now());
            org.quire.engine.document.DocumentStore.save(doc, file);
            double[][] ms = new double[3][(int) runs];
            // warm-up rounds first, as for the Monte Carlo benchmark: until the best evaluation of the last SETTLE
            // rounds is within 5 % of the best before them (at least WARM_UP_LEAST, at most WARM_UP_LIMIT); the
            // first evaluation in this JVM is reported apart (first_evaluate_ms)
            List<Double> warm = new ArrayList<>();
            while (warm.size() < WARM_UP_LIMIT) {
                int k = warm.size();
                if (k >= WARM_UP_LEAST && Collections.min(warm.subList(k - SETTLE, k))
                        > 0.95 * Collections.min(warm.subList(0, k - SETTLE))) {
                    break;
                }
                warm.add(documentRound(file)[1]);
            }
            double first = warm.get(0);
            out.printf(Locale.ROOT, "warm-up: %d rounds%n", warm.size());
            for (int r = 0; r < runs; r++) {
                double[] t = documentRound(file);
                for (int k = 0; k < 3; k++) {
                    ms[k][r] = t[k];
                }
                out.printf(Locale.ROOT, "run %d: open %.1f ms, evaluate %.1f ms, save %.1f ms (u_c(E) = %.4g %%)%n",
                        r + 1, t[0], t[1], t[2], t[3]);
            }
            double[] median = new double[3];
            for (int k = 0; k < 3; k++) {
                double[] s = ms[k].clone();
                Arrays.sort(s);
                median[k] = s[s.length / 2];
            }
            out.printf(Locale.ROOT, "open_ms=%.1f evaluate_ms=%.1f save_ms=%.1f first_evaluate_ms=%.1f inputs=%d%n",
                    median[0], median[1], median[2], first, n);
            return 0;
        } finally {
            for (Path p : java.nio.file.Files.list(dir).toArray(Path[]::new)) {
                java.nio.file.Files.deleteIfExists(p);
            }
            java.nio.file.Files.deleteIfExists(dir);
        }
    }
}
