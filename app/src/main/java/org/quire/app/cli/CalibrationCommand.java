package org.quire.app.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.stream.IntStream;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Parameters;
import jakarta.json.JsonObject;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.quire.app.common.Cautions;
import org.quire.engine.calibration.AdjustmentResult;
import org.quire.engine.calibration.CalibrationEvaluator;
import org.quire.engine.calibration.CalibrationException;
import org.quire.engine.calibration.CalibrationResult;
import org.quire.engine.calibration.PointConformity;
import org.quire.engine.calibration.PointResult;
import org.quire.engine.calibration.RunResult;
import org.quire.engine.calibration.RunsCsv;
import org.quire.engine.calibration.SeriesResult;
import org.quire.engine.csv.CsvOptions;
import org.quire.engine.csv.CsvReader;
import org.quire.engine.csv.CsvTable;
import org.quire.engine.document.DocumentStore;
import org.quire.engine.document.Template;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.calibration.CalibrationJson;
import org.quire.engine.calibration.CalibrationResultJson;
import org.quire.engine.io.JsonCursor;
import org.quire.engine.model.ModelException;

/**
 * {@code quire calibration build|evaluate|fleet}: a meter's calibration across its range. The engine computes
 * everything ({@link CalibrationEvaluator}); this class reads the files, writes the results and reports user
 * errors with the file and the JSON path or CSV line and column (exit status 2, nothing written).
 * <ul>
 * <li>{@code build METHOD RUNS.csv --job JOB.json -o CAL.json}: a calibration file from the method template, the
 *     rig's runs (one reader for every CSV file: {@link CsvReader}) and the job file (laboratory, customer,
 *     item, declarations, adjustment, CMC, conformity).</li>
 * <li>{@code evaluate CAL.json [--method TEMPLATE] [--format text|json|csv] [-o FILE]}: per run, per point,
 *     adjustment, as found and as left, conformity and CMC findings.</li>
 * <li>{@code fleet METHOD RUNS.csv --job JOB.json -o RESULTS.csv}: many meters' runs in one CSV (a
 *     {@code meter} column), evaluated in parallel; one row per meter and point and one verdict row per
 *     meter.</li>
 * </ul>
 */
@Command(name = "calibration", mixinStandardHelpOptions = true, synopsisSubcommandLabel = "ACTION",
        description = "A meter's calibration across its range: build it from a method template, the rig's runs and "
                + "a job file; evaluate it (per run, per point, adjustment, as found and as left, conformity, CMC); "
                + "evaluate a fleet of meters' runs in one CSV file in parallel.",
        subcommands = {CalibrationCommand.BuildAction.class, CalibrationCommand.EvaluateAction.class,
            CalibrationCommand.FleetAction.class},
        footerHeading = "%nExamples:%n",
        footer = {"  quire calibration build templates/tvfl-emf-gravimetric-calibration-run.json runs.csv --job job.json -o cal.json",
            "  quire calibration evaluate worked-examples/calibration/tarrow-vale-dn80-calibration.json",
            "  quire calibration fleet templates/tvfl-emf-gravimetric-calibration-run.json fleet.csv --job job.json -o results.csv"})
final class CalibrationCommand implements Callable<Integer> {
    @ParentCommand
    QuireCommand quire;

    @Override
    public Integer call() throws UsageException {
        throw new UsageException("say what to do: build, evaluate or fleet (see 'quire calibration --help')");
    }

    /** {@code --separator} and {@code --decimal}: how the runs file is read (detected when not given). */
    static final class CsvChoice {
        @Option(names = "--separator", paramLabel = "SEP",
                description = "comma, semicolon or tab (default: detected from the header)")
        String separator;

        @Option(names = "--decimal", paramLabel = "MARK",
                description = "point or comma (default: detected; a decimal comma only when the file proves it)")
        String decimal;
    }

