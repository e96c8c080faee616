package org.quire.app.compare;

import java.util.Objects;

/**
 * One field that differs between two budgets.
 *
 * @param field what changed, in words, e.g. "standard uncertainty"
 * @param before its value in budget A, as text ("" when absent)
 * @param after its value in budget B, as text ("" when absent)
 */
public record FieldChange(String field, String before, String after) {
    public FieldChange {
        Objects.requireNonNull(field, "field");
        before = before == null ? "" : before;
        after = after == null ? "" : after;
    }
}
