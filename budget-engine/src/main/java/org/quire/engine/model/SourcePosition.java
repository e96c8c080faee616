package org.quire.engine.model;

/**
 * A place in the model text.
 *
 * @param line 1-based line
 * @param column 1-based column
 * @param length number of characters
 */
public record SourcePosition(int line, int column, int length) {
    public static final SourcePosition NONE = new SourcePosition(0, 0, 0);

    @Override
    public String toString() {
        return "line " + line + ", column " + column;
    }
}
