package org.quire.engine.document;

import jakarta.json.JsonObject;
import java.time.Instant;
import java.util.Objects;
import java.util.regex.Pattern;

/**
 * One line of a document's revision history: a change of status, who made it, when, and why. An approval
 * also records the SHA-256 hash of the document's canonical content and that content itself, so the approved
 * revision can be read back after later edits ({@link BudgetDocument#approvedRevision(int)}). An entry that
 * records an assessor's decision ({@link ReviewDecisions}) says so in {@code decision}: an endorsement is an
 * approval; a sending back is a move to draft that records the hash of the content sent back (and not the
 * content). Earlier decisions are found from these fields, never from the comment.
 *
 * @param revision the revision number the entry belongs to, at least 1
 * @param status the status the document moved to
 * @param by who made the change (not blank)
 * @param at when, in UTC
 * @param comment why, may be empty
 * @param contentHash 64 lowercase hex digits for an approval, else empty
 * @param content the canonical content ({@link BudgetDocument#contentJson()}) for an approval, else null
 * @param decision the assessor's verdict when the entry records a review decision, else null
 */
public record RevisionEntry(int revision, DocumentStatus status, String by, Instant at, String comment,
        String contentHash, JsonObject content, Verdict decision) {
    private static final Pattern HEX64 = Pattern.compile("[0-9a-f]{64}");

    /**
     * Checks the entry; an approval needs its hash and content, and the two must agree; an endorsement is an
     * approval; a sending back is a move to draft with the hash of the content sent back and no content.
     */
    public RevisionEntry {
        if (revision < 1) {
            throw new IllegalArgumentException("revision must be 1 or more, not " + revision);
        }
        Objects.requireNonNull(status, "status");
        if (by == null || by.isBlank()) {
            throw new IllegalArgumentException("a history entry must name who made the change (by)");
        }
        Objects.requireNonNull(at, "at");
        comment = comment == null ? "" : comment;
        contentHash = contentHash == null ? "" : contentHash;
        if (status == DocumentStatus.APPROVED) {
            if (!HEX64.matcher(contentHash).matches()) {
                throw new IllegalArgumentException("an approval must record the SHA-256 content hash as 64 lowercase "
                        + "hex digits, not '" + contentHash + "'");
            }
            if (content == null) {
                throw new IllegalArgumentException("an approval must record the approved content");
            }
            String actual = CanonicalJson.sha256(content);
            if (!actual.equals(contentHash)) {
                throw new IllegalArgumentException("the recorded content of approved revision " + revision
                        + " has hash " + actual + ", not the recorded " + contentHash
                        + ": the approved content was altered");
            }
            if (decision == Verdict.SENT_BACK) {
                throw new IllegalArgumentException("a decision 'sent-back' moves the document to draft, not to "
                        + status.label());
            }
        } else if (decision == Verdict.SENT_BACK) {
            if (status != DocumentStatus.DRAFT) {
                throw new IllegalArgumentException("a decision 'sent-back' moves the document to draft, not to "
                        + status.label());
            }
            if (!HEX64.matcher(contentHash).matches()) {
                throw new IllegalArgumentException("a decision 'sent-back' must record the SHA-256 hash of the content "
                        + "sent back as 64 lowercase hex digits, not '" + contentHash + "'");
            }
            if (content != null) {
                throw new IllegalArgumentException("a decision 'sent-back' records the hash of the content, not the "
                        + "content");
            }
        } else if (decision == Verdict.ENDORSED) {
            throw new IllegalArgumentException("a decision 'endorsed' approves the document; it cannot move it to "
                    + status.label());
        } else if (!contentHash.isEmpty() || content != null) {
            throw new IllegalArgumentException("only an approval records a content hash and content, not a move to "
                    + status.label());
        }
    }

    /** An entry that records no review decision. */
    public RevisionEntry(int revision, DocumentStatus status, String by, Instant at, String comment,
            String contentHash, JsonObject content) {
        this(revision, status, by, at, comment, contentHash, content, null);
    }

    /** @return an entry without hash and content, for any status but {@link DocumentStatus#APPROVED} */
    public static RevisionEntry of(int revision, DocumentStatus status, String by, Instant at, String comment) {
        return new RevisionEntry(revision, status, by, at, comment, "", null);
    }
}
