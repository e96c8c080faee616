package org.quire.engine.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import org.junit.jupiter.api.Test;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.TypeB;

/** The review cycle of a document: allowed moves, approvals with hash and content, revisions after approval. */
class ReviewCycleTest {
    private static final Instant T1 = Instant.parse("2026-03-03T09:00:00Z");
    private static final Instant T2 = Instant.parse("2026-03-04T09:00:00Z");
    private static final Instant T3 = Instant.parse("2026-03-05T09:00:00Z");

    private static BudgetDocument approved() throws Exception {
        return Fixtures.doc("tvfl-gravimetric-water-v1.json")
                .moveTo(DocumentStatus.IN_REVIEW, "Wren Halloway", T1, "ready for review")
                .moveTo(DocumentStatus.APPROVED, "Ash Penrose", T2, "checked against FP-03");
    }

    @Test
    void onlyTheDocumentedMovesAreAllowed() throws Exception {
        BudgetDocument d = Fixtures.doc("tvfl-gravimetric-water-v1.json");
        IllegalStateException e = assertThrows(IllegalStateException.class,
                () -> d.moveTo(DocumentStatus.APPROVED, "Ash Penrose", T1, ""));
        assertTrue(e.getMessage().contains("draft cannot move to approved"), e.getMessage());
        BudgetDocument w = d.moveTo(DocumentStatus.WITHDRAWN, "Wren Halloway", T1, "superseded");
        assertThrows(IllegalStateException.class, () -> w.moveTo(DocumentStatus.DRAFT, "Wren Halloway", T2, ""));
        assertThrows(IllegalStateException.class, () -> w.withBudget(w.budget().withNotes("x"), "Wren Halloway", T2));
        assertThrows(IllegalArgumentException.class, () -> d.moveTo(DocumentStatus.IN_REVIEW, " ", T1, ""));
        assertEquals(DocumentStatus.DRAFT, d.moveTo(DocumentStatus.IN_REVIEW, "Wren Halloway", T1, "")
                .moveTo(DocumentStatus.DRAFT, "Ash Penrose", T2, "sources missing").status());
    }

    @Test
    void approvalRecordsTheContentHashAndContent() throws Exception {
        BudgetDocument a = approved();
        assertEquals(2, a.history().size());
        RevisionEntry e = a.history().get(1);
        assertEquals(DocumentStatus.APPROVED, e.status());
        assertEquals("Ash Penrose", e.by());
        assertEquals(T2, e.at());
        assertEquals(a.contentHash(), e.contentHash());
        assertEquals(a.contentHash(), CanonicalJson.sha256(e.content()));
        assertTrue(a.approvalIntact());
        assertEquals(T2, a.modified());
    }

    @Test
    void anEditAfterApprovalOpensANewDraftRevisionAndKeepsTheApprovedOneReadable() throws Exception {
        BudgetDocument a = approved();
        Budget b = a.budget();
        Budget changed = b.withInput("delta_div", b.input("delta_div").withEvaluation(
                ((TypeB) b.input("delta_div").evaluation()).with("standardUncertainty", 0.02)));
        BudgetDocument d = a.withBudget(changed, "Wren Halloway", T3);
        assertEquals(2, d.revision());
        assertEquals(DocumentStatus.DRAFT, d.status());
        assertEquals(T3, d.modified());
        assertEquals(3, d.history().size());
        assertEquals(2, d.history().get(2).revision());
        BudgetDocument back = d.approvedRevision(1).orElseThrow();
        assertEquals(b, back.budget());
        assertEquals(a.contentHash(), back.contentHash());
        assertEquals(DocumentStatus.APPROVED, back.status());
        assertTrue(back.approvalIntact());
        assertTrue(d.approvedRevision(2).isEmpty());
        // a second edit of the draft stays in revision 2
        BudgetDocument d2 = d.withBudget(changed.withNotes("second edit"), "Wren Halloway", T3.plusSeconds(5));
        assertEquals(2, d2.revision());
        assertEquals(3, d2.history().size());
        // and the history survives a save and a read
        BudgetDocument read = DocumentJson.read(DocumentJson.write(d2), Instant.EPOCH);
        assertEquals(b, read.approvedRevision(1).orElseThrow().budget());
    }

    @Test
    void aChangeThatLeavesTheContentAsItWasChangesNothing() throws Exception {
        BudgetDocument a = approved();
        BudgetDocument same = a.withBudget(a.budget(), "Wren Halloway", T3);
        assertEquals(1, same.revision());
        assertEquals(DocumentStatus.APPROVED, same.status());
        assertSame(a.budget(), same.budget());
    }

    @Test
    void aChangeDuringReviewSendsTheDocumentBackToDraft() throws Exception {
        BudgetDocument r = Fixtures.doc("tvfl-gravimetric-water-v1.json")
                .moveTo(DocumentStatus.IN_REVIEW, "Wren Halloway", T1, "");
        BudgetDocument d = r.withBudget(r.budget().withNotes("typo"), "Wren Halloway", T2);
        assertEquals(DocumentStatus.DRAFT, d.status());
        assertEquals(1, d.revision());
    }

    @Test
    void anApprovedFileEditedOutsideQuireIsRecognised() throws Exception {
        String text = DocumentJson.write(approved());
        int at = text.indexOf("\"estimate\": 998.2");
        String edited = text.substring(0, at) + "\"estimate\": 998.25" + text.substring(at + 17);
        assertTrue(edited.indexOf("\"estimate\": 998.2,", at + 5) > 0, "the history copy is left unchanged");
        BudgetDocument d = DocumentJson.read(edited, Instant.EPOCH);
        assertEquals(DocumentStatus.APPROVED, d.status());
        assertFalse(d.approvalIntact());
    }
}
