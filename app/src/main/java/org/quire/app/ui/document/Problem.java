package org.quire.app.ui.document;

/**
 * One entry of the problems list: what is wrong, where, and how serious it is.
 *
 * @param severity error (no results) or warning (results, with a caution)
 * @param area the notebook section the problem belongs to
 * @param message one sentence from the engine saying what is wrong
 * @param line 1-based model line, or 0
 * @param column 1-based model column, or 0
 * @param length characters the problem spans in the model, or 0
 */
public record Problem(Severity severity, Area area, String message, int line, int column, int length) {

    /** How serious a problem is. */
    public enum Severity { ERROR, WARNING }

    /**
     * The section a problem belongs to, for jumping there from the list; {@code ENTRY} is a value the engineer
     * typed and the workbench refused (kept until the entry is fixed).
     */
    public enum Area { MODEL, INPUTS, CORRELATIONS, RESULTS, ENTRY }

    public static Problem of(Severity severity, Area area, String message) {
        return new Problem(severity, area, message, 0, 0, 0);
    }

    /** @return "line 3, column 7" or "" */
    public String where() {
        return line > 0 ? "line " + line + ", column " + column : "";
    }
}
