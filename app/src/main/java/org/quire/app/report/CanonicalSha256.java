package org.quire.app.report;

import org.quire.engine.budget.Budget;
import org.quire.engine.document.CanonicalJson;
import org.quire.engine.io.BudgetJson;

/**
 * The content hash of a budget that is not held in a document: SHA-256 of the engine's canonical text
 * ({@link CanonicalJson}) of the budget as {@link BudgetJson#toJson(Budget)} writes it. Two files that differ only
 * in spacing, field order or number spelling have the same hash; any change of content changes it.
 *
 * <p>A budget document has its own hash, {@link org.quire.engine.document.BudgetDocument#contentHash()}, which
 * also covers laboratory, device under test, author and creation time; reports, reviews and decisions of a
 * document quote that one ({@link DocumentInfo#of}, {@code Review.start(BudgetDocument, ...)}). Both use the one
 * canonical form and the one SHA-256 of the engine.
 *
 * <p>References: FIPS 180-4 (SHA-256), through {@link CanonicalJson#sha256Hex(byte[])}.
 *
 * <p>Stateless and thread-safe.
 */
public final class CanonicalSha256 implements ContentHasher {
    /** The one instance. */
    public static final CanonicalSha256 INSTANCE = new CanonicalSha256();

    private CanonicalSha256() {
    }

    @Override
    public String algorithm() {
        return DocumentInfo.HASH_ALGORITHM;
    }

    @Override
    public String hash(Budget budget) {
        return CanonicalJson.sha256(BudgetJson.toJson(budget));
    }

    /** @return the SHA-256 of {@code bytes} as 64 lower-case hexadecimal digits */
    public static String sha256(byte[] bytes) {
        return CanonicalJson.sha256Hex(bytes);
    }
}
