package org.quire.app.compare;

import java.util.Objects;

/**
 * One line of a line-by-line comparison of two model texts.
 *
 * @param kind kept, removed (only in A) or added (only in B)
 * @param lineA the 1-based line number in A, 0 for an added line
 * @param lineB the 1-based line number in B, 0 for a removed line
 * @param text the line
 */
public record LineEdit(Kind kind, int lineA, int lineB, String text) {

    /** Whether a line is in both texts, only in A, or only in B. */
    public enum Kind { KEPT, REMOVED, ADDED }

    public LineEdit {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(text, "text");
    }
}
