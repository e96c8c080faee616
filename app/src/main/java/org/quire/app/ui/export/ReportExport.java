package org.quire.app.ui.export;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Locale;
import org.quire.app.report.DocumentInfo;
import org.quire.app.report.HtmlReport;
import org.quire.app.report.PdfReport;
import org.quire.app.report.ReportBuilder;
import org.quire.app.report.ReportInput;
import org.quire.engine.montecarlo.MonteCarloOutcome;
import org.quire.app.report.ReportModel;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.gum.GumResult;

/**
 * Budget &gt; Export report: the report of the present budget and its GUM result, with the document's facts
 * (laboratory, device under test, author, revision, status, the SHA-256 content hash and the revision history),
 * as PDF or HTML chosen by the file's extension, written whole or not at all.
 *
 * <p>No user-interface imports. Stateless and thread-safe; the workbench runs it off the event thread.
 */
public final class ReportExport {
    /** The hash algorithm of {@link BudgetDocument#contentHash()}. */
    public static final String HASH_ALGORITHM = "SHA-256";

    private ReportExport() {
    }

    /** The report's format, from the file name. */
    public enum Format { PDF, HTML }

    /**
     * @return the format the file name asks for
     * @throws IllegalArgumentException when the name ends in neither .pdf nor .html/.htm
     */
    public static Format formatOf(Path target) {
        String n = String.valueOf(target.getFileName()).toLowerCase(Locale.ROOT);
        if (n.endsWith(".pdf")) {
            return Format.PDF;
        }
        if (n.endsWith(".html") || n.endsWith(".htm")) {
            return Format.HTML;
        }
        throw new IllegalArgumentException("a report's file name must end in .pdf or .html, not '"
                + target.getFileName() + "'");
    }

    /** @return the header facts of the document as a report prints them, dated {@code date} */
    public static DocumentInfo info(BudgetDocument doc, LocalDate date) {
        return DocumentInfo.of(doc, date);
    }

    /**
     * Writes the report of {@code doc}.
     *
     * @param gum the GUM result of {@code doc}'s budget
     * @param monteCarlo the Monte Carlo outcome of that same budget from the workbench's last run, or null when it
     *     was not run (the report then says so)
     * @param library the function set {@code gum} was evaluated with
     * @throws IOException naming the file when it cannot be written
     * @throws IllegalArgumentException when the file name ends in neither .pdf nor .html
     */
    public static void write(BudgetDocument doc, GumResult gum, MonteCarloOutcome monteCarlo, Path target,
            LocalDate date, org.quire.engine.model.FunctionLibrary library) throws IOException {
        Format f = formatOf(target);
        ReportInput in = ReportInput.of(doc.budget(), gum, info(doc, date), library);
        if (monteCarlo != null) {
            in = in.withMonteCarlo(monteCarlo);
        }
        ReportModel m = ReportBuilder.build(in);
        if (f == Format.PDF) {
            org.quire.engine.document.DocumentStore.writeAtomically(target, out -> PdfReport.render(m, out));
        } else {
            byte[] html = HtmlReport.render(m).getBytes(StandardCharsets.UTF_8);
            org.quire.engine.document.DocumentStore.writeAtomically(target, out -> out.write(html));
        }
    }
}
