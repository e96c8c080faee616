package org.quire.engine.document;

import jakarta.json.JsonObject;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.quire.engine.budget.Budget;

/**
 * A budget with what a laboratory keeps about it: title (the budget's), laboratory, device under test,
 * author, creation and modification times, revision number and status, calibration data sets, the last
 * results, the revision history and, when made from a template, the template it came from. A document may
 * itself be a template ({@link #template()}).
 *
 * <p>The review cycle ({@link DocumentStatus}): every method that changes content takes who makes the change
 * and when. A change to a draft only updates the modification time; a change to a document in review sends it
 * back to draft; a change to an approved document opens the next revision as a draft, while the approved
 * revision stays readable through {@link #approvedRevision(int)}; a withdrawn document cannot be changed.
 *
 * <p>Immutable and thread-safe; the content hash is computed once, on first use.
 */
public final class BudgetDocument {
    private final Budget budget;
    private final String laboratory;
    private final String deviceUnderTest;
    private final String author;
    private final Instant created;
    private final Instant modified;
    private final int revision;
    private final DocumentStatus status;
    private final ResultSnapshot results;
    private final List<RevisionEntry> history;
    private final TemplateOrigin templateOrigin;
    private final TemplateSpec template;
    private final int migratedFrom;
    private volatile String hash;

    BudgetDocument(Budget budget, String laboratory, String deviceUnderTest, String author, Instant created,
            Instant modified, int revision, DocumentStatus status, ResultSnapshot results,
            List<RevisionEntry> history, TemplateOrigin templateOrigin, TemplateSpec template, int migratedFrom) {
        this.budget = Objects.requireNonNull(budget, "budget");
        this.laboratory = laboratory == null ? "" : laboratory;
        this.deviceUnderTest = deviceUnderTest == null ? "" : deviceUnderTest;
        this.author = author == null ? "" : author;
        this.created = Objects.requireNonNull(created, "created").truncatedTo(ChronoUnit.MILLIS);
        this.modified = Objects.requireNonNull(modified, "modified").truncatedTo(ChronoUnit.MILLIS);
        if (revision < 1) {
            throw new IllegalArgumentException("revision must be 1 or more, not " + revision);
        }
        this.revision = revision;
        this.status = Objects.requireNonNull(status, "status");
        this.results = results;
        this.history = List.copyOf(history);
        this.templateOrigin = templateOrigin;
        this.template = template;
        this.migratedFrom = migratedFrom;
        for (RevisionEntry e : this.history) {
            if (e.revision() > revision) {
                throw new IllegalArgumentException("history entry for revision " + e.revision()
                        + " lies beyond the document's revision " + revision);
            }
        }
    }

    /**
     * @param budget the budget
     * @param author who writes it (may be empty until set)
     * @param now the creation time
     * @return revision 1 as a draft with an empty history
     */
    public static BudgetDocument newDraft(Budget budget, String author, Instant now) {
        return new BudgetDocument(budget, "", "", author, now, now, 1, DocumentStatus.DRAFT, null, List.of(),
                null, null, 0);
    }

    private BudgetDocument copy(Budget b, String lab, String dut, String auth, Instant mod, int rev,
            DocumentStatus st, ResultSnapshot res, List<RevisionEntry> hist, TemplateOrigin origin,
            TemplateSpec tmpl) {
        return new BudgetDocument(b, lab, dut, auth, created, mod, rev, st, res, hist, origin, tmpl,
                migratedFrom);
    }

    // ----- content changes, following the review cycle --------------------------------------------------------

    /** @return the document with its budget replaced (see the class description for the review cycle) */
    public BudgetDocument withBudget(Budget b, String who, Instant when) {
        return changed(copy(Objects.requireNonNull(b, "budget"), laboratory, deviceUnderTest, author, modified,
                revision, status, results, history, templateOrigin, template), who, when);
    }

    /** @return the document with laboratory, device under test and author replaced */
    public BudgetDocument withDetails(String lab, String dut, String auth, String who, Instant when) {
        return changed(copy(budget, lab, dut, auth, modified, revision, status, results, history,
                templateOrigin, template), who, when);
    }

