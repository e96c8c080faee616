package org.quire.app.cli;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import org.quire.app.compare.BudgetComparison;
import org.quire.app.compare.Comparison;
import org.quire.app.compare.ComparisonSection;
import org.quire.app.report.CalibrationReport;
import org.quire.app.report.CalibrationSections;
import org.quire.app.report.CsvTables;
import org.quire.app.report.DocumentInfo;
import org.quire.app.report.HtmlReport;
import org.quire.app.report.PdfReport;
import org.quire.app.report.ReportBuilder;
import org.quire.app.report.ReportInput;
import org.quire.app.report.ReportModel;
import org.quire.app.report.ReportSection;
import org.quire.engine.budget.Budget;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.gum.GumEvaluator;
import org.quire.engine.gum.GumResult;
import org.quire.engine.model.CompiledModel;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Parameters;

/**
 * {@code quire report FILE [-o OUT.pdf|OUT.html] [--csv DIR] [--mc [--trials N] [--seed S]] [--laboratory T]
 * [--author T] [--device T] [--date YYYY-MM-DD] [--against EARLIER]}: the report of a budget document as PDF or HTML
 * (by the output's extension) and/or every table of it as CSV files in a folder. The header shows the document's
 * laboratory, device under test, author, revision, status and content hash, and the report ends with its
 * revision history; calibration lines, flow range and conformity decisions are added when the budget has them;
 * {@code --mc} adds the Monte Carlo method. {@code --laboratory}, {@code --author} and {@code --device} fill those
 * fields for a file of format version 1, which does not record them. Files are written whole or not at all.
 *
 * <p>The Monte Carlo method runs only when asked for with {@code --mc}: a budget's settings always carry a number of
 * trials and a seed, so they cannot tell whether the author wanted it, and a million trials of a large model take
 * long enough that a report should not start them unasked.
 */
@Command(name = "report", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"The report of a budget as PDF or HTML (by the file name's extension), and/or every table of "
                + "it as one CSV file each in a folder.",
            "The header shows the document's laboratory, device under test, author, revision, status and content "
                + "hash; calibration lines, flow range and conformity are added when the budget has them; --mc adds "
                + "the Monte Carlo method (JCGM 101), --against the changes from an earlier budget.",
            "Files are written whole or not at all."},
        footerHeading = "%nExamples:%n",
        footer = {"  quire report budget.json -o report.pdf",
            "  quire report budget.json -o report.html --mc --trials 1e6 --seed 11",
            "  quire report budget.json --csv tables/ --against budget-2025.json"})
final class ReportCommand implements Callable<Integer> {
    @ParentCommand
    QuireCommand quire;

    @Parameters(paramLabel = "FILE", description = "the budget file (JSON)")
    String file;

    @Option(names = {"-o", "--output"}, paramLabel = "OUT", description = "the report file, ending in .pdf or .html")
    String output;

    @Option(names = "--csv", paramLabel = "DIR", description = "write every table as a CSV file into this folder")
    String csv;

    @Option(names = "--mc", description = "add the Monte Carlo method (JCGM 101:2008)")
    boolean mc;

    @Mixin
    Options.Trials trials;

    @Option(names = "--laboratory", paramLabel = "TEXT", description = "the laboratory, for a file of format version 1")
    String laboratory;

    @Option(names = "--author", paramLabel = "TEXT", description = "the author, for a file of format version 1")
    String author;

    @Option(names = "--device", paramLabel = "TEXT",
            description = "the device under test, for a file of format version 1")
    String device;

    @Option(names = "--date", paramLabel = "YYYY-MM-DD", converter = Options.IsoDate.class,
            description = "the report's date (default: today)")
    LocalDate date;

    @Option(names = "--against", paramLabel = "EARLIER.json", description = "add the changes from this earlier budget")
    String against;

    @Option(names = "--with-guidance", description = "add the notes on the inputs (a template's guidance for the "
            + "author) as an appendix; they are never in the report's body")
    boolean withGuidance;

