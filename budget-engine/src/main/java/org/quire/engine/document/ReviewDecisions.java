package org.quire.engine.document;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The one place where an assessor's decision on a budget document is recorded, for the command line and the
 * workbench alike. The rules, checked in this order:
 * <ol>
 * <li>A decision is on one content: the content hash the assessor reviewed must be the document's current one.</li>
 * <li>A decision needs a draft or a document in review. <b>An approved document is refused</b>, whatever the
 *     verdict: its approval stands until the budget is changed, and a change opens the next revision as a draft
 *     ({@link BudgetDocument#withBudget}), which is then reviewed like any draft. A withdrawn document takes no
 *     decision.</li>
 * <li>Separation of duties ({@link SeparationOfDuties}): the document's author does not endorse it. (Sending a
 *     budget back approves nothing, so it is not restricted.)</li>
 * <li>One content, one decision: content that was already endorsed or sent back (found from the structured
 *     history entries, {@link RevisionEntry#decision()} and approvals, never from comment text) is refused; a
 *     budget sent back comes back changed, with a new hash, for a new review.</li>
 * </ol>
 * Endorsing moves a draft to in-review and then to approved, in the assessor's name; the approval records the
 * content hash and the content. Sending back moves a draft to in-review and then back to draft (so the history
 * shows it was reviewed), or a document in review to draft, recording the hash of the content sent back.
 *
 * <p>References: ISO/IEC 17025:2017 7.8.2.1 o) and 8.4 (identification of who authorises results; control of
 * records). Recording one decision per reviewed content is common practice.
 *
 * <p>Stateless and thread-safe: documents are immutable, each call returns the next document.
 */
public final class ReviewDecisions {
    private ReviewDecisions() {
    }

    /**
     * One decision as the history records it.
     *
     * @param revision the revision decided on
     * @param verdict endorsed or sent back
     * @param assessor who decided
     * @param at when it was recorded
     * @param contentHash the SHA-256 content hash decided on
     * @param comment the history comment (for people to read)
     */
    public record Recorded(int revision, Verdict verdict, String assessor, Instant at, String contentHash,
            String comment) {
    }

    /**
     * @param doc the document under review
     * @param reviewedHash the content hash the assessor reviewed
     * @param verdict the verdict
     * @param assessor who decides (not blank)
     * @param when when the decision is recorded
     * @param comment what the history keeps besides the structured fields: reason, findings, remarks
     * @return the document with the decision recorded
     * @throws IllegalArgumentException with the sentence saying why, when a rule of the class refuses it
     */
    public static BudgetDocument record(BudgetDocument doc, String reviewedHash, Verdict verdict, String assessor,
            Instant when, String comment) {
        Objects.requireNonNull(doc, "doc");
        Objects.requireNonNull(verdict, "verdict");
        Objects.requireNonNull(when, "when");
        String problem = refusal(doc, reviewedHash, verdict, assessor);
        if (problem != null) {
            throw new IllegalArgumentException(problem);
        }
        String who = assessor.strip();
        BudgetDocument next = doc;
        if (next.status() == DocumentStatus.DRAFT) {
            next = next.moveTo(DocumentStatus.IN_REVIEW, who, when, "taken into review by " + who);
        }
        return next.moveTo(verdict == Verdict.ENDORSED ? DocumentStatus.APPROVED : DocumentStatus.DRAFT, who, when,
                comment == null ? "" : comment, verdict);
    }

    /**
     * @return null when {@link #record} would accept the decision, otherwise the sentence saying why not (the
     *     workbench asks before it offers the button)
     */
    public static String refusal(BudgetDocument doc, String reviewedHash, Verdict verdict, String assessor) {
        String title = "'" + doc.title() + "'";
        if (assessor == null || assessor.isBlank()) {
            return "a decision needs the assessor's name";
        }
        if (reviewedHash == null || !reviewedHash.equals(doc.contentHash())) {
            return "the review is of content " + shortHash(reviewedHash) + ", but the content of " + title
                    + " is now " + shortHash(doc.contentHash()) + "; review the current content";
        }
        if (doc.status() == DocumentStatus.APPROVED) {
            return "revision " + doc.revision() + " of " + title + " is approved already; a decision needs a draft "
                    + "or a document in review. To change an approved budget, edit it: the change opens revision "
                    + (doc.revision() + 1) + " as a draft for a new review";
        }
        if (doc.status() == DocumentStatus.WITHDRAWN) {
            return "revision " + doc.revision() + " of " + title + " is withdrawn and takes no decision";
        }
        if (verdict == Verdict.ENDORSED) {
            String duties = SeparationOfDuties.problem(title, doc.author(), assessor);
            if (duties != null) {
                return duties;
            }
        }
        List<Recorded> earlier = decisions(doc, reviewedHash);
        if (!earlier.isEmpty()) {
            Recorded r = earlier.get(0);
            return "content " + shortHash(reviewedHash) + " was already " + r.verdict().label() + " by "
                    + r.assessor() + " on " + r.at().toString().substring(0, 10) + " (revision " + r.revision()
                    + "); change the budget before it is decided on again";
        }
        return null;
    }

    /**
     * @return the decisions on that content the document's history records, oldest first: entries marked with a
     *     {@link RevisionEntry#decision()}, and approvals (an approval written before decisions were marked is an
     *     endorsement of its content)
     */
    public static List<Recorded> decisions(BudgetDocument doc, String contentHash) {
        List<Recorded> out = new ArrayList<>();
        for (RevisionEntry e : doc.history()) {
            Verdict v = e.decision() != null ? e.decision()
                    : e.status() == DocumentStatus.APPROVED ? Verdict.ENDORSED : null;
            if (v != null && e.contentHash().equals(contentHash)) {
                out.add(new Recorded(e.revision(), v, e.by(), e.at(), e.contentHash(), e.comment()));
            }
        }
        return List.copyOf(out);
    }

    private static String shortHash(String h) {
        return h == null ? "(none)" : h.substring(0, Math.min(16, h.length())) + "\u2026";
    }
}
