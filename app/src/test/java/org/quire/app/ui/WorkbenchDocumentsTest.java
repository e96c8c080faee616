package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.EventQueue;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JTable;
import javax.swing.JTextField;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStatus;
import org.quire.engine.document.DocumentStore;

/** Budget documents in the workbench: saving through the document store, details and status, recovery copies. */
class WorkbenchDocumentsTest extends GuiTestSupport {
    @TempDir
    Path dir;

    @Test
    void saveToAnUnwritablePlaceShowsWhyAndKeepsTheBudgetOpenAndChanged() throws Exception {
        BudgetEditor ed = openDemo();
        onEdt(() -> ed.edit("Edit notes", "", b -> b.withNotes("changed before a failed save")));
        Path blocker = dir.resolve("not-a-folder");
        Files.writeString(blocker, "a regular file where a folder should be");
        Path target = blocker.resolve("point-30.json");
        AtomicReference<Boolean> saved = new AtomicReference<>();
        EventQueue.invokeLater(() -> frame.saveTo(ed, target).thenAccept(saved::set));
        String message = takeMessageBox();
        assertTrue(message.startsWith("The budget was not saved"), message);
        assertTrue(message.contains("point-30.json") && message.contains("not-a-folder"),
                "the message names the file and the folder: " + message);
        waitFor("the save to return", () -> saved.get() != null);
        assertFalse(saved.get());
        assertTrue(ed.document().isDirty(), "the budget is still marked as changed");
        assertNull(ed.document().file(), "the budget did not take the unwritable file as its own");
        assertEquals(List.of(ed), frame.editors(), "the budget is still open");
        assertEquals("changed before a failed save", ed.document().budget().notes());
        assertTrue(frame.statusText().contains("not saved"), frame.statusText());
    }

    @Test
    void savingKeepsThePreviousVersionAsBackupAndWritesFormatVersion2() throws Exception {
        BudgetEditor ed = openDemo();
        Path file = dir.resolve("point-30.json");
        assertTrue(await(onEdt(() -> frame.saveTo(ed, file))));
        onEdt(() -> ed.edit("Edit notes", "", b -> b.withNotes("second version")));
        assertTrue(await(onEdt(() -> frame.saveTo(ed, file))));
        assertTrue(Files.readString(file).contains("\"formatVersion\": 2"), "the file is of format version 2");
        assertEquals("second version", DocumentStore.open(file).budget().notes());
        assertTrue(Files.exists(DocumentStore.backupOf(file)), "NAME.bak is kept");
        assertFalse(DocumentStore.open(DocumentStore.backupOf(file)).budget().notes().equals("second version"),
                "the backup holds the previous version");
    }

    @Test
    void detailsAreEditedInThePurposeSectionAndStatusMovesOnlyAsTheReviewCycleAllows() throws Exception {
        BudgetEditor ed = openDemo();
        onEdt(() -> {
            JTextField dut = named(ed, "deviceUnderTest");
            dut.setText("TV-EM-100-07");
            return null;
        });
        assertEquals("TV-EM-100-07", ed.document().content().deviceUnderTest());
        assertEquals("Tarrow Vale Flow Laboratory", ed.document().content().laboratory());
        @SuppressWarnings("unchecked")
        JComboBox<DocumentStatus> status = onEdt(() -> named(ed, "status"));
        List<DocumentStatus> offered = onEdt(() -> {
            List<DocumentStatus> l = new java.util.ArrayList<>();
            for (int i = 0; i < status.getItemCount(); i++) {
                l.add(status.getItemAt(i));
            }
            return l;
        });
        assertEquals(List.of(DocumentStatus.DRAFT, DocumentStatus.IN_REVIEW, DocumentStatus.WITHDRAWN), offered,
                "a draft can go to review or be withdrawn, nothing else");
        onEdt(() -> { status.setSelectedItem(DocumentStatus.IN_REVIEW); return null; });
        assertEquals(DocumentStatus.IN_REVIEW, ed.document().content().status());
        List<DocumentStatus> inReview = onEdt(() -> {
            List<DocumentStatus> l = new java.util.ArrayList<>();
            for (int i = 0; i < status.getItemCount(); i++) {
                l.add(status.getItemAt(i));
            }
            return l;
        });
        assertTrue(!inReview.contains(DocumentStatus.APPROVED), "approval is the assessor's, in review mode: " + inReview);
        onEdt(() -> ed.document().applyToDocument("Approve", null,
                d -> d.moveTo(DocumentStatus.APPROVED, "Test Engineer", ed.document().now(), "checked")));
        BudgetDocument approved = ed.document().content();
        assertEquals(DocumentStatus.APPROVED, approved.status());
        assertEquals("Test Engineer", approved.history().get(approved.history().size() - 1).by());
        onEdt(() -> ed.edit("Edit notes", "", b -> b.withNotes("after approval")));
        assertEquals(DocumentStatus.DRAFT, ed.document().content().status(), "an edit opens a new draft");
        assertEquals(2, ed.document().content().revision());
        onEdt(() -> { ed.document().undo(); return null; });
        assertEquals(approved, ed.document().content(), "undo brings the approved revision back");
        assertTrue(onEdt(() -> ((JTextField) named(ed, "title")).isEditable()));
    }

