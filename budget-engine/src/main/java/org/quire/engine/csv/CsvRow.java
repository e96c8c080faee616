package org.quire.engine.csv;

import java.util.List;

/**
 * One data row of a {@link CsvTable}: its cells (trimmed, quotes removed) and its 1-based line in the source.
 * Column indexes are 0-based, as in Java lists; messages give 1-based column numbers and the header name.
 * Immutable and thread-safe.
 */
public final class CsvRow {
    private final CsvTable table;
    private final int line;
    private final List<String> cells;

    CsvRow(CsvTable table, int line, List<String> cells) {
        this.table = table;
        this.line = line;
        this.cells = cells;
    }

    /** @return the table the row belongs to (its header, source name and decimal mark) */
    public CsvTable table() {
        return table;
    }

    /** @return the 1-based line in the source at which the row starts */
    public int line() {
        return line;
    }

    /** @return the number of cells (the same for every row of a table) */
    public int size() {
        return cells.size();
    }

    /** @return the cells, in column order */
    public List<String> cells() {
        return cells;
    }

    /**
     * @param column 0-based
     * @return the trimmed text of the cell
     * @throws CsvException when there is no such column
     */
    public String text(int column) throws CsvException {
        if (column < 0 || column >= cells.size()) {
            throw new CsvException(table.sourceName(), line, 0, null, CsvMessages.noSuchCell(column, cells.size()));
        }
        return cells.get(column);
    }

    /** @return the trimmed text of the cell in the named column */
    public String text(String column) throws CsvException {
        return text(table.columnIndex(column));
    }

    /** @return whether the cell is empty */
    public boolean isBlank(int column) throws CsvException {
        return text(column).isEmpty();
    }

    /** @return whether the cell in the named column is empty */
    public boolean isBlank(String column) throws CsvException {
        return isBlank(table.columnIndex(column));
    }

    /**
     * Reads the cell as a number by the one rule of the CSV reader: the table's decimal mark (a decimal comma
     * only when stated or proven by the file); a cell that may be a thousands group ({@code 1,002}) refused as
     * ambiguous unless the decimal mark is comma; thousands separators, NaN, infinities, values beyond the
     * range of a double (overflow, a non-zero value that would become 0), more than 30 significant digits or
     * an exponent of more than 5 digits refused.
     *
     * @param column 0-based
     * @return the value, finite
     * @throws CsvException naming the source, line, column number and header name, and why
     */
    public double number(int column) throws CsvException {
        String cell = text(column);
        try {
            return CsvNumbers.parse(cell, table.decimalMark(), table.separator() == CsvOptions.Separator.COMMA
                    && !table.decimalMarkStated(), table.proof());
        } catch (IllegalArgumentException e) {
            throw new CsvException(table.sourceName(), line, column + 1, table.columnName(column), e.getMessage());
        }
    }

    /** @return the number in the named column, by the rule of {@link #number(int)} */
    public double number(String column) throws CsvException {
        return number(table.columnIndex(column));
    }

    /**
     * @return a problem with this row, located at its line (and column, when it is not 0), for checks the
     *     caller makes on the values
     */
    public CsvException problem(int column, String reason) {
        return new CsvException(table.sourceName(), line, column + 1, column < 0 ? null : table.columnName(column),
                reason);
    }

    @Override
    public String toString() {
        return "CsvRow[line " + line + ", " + cells + "]";
    }
}
