package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JRadioButton;
import javax.swing.JTable;
import javax.swing.JTextField;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.app.review.Mark;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStatus;
import org.quire.engine.document.DocumentStore;
import org.quire.engine.document.RevisionEntry;

/** The assessor's review of a budget opened read-only: checklist, marks, comments and the recorded decision. */
class WorkbenchReviewTest extends GuiTestSupport {
    @TempDir
    Path dir;

    /** Saves the demo budget to a file and opens that file for review. */
    private BudgetEditor openForReview(Path file) throws Exception {
        BudgetEditor demo = openDemo();
        assertTrue(await(onEdt(() -> frame.saveTo(demo, file))));
        onEdt(() -> { frame.forceClose(demo); return null; });
        BudgetEditor ed = await(onEdt(() -> frame.open(file, true))).orElseThrow();
        waitForCurrentResult(ed);
        JTable checklist = onEdt(() -> named(ed, "checklist"));
        waitFor("the automatic checklist", () -> checklist.getRowCount() > 0);
        return ed;
    }

    private static void markAll(JTable checklist, Mark mark) {
        for (int r = 0; r < checklist.getRowCount(); r++) {
            checklist.setValueAt(mark.label(), r, 3);
        }
    }

    @Test
    void anEndorsementMovesTheDocumentThroughReviewToApprovedInTheHistoryAndTheFile() throws Exception {
        Path file = dir.resolve("point-30.json");
        BudgetEditor ed = openForReview(file);
        String reviewed = ed.document().content().contentHash();
        onEdt(() -> {
            JTable checklist = named(ed, "checklist");
            assertTrue(checklist.isShowing(), "the review section is shown on a review copy");
            markAll(checklist, Mark.AGREED);
            checklist.setValueAt("checked against the balance certificate", 0, 4);
            ((JComboBox<?>) named(ed, "commentInput")).setSelectedItem("I_net");
            ((JTextField) named(ed, "commentText")).setText("mean of five runs; fine");
            ((JButton) named(ed, "addComment")).doClick();
            ((JTextField) named(ed, "assessor")).setText("Morwenna Hale");
            ((JTextField) named(ed, "decisionDate")).setText("2026-02-03");
            ((JButton) named(ed, "recordDecision")).doClick();
            return null;
        });
        String outcome = onEdt(() -> ((JLabel) named(ed, "decisionOutcome")).getText());
        assertTrue(outcome.startsWith("Endorsed by Morwenna Hale on 2026-02-03"), outcome);
        BudgetDocument d = ed.document().content();
        assertEquals(DocumentStatus.APPROVED, d.status());
        List<RevisionEntry> h = d.history();
        assertEquals(DocumentStatus.IN_REVIEW, h.get(h.size() - 2).status());
        RevisionEntry approval = h.get(h.size() - 1);
        assertEquals("Morwenna Hale", approval.by());
        assertEquals(reviewed, approval.contentHash(), "the approval records the hash of the content reviewed");
        assertTrue(approval.comment().contains("endorsed by Morwenna Hale on 2026-02-03"), approval.comment());
        assertTrue(approval.comment().contains("input I_net: mean of five runs; fine"), approval.comment());
        assertEquals(d, DocumentStore.open(file), "the decided document is saved to its file");
        assertTrue(DocumentStore.open(file).approvalIntact());
        assertTrue(Files.exists(DocumentStore.backupOf(file)), "the undecided version is kept as backup");
        assertTrue(!ed.document().isDirty() && ed.document().isReadOnly(), "saved, still a review copy");
    }