    @Test
    void aChangedBudgetIsKeptForRecoveryAndOfferedAfterARestart() throws Exception {
        Path file = dir.resolve("kept.json");
        BudgetEditor demo = openDemo();
        assertTrue(await(onEdt(() -> frame.saveTo(demo, file))));
        onEdt(() -> { frame.forceClose(demo); return null; });
        node.putInt("autosaveMinutes", 1);
        WorkbenchFrame first = newFrameOnSamePreferences();
        BudgetEditor ed = await(onEdt(() -> first.open(file))).orElseThrow();
        onEdt(() -> ed.edit("Edit notes", "", b -> b.withNotes("work not saved when the power went")));
        assertEquals(1, (int) onEdt(() -> first.recovery().flush()).get(10, java.util.concurrent.TimeUnit.SECONDS), "one copy written");
        assertEquals(1, recoveryCopies(), "the copy is in the recovery folder");
        onEdt(() -> { first.dispose(); return null; });
        first.recoveryClosed().get(10, java.util.concurrent.TimeUnit.SECONDS); // written and released off the event thread

        WorkbenchFrame second = newFrameOnSamePreferences();
        try {
            EventQueue.invokeLater(second::offerRecovery);
            RecoveryDialog dlg = waitForWindow("recovery", RecoveryDialog.class);
            JTable copies = dlg.table();
            assertEquals(1, (int) onEdt(copies::getRowCount));
            assertEquals(file.toAbsolutePath().toString(), onEdt(() -> copies.getValueAt(0, 1)));
            assertNotNull(onEdt(() -> copies.getValueAt(0, 2)), "the time it was kept is listed");
            onEdt(() -> { ((JButton) named(dlg.getContentPane(), "restore")).doClick(); return null; });
            waitFor("the restored budget", () -> second.editors().size() == 1);
            BudgetEditor restored = second.editors().get(0);
            assertEquals("work not saved when the power went", restored.document().budget().notes());
            assertEquals(file.toAbsolutePath(), restored.document().file(), "it belongs to its file again");
            assertTrue(restored.document().isDirty(), "and is marked as changed");
            assertTrue(await(onEdt(() -> second.saveTo(restored, file))));
            // the copy is removed on the autosave thread, off the event thread: wait for it, at most 10 s
            long until = System.nanoTime() + java.util.concurrent.TimeUnit.SECONDS.toNanos(10);
            while (recoveryCopies() != 0 && System.nanoTime() < until) {
                Thread.sleep(20);
            }
            assertEquals(0, recoveryCopies(), "saving removes the copy");
            assertEquals("work not saved when the power went", DocumentStore.open(file).budget().notes());
        } finally {
            onEdt(() -> {
                for (BudgetEditor e : second.editors()) {
                    second.forceClose(e);
                }
                second.dispose();
                return null;
            });
        }
    }
}