    /** @param spec the template section that makes this document a template; null makes it a plain document */
    public BudgetDocument withTemplate(TemplateSpec spec, String who, Instant when) {
        if (spec != null) {
            List<String> p = spec.problems(budget);
            if (!p.isEmpty()) {
                throw new IllegalArgumentException("the template does not fit its budget: " + String.join("; ", p));
            }
        }
        return changed(copy(budget, laboratory, deviceUnderTest, author, modified, revision, status,
                results, history, templateOrigin, spec), who, when);
    }

    /** @param origin the template this document follows; null for none */
    public BudgetDocument withTemplateOrigin(TemplateOrigin origin, String who, Instant when) {
        return changed(copy(budget, laboratory, deviceUnderTest, author, modified, revision, status,
                results, history, origin, template), who, when);
    }

    private BudgetDocument changed(BudgetDocument c, String who, Instant when) {
        Objects.requireNonNull(when, "when");
        if (c.contentHash().equals(contentHash())) {
            return c;
        }
        switch (status) {
            case DRAFT:
                return c.copy(c.budget, c.laboratory, c.deviceUnderTest, c.author, when, revision, status,
                        c.results, history, c.templateOrigin, c.template);
            case IN_REVIEW:
                return c.copy(c.budget, c.laboratory, c.deviceUnderTest, c.author, when, revision,
                        DocumentStatus.DRAFT, c.results, append(RevisionEntry.of(revision,
                                DocumentStatus.DRAFT, who, when, "changed during review")), c.templateOrigin,
                        c.template);
            case APPROVED:
                return c.copy(c.budget, c.laboratory, c.deviceUnderTest, c.author, when, revision + 1,
                        DocumentStatus.DRAFT, c.results, append(RevisionEntry.of(revision + 1,
                                DocumentStatus.DRAFT, who, when, "changed after approval of revision " + revision)),
                        c.templateOrigin, c.template);
            default:
                throw new IllegalStateException("revision " + revision + " is withdrawn and cannot be changed; "
                        + "start a new document from a copy of it");
        }
    }

    private List<RevisionEntry> append(RevisionEntry e) {
        List<RevisionEntry> h = new ArrayList<>(history);
        h.add(e);
        return h;
    }

    /**
     * Moves the document to another status, recording who, when and why. Approving records the content hash
     * and the canonical content; moving an approved document to draft opens the next revision.
     *
     * @throws IllegalStateException when the move is not allowed from the current status
     * @throws IllegalArgumentException when {@code who} is blank
     */
    public BudgetDocument moveTo(DocumentStatus target, String who, Instant when, String comment) {
        return moveTo(target, who, when, comment, null);
    }

    /**
     * {@link #moveTo(DocumentStatus, String, Instant, String)} with the entry marked as a review decision
     * ({@link ReviewDecisions} checks the rules first): an endorsement is the approval; a sending back is the
     * move to draft and records the hash of the content sent back.
     */
    BudgetDocument moveTo(DocumentStatus target, String who, Instant when, String comment, Verdict decision) {
        Objects.requireNonNull(target, "target");
        if (!status.canMoveTo(target)) {
            throw new IllegalStateException("a document that is " + status.label() + " cannot move to "
                    + target.label() + "; it can move to " + (status.next().isEmpty() ? "nothing"
                            : String.join(", ", status.next().stream().map(DocumentStatus::label).toList())));
        }
        int rev = status == DocumentStatus.APPROVED && target == DocumentStatus.DRAFT ? revision + 1 : revision;
        Instant at = when.truncatedTo(ChronoUnit.MILLIS);
        RevisionEntry e = target == DocumentStatus.APPROVED
                ? new RevisionEntry(rev, target, who, at, comment, contentHash(), contentJson(), decision)
                : decision == Verdict.SENT_BACK
                        ? new RevisionEntry(rev, target, who, at, comment, contentHash(), null, decision)
                        : new RevisionEntry(rev, target, who, at, comment, "", null, decision);
        return copy(budget, laboratory, deviceUnderTest, author, when, rev, target, results, append(e),
                templateOrigin, template);
    }

    /** @param r the last results, or null to clear them; not part of the content, so no new revision */
    public BudgetDocument withResults(ResultSnapshot r) {
        return copy(budget, laboratory, deviceUnderTest, author, modified, revision, status, r, history,
                templateOrigin, template);
    }

