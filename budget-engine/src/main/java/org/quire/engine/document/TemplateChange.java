package org.quire.engine.document;

import java.util.Objects;

/**
 * One difference between a document and a newer version of its template, found by
 * {@link TemplateLibrary#compare(BudgetDocument, Template)} and taken over by
 * {@link TemplateLibrary#adopt(BudgetDocument, Template, java.util.List, String, java.time.Instant)}.
 *
 * @param kind what changed
 * @param subject the input's name, or {@code model}, {@code outputs}, {@code settings}, {@code correlations}
 * @param before the document's value as text (empty for an added input)
 * @param after the newer template's value as text (empty for a removed input)
 */
public record TemplateChange(Kind kind, String subject, String before, String after) {
    /** What kind of difference. */
    public enum Kind {
        /** The newer template has an input the document lacks. */
        INPUT_ADDED,
        /** The document has an input the newer template lacks. */
        INPUT_REMOVED,
        /** Only the estimate of an input differs. */
        ESTIMATE_CHANGED,
        /** The evaluation (distribution, uncertainty, degrees of freedom) of an input differs. */
        EVALUATION_CHANGED,
        /** The source of an input differs. */
        SOURCE_CHANGED,
        /** The unit, description or notes of an input differ. */
        DETAILS_CHANGED,
        /** The model text differs. */
        MODEL_CHANGED,
        /** The outputs differ. */
        OUTPUTS_CHANGED,
        /** The evaluation settings differ. */
        SETTINGS_CHANGED,
        /** The correlations differ. */
        CORRELATIONS_CHANGED
    }

    /** Checks the fields. */
    public TemplateChange {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(subject, "subject");
        before = before == null ? "" : before;
        after = after == null ? "" : after;
    }

    @Override
    public String toString() {
        return kind + " " + subject + ": " + before + " -> " + after;
    }
}
