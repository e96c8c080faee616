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
