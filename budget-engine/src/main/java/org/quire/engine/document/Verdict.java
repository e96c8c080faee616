package org.quire.engine.document;

/**
 * An assessor's decision on the content of a budget document under review, as {@link ReviewDecisions} records it
 * in the revision history.
 *
 * <p>Immutable and thread-safe.
 */
public enum Verdict {
    /** The budget is fit for use as it stands: the document is approved. */
    ENDORSED("endorsed", "endorsed"),
    /** The budget goes back to its author with the findings to correct: the document is a draft again. */
    SENT_BACK("sent back", "sent-back");

    private final String label;
    private final String key;

    Verdict(String label, String key) {
        this.label = label;
        this.key = key;
    }

    /** @return the words shown to people, e.g. {@code sent back} */
    public String label() {
        return label;
    }

    /** @return the name written in the {@code decision} field of a history entry, e.g. {@code sent-back} */
    public String key() {
        return key;
    }

    /**
     * @param key a name as written in files
     * @return the verdict
     * @throws IllegalArgumentException naming the allowed names
     */
    public static Verdict ofKey(String key) {
        for (Verdict v : values()) {
            if (v.key.equals(key)) {
                return v;
            }
        }
        throw new IllegalArgumentException("a decision must be endorsed or sent-back, not '" + key + "'");
    }
}
