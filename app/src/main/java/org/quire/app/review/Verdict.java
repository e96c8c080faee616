package org.quire.app.review;

/** The assessor's decision on a budget. */
public enum Verdict {
    /** The budget is fit for use as it stands. */
    ENDORSED("endorsed"),
    /** The budget goes back to its author with the findings to correct. */
    SENT_BACK("sent back");

    private final String label;

    Verdict(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
