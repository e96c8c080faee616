package org.quire.app.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.IntStream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.EvaluationSettings;
import org.quire.engine.csv.CsvException;
import org.quire.engine.csv.CsvOptions;
import org.quire.engine.csv.CsvReader;
import org.quire.engine.csv.CsvRow;
import org.quire.engine.csv.CsvTable;
import org.quire.engine.montecarlo.BudgetSimulation;
import org.quire.engine.montecarlo.CoverageInterval;
import org.quire.engine.montecarlo.MonteCarlo;
import org.quire.engine.montecarlo.ProgressListener;
import org.quire.engine.document.DocumentStore;
import org.quire.engine.document.PreparedTemplate;
import org.quire.engine.document.Template;
import org.quire.engine.document.TemplateParameter;
import org.quire.engine.gum.GumResult;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.model.ModelException;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Parameters;

/**
 * {@code quire batch TEMPLATE DATA.csv -o RESULTS.csv}: evaluates a template (GUM) for every row of a CSV
 * file whose columns are named after the template's parameters (an optional {@code id} column is copied
 * through), on all processor cores (with --mc, row after row on one set of Monte Carlo worker threads), and
 * writes per row the estimate, u, k and U of every output and an {@code error} column. A bad row is reported
 * on stderr with its line number and does not stop the others.
 * Exit status 0 when every row was evaluated; 2 when a row was refused (its values are bad input: the other rows'
 * results are still written) or for unusable files or arguments.
 */
@Command(name = "batch", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Evaluate a template (GUM, and with --mc the Monte Carlo method) for every row of a CSV file "
                + "whose columns are named after the template's parameters; an 'id' column is copied through.",
            "Writes per row the estimate, u, k and U of every output and an error column. A bad row is reported "
                + "on stderr with its line number and does not stop the others. Exit status 0 when every row was "
                + "evaluated; 2 when a row was refused (the other rows' results are still written) or for unusable "
                + "files or arguments.",
            "On a terminal a progress line on stderr shows the rate and the time left."},
        footerHeading = "%nExamples:%n",
        footer = {"  quire batch tvfl-volumetric-proving-tank fleet.csv -o results.csv",
            "  quire batch my-template.json fleet.csv -o results.csv --mc --trials 1e5 --seed 3",
            "  quire template list          # the templates and their parameters (the CSV's column names)"})
final class BatchCommand implements Callable<Integer> {
    /** Largest data file read. */
    static final long MAX_CSV_BYTES = 256L * 1024 * 1024;

    @ParentCommand
    QuireCommand quire;

    @Parameters(index = "0", paramLabel = "TEMPLATE", description = "a template file, or the id of a template in the library")
    String templateName;

    @Parameters(index = "1", paramLabel = "DATA.csv", description = "one row of parameter values per meter")
    String dataName;

    @Option(names = {"-o", "--output"}, paramLabel = "RESULTS.csv", required = true, description = "the results file")
    String output;

    @Option(names = "--mc", description = "add the Monte Carlo method (JCGM 101:2008) for every row")
    boolean mc;

    @Mixin
    Options.Trials trials;

    @Mixin
    TemplateCommand.Folders folders;

    @Mixin
    Options.Quiet quiet;

    /** One data row: where it is, its id and its cells by column. */
    private record Row(long line, String id, CsvRow cells) {
    }

    /** One row's result: the output cells, or the error. */
    private record Outcome(List<String> cells, String error) {
    }