    @Command(name = "build", mixinStandardHelpOptions = true,
            description = "A calibration file from the method template, the rig's runs (CSV: point, optional phase "
                    + "as-found/as-left, meter, run, constant, and one column per per-run quantity of the method) "
                    + "and the job file (laboratory, customer, item, declarations, adjustment, CMC, conformity).",
            footerHeading = "%nExamples:%n",
            footer = {"  quire calibration build templates/tvfl-emf-gravimetric-calibration-run.json "
                    + "worked-examples/calibration/tarrow-vale-dn80-runs.csv --job worked-examples/calibration/"
                    + "tarrow-vale-dn80-job.json -o cal.json"})
    static final class BuildAction implements Callable<Integer> {
        @ParentCommand
        CalibrationCommand parent;

        @Parameters(index = "0", paramLabel = "METHOD", description = "the method template (one run at one point)")
        String method;

        @Parameters(index = "1", paramLabel = "RUNS.csv", description = "the rig's runs")
        String runs;

        @Option(names = "--job", paramLabel = "JOB.json", required = true, description = "the job file")
        String job;

        @Option(names = {"-o", "--output"}, paramLabel = "CAL.json", required = true,
                description = "the calibration file to write")
        String output;

        @Option(names = "--meter", paramLabel = "ID", description = "the meter to take from a file of several")
        String meter;

        @Mixin
        CsvChoice csv;

        @Override
        public Integer call() throws Exception {
            return build(method, runs, job, output, meter, csv, parent.quire.out);
        }
    }

    @Command(name = "evaluate", mixinStandardHelpOptions = true,
            description = "Evaluates a calibration file: per run, per point (mean, Type A repeatability, budget, U "
                    + "with its own k), covariance of the points, adjustment with the old and new constant, as found "
                    + "and as left, conformity and CMC findings.",
            footerHeading = "%nExamples:%n",
            footer = {"  quire calibration evaluate worked-examples/calibration/tarrow-vale-dn80-calibration.json",
                "  quire calibration evaluate cal.json --format csv -o cal-results.csv"})
    static final class EvaluateAction implements Callable<Integer> {
        @ParentCommand
        CalibrationCommand parent;

        @Parameters(paramLabel = "CAL.json", description = "the calibration file")
        String file;

        @Option(names = "--method", paramLabel = "TEMPLATE",
                description = "the method template (default: the file the calibration names)")
        String method;

        @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
                description = "text, json or csv (default: ${DEFAULT-VALUE})")
        String format;

