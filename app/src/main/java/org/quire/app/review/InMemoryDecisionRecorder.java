package org.quire.app.review;

import java.util.ArrayList;
import java.util.List;

/**
 * Keeps recorded decisions in memory, for the command line and tests. One content has at most one decision:
 * a budget sent back comes back changed, with a new hash, for a new review.
 *
 * <p>Thread-safe (all methods synchronized).
 */
public final class InMemoryDecisionRecorder implements DecisionRecorder {
    private final List<Recorded> records = new ArrayList<>();

    @Override
    public synchronized Recorded record(Review review) {
        Decision d = review.decision();
        if (d == null) {
            throw new IllegalArgumentException("the review of '" + review.title() + "' has no decision to record");
        }
        for (Recorded r : records) {
            if (r.contentHash().equals(review.contentHash())) {
                throw new IllegalArgumentException("content " + review.contentHash().substring(0,
                        Math.min(16, review.contentHash().length())) + "… was already " + r.decision().verdict().label()
                        + " by " + r.decision().assessor() + " on " + r.decision().date());
            }
        }
        Recorded r = new Recorded(records.size() + 1L, review.hashAlgorithm(), review.contentHash(), review.title(), d,
                review.findings(), review.comments().size());
        records.add(r);
        return r;
    }

    @Override
    public synchronized List<Recorded> decisions(String contentHash) {
        List<Recorded> out = new ArrayList<>();
        for (Recorded r : records) {
            if (r.contentHash().equals(contentHash)) {
                out.add(r);
            }
        }
        return out;
    }
}
