package org.quire.app.review;

import org.quire.engine.document.Verdict;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.quire.app.report.ContentHasher;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumResult;

/**
 * An assessor's review of one budget content: the automatic checklist, the assessor's mark and comment on each
 * item, comments attached to inputs and sections, and finally the decision. It is tied to the content hash of
 * the budget reviewed: a changed budget needs a new review.
 *
 * <p>Rules of the decision (our own): a budget can be endorsed only when every item whose automatic outcome is
 * "not met" or "to confirm" carries the assessor's mark, and no item is marked a finding. Sending back needs a
 * reason or at least one finding.
 *
 * <p>Immutable and thread-safe; every {@code with...} method returns a changed copy.
 */
public final class Review {

    /**
     * The assessor's mark on one item.
     *
     * @param mark agreed, finding or remark
     * @param comment why
     */
    public record ItemMark(Mark mark, String comment) {
        public ItemMark {
            Objects.requireNonNull(mark, "mark");
            comment = comment == null ? "" : comment.strip();
        }
    }

    private final String title;
    private final String hashAlgorithm;
    private final String contentHash;
    private final List<CheckItem> items;
    private final Map<String, ItemMark> marks;
    private final List<Comment> comments;
    private final Decision decision;

    private Review(String title, String hashAlgorithm, String contentHash, List<CheckItem> items,
            Map<String, ItemMark> marks, List<Comment> comments, Decision decision) {
        this.title = title;
        this.hashAlgorithm = hashAlgorithm;
        this.contentHash = contentHash;
        this.items = List.copyOf(items);
        this.marks = Collections.unmodifiableMap(new LinkedHashMap<>(marks));
        this.comments = List.copyOf(comments);
        this.decision = decision;
    }

    /** @return a new review of {@code budget} with the automatic checklist filled */
    public static Review start(Budget budget, GumResult gum, ReviewContext context, ContentHasher hasher) {
        return new Review(budget.title(), hasher.algorithm(), hasher.hash(budget),
                Checklist.evaluate(budget, gum, context), Map.of(), List.of(), null);
    }

    /**
     * @return a new review of the document's budget, tied to the document's content hash
     *     ({@link org.quire.engine.document.BudgetDocument#contentHash()})
     */
    public static Review start(org.quire.engine.document.BudgetDocument doc, GumResult gum, ReviewContext context) {
        return start(doc.budget(), gum, context, ContentHasher.of(doc));
    }

    /**
     * @param itemId the id of a checklist item
     * @throws IllegalArgumentException for an unknown item, or after the decision
     */
    public Review withMark(String itemId, Mark mark, String comment) {
        open();
        item(itemId);
        Map<String, ItemMark> m = new LinkedHashMap<>(marks);
        m.put(itemId, new ItemMark(mark, comment));
        return new Review(title, hashAlgorithm, contentHash, items, m, comments, null);
    }

    /** @throws IllegalArgumentException after the decision */
    public Review withComment(Comment c) {
        open();
        List<Comment> list = new ArrayList<>(comments);
        list.add(Objects.requireNonNull(c, "comment"));
        return new Review(title, hashAlgorithm, contentHash, items, marks, list, null);
    }

    /**
     * @return the review with its decision
     * @throws IllegalStateException naming what stands in the way, when the rules of the decision are not met
     */
    public Review decide(Verdict verdict, String assessor, LocalDate date, String reason) {
        open();
        Decision d = new Decision(verdict, assessor, date, reason);
        if (verdict == Verdict.ENDORSED) {
            List<String> unmarked = unmarked();
            if (!unmarked.isEmpty()) {
                throw new IllegalStateException("cannot endorse: mark these items first: " + String.join(", ", unmarked));
            }
            List<String> findings = findings();
            if (!findings.isEmpty()) {
                throw new IllegalStateException("cannot endorse while items are marked as findings: "
                        + String.join(", ", findings));
            }
        } else if (d.reason().isEmpty() && findings().isEmpty()) {
            throw new IllegalStateException("sending a budget back needs a reason or at least one finding");
        }
        return new Review(title, hashAlgorithm, contentHash, items, marks, comments, d);
    }