    @Override
    public Integer call() throws Exception {
        PrintStream err = quire.err;
        if (!mc && trials.given()) {
            throw new UsageException("--trials and --seed go with --mc");
        }
        Path out = Files.path(output);
        Template template = TemplateCommand.template(templateName, folders.library());
        Budget base = template.document().budget();
        if (mc) {
            base = base.withSettings(trials.apply(base.settings()));
        }
        EvaluationSettings settings = base.settings();
        PreparedTemplate prepared;
        try {
            prepared = PreparedTemplate.of(template, quire.engine.library());
        } catch (ModelException e) {
            throw Files.modelProblem(templateName, e);
        }
        List<Row> rows = readRows(dataName, template);
        int n = rows.size();
        long started = System.nanoTime();
        AtomicInteger done = new AtomicInteger();
        ProgressLine progress = ProgressLine.forTerminal(err, "quire batch", "rows", quiet.quiet);
        info(err, "quire batch: " + n + " rows of " + dataName + " with template " + template.id() + " version "
                + template.version() + " on " + Runtime.getRuntime().availableProcessors() + " cores");
        Outcome[] outcomes;
        // the GUM rows in parallel; with the Monte Carlo method, row after row, each on one set of worker threads
        // and arrays for the whole batch
        IntStream order = mc ? IntStream.range(0, n) : IntStream.range(0, n).parallel();
        MonteCarlo.Workers workers = mc ? MonteCarlo.Workers.of(Runtime.getRuntime().availableProcessors()) : null;
        try {
            outcomes = order.mapToObj(i -> {
                Outcome o = evaluate(prepared, rows.get(i), mc ? settings : null, workers);
                synchronized (err) {
                    int d = done.incrementAndGet();
                    if (o.error() != null) {
                        progress.finish();
                        err.println(dataName + " line " + rows.get(i).line() + ": " + o.error());
                    }
                    progress.progress(d, n);
                }
                return o;
            }).toArray(Outcome[]::new);
        } finally {
            progress.finish();
            if (workers != null) {
                workers.close();
            }
        }
        List<String> header = new ArrayList<>();
        header.add("id");
        for (String o : base.outputNames()) {
            header.addAll(List.of(o + "_estimate", o + "_u", o + "_k", o + "_U"));
            if (mc) {
                header.addAll(List.of(o + "_mc_low", o + "_mc_high", o + "_gum_check"));
            }
        }
        header.add("error");
        StringWriter text = new StringWriter();
        int failed = 0;
        try (CSVPrinter p = new CSVPrinter(text, CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get())) {
            p.printRecord(header);
            for (int i = 0; i < n; i++) {
                List<String> record = new ArrayList<>();
                record.add(rows.get(i).id());
                Outcome o = outcomes[i];
                if (o.error() == null) {
                    record.addAll(o.cells());
                    record.add("");
                } else {
                    failed++;
                    for (int k = 0; k < (mc ? 7 : 4) * base.outputs().size(); k++) {
                        record.add("");
                    }
                    record.add(o.error());
                }
                p.printRecord(record);
            }
        }
        DocumentStore.writeAtomically(out, text.toString().getBytes(StandardCharsets.UTF_8), false);
        double seconds = (System.nanoTime() - started) / 1e9;
        info(err, "quire batch: " + (n - failed) + (n - failed == 1 ? " row" : " rows") + " evaluated, " + failed
                + " failed; results in " + out);
        info(err, String.format(java.util.Locale.ROOT, "quire batch: %.2f s, %.0f rows per second", seconds,
                n / Math.max(seconds, 1e-9)));
        // a refused row is bad input, a user error like any other (the brief: exit status 2 for every user error)
        return failed == 0 ? CommandLine.OK : CommandLine.USER_ERROR;
    }

    /** Prints a line of information, unless --quiet; a row's error is always printed. */
    private void info(PrintStream err, String line) {
        if (!quiet.quiet) {
            err.println(line);
        }
    }

    private static List<Row> readRows(String name, Template template) throws UsageException, Files.FileProblem {
        Path p = Files.path(name);
        CsvTable table;
        try {
            table = CsvReader.read(p, CsvOptions.defaults().withMaxBytes(MAX_CSV_BYTES));
        } catch (NoSuchFileException e) {
            throw new UsageException("no such file: " + name);
        } catch (CsvException e) {
            throw new Files.FileProblem(e);
        } catch (IOException e) {
            throw new Files.FileProblem(name, "cannot read the file: " + e.getMessage());
        }
        checkColumns(table, template);
        List<Row> rows = new ArrayList<>();
        boolean hasId = table.hasColumn("id");
        int n = 0;
        for (CsvRow r : table.rows()) {
            n++;
            String id;
            try {
                id = hasId && !r.isBlank("id") ? r.text("id") : Integer.toString(n);
            } catch (CsvException e) {
                throw new Files.FileProblem(e);
            }
            rows.add(new Row(r.line(), id, r));
        }
        return rows;
    }

