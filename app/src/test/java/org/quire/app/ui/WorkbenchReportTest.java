package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.document.BudgetDocument;

/** Budget &gt; Export report: the report carries the document's facts; a failure is reported, not swallowed. */
class WorkbenchReportTest extends GuiTestSupport {
    @TempDir
    Path dir;

    @Test
    void theHtmlReportNamesLaboratoryRevisionStatusAndContentHash() throws Exception {
        BudgetEditor ed = openDemo();
        onEdt(() -> ed.editDocument("Move to in-review", "", d -> d.moveTo(
                org.quire.engine.document.DocumentStatus.IN_REVIEW, "Test Engineer", d.modified(), "ready")));
        Path html = dir.resolve("point-30.html");
        onEdt(() -> { frame.exportReport(ed, html); return null; });
        waitFor("the report", () -> frame.statusText().startsWith("Report written"));
        String text = Files.readString(html);
        BudgetDocument d = ed.document().content();
        assertTrue(text.contains(d.contentHash()), "the SHA-256 content hash of the document");
        assertTrue(text.contains("Tarrow Vale Flow Laboratory") && text.contains("Test Engineer"));
        assertTrue(text.contains("in-review"), "the status");
        Path pdf = dir.resolve("point-30.pdf");
        onEdt(() -> { frame.exportReport(ed, pdf); return null; });
        waitFor("the PDF report", () -> frame.statusText().equals("Report written to " + pdf));
        assertTrue(new String(Files.readAllBytes(pdf), 0, 5, java.nio.charset.StandardCharsets.US_ASCII)
                .equals("%PDF-"), "a PDF file");
    }

    @Test
    void anExportedReportCarriesTheMonteCarloResultsOnceTheyExist() throws Exception {
        BudgetEditor ed = openDemo();
        Path before = dir.resolve("before.html");
        onEdt(() -> { frame.exportReport(ed, before); return null; });
        waitFor("the report", () -> frame.statusText().equals("Report written to " + before));
        String none = Files.readString(before);
        assertTrue(none.contains("was not run for this report"), "no Monte Carlo results before a run");
        onEdt(() -> ed.edit("Fewer trials", "", b -> b.withSettings(b.settings().withTrials(200_000))));
        waitFor("the results of the changed budget", () -> ed.latest() != null && ed.latest().result() != null
                && ed.latest().budget().equals(ed.document().budget()));
        onEdt(() -> { ed.runMonteCarlo(); return null; });
        waitFor("the verdict of E", () -> WorkbenchEditingTest.find(ed, "mcVerdict:E") != null);
        String label = onEdt(() -> ((javax.swing.JLabel) WorkbenchEditingTest.find(ed, "mcVerdict:E")).getText());
        assertFalse(label.contains("d_low") || label.contains("d_high"), "the reason's symbols are typeset: " + label);
        assertTrue(label.contains("<sub>low</sub>"), label);
        Path after = dir.resolve("after.html");
        onEdt(() -> { frame.exportReport(ed, after); return null; });
        waitFor("the report", () -> frame.statusText().equals("Report written to " + after));
        String html = Files.readString(after);
        assertFalse(html.contains("was not run for this report"), "the Monte Carlo results of the run");
        // JCGM 101:2008 7.9 / 8.2: the run's trials, its coverage intervals and the validation of the GUM result
        assertTrue(html.contains("200\u202f000 trials"), "the number of trials of the run");
        assertTrue(html.contains("Validation of the GUM result"), "the comparison table");
        assertFalse(html.contains("d_low =") || html.contains("d_high ="), "no raw symbol names in the reasons");
    }

    @Test
    void aReportThatCannotBeWrittenIsReportedWithItsPlace() throws Exception {
        BudgetEditor ed = openDemo();
        Path blocker = dir.resolve("not-a-folder");
        Files.writeString(blocker, "x");
        Path target = blocker.resolve("point-30.html");
        onEdt(() -> { frame.exportReport(ed, target); return null; });
        String message = takeMessageBox();
        assertTrue(message.startsWith("The report was not written") && message.contains("point-30.html"), message);
        assertFalse(Files.exists(target));
    }
}