    // ----- content hash ---------------------------------------------------------------------------------------

    /**
     * The content a hash covers: the document as written in a file of format version 2
     * ({@link DocumentJson#toJson(BudgetDocument)}) without {@code formatVersion}, {@code results},
     * {@code history}, and the {@code document} fields {@code modified}, {@code revision} and {@code status}.
     * So the title, notes, model, outputs, inputs, correlations, settings, laboratory, device under test,
     * author, creation time, data sets, template origin, template section and every field this version does
     * not interpret are covered; how a file is laid out (order of fields, spaces, how a number is written)
     * is not.
     *
     * @return that content as a JSON object
     */
    public JsonObject contentJson() {
        return DocumentJson.content(this);
    }

    /** @return the canonical text ({@link CanonicalJson}) of {@link #contentJson()} */
    public String canonicalText() {
        return CanonicalJson.write(contentJson());
    }

    /** @return the SHA-256 of the UTF-8 {@link #canonicalText()}, as 64 lowercase hex digits */
    public String contentHash() {
        String h = hash;
        if (h == null) {
            h = CanonicalJson.sha256(contentJson());
            hash = h;
        }
        return h;
    }

    /**
     * @return for an approved document, whether its content still has the hash recorded when it was approved;
     *     always true for other statuses. False means the file was changed outside Quire after approval.
     */
    public boolean approvalIntact() {
        if (status != DocumentStatus.APPROVED) {
            return true;
        }
        for (int i = history.size() - 1; i >= 0; i--) {
            RevisionEntry e = history.get(i);
            if (e.status() == DocumentStatus.APPROVED && e.revision() == revision) {
                return e.contentHash().equals(contentHash());
            }
        }
        return false;
    }

    /**
     * @param rev a revision number
     * @return that revision as it was approved (status approved, its history empty), read back from the content
     *     the history recorded; empty when that revision was never approved
     */
    public Optional<BudgetDocument> approvedRevision(int rev) {
        for (int i = history.size() - 1; i >= 0; i--) {
            RevisionEntry e = history.get(i);
            if (e.status() == DocumentStatus.APPROVED && e.revision() == rev) {
                return Optional.of(DocumentJson.fromContent(e));
            }
        }
        return Optional.empty();
    }

    // ----- accessors ------------------------------------------------------------------------------------------

    public Budget budget() { return budget; }
    /** @return the budget's title */
    public String title() { return budget.title(); }
    public String laboratory() { return laboratory; }
    public String deviceUnderTest() { return deviceUnderTest; }
    public String author() { return author; }
    public Instant created() { return created; }
    public Instant modified() { return modified; }
    public int revision() { return revision; }
    public DocumentStatus status() { return status; }
    /** @return the calibration data sets as stored, or null when there are none */
    /** @return the last results, or null */
    public ResultSnapshot results() { return results; }
    public List<RevisionEntry> history() { return history; }
    /** @return the template this document was made from, or null */
    public TemplateOrigin templateOrigin() { return templateOrigin; }
    /**
     * @return the template whose locks cover the budget's settings (coverage, digits, Monte Carlo trials, seed and
     *     adaptive mode), or null when none does
     */
    public TemplateOrigin settingsLockedBy() {
        return templateOrigin != null && templateOrigin.locksPart("settings") ? templateOrigin : null;
    }
    /** @return the template section when this document is a template, or null */
    public TemplateSpec template() { return template; }
    /** @return the format version the document was read from when it was migrated (1), else 0 */
    public int migratedFrom() { return migratedFrom; }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof BudgetDocument)) {
            return false;
        }
        BudgetDocument d = (BudgetDocument) o;
        return budget.equals(d.budget) && laboratory.equals(d.laboratory)
                && deviceUnderTest.equals(d.deviceUnderTest) && author.equals(d.author)
                && created.equals(d.created) && modified.equals(d.modified) && revision == d.revision
                && status == d.status && Objects.equals(results, d.results)
                && history.equals(d.history) && Objects.equals(templateOrigin, d.templateOrigin)
                && Objects.equals(template, d.template);
    }

    @Override
    public int hashCode() {
        return Objects.hash(budget, revision, status, created);
    }

    @Override
    public String toString() {
        return "'" + title() + "' revision " + revision + " (" + status.label() + ")";
    }
}
