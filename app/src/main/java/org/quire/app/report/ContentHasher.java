package org.quire.app.report;

import org.quire.engine.budget.Budget;

/**
 * Computes the fingerprint of a budget's content that a report, a review decision and a revision record all
 * quote, so that a reader can tell which content a signature belongs to.
 *
 * <p>This is a seam: the budget documents (org.quire.engine.document) will define the document hash of a
 * revision; their implementation replaces {@link CanonicalSha256}. Implementations must be thread-safe.
 */
public interface ContentHasher {

    /** @return the algorithm's name as shown in reports, e.g. {@code SHA-256} */
    String algorithm();

    /** @return the fingerprint of the budget's content as lower-case hexadecimal */
    String hash(Budget budget);
}
