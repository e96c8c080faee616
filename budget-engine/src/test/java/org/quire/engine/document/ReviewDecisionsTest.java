package org.quire.engine.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.quire.engine.io.BudgetFormatException;

/**
 * The one review-decision recorder, {@link ReviewDecisions}: the rules are the project's own (documented on the
 * class); separation of duties follows ISO/IEC 17025:2017 7.8.2.1 o) and common practice. The document is the
 * invented Tarrow Vale gravimetric budget, author Wren Halloway.
 */
class ReviewDecisionsTest {
    private static final Instant T1 = Instant.parse("2026-03-03T09:00:00Z");
    private static final Instant T2 = Instant.parse("2026-03-04T09:00:00Z");

    private static BudgetDocument draft() throws Exception {
        return Fixtures.doc("tvfl-gravimetric-water-v1.json");
    }

    @Test
    void endorsingADraftApprovesItWithAStructuredDecisionEntry() throws Exception {
        BudgetDocument d = draft();
        BudgetDocument a = ReviewDecisions.record(d, d.contentHash(), Verdict.ENDORSED, "Ash Penrose", T1,
                "endorsed by Ash Penrose");
        assertEquals(DocumentStatus.APPROVED, a.status());
        List<RevisionEntry> h = a.history();
        assertEquals(List.of(DocumentStatus.IN_REVIEW, DocumentStatus.APPROVED),
                h.stream().map(RevisionEntry::status).toList());
        assertNull(h.get(0).decision(), "taking into review is not a decision");
        assertEquals(Verdict.ENDORSED, h.get(1).decision());
        assertEquals(d.contentHash(), h.get(1).contentHash());
        assertTrue(a.approvalIntact());
    }

    @Test
    void theAuthorMayNotEndorseButMaySendBack() throws Exception {
        BudgetDocument d = draft();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ReviewDecisions.record(d,
                d.contentHash(), Verdict.ENDORSED, "  wren   HALLOWAY ", T1, ""));
        assertTrue(e.getMessage().contains("is the author of") && e.getMessage().contains("separation of duties"),
                e.getMessage());
        assertEquals(DocumentStatus.DRAFT, ReviewDecisions.record(d, d.contentHash(), Verdict.SENT_BACK,
                "Wren Halloway", T1, "withdrawn from review by the author").status());
    }

    @Test
    void aDecisionOnAnApprovedDocumentIsRefusedWhateverTheVerdict() throws Exception {
        BudgetDocument d = draft();
        BudgetDocument a = ReviewDecisions.record(d, d.contentHash(), Verdict.ENDORSED, "Ash Penrose", T1, "");
        for (Verdict v : Verdict.values()) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> ReviewDecisions.record(a, a.contentHash(), v, "Kit Marram", T2, "again"));
            assertTrue(e.getMessage().contains("revision 1 of") && e.getMessage().contains("is approved already")
                    && e.getMessage().contains("opens revision 2 as a draft"), e.getMessage());
        }
        // the way on: an edit opens revision 2 as a draft, which takes a decision again
        BudgetDocument edited = a.withBudget(a.budget().withNotes("re-read the balance certificate"), "Wren Halloway",
                T2);
        assertEquals(2, edited.revision());
        assertEquals(DocumentStatus.APPROVED, ReviewDecisions.record(edited, edited.contentHash(), Verdict.ENDORSED,
                "Kit Marram", T2, "").status());
        BudgetDocument withdrawn = a.moveTo(DocumentStatus.WITHDRAWN, "Ash Penrose", T2, "superseded");
        assertTrue(assertThrows(IllegalArgumentException.class, () -> ReviewDecisions.record(withdrawn,
                withdrawn.contentHash(), Verdict.SENT_BACK, "Kit Marram", T2, "")).getMessage()
                .contains("withdrawn and takes no decision"));
    }

    @Test
    void contentAlreadySentBackIsFoundFromTheHistoryEntryNotItsComment() throws Exception {
        BudgetDocument d = draft();
        // a comment that says nothing about the decision: the rule must not depend on its words
        BudgetDocument back = ReviewDecisions.record(d, d.contentHash(), Verdict.SENT_BACK, "Ash Penrose", T1,
                "see the meeting notes");
        RevisionEntry last = back.history().get(back.history().size() - 1);
        assertEquals(Verdict.SENT_BACK, last.decision());
        assertEquals(d.contentHash(), last.contentHash());
        assertEquals(1, ReviewDecisions.decisions(back, d.contentHash()).size());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ReviewDecisions.record(back,
                back.contentHash(), Verdict.ENDORSED, "Kit Marram", T2, ""));
        assertTrue(e.getMessage().contains("was already sent back by Ash Penrose on 2026-03-03 (revision 1)"),
                e.getMessage());

        // a comment that reads like a decision but is none is not taken for one
        BudgetDocument fake = d.moveTo(DocumentStatus.IN_REVIEW, "Wren Halloway", T1, "ready")
                .moveTo(DocumentStatus.DRAFT, "Wren Halloway", T1, "sent back by Ash Penrose on 2026-03-03 (content "
                        + "SHA-256 " + d.contentHash() + ")");
        assertTrue(ReviewDecisions.decisions(fake, d.contentHash()).isEmpty());
        assertNull(ReviewDecisions.refusal(fake, fake.contentHash(), Verdict.ENDORSED, "Ash Penrose"));
    }

    @Test
    void theDecisionSurvivesWritingAndReadingTheFile() throws Exception {
        BudgetDocument d = draft();
        BudgetDocument back = ReviewDecisions.record(d, d.contentHash(), Verdict.SENT_BACK, "Ash Penrose", T1, "x");
        String json = DocumentJson.write(back);
        assertTrue(json.contains("\"decision\": \"sent-back\"") || json.contains("\"decision\":\"sent-back\""), json);
        BudgetDocument read = DocumentJson.read(json, T2);
        assertEquals(back.history(), read.history());
        assertEquals(1, ReviewDecisions.decisions(read, d.contentHash()).size());
        // a decision field that contradicts the status is refused with its path
        String bad = json.replace("sent-back", "endorsed");
        BudgetFormatException e = assertThrows(BudgetFormatException.class, () -> DocumentJson.read(bad, T2));
        assertTrue(e.getMessage().contains("history[") && e.getMessage().contains("decision"), e.getMessage());
    }

    @Test
    void aReviewOfOtherContentIsRefused() throws Exception {
        BudgetDocument d = draft();
        String other = "0".repeat(64);
        assertTrue(assertThrows(IllegalArgumentException.class, () -> ReviewDecisions.record(d, other,
                Verdict.ENDORSED, "Ash Penrose", T1, "")).getMessage().contains("review the current content"));
    }
}