        @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "write to FILE instead of the screen")
        String output;

        @Override
        public Integer call() throws Exception {
            return evaluate(file, method, format, output, parent.quire.out, parent.quire.engine.library());
        }
    }

    @Command(name = "fleet", mixinStandardHelpOptions = true,
            description = "Many meters' runs in one CSV file (a meter column, optionally a constant column), "
                    + "evaluated in one process in parallel with one job file: one row per meter and point and one "
                    + "verdict row per meter. Exit status 2 when a meter was refused (the others' results are still written).",
            footerHeading = "%nExamples:%n",
            footer = {"  quire calibration fleet templates/tvfl-emf-gravimetric-calibration-run.json fleet.csv "
                    + "--job job.json -o results.csv"})
    static final class FleetAction implements Callable<Integer> {
        @ParentCommand
        CalibrationCommand parent;

        @Parameters(index = "0", paramLabel = "METHOD", description = "the method template")
        String method;

        @Parameters(index = "1", paramLabel = "RUNS.csv", description = "the runs of every meter")
        String runs;

        @Option(names = "--job", paramLabel = "JOB.json", required = true, description = "the job file")
        String job;

        @Option(names = {"-o", "--output"}, paramLabel = "RESULTS.csv", required = true,
                description = "the results file to write")
        String output;

        @Mixin
        CsvChoice csv;

        @Override
        public Integer call() throws Exception {
            return fleet(method, runs, job, output, csv, parent.quire.err, parent.quire.engine.library());
        }
    }

    private static CsvOptions csvOptions(CsvChoice a) throws UsageException {
        CsvOptions o = CsvOptions.defaults();
        if (a.separator != null) {
            String s = a.separator;
            switch (s) {
                case "comma": o = o.withSeparator(CsvOptions.Separator.COMMA); break;
                case "semicolon": o = o.withSeparator(CsvOptions.Separator.SEMICOLON); break;
                case "tab": o = o.withSeparator(CsvOptions.Separator.TAB); break;
                default: throw new UsageException("--separator must be comma, semicolon or tab, not '" + s + "'");
            }
        }
        if (a.decimal != null) {
            String s = a.decimal;
            switch (s) {
                case "point": o = o.withDecimalMark(CsvOptions.DecimalMark.POINT); break;
                case "comma": o = o.withDecimalMark(CsvOptions.DecimalMark.COMMA); break;
                default: throw new UsageException("--decimal must be point or comma, not '" + s + "'");
            }
        }
        return o;
    }

    private static Template method(String name) throws UsageException, Files.FileProblem {
        Path p = Files.path(name);
        if (!java.nio.file.Files.isRegularFile(p)) {
            throw new UsageException("no such method template file: " + name);
        }
        try {
            return CalibrationJson.openMethod(p, "");
        } catch (BudgetFormatException e) {
            throw new Files.FileProblem(name, e.getMessage());
        }
    }

    private static List<RunsCsv.MeterRuns> runs(String name, Template method, CsvOptions o)
            throws UsageException, Files.FileProblem {
        Path p = Files.path(name);
        if (!java.nio.file.Files.isRegularFile(p)) {
            throw new UsageException("no such runs file: " + name);
        }
        try {
            CsvTable t = CsvReader.read(p, o);
            return RunsCsv.read(t, method);
        } catch (BudgetFormatException e) {
            throw new Files.FileProblem(name, e.getMessage().startsWith(p.getFileName().toString())
                    ? e.getMessage().substring(p.getFileName().toString().length()).replaceFirst("^[,:] ?", "")
                    : e.getMessage());
        } catch (IOException e) {
            throw new Files.FileProblem(name, "cannot read the file: " + e.getMessage());
        }
    }

    private static JsonObject job(String name) throws UsageException, Files.FileProblem {
        Path p = Files.path(name);
        if (!java.nio.file.Files.isRegularFile(p)) {
            throw new UsageException("no such job file: " + name);
        }
        try {
            return CalibrationJson.readJob(JsonCursor.root(BudgetJson.parseObject(BudgetJson.readText(p))));
        } catch (BudgetFormatException e) {
            throw new Files.FileProblem(name, e.getMessage());
        } catch (IOException e) {
            throw new Files.FileProblem(name, "cannot read the file: " + e.getMessage());
        }
    }

    /** @return the method file's path relative to the calibration file's folder, with '/' separators */
    private static String relative(Path calibration, Path method) {
        Path dir = calibration.toAbsolutePath().getParent();
        Path m = method.toAbsolutePath().normalize();
        String r = dir == null ? m.toString() : dir.normalize().relativize(m).toString();
        return r.replace('\\', '/');
    }

    private static int build(String methodName, String runsName, String jobName, String outputName, String meter,
            CsvChoice csv, PrintStream out) throws Exception {
        Path target = Files.path(outputName);
        Template method = method(methodName);
        List<RunsCsv.MeterRuns> all = runs(runsName, method, csvOptions(csv));
        RunsCsv.MeterRuns mine;
        if (meter != null) {
            String id = meter;
            mine = all.stream().filter(m -> m.meter().equals(id)).findFirst().orElse(null);
            if (mine == null) {
                throw new Files.FileProblem(runsName, "no runs of meter '" + id + "'");
            }
        } else {
            if (all.size() > 1) {
                throw new Files.FileProblem(runsName, "the file holds the runs of " + all.size() + " meters; choose one "
                        + "with --meter ID, or evaluate them all with 'quire calibration fleet'");
            }
            mine = all.get(0);
        }
        JsonObject job = job(jobName);
        CalibrationJson.Loaded loaded;
        try {
            loaded = CalibrationJson.complete(job, method.origin(), relative(target, Files.path(methodName)),
                    mine.asFound(), mine.asLeft(), mine.constant());
        } catch (BudgetFormatException e) {
            throw new Files.FileProblem(jobName, e.getMessage());
        }
        List<String> undeclared = new ArrayList<>();
        for (String n : method.document().budget().inputNames()) {
            if (!loaded.calibration().declarations().containsKey(n)) {
                undeclared.add(n);
            }
        }
        DocumentStore.writeAtomically(target, CalibrationJson.write(loaded.calibration(), loaded.methodFile())
                .getBytes(StandardCharsets.UTF_8), false);
        int runs = mine.asFound().stream().mapToInt(p -> p.runs().size()).sum();
        out.println("quire calibration: " + mine.asFound().size() + " as-found points (" + runs + " runs)"
                + (mine.asLeft().isEmpty() ? "" : " and " + mine.asLeft().size() + " as-left points") + " of "
                + runsName + " with method " + method.id() + " version " + method.version() + " written to " + target);
        if (!undeclared.isEmpty()) {
            out.println("before it can be evaluated, declare in $.declarations how these inputs behave between flow "
                    + "points (shared, independent or correlated): " + String.join(", ", undeclared));
        }
        return 0;
    }

    private static int evaluate(String name, String methodName, String format, String output, PrintStream out,
            org.quire.engine.model.FunctionLibrary library)
            throws Exception {
        if (!Set.of("text", "json", "csv").contains(format)) {
            throw new UsageException("--format must be text, json or csv, not '" + format + "'");
        }
        Path file = Files.path(name);
        if (!java.nio.file.Files.isRegularFile(file)) {
            throw new UsageException("no such calibration file: " + name);
        }
        CalibrationJson.Loaded loaded;
        Template method;
        try {
            loaded = CalibrationJson.read(file);
            method = methodName != null ? method(methodName) : CalibrationJson.method(file, loaded);
        } catch (BudgetFormatException e) {
            throw new Files.FileProblem(name, e.getMessage());
        }
        CalibrationResult r = evaluate(name, method, loaded, library);
        String text = format.equals("json") ? BudgetJson.pretty(CalibrationResultJson.toJson(r))
                : format.equals("csv") ? csv(r) : text(r);
        if (output != null) {
            DocumentStore.writeAtomically(Files.path(output), text.getBytes(StandardCharsets.UTF_8), false);
        } else {
            out.print(text);
        }
        return 0;
    }

    /**
     * Reads a calibration file and its method (the template the file names) and evaluates it.
     *
     * @throws UsageException when the file does not exist
     * @throws Files.FileProblem naming the file and the JSON path of what is wrong
     */
    static CalibrationResult readAndEvaluate(String name, org.quire.engine.model.FunctionLibrary library)
            throws UsageException, Files.FileProblem, IOException {
        return readAndEvaluateWithFile(name, library).result();
    }

    /**
     * A calibration evaluated, with the method file as the calibration names it (part of its content).
     *
     * @param result the evaluation
     * @param methodFile the method's file as written in the calibration, or null
     */
    record Evaluated(CalibrationResult result, String methodFile) {
    }

    /** As {@link #readAndEvaluate(String, org.quire.engine.model.FunctionLibrary)}, keeping the method file the calibration names. */
    static Evaluated readAndEvaluateWithFile(String name, org.quire.engine.model.FunctionLibrary library)
            throws UsageException, Files.FileProblem, IOException {
        Path file = Files.path(name);
        if (!java.nio.file.Files.isRegularFile(file)) {
            throw new UsageException("no such calibration file: " + name);
        }
        try {
            CalibrationJson.Loaded loaded = CalibrationJson.read(file);
            return new Evaluated(evaluate(name, CalibrationJson.method(file, loaded), loaded, library),
                    loaded.methodFile());
        } catch (BudgetFormatException e) {
            throw new Files.FileProblem(name, e.getMessage());
        }
    }

    private static CalibrationResult evaluate(String name, Template method, CalibrationJson.Loaded loaded,
            org.quire.engine.model.FunctionLibrary library)
            throws Files.FileProblem {
        try {
            return CalibrationEvaluator.of(method, library).evaluate(loaded.calibration());
        } catch (CalibrationException e) {
            throw new Files.FileProblem(name, (e.location().isEmpty() ? "" : "$." + e.location() + ": ") + e.getMessage());
        } catch (ModelException e) {
            throw Files.modelProblem(name, e);
        } catch (IllegalArgumentException e) {
            throw new Files.FileProblem(name, e.getMessage());
        }
    }

    static String g(double v) {
        return FitCommand.g(v);
    }

    private static String f(String pattern, Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }

    static String text(CalibrationResult r) {
        StringBuilder s = new StringBuilder();
        if (!r.calibration().title().isEmpty()) {
            s.append(r.calibration().title()).append("\n");
        }
        s.append("method: ").append(r.methodTitle()).append(" (").append(r.calibration().method().id())
                .append(" version ").append(r.calibration().method().version()).append(")\n");
        s.append("repeatability: ").append(r.calibration().repeatability().text()).append("\n\n");
        series(s, r, r.asFound());
        AdjustmentResult adj = r.adjustment();
        if (adj != null) {
            s.append(f("adjustment (%s):%n", adj.kind().text()));
            String unit = adj.constantUnit().isEmpty() ? "" : " " + adj.constantUnit();
            s.append(f("  %-24s %16s   %16s%n", adj.constantName(), "as found", "as left"));
            s.append(f("  %-24s %16s   %16s%n", "", g(adj.oldConstant()) + unit, g(adj.newConstant()) + unit));
            s.append(f("  u(new constant) = %s%s; indications scale by %s; error removed %s %%%s%n",
                    g(adj.newConstantUncertainty()), unit, g(adj.scale()), g(adj.errorRemoved()),
                    Double.isNaN(adj.errorRemovedUncertainty()) ? "" : " (u = " + g(adj.errorRemovedUncertainty()) + " %)"));
            for (String n : adj.notes()) {
                s.append("  ").append(n).append('\n');
            }
            s.append('\n');
        }
        if (r.asLeft() != null) {
            series(s, r, r.asLeft());
        } else {
            s.append("not adjusted: the as-found results stand as left\n\n");
        }
        if (!r.findings().isEmpty()) {
            s.append("findings:\n");
            for (String x : r.findings()) {
                s.append("  - ").append(x).append('\n');
            }
            s.append('\n');
        }
        s.append(Cautions.TEXT).append('\n');
        return s.toString();
    }

    private static void series(StringBuilder s, CalibrationResult r, SeriesResult ser) {
        s.append(ser.phase().label()).append(":\n");
        s.append(f("  %-8s %5s %12s %12s %10s %10s %8s %6s %10s %8s %10s%n", "point", "row", "flow / " + r.flowUnit(),
                "error / %", "s / %", "u_rep / %", "\u03bd_eff", "k", "U / %", "CMC / %", "reported U"));
        for (PointResult p : ser.points()) {
            for (RunResult run : p.runs()) {
                s.append(f("  %-8s %5s %12s %12.4f%n", "", run.sourceRow() > 0 ? Integer.toString(run.sourceRow()) : "-",
                        g(run.flow()), run.error()));
            }
            s.append(f("  %-8s %5s %12s %12.4f %10s %10s %8s %6s %10.4f %8s %10.4f%s%n", p.label(), "mean",
                    g(p.flow()), p.error(), Double.isNaN(p.runStandardDeviation()) ? "-" : f("%.4f", p.runStandardDeviation()),
                    f("%.4f", p.repeatabilityUncertainty()), org.quire.engine.gum.Figures.dof(p.effectiveDof()), org.quire.engine.gum.Figures.coverageFactor(p.coverageFactor()),
                    p.expandedUncertainty(), Double.isNaN(p.cmc()) ? "-" : f("%.3f", p.cmc()),
                    p.reportedExpandedUncertainty(), p.raisedToCmc() ? "  (at the CMC)" : ""));
        }
        s.append("  correlation of the point errors:\n");
        for (double[] row : ser.correlation()) {
            s.append("   ");
            for (double v : row) {
                s.append(f(" %7s", Double.isNaN(v) ? "-" : f("%.3f", v)));
            }
            s.append('\n');
        }
        if (ser.conformity() != null) {
            s.append(f("  conformity (%s, %s):%n", ser.conformity().limitsName(), ser.conformity().rule().kind().title()));
            s.append(f("  %-8s %12s %10s %10s %10s %8s %-6s %s%n", "point", "flow", "error %", "U %", "MPE %", "p_c",
                    "U<=MPE/" + org.quire.engine.gum.Figures.compact(ser.conformity().points().get(0).uncertaintyRatio(), 4), "decision"));
            for (PointConformity pc : ser.conformity().points()) {
                s.append(f("  %-8s %12s %10.4f %10.4f %10.4f %8.4f %-6s %s%n", pc.label(), g(pc.decision().point().flow()),
                        pc.decision().point().errorPercent(), pc.decision().expandedUncertainty(), pc.mpe(),
                        pc.decision().probabilityOfConformity(), pc.ratioMet() ? "yes" : "NO", pc.decision().decision().label()));
            }
            s.append("  overall: ").append(ser.conformity().overall().label()).append('\n');
            s.append("  ").append(ser.conformity().statement()).append('\n');
        }
        s.append('\n');
    }

    static String csv(CalibrationResult r) throws IOException {
        StringWriter w = new StringWriter();
        try (CSVPrinter p = new CSVPrinter(w, CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get())) {
            p.printRecord("series", "point", "row", "flow", "error", "run_standard_deviation", "repeatability_u",
                    "repeatability_dof", "standard_uncertainty", "effective_dof", "coverage_factor",
                    "expanded_uncertainty", "cmc", "reported_expanded_uncertainty", "raised_to_cmc", "mpe",
                    "probability_of_conformity", "decision", "ratio_met");
            for (SeriesResult ser : r.asLeft() == null ? List.of(r.asFound()) : List.of(r.asFound(), r.asLeft())) {
                for (int i = 0; i < ser.points().size(); i++) {
                    PointResult pt = ser.points().get(i);
                    for (RunResult run : pt.runs()) {
                        p.printRecord(ser.phase().label(), pt.label(), run.sourceRow(), EvaluateCommand.num(run.flow()),
                                EvaluateCommand.num(run.error()), "", "", "", "",
                                "", "", "", "", "", "", "", "", "", "");
                    }
                    PointConformity pc = ser.conformity() == null ? null : ser.conformity().points().get(i);
                    p.printRecord(ser.phase().label(), pt.label(), "mean", EvaluateCommand.num(pt.flow()),
                            EvaluateCommand.num(pt.error()), EvaluateCommand.num(pt.runStandardDeviation()),
                            EvaluateCommand.num(pt.repeatabilityUncertainty()), EvaluateCommand.num(pt.repeatabilityDof()),
                            EvaluateCommand.num(pt.standardUncertainty()), EvaluateCommand.num(pt.effectiveDof()),
                            EvaluateCommand.num(pt.coverageFactor()), EvaluateCommand.num(pt.expandedUncertainty()),
                            EvaluateCommand.num(pt.cmc()), EvaluateCommand.num(pt.reportedExpandedUncertainty()),
                            pt.raisedToCmc(), pc == null ? "" : EvaluateCommand.num(pc.mpe()),
                            pc == null ? "" : EvaluateCommand.num(pc.decision().probabilityOfConformity()),
                            pc == null ? "" : pc.decision().decision().label(), pc == null ? "" : pc.ratioMet());
                }
            }
            AdjustmentResult adj = r.adjustment();
            if (adj != null) {
                p.println();
                p.printRecord("adjustment", "constant", "old_constant", "new_constant", "u_new_constant", "scale",
                        "error_removed", "u_error_removed");
                p.printRecord(adj.kind().word(), adj.constantName(), EvaluateCommand.num(adj.oldConstant()),
                        EvaluateCommand.num(adj.newConstant()), EvaluateCommand.num(adj.newConstantUncertainty()),
                        EvaluateCommand.num(adj.scale()), EvaluateCommand.num(adj.errorRemoved()),
                        EvaluateCommand.num(adj.errorRemovedUncertainty()));
            }
            p.println();
            p.printRecord("finding");
            for (String x : r.findings()) {
                p.printRecord(x);
            }
        }
        return w.toString();
    }

    /** One meter's outcome in a fleet: its result or its error. */
    private record MeterOutcome(String meter, CalibrationResult result, String error) {
    }

    private static int fleet(String methodName, String runsName, String jobName, String outputName, CsvChoice csv,
            PrintStream err, org.quire.engine.model.FunctionLibrary library) throws Exception {
        Path target = Files.path(outputName);
        long started = System.nanoTime();
        Template method = method(methodName);
        List<RunsCsv.MeterRuns> meters = runs(runsName, method, csvOptions(csv));
        JsonObject job = job(jobName);
        CalibrationEvaluator ev;
        try {
            ev = CalibrationEvaluator.of(method, library).withMonteCarloThreads(1);
        } catch (ModelException e) {
            throw Files.modelProblem(methodName, e);
        }
        long read = System.nanoTime();
        MeterOutcome[] outcomes = IntStream.range(0, meters.size()).parallel().mapToObj(i -> {
            RunsCsv.MeterRuns m = meters.get(i);
            try {
                CalibrationJson.Loaded l = CalibrationJson.complete(job, method.origin(), "", m.asFound(), m.asLeft(),
                        m.constant());
                return new MeterOutcome(m.meter(), ev.evaluate(l.calibration()), null);
            } catch (CalibrationException e) {
                return new MeterOutcome(m.meter(), null, (e.location().isEmpty() ? "" : "$." + e.location() + ": ")
                        + e.getMessage());
            } catch (BudgetFormatException | IllegalArgumentException | ModelException e) {
                return new MeterOutcome(m.meter(), null, e.getMessage());
            }
        }).toArray(MeterOutcome[]::new);
        StringWriter w = new StringWriter();
        int failed = 0;
        try (CSVPrinter p = new CSVPrinter(w, CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get())) {
            p.printRecord("meter", "row_kind", "series", "point", "flow", "error", "expanded_uncertainty",
                    "coverage_factor", "reported_expanded_uncertainty", "mpe", "decision", "ratio_met", "verdict",
                    "old_constant", "new_constant", "findings", "problem");
            for (MeterOutcome o : outcomes) {
                if (o.error() != null) {
                    failed++;
                    p.printRecord(o.meter(), "verdict", "", "", "", "", "", "", "", "", "", "", "not evaluated", "", "",
                            "", o.error());
                    continue;
                }
                CalibrationResult r = o.result();
                SeriesResult ser = r.asReturned();
                for (int i = 0; i < ser.points().size(); i++) {
                    PointResult pt = ser.points().get(i);
                    PointConformity pc = ser.conformity() == null ? null : ser.conformity().points().get(i);
                    p.printRecord(o.meter(), "point", ser.phase().label(), pt.label(), EvaluateCommand.num(pt.flow()),
                            EvaluateCommand.num(pt.error()), EvaluateCommand.num(pt.expandedUncertainty()),
                            EvaluateCommand.num(pt.coverageFactor()), EvaluateCommand.num(pt.reportedExpandedUncertainty()),
                            pc == null ? "" : EvaluateCommand.num(pc.mpe()), pc == null ? "" : pc.decision().decision().label(),
                            pc == null ? "" : pc.ratioMet(), "", "", "", "", "");
                }
                String verdict = ser.conformity() == null ? "no conformity specification" : ser.conformity().overall().label();
                p.printRecord(o.meter(), "verdict", ser.phase().label(), "", "", "", "", "", "", "", "", "", verdict,
                        r.adjustment() == null ? EvaluateCommand.num(r.calibration().constant().asFound())
                                : EvaluateCommand.num(r.adjustment().oldConstant()),
                        r.adjustment() == null ? "" : EvaluateCommand.num(r.adjustment().newConstant()),
                        String.join(" | ", r.findings()), "");
            }
        }
        DocumentStore.writeAtomically(target, w.toString().getBytes(StandardCharsets.UTF_8), false);
        long done = System.nanoTime();
        int points = 0;
        for (MeterOutcome o : outcomes) {
            points += o.result() == null ? 0 : o.result().asFound().points().size();
        }
        err.println("quire calibration fleet: " + (meters.size() - failed) + " of " + meters.size() + " meters evaluated ("
                + points + " as-found points) on " + Runtime.getRuntime().availableProcessors() + " cores; results in "
                + target);
        err.println(f("quire calibration fleet: %.2f s in all (reading %.2f s, evaluating and writing %.2f s)",
                (done - started) / 1e9, (read - started) / 1e9, (done - read) / 1e9));
        for (MeterOutcome o : outcomes) {
            if (o.error() != null) {
                err.println(runsName + ": meter '" + o.meter() + "': " + o.error());
            }
        }
        return failed == 0 ? CommandLine.OK : CommandLine.USER_ERROR; // a refused meter is bad input
    }
}
