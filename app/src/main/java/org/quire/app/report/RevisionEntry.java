package org.quire.app.report;

import java.util.Objects;

/**
 * One line of a budget document's revision history as a report prints it. Filled by the budget documents
 * (org.quire.engine.document) once they exist; until then a report says that no history is recorded.
 *
 * @param revision the revision's label, e.g. "3"
 * @param date when it was made, as text (ISO 8601 date)
 * @param author who made it
 * @param status the document status it was given
 * @param hash the content hash of that revision
 * @param summary what changed, one line
 */
public record RevisionEntry(String revision, String date, String author, String status, String hash,
        String summary) {
    public RevisionEntry {
        Objects.requireNonNull(revision, "revision");
        date = date == null ? "" : date;
        author = author == null ? "" : author;
        status = status == null ? "" : status;
        hash = hash == null ? "" : hash;
        summary = summary == null ? "" : summary;
    }
}