    private static void checkColumns(CsvTable table, Template template) throws Files.FileProblem {
        List<String> params = template.parameterNames();
        List<String> columns = table.header();
        List<String> required = new ArrayList<>();
        for (TemplateParameter tp : template.spec().parameters()) {
            if (!tp.hasDefault()) {
                required.add(tp.name());
            }
        }
        try {
            if (columns.size() == 1 && required.size() > 1) {
                table.requireColumns(required.toArray(String[]::new));
            }
            for (int c = 0; c < columns.size(); c++) {
                if (!columns.get(c).equals("id") && !params.contains(columns.get(c))) {
                    throw table.headerProblem(c, "column '" + columns.get(c) + "' is not a parameter of template "
                            + template.id() + "; its parameters are " + String.join(", ", params) + " (and 'id')");
                }
            }
            for (String r : required) {
                if (!columns.contains(r)) {
                    throw table.headerProblem(-1, "parameter '" + r + "' has no default, so the file needs a column '"
                            + r + "'");
                }
            }
        } catch (CsvException e) {
            throw new Files.FileProblem(e);
        }
    }

    /**
     * @param mc the settings for the Monte Carlo method, or null for the GUM only
     * @param workers the Monte Carlo workers of the batch, or null for the GUM only
     */
    private static Outcome evaluate(PreparedTemplate prepared, Row row, EvaluationSettings mc,
            MonteCarlo.Workers workers) {
        Template template = prepared.template();
        Map<String, Double> values = new LinkedHashMap<>();
        Map<String, double[]> readings = new LinkedHashMap<>();
        List<String> header = row.cells().table().header();
        for (int c = 0; c < header.size(); c++) {
            String column = header.get(c);
            try {
                if (column.equals("id") || row.cells().isBlank(c)) {
                    continue;
                }
                org.quire.engine.document.TemplateParameter p = template.spec().parameter(column);
                if (p != null && p.isReadings()) {
                    // the readings of one row: one cell, separated by ';' or tabs, read by the one CSV number rule
                    readings.put(column, org.quire.engine.csv.CsvReadings.parse("line " + row.cells().line()
                            + ", column " + column, row.cells().text(c), org.quire.engine.csv.CsvOptions.defaults()));
                } else {
                    values.put(column, row.cells().number(c));
                }
            } catch (CsvException e) {
                return new Outcome(null, "parameter '" + column + "': " + e.reason());
            }
        }
        org.quire.engine.document.TemplateValues given = org.quire.engine.document.TemplateValues.of(values);
        for (Map.Entry<String, double[]> r : readings.entrySet()) {
            given = given.withReadings(r.getKey(), r.getValue());
        }
        try {
            Budget b = prepared.budgetFor(given);
            GumResult r = prepared.evaluate(b);
            List<String> cells = new ArrayList<>();
            for (OutputResult o : r.outputs()) {
                cells.add(EvaluateCommand.num(o.estimate()));
                cells.add(EvaluateCommand.num(o.standardUncertainty()));
                cells.add(EvaluateCommand.num(o.coverageFactor()));
                cells.add(EvaluateCommand.num(o.expandedUncertainty()));
                if (mc != null) {
                    cells.addAll(List.of("", "", ""));
                }
            }
            if (mc != null) {
                org.quire.engine.montecarlo.MonteCarloOutcome m = BudgetSimulation.run(b, prepared.model(), r,
                        BudgetSimulation.settings(mc, r).withThreads(workers.threads()), ProgressListener.NONE,
                        workers);
                int per = 7;
                for (int k = 0; k < r.outputs().size(); k++) {
                    CoverageInterval ci = m.output(k).symmetricInterval();
                    cells.set(k * per + 4, EvaluateCommand.num(ci.lower()));
                    cells.set(k * per + 5, EvaluateCommand.num(ci.upper()));
                    cells.set(k * per + 6, m.output(k).comparison().verdict().word());
                }
            }
            return new Outcome(cells, null);
        } catch (ModelException e) {
            return new Outcome(null, e.problems().isEmpty() ? String.valueOf(e.getMessage())
                    : e.problems().get(0).message());
        } catch (IllegalArgumentException e) {
            return new Outcome(null, e.getMessage());
        }
    }
}
