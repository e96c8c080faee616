package org.quire.app.report;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import org.quire.engine.budget.Budget;
import org.quire.engine.io.BudgetJson;

/**
 * SHA-256 of a budget's canonical content: the budget as {@link BudgetJson#write(Budget)} writes it (fixed field
 * order, fixed number formatting, fields this version does not interpret kept), encoded as UTF-8. Two files
 * that differ only in spacing, field order or number spelling ({@code 1e-5} or {@code 0.00001}) have the same
 * hash; any change of content changes it.
 *
 * <p>References: FIPS 180-4 (SHA-256), through {@link MessageDigest}.
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
        return "SHA-256";
    }

    @Override
    public String hash(Budget budget) {
        return sha256(BudgetJson.write(budget).getBytes(StandardCharsets.UTF_8));
    }

    /** @return the SHA-256 of {@code bytes} as 64 lower-case hexadecimal digits */
    public static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("this Java runtime has no SHA-256, which every Java SE runtime must have", e);
        }
    }
}
