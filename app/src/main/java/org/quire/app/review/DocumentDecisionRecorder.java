package org.quire.app.review;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStatus;
import org.quire.engine.document.RevisionEntry;

/**
 * Records an assessor's decision in a budget document's revision history, following the document's review cycle
 * ({@link DocumentStatus}):
 * <ul>
 * <li>endorsing moves the document to in-review (when it is a draft) and then to approved, in the assessor's name;
 *     the approval records the content hash and the content, so the approved revision stays readable after later
 *     changes ({@link BudgetDocument#approvedRevision(int)});</li>
 * <li>sending back moves it to in-review (when it is a draft) and then to draft, with the reason and the
 *     findings in the comment.</li>
 * </ul>
 * Every comment names the assessor, the date of the decision and the content hash decided on. A review is tied to
 * one content: it is refused when the document's content hash is not the one reviewed, when the document is
 * approved or withdrawn already, or when that content already has a decision.
 *
 * <p>The recorder holds the current document, which changes with each decision; {@link #document()} gives it for
 * saving. Thread-safe (all methods synchronized).
 */
public final class DocumentDecisionRecorder implements DecisionRecorder {
    private static final Pattern HASH = Pattern.compile("content SHA-256 ([0-9a-f]{64})");
    private static final Pattern BY = Pattern.compile("^(endorsed|sent back) by (.+?) on (\\d{4}-\\d{2}-\\d{2})");

    private final java.time.Clock clock;
    private BudgetDocument doc;
    private final List<Recorded> records = new ArrayList<>();

    /**
     * @param doc the document reviewed
     * @param clock gives the time written in the history
     */
    public DocumentDecisionRecorder(BudgetDocument doc, java.time.Clock clock) {
        this.doc = Objects.requireNonNull(doc, "doc");
        this.clock = Objects.requireNonNull(clock, "clock");
    }

    /** @return the document with every decision recorded so far */
    public synchronized BudgetDocument document() {
        return doc;
    }

    @Override
    public synchronized Recorded record(Review review) {
        Decision d = review.decision();
        if (d == null) {
            throw new IllegalArgumentException("the review of '" + review.title() + "' has no decision to record");
        }
        if (!review.contentHash().equals(doc.contentHash())) {
            throw new IllegalArgumentException("the review is of content " + shortHash(review.contentHash())
                    + ", but the document's content is now " + shortHash(doc.contentHash())
                    + "; review the current content");
        }
        if (doc.status() == DocumentStatus.APPROVED || doc.status() == DocumentStatus.WITHDRAWN) {
            throw new IllegalArgumentException("revision " + doc.revision() + " of '" + doc.title() + "' is "
                    + doc.status().label() + " already; a decision needs a draft or a document in review");
        }
        if (d.verdict() == Verdict.ENDORSED) {
            String duties = org.quire.engine.document.SeparationOfDuties.problem("'" + doc.title() + "'", doc.author(),
                    d.assessor());
            if (duties != null) {
                throw new IllegalArgumentException(duties);
            }
        }
        List<Recorded> earlier = decisions(review.contentHash());
        if (!earlier.isEmpty()) {
            Recorded r = earlier.get(0);
            throw new IllegalArgumentException("content " + shortHash(review.contentHash()) + " was already "
                    + r.decision().verdict().label() + " by " + r.decision().assessor() + " on " + r.decision().date());
        }
        String hash = doc.contentHash();
        Instant now = clock.instant();
        StringBuilder comment = new StringBuilder();
        comment.append(d.verdict().label()).append(" by ").append(d.assessor()).append(" on ").append(d.date())
                .append(" (content SHA-256 ").append(hash).append(")");
        if (!d.reason().isEmpty()) {
            comment.append(": ").append(d.reason());
        }
        List<String> findings = review.findings();
        if (!findings.isEmpty()) {
            comment.append("; findings: ").append(String.join(", ", findings));
        }
        BudgetDocument next = doc;
        if (next.status() == DocumentStatus.DRAFT) {
            next = next.moveTo(DocumentStatus.IN_REVIEW, d.assessor(), now, "taken into review by " + d.assessor());
        }
        next = next.moveTo(d.verdict() == Verdict.ENDORSED ? DocumentStatus.APPROVED : DocumentStatus.DRAFT,
                d.assessor(), now, comment.toString());
        doc = next;
        Recorded r = new Recorded(records.size() + 1L, review.hashAlgorithm(), hash, review.title(), d, findings,
                review.comments().size());
        records.add(r);
        return r;
    }

    /**
     * The decisions on that content: those recorded here, and those the document's history shows from earlier
     * sessions (read back from the comments this recorder writes).
     */
    @Override
    public synchronized List<Recorded> decisions(String contentHash) {
        List<Recorded> out = new ArrayList<>();
        long n = 0;
        for (RevisionEntry e : doc.history()) {
            Matcher h = HASH.matcher(e.comment());
            Matcher by = BY.matcher(e.comment());
            if (!h.find() || !by.find() || !h.group(1).equals(contentHash)) {
                continue;
            }
            Verdict v = by.group(1).equals("endorsed") ? Verdict.ENDORSED : Verdict.SENT_BACK;
            String rest = e.comment().substring(h.end() + 1);
            List<String> findings = List.of();
            int f = rest.indexOf("; findings: ");
            if (f >= 0) {
                findings = List.of(rest.substring(f + "; findings: ".length()).split(", "));
                rest = rest.substring(0, f);
            }
            String reason = rest.startsWith(": ") ? rest.substring(2) : "";
            Decision d = new Decision(v, by.group(2), java.time.LocalDate.parse(by.group(3)), reason);
            out.add(new Recorded(++n, "SHA-256", contentHash, doc.title(), d, findings, 0));
        }
        return out;
    }

    private static String shortHash(String h) {
        return h.substring(0, Math.min(16, h.length())) + "…";
    }
}
