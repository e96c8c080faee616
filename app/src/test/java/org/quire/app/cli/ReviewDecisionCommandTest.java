package org.quire.app.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.app.review.Review;
import org.quire.app.review.ReviewContext;
import org.quire.engine.document.Verdict;
import org.quire.app.testing.Examples;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStatus;
import org.quire.engine.document.DocumentStore;
import org.quire.engine.document.ReviewDecisions;
import org.quire.engine.document.RevisionEntry;

/**
 * Review decisions recorded in the document's history through {@code quire review --decide}, the review cycle
 * that follows (a later edit opens a new draft revision; the approved one stays readable), and
 * {@code quire diff FILE --revision N}. The rules are the project's own (Review, DocumentStatus); the examples are
 * JCGM 100:2008 H.1 and H.2.
 */
class ReviewDecisionCommandTest {
    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();

    private int run(String... args) {
        out.reset();
        err.reset();
        return CommandLine.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
    }

    private String out() {
        return out.toString(StandardCharsets.UTF_8);
    }

    private static Path copy(Path dir, String example) throws Exception {
        return Files.copy(Examples.file(example), dir.resolve(example));
    }

    /** @return --mark options marking every item that needs the assessor's mark as agreed */
    private static List<String> agreeToAll(Path file) throws Exception {
        BudgetDocument doc = DocumentStore.open(file);
        Review r = Review.start(doc, Examples.gum(doc.budget()), ReviewContext.none());
        List<String> args = new ArrayList<>();
        for (String id : r.unmarked()) {
            args.add("--mark");
            args.add(id + "=agreed:checked by hand");
        }
        return args;
    }

