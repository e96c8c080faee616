package org.quire.engine.document;

import java.util.regex.Pattern;

/**
 * Which template a document was created from: the template's identifier, version and content hash
 * ({@link BudgetDocument#contentHash()} of the template document).
 *
 * @param id the template's identifier
 * @param version its version, at least 1
 * @param contentHash 64 lowercase hex digits
 */
public record TemplateOrigin(String id, int version, String contentHash) {
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
    }
}
