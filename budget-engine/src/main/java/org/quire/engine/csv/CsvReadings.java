package org.quire.engine.csv;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;

/**
 * The repeated observations of a Type A evaluation from CSV text: a data logger's or spreadsheet's file, or
 * cells pasted from a spreadsheet. The readings are the column named {@code reading}, {@code readings},
 * {@code value} or {@code x} (case ignored); a table of one column is that column; text without a header (its
 * first row is numbers) is one column or one row of readings, in which a comma is never a separator (it is a
 * decimal comma or an error by the number rule). A table of several columns none of which is so
 * named is refused, listing its columns: Quire does not pick a column. Every cell of the column is read by the
 * one number rule ({@link CsvRow#number(int)}); an empty cell is an error. Stateless and thread-safe.
 */
public final class CsvReadings {
    /** The names of a readings column, lower case. */
    public static final List<String> COLUMN_NAMES = List.of("reading", "readings", "value", "x");

    private static final Pattern NUMBER_LIKE = Pattern.compile("[+-]?[0-9.,]*[0-9][0-9.,]*(?:[eE][+-]?[0-9]+)?");

    private CsvReadings() {
    }

    /** Reads the readings in a file, by {@link #parse(String, String, CsvOptions)}. */
    public static double[] read(Path file, CsvOptions options) throws IOException, CsvException {
        return parse(CsvReader.sourceName(file), CsvReader.readText(file, options), options);
    }

    /**
     * @param sourceName the name in messages ({@code pasted text}, a file name)
     * @return the readings, in order
     * @throws CsvException naming the line and column of a bad cell, or saying that there is no reading column
     */
    public static double[] parse(String sourceName, String text, CsvOptions options) throws CsvException {
        String first = firstRow(text);
        if (options.header() && first != null && numbers(first)) {
            CsvOptions o = options.withHeader(false);
            if (options.separator() == null && first.indexOf(';') < 0 && first.indexOf('\t') < 0) {
                // one column: a comma between digits is a decimal comma or an error, never a split
                o = o.withSeparator(text.indexOf('\t') >= 0 ? CsvOptions.Separator.TAB : CsvOptions.Separator.SEMICOLON);
            }
            return readings(CsvReader.parse(sourceName, text, o));
        }
        return readings(CsvReader.parse(sourceName, text, options));
    }

    /**
     * Readings pasted as a block of cells from a spreadsheet (a cell, a column, a row or several rows of
     * several cells), read in reading order: row by row, left to right, blank cells skipped. When the first row
     * is not all numbers it is a header, and the block is read as by {@link #parse} (one column, or the column
     * named {@code reading}).
     *
     * @param sourceName the name in messages ({@code pasted text})
     * @return the readings, in reading order
     * @throws CsvException naming the line and column of a bad cell
     */
    public static double[] parseBlock(String sourceName, String text, CsvOptions options) throws CsvException {
        String first = firstRow(text);
        if (first == null || !numbers(first)) {
            return parse(sourceName, text, options);
        }
        CsvTable t = CsvReader.parse(sourceName, text, options.withHeader(false));
        List<Double> out = new java.util.ArrayList<>();
        for (CsvRow r : t.rows()) {
            for (int c = 0; c < r.size(); c++) {
                if (!r.isBlank(c)) {
                    out.add(r.number(c));
                }
            }
        }
        if (out.isEmpty()) {
            throw new CsvException(sourceName, 0, 0, null, CsvMessages.noData());
        }
        double[] d = new double[out.size()];
        for (int i = 0; i < d.length; i++) {
            d[i] = out.get(i);
        }
        return d;
    }

    private static String firstRow(String text) {
        for (String line : text.split("\\R")) {
            String l = line.replace("\uFEFF", "").strip();
            if (!l.isEmpty() && !l.startsWith("#")) {
                return l;
            }
        }
        return null;
    }

    /** @return whether every cell of the row (split at ',' ';' tab, quotes removed) looks like a number */
    private static boolean numbers(String row) {
        for (String cell : row.split("[,;\t]", -1)) {
            String c = cell.strip();
            if (c.length() >= 2 && c.startsWith("\"") && c.endsWith("\"")) {
                c = c.substring(1, c.length() - 1).strip();
            }
            if (!c.isEmpty() && !NUMBER_LIKE.matcher(c).matches()) {
                return false;
            }
        }
        return true;
    }

    /** @return the readings of a table read with or without a header, by the rule of this class */
    public static double[] readings(CsvTable t) throws CsvException {
        List<CsvRow> rows = t.rows();
        if (t.header().isEmpty() && rows.size() == 1 && rows.get(0).size() > 1) {
            CsvRow r = rows.get(0);
            double[] out = new double[r.size()];
            for (int c = 0; c < out.length; c++) {
                out[c] = r.number(c);
            }
            return out;
        }
        int column = column(t);
        if (rows.isEmpty()) {
            throw new CsvException(t.sourceName(), 0, 0, null, CsvMessages.noData());
        }
        double[] out = new double[rows.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = rows.get(i).number(column);
        }
        return out;
    }

    private static int column(CsvTable t) throws CsvException {
        if (t.columnCount() == 1) {
            return 0;
        }
        for (int c = 0; c < t.header().size(); c++) {
            if (COLUMN_NAMES.contains(t.header().get(c).toLowerCase(Locale.ROOT))) {
                return c;
            }
        }
        throw new CsvException(t.sourceName(), t.header().isEmpty() ? 0 : 1, 0, null,
                CsvMessages.noReadingsColumn(t.header(), t.columnCount()));
    }
}
