package org.quire.app.report;

import java.time.LocalDate;
import java.util.List;
import java.util.Objects;

/**
 * What a report's header says about the document: laboratory, title, device under test, revision, status,
 * date, author, content hash and the revision history.
 *
 * <p>This is the seam to the budget documents (org.quire.engine.document): a document with revisions and a
 * status produces one of these; a plain budget file gets {@link #forPlainBudget}, with the fields the
 * command line was given and "not recorded" for revision and status.
 *
 * @param laboratory the laboratory's name
 * @param title the report's title
 * @param deviceUnderTest the meter or instrument the budget is for
 * @param revision the revision's label
 * @param status the document status, in the documents' own words
 * @param date the date of the report
 * @param author who prepared the budget
 * @param hashAlgorithm e.g. {@code SHA-256}
 * @param hash the content hash, lower-case hexadecimal
 * @param revisions the revision history, oldest first; empty when none is recorded
 *
 * <p>Immutable and thread-safe.
 */
public record DocumentInfo(String laboratory, String title, String deviceUnderTest, String revision,
        String status, LocalDate date, String author, String hashAlgorithm, String hash,
        List<RevisionEntry> revisions, String templateExample) {

    /** A header of a document that is not a template evaluated as it is. */
    public DocumentInfo(String laboratory, String title, String deviceUnderTest, String revision, String status,
            LocalDate date, String author, String hashAlgorithm, String hash, List<RevisionEntry> revisions) {
        this(laboratory, title, deviceUnderTest, revision, status, date, author, hashAlgorithm, hash, revisions, "");
    }

    /** Shown for a field nobody stated. */
    public static final String NOT_STATED = "not stated";
    /** Shown for revision and status of a budget file that is not a revisioned document. */
    public static final String NOT_RECORDED = "not recorded (plain budget file)";

    public DocumentInfo {
        templateExample = templateExample == null ? "" : templateExample;
        laboratory = orNotStated(laboratory);
        title = orNotStated(title);
        deviceUnderTest = orNotStated(deviceUnderTest);
        revision = orNotStated(revision);
        status = orNotStated(status);
        Objects.requireNonNull(date, "date");
        author = orNotStated(author);
        Objects.requireNonNull(hashAlgorithm, "hashAlgorithm");
        Objects.requireNonNull(hash, "hash");
        if (!hash.matches("[0-9a-f]+")) {
            throw new IllegalArgumentException("hash must be lower-case hexadecimal, not '" + hash + "'");
        }
        revisions = List.copyOf(revisions);
    }

    private static String orNotStated(String s) {
        return s == null || s.isBlank() ? NOT_STATED : s.strip();
    }

    /**
     * @param budget the budget (its title is the report's title)
     * @param hasher computes the content hash
     * @param date the report's date
     * @return header facts for a budget file that is not a revisioned document
     */
    public static DocumentInfo forPlainBudget(org.quire.engine.budget.Budget budget, ContentHasher hasher,
            LocalDate date) {
        return new DocumentInfo("", budget.title(), "", NOT_RECORDED, NOT_RECORDED, date, "", hasher.algorithm(),
                hasher.hash(budget), List.of());
    }

    /**
     * The header facts of a budget document as the engine keeps it: laboratory, device under test, author,
     * revision with its last change, status, and the document's own content hash
     * ({@link org.quire.engine.document.BudgetDocument#contentHash()}, SHA-256 of its canonical content). The
     * revision history lists every change of status; approvals carry the hash of the content approved. A
     * document migrated from a file of format version 1 records no revision or status, and says so.
     *
     * @param doc the document
     * @param date the report's date
     */
    public static DocumentInfo of(org.quire.engine.document.BudgetDocument doc, LocalDate date) {
        Objects.requireNonNull(doc, "doc");
        String revision;
        String status;
        if (doc.migratedFrom() == 1) {
            revision = NOT_RECORDED_V1;
            status = NOT_RECORDED_V1;
        } else {
            revision = doc.revision() + ", last changed " + instant(doc.modified());
            status = doc.status().label();
            if (doc.status() == org.quire.engine.document.DocumentStatus.APPROVED) {
                status += doc.approvalIntact() ? " (content unchanged since approval)"
                        : " (WARNING: the content no longer has the hash recorded at approval; the file was changed "
                                + "outside Quire)";
            }
        }
        List<RevisionEntry> history = new java.util.ArrayList<>();
        for (org.quire.engine.document.RevisionEntry e : doc.history()) {
            history.add(new RevisionEntry(Integer.toString(e.revision()), instant(e.at()), e.by(), e.status().label(),
                    e.contentHash(), e.comment()));
        }
        // a template evaluated as it is: said in a row of the header and in the band of every page
        String example = org.quire.engine.document.TemplateConformance.exampleFigures(doc)
                .map(org.quire.app.report.DocumentInfo::sentence).orElse("");
        return new DocumentInfo(doc.laboratory(), doc.title(), doc.deviceUnderTest(), revision, status, date,
                doc.author(), HASH_ALGORITHM, doc.contentHash(), history, example);
    }

    /** The algorithm of every content hash Quire shows: that of {@code BudgetDocument.contentHash()}. */
    public static final String HASH_ALGORITHM = "SHA-256";
    /** Shown for revision and status of a document read from a file of format version 1. */
    public static final String NOT_RECORDED_V1 = "not recorded (file of format version 1)";

    /** @return an engine finding as a sentence: its first letter a capital, a full stop at its end */
    static String sentence(String finding) {
        return finding.isEmpty() ? finding : Character.toUpperCase(finding.charAt(0)) + finding.substring(1) + ".";
    }

    /** @return an instant as {@code 2026-11-20 14:03 UTC} */
    static String instant(java.time.Instant t) {
        return java.time.format.DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", java.util.Locale.ROOT)
                .withZone(java.time.ZoneOffset.UTC).format(t);
    }

    /**
     * @return the words every page of a report carries in a band at its top when the content is not an approved
     *     revision (a draft, a document in review or withdrawn, a plain budget file that records no approval, an
     *     approved document whose content changed since, a template's example), or null for approved content whose
     *     hash is intact
     */
    public String notApprovedMark() {
        String mark = approvalMark();
        if (!templateExample.isEmpty()) {
            return "TEMPLATE EXAMPLE: not a measurement's figures" + (mark == null ? "" : "; " + mark.toLowerCase(
                    java.util.Locale.ROOT));
        }
        return mark;
    }

    /** @return the band of {@link #notApprovedMark} for the status alone */
    private String approvalMark() {
        if (status.equals("approved (content unchanged since approval)")) {
            return null;
        }
        if (status.startsWith("approved")) {
            return "CHANGED SINCE APPROVAL: not the content approved";
        }
        if (status.startsWith("draft")) {
            return "DRAFT: not approved, not for issue";
        }
        if (status.startsWith("in review") || status.startsWith("in-review")) {
            return "IN REVIEW: not approved, not for issue";
        }
        if (status.startsWith("withdrawn")) {
            return "WITHDRAWN: not for use";
        }
        return "NOT APPROVED: no approval recorded for this content";
    }

    /** @return whether the header stands for a document whose revision and status are recorded */
    public boolean hasRevisions() {
        return !revision.equals(NOT_RECORDED) && !revision.equals(NOT_RECORDED_V1);
    }

    public DocumentInfo withLaboratory(String v) { return new DocumentInfo(v, title, deviceUnderTest, revision, status, date, author, hashAlgorithm, hash, revisions, templateExample); }
    public DocumentInfo withDeviceUnderTest(String v) { return new DocumentInfo(laboratory, title, v, revision, status, date, author, hashAlgorithm, hash, revisions, templateExample); }
    public DocumentInfo withAuthor(String v) { return new DocumentInfo(laboratory, title, deviceUnderTest, revision, status, date, v, hashAlgorithm, hash, revisions, templateExample); }
    public DocumentInfo withRevision(String v) { return new DocumentInfo(laboratory, title, deviceUnderTest, v, status, date, author, hashAlgorithm, hash, revisions, templateExample); }
    public DocumentInfo withStatus(String v) { return new DocumentInfo(laboratory, title, deviceUnderTest, revision, v, date, author, hashAlgorithm, hash, revisions, templateExample); }
    public DocumentInfo withRevisions(List<RevisionEntry> v) { return new DocumentInfo(laboratory, title, deviceUnderTest, revision, status, date, author, hashAlgorithm, hash, v, templateExample); }
}
