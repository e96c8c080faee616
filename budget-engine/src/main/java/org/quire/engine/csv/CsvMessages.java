package org.quire.engine.csv;

import java.util.List;
import java.util.Locale;

/** The error messages of the CSV package, in one place so that a problem is always worded the same way. */
final class CsvMessages {
    private CsvMessages() {
    }

    static String fmt(String pattern, Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }

    static String quoted(String cell) {
        return "\"" + cell + "\"";
    }

    static String tooLarge(long size, long max) {
        return fmt("the file is %d bytes, larger than the %d bytes a CSV file may have", size, max);
    }

    static String notUtf8() {
        return "the file is not UTF-8 text (save it from the spreadsheet as CSV UTF-8)";
    }

    static String empty() {
        return "the file holds no rows";
    }

    static String noData() {
        return "the file has a header but no data rows";
    }

    static String malformed(String detail) {
        return "malformed CSV (check the quotes): " + detail;
    }

    static String blankHeader() {
        return "a column has no name in the header";
    }

    static String duplicateHeader(String name) {
        return fmt("the column name %s occurs twice in the header", quoted(name));
    }

    static String cellCount(int cells, int expected, List<String> header, String hint) {
        String cols = header.isEmpty() ? "the first row has " + expected
                : "the header has " + expected + " (" + String.join(", ", header) + ")";
        return fmt("the row has %d %s, but %s%s; extra or missing cells are not ignored", cells,
                cells == 1 ? "cell" : "cells", cols, hint);
    }

    static String wrongSeparator(Character seen, CsvOptions.Separator used) {
        return fmt("the file seems to be separated by %s, not %s; state the separator",
                seen == '\t' ? "tab" : "'" + seen + "'", used.label());
    }

    static String noColumn(String name, List<String> header) {
        return fmt("there is no column %s; the columns are: %s", quoted(name),
                header.isEmpty() ? "(none: the file is read without a header)" : String.join(", ", header));
    }

    static String oneColumn(String headerCell, List<String> expected) {
        return fmt("one column %s where the columns %s are expected", quoted(headerCell), String.join(", ", expected));
    }

    static String noSuchCell(int index, int size) {
        return fmt("the row has %d cells, there is no column %d", size, index + 1);
    }

    static String emptyCell() {
        return "the cell is empty; a number is expected";
    }

    static String ambiguous(String cell) {
        return fmt("%s is ambiguous: a decimal comma or a thousands separator? Quire never guesses; "
                + "state the decimal mark, or write the number without a thousands separator", quoted(cell));
    }

    static String commaInPointFile(String cell, String proof) {
        return fmt("%s has a decimal comma, but the file uses decimal points%s; one file uses one decimal mark",
                quoted(cell), proof);
    }

    static String commaNotStated(String cell) {
        return fmt("%s has a decimal comma; in a comma-separated file a decimal comma is read only when it is "
                + "stated (decimal mark: comma)", quoted(cell));
    }

    static String pointInCommaFile(String cell) {
        return fmt("%s has a decimal point, but the file uses decimal commas; thousands separators are not "
                + "accepted", quoted(cell));
    }

    static String thousands(String cell) {
        return fmt("%s has a thousands separator; write the number without one", quoted(cell));
    }

    static String notANumber(String cell) {
        return fmt("%s is not a number", quoted(cell));
    }

    static String tooManyDigits(String cell, int max) {
        return fmt("%s has more than %d digits; no measurement has that many", quoted(cell), max);
    }

    static String exponentTooLong(String cell) {
        return fmt("%s has an exponent out of range", quoted(cell));
    }

    static String overflow(String cell) {
        return fmt("%s is too large for a number (the largest is about 1.8e308)", quoted(cell));
    }

    static String underflow(String cell) {
        return fmt("%s is too small for a number and would become 0 (the smallest is about 4.9e-324)", quoted(cell));
    }

    static String noReadingsColumn(List<String> header, int columns) {
        return header.isEmpty()
                ? fmt("%d columns and no header: give one column of readings, or a header naming the column "
                        + "reading", columns)
                : fmt("no column is named reading, readings, value or x; the columns are: %s", String.join(", ", header));
    }
}
