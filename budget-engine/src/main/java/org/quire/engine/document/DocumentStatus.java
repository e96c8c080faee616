package org.quire.engine.document;

import java.util.EnumSet;
import java.util.Set;

/**
 * Where a budget document stands in its review cycle. The allowed moves:
 * <pre>
 *   DRAFT ------&gt; IN_REVIEW ------&gt; APPROVED ------&gt; WITHDRAWN
 *     ^  ^            |                  |
 *     |  +------------+ (sent back)      |
 *     +----------------------------------+ (a change opens a new draft revision)
 *   DRAFT ------&gt; WITHDRAWN (abandoned)
 * </pre>
 * A withdrawn document is closed: it is kept for the record and not changed again.
 *
 * <p>Immutable and thread-safe.
 */
public enum DocumentStatus {
    /** Being written; may change freely. */
    DRAFT("draft"),
    /** Handed to a reviewer; a change sends it back to draft. */
    IN_REVIEW("in-review"),
    /** Signed off; its content hash and content are recorded in the history. */
    APPROVED("approved"),
    /** No longer to be used. */
    WITHDRAWN("withdrawn");

    private final String label;

    DocumentStatus(String label) {
        this.label = label;
    }

    /** @return the name written in files, e.g. {@code in-review} */
    public String label() {
        return label;
    }

    /** @return the statuses this one may move to */
    public Set<DocumentStatus> next() {
        switch (this) {
            case DRAFT: return EnumSet.of(IN_REVIEW, WITHDRAWN);
            case IN_REVIEW: return EnumSet.of(DRAFT, APPROVED);
            case APPROVED: return EnumSet.of(DRAFT, WITHDRAWN);
            default: return EnumSet.noneOf(DocumentStatus.class);
        }
    }

    /** @return whether a document may move from this status to {@code target} */
    public boolean canMoveTo(DocumentStatus target) {
        return next().contains(target);
    }

    /**
     * @param label a name as written in files
     * @return the status
     * @throws IllegalArgumentException naming the allowed labels
     */
    public static DocumentStatus ofLabel(String label) {
        for (DocumentStatus s : values()) {
            if (s.label.equals(label)) {
                return s;
            }
        }
        throw new IllegalArgumentException("status must be one of draft, in-review, approved, withdrawn, not '"
                + label + "'");
    }

    @Override
    public String toString() {
        return label;
    }
}
