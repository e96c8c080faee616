package org.quire.engine.document;

import java.util.regex.Pattern;

/**
 * Which template a document was created from: the template's identifier, version and content hash
 * ({@link BudgetDocument#contentHash()} of the template document).
 *
 * @param id the template's identifier
 * @param version its version, at least 1
 * @param contentHash 64 lowercase hex digits
 * @param locked the fields the template locks ({@link TemplateSpec#locked()}) as recorded when the document was
 *     made, so that an editor can show them read-only; empty in files written before this was recorded. The
 *     check of a budget against its template ({@link TemplateConformance}) uses the template's own locks.
 */
public record TemplateOrigin(String id, int version, String contentHash, java.util.List<String> locked) {
    private static final Pattern HEX64 = Pattern.compile("[0-9a-f]{64}");

    /** Checks the fields. */
    public TemplateOrigin {
        TemplateSpec.checkId(id);
        if (version < 1) {
            throw new IllegalArgumentException("template version must be 1 or more, not " + version);
        }
        if (contentHash == null || !HEX64.matcher(contentHash).matches()) {
            throw new IllegalArgumentException("template contentHash must be 64 lowercase hex digits, not '"
                    + contentHash + "'");
        }
        locked = locked == null ? java.util.List.of() : java.util.List.copyOf(locked);
    }

    /** An origin that records no locked fields. */
    public TemplateOrigin(String id, int version, String contentHash) {
        this(id, version, contentHash, java.util.List.of());
    }

    /**
     * @param input an input name
     * @param field one of {@link TemplateSpec#INPUT_FIELDS}
     * @return whether the recorded locks cover that field of that input (by the rule of
     *     {@link TemplateSpec#isLocked})
     */
    public boolean isLocked(String input, String field) {
        return TemplateSpec.isLocked(locked, input, field);
    }

    /**
     * @param part one of {@link TemplateSpec#BUDGET_PARTS} ({@code model}, {@code outputs}, {@code settings},
     *     {@code correlations})
     * @return whether the recorded locks cover that part of the budget
     */
    public boolean locksPart(String part) {
        if (!TemplateSpec.BUDGET_PARTS.contains(part)) {
            throw new IllegalArgumentException("'" + part + "' is not a part of a budget a template can lock; the parts "
                    + "are " + String.join(", ", TemplateSpec.BUDGET_PARTS));
        }
        return locked.contains(part);
    }

    /** @return whether {@code o} names the same template: id, version and content hash (the recorded locks aside) */
    public boolean sameTemplate(TemplateOrigin o) {
        return o != null && id.equals(o.id) && version == o.version && contentHash.equals(o.contentHash);
    }

    /** @return whether any field of the input is locked (then its name is too: renaming would remove it) */
    public boolean locksAnyOf(String input) {
        return locked.contains(input) || locked.stream().anyMatch(l -> l.startsWith(input + "."));
    }

    /** @return the reason shown beside a locked field, e.g. "locked by template tvfl-gravimetric-emf-point v1" */
    public String lockReason() {
        return "locked by template " + id + " v" + version;
    }
}
