package org.quire.engine.io;

/**
 * A budget file that cannot be read: malformed JSON (with line and column), or a field that is missing, of the
 * wrong type or out of range (with its JSON path, e.g. {@code $.inputs[2].evaluation.halfWidth}); its subclass
 * {@code org.quire.engine.csv.CsvException} is a CSV file that cannot be read (with line and column).
 */
public class BudgetFormatException extends Exception {
    private static final long serialVersionUID = 1L;
    private final String path;

    public BudgetFormatException(String path, String message) {
        super(path.isEmpty() ? message : path + ": " + message);
        this.path = path;
    }

    public BudgetFormatException(String path, String message, Throwable cause) {
        super(path.isEmpty() ? message : path + ": " + message, cause);
        this.path = path;
    }

    /** @return the JSON path of the bad field, or a "line L, column C" location for a syntax error */
    public String path() {
        return path;
    }
}
