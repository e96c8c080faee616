package org.quire.app.review;

/** The assessor's own mark on a checklist item, whatever the automatic outcome was. */
public enum Mark {
    /** The assessor agrees the item is satisfied. */
    AGREED("agreed"),
    /** The assessor records a finding: something to correct before the budget can be endorsed. */
    FINDING("finding"),
    /** The assessor records a remark: worth noting, no correction required. */
    REMARK("remark");

    private final String label;

    Mark(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
