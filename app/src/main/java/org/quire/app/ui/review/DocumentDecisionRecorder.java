package org.quire.app.ui.review;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.quire.app.report.ContentHasher;
import org.quire.app.review.Comment;
import org.quire.app.review.Decision;
import org.quire.app.review.DecisionRecorder;
import org.quire.app.review.Mark;
import org.quire.app.review.Review;
import org.quire.app.review.Verdict;
import org.quire.engine.budget.Budget;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStatus;
import org.quire.engine.document.DocumentStore;

/**
 * Records an assessor's decision in a budget document's revision history and saves the document to its file
 * with {@link DocumentStore#save}. Endorsing moves the document through in-review to approved in the assessor's
 * name (the approval records the content hash and the content); sending back moves it to draft with the reason
 * (through in-review when it was a draft, so the history shows it was reviewed). The history comment carries
 * the verdict, the date, the reason, the findings and remarks with their comments, and the comments on inputs.
 *
 * <p>{@link #decisions} lists the decisions this recorder made. Thread-safe (all methods synchronized).
 */
public final class DocumentDecisionRecorder implements DecisionRecorder {
    private final Path file;
    private final Clock clock;
    private final List<Recorded> records = new ArrayList<>();
    private BudgetDocument document;

    /**
     * @param document the document under review
     * @param file its file, where the decided document is saved
     * @param clock dates the history entries
     */
    public DocumentDecisionRecorder(BudgetDocument document, Path file, Clock clock) {
        this.document = Objects.requireNonNull(document, "document");
        this.file = Objects.requireNonNull(file, "file");
        this.clock = Objects.requireNonNull(clock, "clock");
    }

    /**
     * @return a hasher that gives the document's SHA-256 content hash ({@link BudgetDocument#contentHash()})
     *     for its own budget, so that a review is tied to the document's content
     */
    public static ContentHasher hasherOf(BudgetDocument doc) {
        return new ContentHasher() {
            @Override
            public String algorithm() {
                return "SHA-256";
            }

            @Override
            public String hash(Budget budget) {
                if (!budget.equals(doc.budget())) {
                    throw new IllegalArgumentException("the budget '" + budget.title() + "' is not the budget of the "
                            + "document under review");
                }
                return doc.contentHash();
            }
        };
    }

    /** @return the document as it stands after the last decision */
    public synchronized BudgetDocument document() {
        return document;
    }

    /**
     * @throws IllegalArgumentException when the review is not decided, was made of other content, or the
     *     document's status allows no such move (approved documents cannot be endorsed again; withdrawn ones
     *     take no decision)
     * @throws UncheckedIOException naming the file when the decided document cannot be saved; the document
     *     then stays as it was
     */
    @Override
    public synchronized Recorded record(Review review) {
        Decision d = review.decision();
        if (d == null) {
            throw new IllegalArgumentException("the review of '" + review.title() + "' has no decision to record");
        }
        if (!review.contentHash().equals(document.contentHash())) {
            throw new IllegalArgumentException("the document changed since the review began (content "
                    + review.contentHash().substring(0, 12) + "\u2026 reviewed, " + document.contentHash()
                    .substring(0, 12) + "\u2026 now); start a new review");
        }
        Instant when = clock.instant();
        String who = d.assessor();
        String note = summary(review);
        DocumentStatus s = document.status();
        BudgetDocument next;
        if (d.verdict() == Verdict.ENDORSED) {
            String duties = org.quire.engine.document.SeparationOfDuties.problem("'" + document.title() + "'",
                    document.author(), who);
            if (duties != null) {
                throw new IllegalArgumentException(duties);
            }
            if (s == DocumentStatus.DRAFT) {
                next = document.moveTo(DocumentStatus.IN_REVIEW, who, when, "taken into review by " + who)
                        .moveTo(DocumentStatus.APPROVED, who, when, note);
            } else if (s == DocumentStatus.IN_REVIEW) {
                next = document.moveTo(DocumentStatus.APPROVED, who, when, note);
            } else {
                throw new IllegalArgumentException("revision " + document.revision() + " is " + s.label()
                        + " and cannot be endorsed" + (s == DocumentStatus.APPROVED ? " again" : ""));
            }
        } else {
            if (s == DocumentStatus.DRAFT) {
                next = document.moveTo(DocumentStatus.IN_REVIEW, who, when, "taken into review by " + who)
                        .moveTo(DocumentStatus.DRAFT, who, when, note);
            } else if (s == DocumentStatus.IN_REVIEW || s == DocumentStatus.APPROVED) {
                next = document.moveTo(DocumentStatus.DRAFT, who, when, note);
            } else {
                throw new IllegalArgumentException("revision " + document.revision() + " is withdrawn and cannot "
                        + "be sent back");
            }
        }
        try {
            DocumentStore.save(next, file);
        } catch (IOException e) {
            throw new UncheckedIOException(e.getMessage(), e);
        }
        document = next;
        Recorded r = new Recorded(records.size() + 1L, review.hashAlgorithm(), review.contentHash(), review.title(),
                d, review.findings(), review.comments().size());
        records.add(r);
        return r;
    }

    /** @return the history comment of a decided review */
    static String summary(Review review) {
        Decision d = review.decision();
        StringBuilder b = new StringBuilder(d.verdict().label()).append(" by ").append(d.assessor()).append(" on ")
                .append(d.date());
        if (!d.reason().isEmpty()) {
            b.append(": ").append(d.reason());
        }
        for (Mark m : new Mark[] {Mark.FINDING, Mark.REMARK}) {
            List<String> items = new ArrayList<>();
            for (Map.Entry<String, Review.ItemMark> e : review.marks().entrySet()) {
                if (e.getValue().mark() == m) {
                    items.add(e.getKey() + (e.getValue().comment().isEmpty() ? "" : " (" + e.getValue().comment() + ")"));
                }
            }
            if (!items.isEmpty()) {
                b.append(". ").append(m == Mark.FINDING ? "Findings: " : "Remarks: ").append(String.join("; ", items));
            }
        }
        List<String> comments = new ArrayList<>();
        for (Comment c : review.comments()) {
            comments.add(c.target().kind().name().toLowerCase(java.util.Locale.ROOT) + " " + c.target().name() + ": "
                    + c.text());
        }
        if (!comments.isEmpty()) {
            b.append(". Comments: ").append(String.join("; ", comments));
        }
        return b.toString();
    }

    @Override
    public synchronized List<Recorded> decisions(String contentHash) {
        List<Recorded> out = new ArrayList<>();
        for (Recorded r : records) {
            if (r.contentHash().equals(contentHash)) {
                out.add(r);
            }
        }
        return out;
    }
}