    @Test
    void endorsingWithUnmarkedItemsIsRefusedAndLeavesTheFileAsItWas(@TempDir Path dir) throws Exception {
        // JCGM 100:2008 H.1: the dominant inputs are not explained, so the item is "not met"
        Path f = copy(dir, "jcgm100-h1-end-gauge.json");
        byte[] before = Files.readAllBytes(f);
        assertEquals(1, run("review", f.toString(), "--decide", "endorse", "--assessor", "M. Okafor"));
        assertTrue(out().contains("decision refused: cannot endorse: mark these items first: ")
                && out().contains("dominant-explained"), out());
        assertEquals(1, run("review", f.toString(), "--decide", "endorse", "--assessor", "M. Okafor", "--mark",
                "dominant-explained=finding:l_s and delta_theta need a word in the notes"));
        assertTrue(out().contains("decision refused"), out());
        assertArrayEquals(before, Files.readAllBytes(f));
        assertEquals(2, run("review", f.toString(), "--decide", "endorse"), "no assessor");
        assertEquals(2, run("review", f.toString(), "--mark", "rounding=agreed"), "a mark without a decision");
        assertEquals(2, run("review", f.toString(), "--decide", "endorse", "--assessor", "M. Okafor", "--mark",
                "no-such-item=agreed"));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("no checklist item 'no-such-item'"));
        assertArrayEquals(before, Files.readAllBytes(f));
    }

    @Test
    void endorseApprovesThenALaterEditOpensRevisionTwoAndDiffShowsTheChange(@TempDir Path dir) throws Exception {
        // JCGM 100:2008 H.2: every item is met or needs only a confirmation
        Path f = copy(dir, "jcgm100-h2-resistance-reactance.json");
        List<String> args = new ArrayList<>(List.of("review", f.toString(), "--decide", "endorse", "--assessor",
                "M. Okafor", "--date", "2026-11-21"));
        args.addAll(agreeToAll(f));
        assertEquals(0, run(args.toArray(new String[0])), out());
        assertTrue(out().contains("endorsed by M. Okafor on 2026-11-21; revision 1 is now approved"), out());
        assertTrue(Files.exists(DocumentStore.backupOf(f)), "the previous version is kept");

        BudgetDocument approved = DocumentStore.open(f);
        assertEquals(DocumentStatus.APPROVED, approved.status());
        assertEquals(1, approved.revision());
        List<RevisionEntry> h = approved.history();
        assertEquals(List.of(DocumentStatus.IN_REVIEW, DocumentStatus.APPROVED), h.stream().map(RevisionEntry::status).toList());
        assertEquals("M. Okafor", h.get(1).by());
        assertEquals(approved.contentHash(), h.get(1).contentHash(), "the approval records the hash of what was approved");
        assertTrue(h.get(1).comment().startsWith("endorsed by M. Okafor on 2026-11-21 (content SHA-256 "
                + approved.contentHash() + ")"), h.get(1).comment());
        assertTrue(approved.approvalIntact());
        assertEquals(Verdict.ENDORSED, h.get(1).decision(), "the history entry says it is a decision");
        List<ReviewDecisions.Recorded> rec = ReviewDecisions.decisions(approved, approved.contentHash());
        assertEquals(1, rec.size());
        assertEquals(Verdict.ENDORSED, rec.get(0).verdict());
        assertEquals("M. Okafor", rec.get(0).assessor());

        // a second decision on approved content is refused
        byte[] approvedBytes = Files.readAllBytes(f);
        assertEquals(2, run("review", f.toString(), "--decide", "send-back", "--assessor", "A. Brandt", "--reason", "x"));
        String refused = err.toString(StandardCharsets.UTF_8);
        assertTrue(refused.contains(f + ": decision refused: revision 1 of") && refused.contains("is approved already"),
                refused);
        assertArrayEquals(approvedBytes, Files.readAllBytes(f), "the approved file is unchanged");

        // a later edit makes revision 2 a draft; revision 1 stays readable as approved
        Budget b = approved.budget();
        List<InputQuantity> inputs = new ArrayList<>(b.inputs());
        InputQuantity first = inputs.get(0);
        inputs.set(0, first.withSource(first.source() + " (re-read 2026-11-22)"));
        BudgetDocument edited = approved.withBudget(b.withInputs(inputs), "R. Hollis", Instant.now());
        assertEquals(2, edited.revision());
        assertEquals(DocumentStatus.DRAFT, edited.status());
        DocumentStore.save(edited, f);
        BudgetDocument reopened = DocumentStore.open(f);
        BudgetDocument one = reopened.approvedRevision(1).orElseThrow();
        assertEquals(approved.contentHash(), one.contentHash());
        assertEquals(approved.budget(), one.budget());
        assertTrue(reopened.approvedRevision(2).isEmpty());

        assertEquals(1, run("diff", f.toString(), "--revision", "1"));
        assertTrue(out().contains("approved revision 1") && out().contains("re-read 2026-11-22"), out());
        assertEquals(2, run("diff", f.toString(), "--revision", "2"));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("revision 2 was never approved")
                && err.toString(StandardCharsets.UTF_8).contains("approved revisions: 1"), err.toString(StandardCharsets.UTF_8));

        // the report of the new draft shows the approval with its full hash
        Path html = dir.resolve("r.html");
        assertEquals(0, run("report", f.toString(), "-o", html.toString()));
        String text = Files.readString(html);
        assertTrue(text.contains("id=\"approvals\"") && text.contains(approved.contentHash()), "approval with hash");
        assertTrue(text.contains(reopened.contentHash()), "the header quotes the current content hash");
        assertTrue(text.contains("<th>Status</th><td>draft</td>"), "status of the new revision");
        assertEquals(2, run("report", f.toString(), "-o", html.toString(), "--laboratory", "X"),
                "a document records its laboratory; the command line does not override it");
    }

    @Test
    void sendBackMovesTheDocumentToDraftWithTheReason(@TempDir Path dir) throws Exception {
        Path f = copy(dir, "jcgm100-h2-resistance-reactance.json");
        assertEquals(0, run("review", f.toString(), "--decide", "send-back", "--assessor", "A. Brandt", "--reason",
                "state the source of the phase readings", "--mark", "warnings=finding:correlated inputs", "--date",
                "2026-11-21"));
        BudgetDocument doc = DocumentStore.open(f);
        assertEquals(DocumentStatus.DRAFT, doc.status());
        RevisionEntry last = doc.history().get(doc.history().size() - 1);
        assertEquals(DocumentStatus.DRAFT, last.status());
        assertTrue(last.comment().contains("state the source of the phase readings")
                && last.comment().contains("Findings: warnings (correlated inputs)")
                && last.comment().contains(doc.contentHash()), last.comment());
        assertEquals(Verdict.SENT_BACK, last.decision());
        assertEquals(doc.contentHash(), last.contentHash(), "the entry records the hash of the content sent back");
        ReviewDecisions.Recorded r = ReviewDecisions.decisions(doc, doc.contentHash()).get(0);
        assertEquals(Verdict.SENT_BACK, r.verdict());
        assertEquals("A. Brandt", r.assessor());
        // the same content cannot be decided on again: it must change first
        List<String> args = new ArrayList<>(List.of("review", f.toString(), "--decide", "endorse", "--assessor",
                "A. Brandt"));
        args.addAll(agreeToAll(f));
        assertEquals(2, run(args.toArray(new String[0])));
        String e = err.toString(StandardCharsets.UTF_8);
        assertTrue(e.contains("was already sent back by A. Brandt on ") && e.contains("(revision 1)"), e);
        // sending back needs a reason or a finding
        Path g = copy(Files.createDirectory(dir.resolve("g")), "jcgm100-h2-resistance-reactance.json");
        assertEquals(1, run("review", g.toString(), "--decide", "send-back", "--assessor", "A. Brandt"));
        assertTrue(out().contains("needs a reason or at least one finding"), out());
    }

    @Test
    void theAuthorCannotEndorseHisOwnBudget(@TempDir Path dir) throws Exception {
        // separation of duties (ISO/IEC 17025:2017 7.8.2.1 o); common practice): the rule is the engine's
        Path f = dir.resolve("h2.json");
        BudgetDocument d = BudgetDocument.newDraft(Examples.budget("jcgm100-h2-resistance-reactance.json"),
                "M. Okafor", Instant.parse("2026-11-20T08:00:00Z"));
        DocumentStore.save(d, f);
        byte[] before = Files.readAllBytes(f);
        List<String> args = new ArrayList<>(List.of("review", f.toString(), "--decide", "endorse", "--assessor",
                " m.  okafor"));
        args.addAll(agreeToAll(f));
        assertEquals(2, run(args.toArray(new String[0])));
        String e = err.toString(StandardCharsets.UTF_8);
        assertTrue(e.contains("decision refused: 'm.  okafor' is the author of") && e.contains("separation of duties"), e);
        assertArrayEquals(before, Files.readAllBytes(f));
        args.set(5, "A. Brandt");
        assertEquals(0, run(args.toArray(new String[0])), err.toString(StandardCharsets.UTF_8));
        assertEquals(DocumentStatus.APPROVED, DocumentStore.open(f).status());
    }

    @Test
    void monteCarloItemOfTheChecklistUsesTheRunWhenAskedFor() {
        // JCGM 101:2008 9.3: the first-order GUM interval is not validated (d_low about 0.045 mg, delta = 0.0005 mg)
        String f = Examples.file("jcgm101-9.3-mass-calibration.json").toString();
        run("review", f);
        assertTrue(out().contains("[not run]        The Monte Carlo result agrees with the GUM result"), out());
        assertEquals(1, run("review", f, "--mc", "--trials", "100000", "--seed", "7"));
        assertTrue(out().contains("[not met]        The Monte Carlo result agrees with the GUM result"), out());
        assertTrue(out().contains("delta_m: the GUM result is not validated: d_low = 0.04"), out());
        assertTrue(out().contains("exceed the numerical tolerance delta = 0.0005 (JCGM 101:2008 8.2)"), out());
        assertEquals(2, run("review", f, "--trials", "1000"), "--trials without --mc");
    }
}