    private void open() {
        if (decision != null) {
            throw new IllegalArgumentException("the review is decided (" + decision.verdict().label()
                    + "); start a new review to change it");
        }
    }

    /** @return the item of that id */
    public CheckItem item(String id) {
        for (CheckItem i : items) {
            if (i.id().equals(id)) {
                return i;
            }
        }
        List<String> ids = new ArrayList<>();
        items.forEach(i -> ids.add(i.id()));
        throw new IllegalArgumentException("no checklist item '" + id + "'; items are " + String.join(", ", ids));
    }

    /** @return ids of items whose automatic outcome needs the assessor's mark and has none */
    public List<String> unmarked() {
        List<String> out = new ArrayList<>();
        for (CheckItem i : items) {
            if ((i.outcome() == Outcome.NOT_MET || i.outcome() == Outcome.TO_CONFIRM) && !marks.containsKey(i.id())) {
                out.add(i.id());
            }
        }
        return out;
    }

    /** @return ids of items the assessor marked as findings */
    public List<String> findings() {
        List<String> out = new ArrayList<>();
        marks.forEach((id, m) -> {
            if (m.mark() == Mark.FINDING) {
                out.add(id);
            }
        });
        return out;
    }

    /** @return whether any item's automatic outcome is "not met" */
    public boolean anyNotMet() {
        return items.stream().anyMatch(i -> i.outcome() == Outcome.NOT_MET);
    }

    public String title() { return title; }
    public String hashAlgorithm() { return hashAlgorithm; }
    /** @return the content hash of the budget reviewed */
    public String contentHash() { return contentHash; }
    public List<CheckItem> items() { return items; }
    /** @return the assessor's marks by item id */
    public Map<String, ItemMark> marks() { return marks; }
    public List<Comment> comments() { return comments; }
    /** @return the decision, or null while the review is open */
    public Decision decision() { return decision; }

    /**
     * @return the text the document's history keeps beside the structured decision: verdict, assessor, date and
     *     content hash, the reason, the findings and remarks with their comments, and the comments on inputs
     * @throws IllegalStateException when the review is not decided
     */
    public String historyComment() {
        if (decision == null) {
            throw new IllegalStateException("the review of '" + title + "' has no decision yet");
        }
        StringBuilder b = new StringBuilder(decision.verdict().label()).append(" by ").append(decision.assessor())
                .append(" on ").append(decision.date()).append(" (content ").append(hashAlgorithm).append(' ')
                .append(contentHash).append(')');
        if (!decision.reason().isEmpty()) {
            b.append(": ").append(decision.reason());
        }
        for (Mark m : new Mark[] {Mark.FINDING, Mark.REMARK}) {
            List<String> list = new ArrayList<>();
            for (Map.Entry<String, ItemMark> e : marks.entrySet()) {
                if (e.getValue().mark() == m) {
                    list.add(e.getKey() + (e.getValue().comment().isEmpty() ? "" : " (" + e.getValue().comment() + ")"));
                }
            }
            if (!list.isEmpty()) {
                b.append(". ").append(m == Mark.FINDING ? "Findings: " : "Remarks: ").append(String.join("; ", list));
            }
        }
        List<String> said = new ArrayList<>();
        for (Comment c : comments) {
            said.add(c.target().kind().name().toLowerCase(java.util.Locale.ROOT) + " " + c.target().name() + ": "
                    + c.text());
        }
        if (!said.isEmpty()) {
            b.append(". Comments: ").append(String.join("; ", said));
        }
        return b.toString();
    }

    /**
     * Records the decision of this review in the document through the engine's one recorder,
     * {@link org.quire.engine.document.ReviewDecisions#record}, which owns every rule (content reviewed, status,
     * separation of duties, one decision per content).
     *
     * @param doc the document reviewed
     * @param when when the decision is recorded
     * @return the document with the decision in its history
     * @throws IllegalArgumentException with the engine's reason when the decision is refused
     * @throws IllegalStateException when the review is not decided
     */
    public org.quire.engine.document.BudgetDocument recordIn(org.quire.engine.document.BudgetDocument doc,
            java.time.Instant when) {
        String text = historyComment();
        return org.quire.engine.document.ReviewDecisions.record(doc, contentHash, decision.verdict(),
                decision.assessor(), when, text);
    }
}
