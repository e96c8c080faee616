package org.quire.app.review;

import java.util.List;

/**
 * Records an assessor's decision against the content hash of the budget reviewed, so that the revision
 * history shows who endorsed or sent back which content, and when.
 *
 * <p>This is the seam to the budget documents (org.quire.engine.document): their implementation appends the
 * decision to the document's revision history (and sets its status); {@link InMemoryDecisionRecorder} serves
 * the command line and tests. Implementations must be thread-safe.
 */
public interface DecisionRecorder {

    /**
     * One recorded decision.
     *
     * @param sequence the record's number, from 1, in the order decisions were recorded
     * @param hashAlgorithm the algorithm of {@code contentHash}
     * @param contentHash the content hash of the budget decided on
     * @param title the budget's title
     * @param decision the decision
     * @param findings ids of the items marked as findings
     * @param comments the number of comments made
     */
    record Recorded(long sequence, String hashAlgorithm, String contentHash, String title, Decision decision,
            List<String> findings, int comments) {
        public Recorded {
            findings = List.copyOf(findings);
        }
    }

    /**
     * @param review a decided review
     * @return the record made
     * @throws IllegalArgumentException when the review is not decided, or this content already has a decision
     */
    Recorded record(Review review);

    /** @return the decisions recorded for that content hash, oldest first */
    List<Recorded> decisions(String contentHash);
}
