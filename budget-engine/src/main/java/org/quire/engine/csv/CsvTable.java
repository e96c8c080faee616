package org.quire.engine.csv;

import java.util.ArrayList;
import java.util.List;

/**
 * A CSV text as read by {@link CsvReader}: its header (empty when read without one), its rows with their
 * line numbers in the source, the separator used and the decimal mark by which its numbers are read.
 * Immutable and thread-safe.
 */
public final class CsvTable {
    private final String sourceName;
    private final CsvOptions.Separator separator;
    private final CsvOptions.DecimalMark decimalMark;
    private final boolean markStated;
    private final String proof;
    private final List<String> header;
    private final List<CsvRow> rows;
    private final int headerLine;

    private CsvTable(String sourceName, CsvOptions.Separator separator, CsvOptions.DecimalMark decimalMark,
            boolean markStated, String proof, int headerLine, List<String> header, List<List<String>> records,
            List<Integer> lines) {
        this.sourceName = sourceName;
        this.separator = separator;
        this.decimalMark = decimalMark;
        this.markStated = markStated;
        this.proof = proof;
        this.header = List.copyOf(header);
        List<CsvRow> r = new ArrayList<>(records.size());
        for (int i = 0; i < records.size(); i++) {
            r.add(new CsvRow(this, lines.get(i), records.get(i)));
        }
        this.rows = List.copyOf(r);
        this.headerLine = headerLine;
    }

    /**
     * Decides the decimal mark: the stated one; otherwise a decimal point in a comma-separated file; otherwise
     * a decimal comma only when some cell proves it ({@code 1,5}, {@code 0,0025}: not a thousands group) and
     * no cell has a decimal point; otherwise a decimal point.
     */
    static CsvTable of(String sourceName, CsvOptions.Separator separator, CsvOptions.DecimalMark stated,
            int headerLine, List<String> header, List<List<String>> records, List<Integer> lines) {
        if (stated != null) {
            String note = stated == CsvOptions.DecimalMark.POINT ? " (the decimal mark is stated as a point)" : "";
            return new CsvTable(sourceName, separator, stated, true, note, headerLine, header, records, lines);
        }
        if (separator == CsvOptions.Separator.COMMA) {
            return new CsvTable(sourceName, separator, CsvOptions.DecimalMark.POINT, false, "", headerLine, header,
                    records, lines);
        }
        String point = null;
        boolean comma = false;
        for (int i = 0; i < records.size() && point == null; i++) {
            for (String cell : records.get(i)) {
                if (CsvNumbers.hasDecimalPoint(cell)) {
                    point = " (e.g. " + CsvMessages.quoted(cell) + " on line " + lines.get(i) + ")";
                    break;
                }
                comma |= CsvNumbers.provesComma(cell);
            }
        }
        if (point == null && comma) {
            return new CsvTable(sourceName, separator, CsvOptions.DecimalMark.COMMA, false, "", headerLine, header,
                    records, lines);
        }
        return new CsvTable(sourceName, separator, CsvOptions.DecimalMark.POINT, false, point == null ? "" : point,
                headerLine, header, records, lines);
    }

    /** @return the name used in messages */
    public String sourceName() {
        return sourceName;
    }

    /** @return the separator the cells were split by (stated or detected) */
    public CsvOptions.Separator separator() {
        return separator;
    }

    /** @return the decimal mark numbers are read with (stated, or detected by the rule of {@link CsvRow#number(int)}) */
    public CsvOptions.DecimalMark decimalMark() {
        return decimalMark;
    }

    /** @return whether the decimal mark was stated rather than detected */
    public boolean decimalMarkStated() {
        return markStated;
    }

    /** @return the column names, trimmed; empty when the table was read without a header */
    public List<String> header() {
        return header;
    }

    /** @return the data rows (the header excluded), in file order */
    public List<CsvRow> rows() {
        return rows;
    }

    /** @return the number of columns (of the header, or of the first row) */
    public int columnCount() {
        return header.isEmpty() ? (rows.isEmpty() ? 0 : rows.get(0).size()) : header.size();
    }

    /** @return whether the header has a column of exactly this name */
    public boolean hasColumn(String name) {
        return header.contains(name);
    }

    /**
     * @return the 0-based index of the column of exactly this name
     * @throws CsvException when there is none, listing the columns there are (and saying so when the file
     *     looks read with the wrong separator)
     */
    public int columnIndex(String name) throws CsvException {
        int i = header.indexOf(name);
        if (i < 0) {
            throw new CsvException(sourceName, headerLine, 0, null, CsvMessages.noColumn(name, header) + separatorNote());
        }
        return i;
    }

    /**
     * Checks that the header has every named column.
     *
     * @throws CsvException naming the first missing column and listing the columns there are; when the file
     *     has one column where several are expected, the message says that the separator looks wrong
     */
    public void requireColumns(String... names) throws CsvException {
        if (names.length > 1 && header.size() == 1) {
            boolean missing = false;
            for (String n : names) {
                missing |= !header.contains(n);
            }
            if (missing) {
                throw new CsvException(sourceName, headerLine, 0, null,
                        CsvMessages.oneColumn(header.get(0), List.of(names)) + separatorNote());
            }
        }
        for (String n : names) {
            columnIndex(n);
        }
    }

    private String separatorNote() {
        Character other = header.isEmpty() ? null : CsvReader.otherSeparator(header, separator);
        return other == null ? "" : "; " + CsvMessages.wrongSeparator(other, separator);
    }

    /**
     * @param column 0-based, or -1 for the header as a whole
     * @return a problem with the header row (line of the header, column number and name), for checks the
     *     caller makes on the column names
     */
    public CsvException headerProblem(int column, String reason) {
        return new CsvException(sourceName, headerLine, column + 1, column < 0 ? null : columnName(column), reason);
    }

    String proof() {
        return proof;
    }

    String columnName(int index) {
        return index < header.size() ? header.get(index) : null;
    }

    @Override
    public String toString() {
        return "CsvTable[" + sourceName + ", " + header.size() + " columns, " + rows.size() + " rows, separator "
                + separator + ", decimal mark " + decimalMark + "]";
    }
}
