package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import javax.swing.JTable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.app.ui.document.BudgetDocument;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.budget.Budget;
import org.quire.engine.document.DocumentStore;

/** Saving, closing and reopening budgets, and the read-only review mode. */
class WorkbenchFilesTest extends GuiTestSupport {
    @TempDir
    Path dir;

    @Test
    void savedBudgetReopensUnchangedAndTheCommandLineFormatReadsIt() throws Exception {
        BudgetEditor ed = openDemo();
        onEdt(() -> {
            JTable t = ed.inputsTable();
            t.setValueAt("TVFL balance B2, certificate 2026-01", 0, 8);
            return null;
        });
        Budget edited = ed.document().budget();
        Path file = dir.resolve("point-30.json");
        onEdt(() -> { ed.document().saveTo(file); return null; });
        assertFalse(ed.document().isDirty(), "saving clears the dirty marker");
        try (Stream<Path> left = Files.list(dir)) {
            assertEquals(1, left.count(), "no temporary file is left beside the budget");
        }
        assertEquals(edited, DocumentStore.open(file).budget(), "the saved file holds the edited budget");
        assertEquals(ed.document().content(), DocumentStore.open(file), "and the document's details and history");
        onEdt(() -> { frame.forceClose(ed); return null; });
        assertTrue(frame.editors().isEmpty());
        BudgetEditor again = await(onEdt(() -> frame.open(file))).orElseThrow();
        assertEquals(edited, again.document().budget());
        assertEquals(file.toAbsolutePath(), again.document().file());
        waitForCurrentResult(again);
    }

    @Test
    void reviewCopyRefusesEveryEditAndShowsTheBanner() throws Exception {
        Path file = dir.resolve("review.json");
        BudgetEditor demo = openDemo();
        onEdt(() -> { demo.document().saveTo(file); frame.forceClose(demo); return null; });
        BudgetEditor ed = await(onEdt(() -> frame.open(file, true))).orElseThrow();
        Budget before = ed.document().budget();
        assertTrue(onEdt(() -> WorkbenchEditingTest.find(ed, "reviewBanner").isShowing()), "banner visible");
        assertFalse(onEdt(() -> ed.inputsTable().isCellEditable(0, 3)), "table cells are not editable");
        assertFalse(onEdt(() -> ed.modelEditor().isEditable()), "model text is not editable");
        onEdt(() -> { ed.inputsTable().setValueAt("1", 0, 3); return null; });
        onEdt(() -> { ed.edit("Edit title", "", b -> b.withTitle("changed")); return null; });
        assertTrue(frame.statusText().contains("read-only") || frame.statusText().contains("review"),
                "the refusal is explained: " + frame.statusText());
        assertThrows(BudgetDocument.ReadOnlyException.class,
                () -> onEdt(() -> ed.document().apply("x", "", b -> b.withNotes("x"))));
        onEdt(() -> { ed.document().undo(); return null; });
        assertEquals(before, ed.document().budget(), "nothing changed");
        assertEquals(before, DocumentStore.open(file).budget(), "the file is untouched");
    }
}