    @Override
    public Integer call() throws Exception {
        PrintStream out = quire.out;
        if (!mc && trials.given()) {
            throw new UsageException("--trials and --seed set the Monte Carlo run; give --mc too");
        }
        if (output == null && csv == null) {
            throw new UsageException("say where the report goes: -o OUT.pdf, -o OUT.html or --csv DIR");
        }
        String format = null;
        Path target = null;
        if (output != null) {
            target = Files.path(output);
            String name = target.getFileName() == null ? "" : target.getFileName().toString().toLowerCase(Locale.ROOT);
            if (name.endsWith(".pdf")) {
                format = "pdf";
            } else if (name.endsWith(".html") || name.endsWith(".htm")) {
                format = "html";
            } else {
                throw new UsageException("the report's file name must end in .pdf or .html, not '" + target
                        + "' (for CSV tables use --csv DIR)");
            }
        }
        Path csvDir = csv != null ? Files.path(csv) : null;
        if (csvDir != null && !java.nio.file.Files.isDirectory(csvDir)) {
            throw new UsageException("--csv needs an existing folder; " + csvDir + " is not one");
        }
        LocalDate date = this.date == null ? LocalDate.now() : this.date;
        if (Files.isCalibration(file)) {
            return calibration(target, format, csvDir, date, out);
        }
        BudgetDocument document = Files.loadDocument(file);
        Budget b = document.budget();
        GumResult r;
        CompiledModel model;
        List<ReportSection> sections;
        try {
            model = b.compile(quire.engine.library());
            r = GumEvaluator.evaluate(b, model, b.correlationMatrix(), b.settings());
            sections = CalibrationSections.of(b, quire.engine.library());
        } catch (org.quire.engine.model.ModelException e) {
            throw Files.modelProblem(file, e);
        } catch (IllegalArgumentException e) {
            throw new Files.FileProblem(file, e.getMessage());
        }
        DocumentInfo doc = DocumentInfo.of(document, date);
        if (document.migratedFrom() == 1) {
            if (laboratory != null) {
                doc = doc.withLaboratory(laboratory);
            }
            if (author != null) {
                doc = doc.withAuthor(author);
            }
            if (device != null) {
                doc = doc.withDeviceUnderTest(device);
            }
        } else {
            String[][] given = {{"laboratory", laboratory}, {"author", author}, {"device", device}};
            for (String[] o : given) {
                if (o[1] != null) {
                    throw new UsageException("--" + o[0] + " fills a field that a file of format version 1 lacks; " + file
                            + " is a budget document that records it, and its content hash covers it: change it in "
                            + "the document");
                }
            }
        }
        ReportInput input = ReportInput.of(b, r, doc, quire.engine.library()).withAuthorNotes(withGuidance);
        for (ReportSection s : sections) {
            input = input.withSection(s);
        }
        if (mc) {
            input = input.withMonteCarlo(ReviewCommand.monteCarlo(trials, file, b, model, r));
        }
        if (against != null) {
            String earlier = against;
            Comparison c = BudgetComparison.compare(Files.loadDocument(earlier).budget(), b, quire.engine.library());
            input = input.withSection(ComparisonSection.of(c, shortName(earlier), shortName(file)));
        }
        write(ReportBuilder.build(input), target, format, csvDir, out);
        return 0;
    }

    /** The report of a calibration file: every point's budget, the correlation of the points, the certificate's figures. */
    private int calibration(Path target, String format, Path csvDir, LocalDate date, PrintStream out) throws Exception {
        String[][] budgetOnly = {{"--mc", mc ? "" : null}, {"--laboratory", laboratory}, {"--author", author},
            {"--device", device}, {"--against", against}};
        for (String[] o : budgetOnly) {
            if (o[1] != null) {
                throw new UsageException(o[0] + " is for a budget; " + file + " is a calibration file"
                        + (o[0].equals("--mc") ? ", which states its Monte Carlo run in $.monteCarlo"
                        : ", which records its own laboratory, author and item"));
            }
        }
        CalibrationCommand.Evaluated e = CalibrationCommand.readAndEvaluateWithFile(file, quire.engine.library());
        DocumentInfo doc = CalibrationReport.documentInfo(e.result().calibration(), e.methodFile(), date);
        write(CalibrationReport.build(e.result(), doc, withGuidance, quire.engine.library()), target, format, csvDir, out);
        return 0;
    }

    private static void write(ReportModel m, Path target, String format, Path csvDir, PrintStream out)
            throws IOException {
        if (target != null) {
            byte[] bytes;
            if (format.equals("pdf")) {
                ByteArrayOutputStream buf = new ByteArrayOutputStream(64 * 1024);
                PdfReport.render(m, buf);
                bytes = buf.toByteArray();
            } else {
                bytes = HtmlReport.render(m).getBytes(StandardCharsets.UTF_8);
            }
            write(target, bytes);
            out.println("wrote " + target);
        }
        if (csvDir != null) {
            List<Path> files;
            try {
                files = CsvTables.write(m, csvDir);
            } catch (IOException e) {
                throw new IOException(e.getMessage(), e);
            }
            out.println("wrote " + files.size() + " CSV tables to " + csvDir);
        }
    }

    private static String shortName(String file) {
        Path p = Path.of(file).getFileName();
        return p == null ? file : p.toString();
    }

    private static void write(Path target, byte[] bytes) throws IOException {
        org.quire.engine.document.DocumentStore.writeAtomically(target, o -> o.write(bytes));
    }
}
