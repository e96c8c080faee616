package org.quire.app.report;

import org.quire.engine.budget.Budget;

/**
 * Computes the fingerprint of a budget's content that a report, a review decision and a revision record all
 * quote, so that a reader can tell which content a signature belongs to.
 *
 * <p>A budget held in a document is identified by the document's hash,
 * {@link org.quire.engine.document.BudgetDocument#contentHash()}; {@link #of(org.quire.engine.document.BudgetDocument)}
 * gives a hasher that quotes it. {@link CanonicalSha256} hashes a budget that is not held in a document with the
 * same canonical form. Implementations must be thread-safe.
 */
public interface ContentHasher {

    /** @return the algorithm's name as shown in reports, e.g. {@code SHA-256} */
    String algorithm();

    /** @return the fingerprint of the budget's content as lower-case hexadecimal */
    String hash(Budget budget);

    /**
     * @param doc a budget document
     * @return a hasher that gives the document's content hash for the document's own budget, and refuses any
     *     other budget (its hash would not be the document's)
     */
    static ContentHasher of(org.quire.engine.document.BudgetDocument doc) {
        java.util.Objects.requireNonNull(doc, "doc");
        return new ContentHasher() {
            @Override
            public String algorithm() {
                return DocumentInfo.HASH_ALGORITHM;
            }

            @Override
            public String hash(Budget budget) {
                if (!budget.equals(doc.budget())) {
                    throw new IllegalArgumentException("this hasher gives the content hash of the document '"
                            + doc.title() + "' and cannot hash another budget");
                }
                return doc.contentHash();
            }
        };
    }
}