    @Test
    void sendingBackRecordsTheReasonAndFindingsAndLeavesADraft() throws Exception {
        Path file = dir.resolve("point-31.json");
        BudgetEditor ed = openForReview(file);
        onEdt(() -> {
            JTable checklist = named(ed, "checklist");
            markAll(checklist, Mark.AGREED);
            checklist.setValueAt(Mark.FINDING.label(), 0, 3);
            checklist.setValueAt("balance certificate number missing", 0, 4);
            ((JButton) named(ed, "recordDecision")).doClick();
            return null;
        });
        String refusal = onEdt(() -> ((JLabel) named(ed, "decisionOutcome")).getText());
        assertTrue(refusal.contains("cannot endorse while items are marked as findings"), refusal);
        assertEquals(DocumentStatus.DRAFT, ed.document().content().status(), "nothing recorded");
        assertTrue(ed.document().content().history().isEmpty());
        onEdt(() -> {
            ((JRadioButton) named(ed, "sendBack")).setSelected(true);
            ((JTextField) named(ed, "reason")).setText("state the balance certificate");
            ((JTextField) named(ed, "assessor")).setText("Morwenna Hale");
            ((JButton) named(ed, "recordDecision")).doClick();
            return null;
        });
        BudgetDocument saved = DocumentStore.open(file);
        assertEquals(DocumentStatus.DRAFT, saved.status());
        RevisionEntry back = saved.history().get(saved.history().size() - 1);
        assertEquals(DocumentStatus.DRAFT, back.status());
        assertEquals("Morwenna Hale", back.by());
        assertTrue(back.comment().contains("sent back by Morwenna Hale")
                && back.comment().contains("state the balance certificate")
                && back.comment().contains("Findings: sources (balance certificate number missing)"), back.comment());
    }

    @Test
    void theWorkbenchFollowsTheEnginesRulesForAnApprovedDocumentAndForTheAuthor() throws Exception {
        // the rules are the engine's (ReviewDecisions): the command line and the workbench refuse alike
        Path file = dir.resolve("point-32.json");
        BudgetEditor ed = openForReview(file);
        String author = ed.document().content().author();
        onEdt(() -> {
            markAll(named(ed, "checklist"), Mark.AGREED);
            ((JTextField) named(ed, "assessor")).setText(author.toUpperCase(java.util.Locale.ROOT));
            ((JButton) named(ed, "recordDecision")).doClick();
            return null;
        });
        String refusal = onEdt(() -> ((JLabel) named(ed, "decisionOutcome")).getText());
        assertTrue(!author.isBlank() && refusal.contains("is the author of") && refusal.contains("separation of duties"),
                author + ": " + refusal);
        assertEquals(DocumentStatus.DRAFT, DocumentStore.open(file).status(), "nothing recorded");
        onEdt(() -> { frame.forceClose(ed); return null; });

        // approved elsewhere, then opened for review and sent back: refused, where the workbench once sent an
        // approved document back to draft
        BudgetDocument d = DocumentStore.open(file);
        DocumentStore.save(org.quire.engine.document.ReviewDecisions.record(d, d.contentHash(),
                org.quire.engine.document.Verdict.ENDORSED, "Morwenna Hale", java.time.Instant.now(), "endorsed"), file);
        byte[] approved = Files.readAllBytes(file);
        BudgetEditor again = await(onEdt(() -> frame.open(file, true))).orElseThrow();
        waitForCurrentResult(again);
        JTable checklist = onEdt(() -> named(again, "checklist"));
        waitFor("the automatic checklist", () -> checklist.getRowCount() > 0);
        onEdt(() -> {
            markAll(checklist, Mark.AGREED);
            ((JRadioButton) named(again, "sendBack")).setSelected(true);
            ((JTextField) named(again, "reason")).setText("second thoughts");
            ((JTextField) named(again, "assessor")).setText("Idris Fenwick");
            ((JButton) named(again, "recordDecision")).doClick();
            return null;
        });
        String second = onEdt(() -> ((JLabel) named(again, "decisionOutcome")).getText());
        assertTrue(second.contains("is approved already"), second);
        assertEquals(DocumentStatus.APPROVED, again.document().content().status());
        assertTrue(java.util.Arrays.equals(approved, Files.readAllBytes(file)), "the approved file is unchanged");
    }
}
