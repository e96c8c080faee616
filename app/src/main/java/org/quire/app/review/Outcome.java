package org.quire.app.review;

/** The automatic outcome of one checklist item, before the assessor looks at it. */
public enum Outcome {
    /** The budget satisfies the item. */
    MET("met"),
    /** The budget does not satisfy the item; the details say where. */
    NOT_MET("not met"),
    /** The rule cannot be decided by a program; the assessor must look at the details. */
    TO_CONFIRM("to confirm"),
    /** The check needs something this evaluation did not produce (a Monte Carlo run, a unit checker). */
    NOT_RUN("not run"),
    /** The item does not concern this budget (no correlations to justify, for instance). */
    NOT_APPLICABLE("not applicable");

    private final String label;

    Outcome(String label) {
        this.label = label;
    }

    /** @return the outcome as shown to people, e.g. "not met" */
    public String label() {
        return label;
    }
}
