package org.quire.engine.conformity;

/** The outcome of a decision rule for one measured error, or for a set of them. */
public enum Decision {
    /** The rule declares the item to conform. */
    CONFORMS("conforms"),
    /** The rule declares the item not to conform. */
    DOES_NOT_CONFORM("does not conform"),
    /** The result lies in a zone where the rule makes no statement. */
    UNDECIDED("undecided");

    private final String label;

    Decision(String label) {
        this.label = label;
    }

    /** @return the words for reports and certificates */
    public String label() {
        return label;
    }
}
