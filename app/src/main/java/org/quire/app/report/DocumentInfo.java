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
        List<RevisionEntry> revisions) {

    /** Shown for a field nobody stated. */
    public static final String NOT_STATED = "not stated";
    /** Shown for revision and status of a budget file that is not a revisioned document. */
    public static final String NOT_RECORDED = "not recorded (plain budget file)";

    public DocumentInfo {
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

    public DocumentInfo withLaboratory(String v) { return new DocumentInfo(v, title, deviceUnderTest, revision, status, date, author, hashAlgorithm, hash, revisions); }
    public DocumentInfo withDeviceUnderTest(String v) { return new DocumentInfo(laboratory, title, v, revision, status, date, author, hashAlgorithm, hash, revisions); }
    public DocumentInfo withAuthor(String v) { return new DocumentInfo(laboratory, title, deviceUnderTest, revision, status, date, v, hashAlgorithm, hash, revisions); }
    public DocumentInfo withRevision(String v) { return new DocumentInfo(laboratory, title, deviceUnderTest, v, status, date, author, hashAlgorithm, hash, revisions); }
    public DocumentInfo withStatus(String v) { return new DocumentInfo(laboratory, title, deviceUnderTest, revision, v, date, author, hashAlgorithm, hash, revisions); }
    public DocumentInfo withRevisions(List<RevisionEntry> v) { return new DocumentInfo(laboratory, title, deviceUnderTest, revision, status, date, author, hashAlgorithm, hash, v); }
}
