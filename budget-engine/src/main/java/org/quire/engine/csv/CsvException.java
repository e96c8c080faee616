package org.quire.engine.csv;

import org.quire.engine.io.BudgetFormatException;

/**
 * A CSV text that cannot be read, or a cell that is not what the caller asked for. The message starts with
 * the location: {@code runs.csv, line 7, column 3 (mass_full): "1,002" is ambiguous: ...}. A subclass of
 * {@link BudgetFormatException}, so that every reader of user files reports it the same way (exit status 2 on
 * the command line). Immutable.
 */
public final class CsvException extends BudgetFormatException {
    private static final long serialVersionUID = 1L;
    private final String sourceName;
    private final int line;
    private final int column;
    private final String columnName;
    private final String reason;

    CsvException(String sourceName, int line, int column, String columnName, String reason) {
        super(location(sourceName, line, column, columnName), reason);
        this.sourceName = sourceName;
        this.line = line;
        this.column = column;
        this.columnName = columnName == null ? "" : columnName;
        this.reason = reason;
    }

    static String location(String sourceName, int line, int column, String columnName) {
        StringBuilder s = new StringBuilder(sourceName == null ? "" : sourceName);
        if (line > 0) {
            s.append(s.length() == 0 ? "" : ", ").append("line ").append(line);
        }
        if (column > 0) {
            s.append(s.length() == 0 ? "" : ", ").append("column ").append(column);
            if (columnName != null && !columnName.isEmpty()) {
                s.append(" (").append(columnName).append(')');
            }
        }
        return s.toString();
    }

    /** @return the file name or other name of the source ({@code pasted text}) */
    public String sourceName() {
        return sourceName;
    }

    /** @return the 1-based line in the source, or 0 when the problem is the whole text */
    public int line() {
        return line;
    }

    /** @return the 1-based column, or 0 when the problem is a whole row or the text */
    public int column() {
        return column;
    }

    /** @return the header name of the column, or empty when there is none */
    public String columnName() {
        return columnName;
    }

    /** @return the message without the location */
    public String reason() {
        return reason;
    }
}
