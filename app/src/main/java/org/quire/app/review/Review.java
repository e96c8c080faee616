package org.quire.app.review;

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
}
