package org.quire.engine.io;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Reads the repeated observations of a Type A evaluation from a CSV file exported by a data logger or a
 * spreadsheet: one reading a row, in the column named {@code reading} (or {@code readings}, {@code value},
 * {@code x}) or, without a header, in the first column. Cells are separated by commas (decimal point) or by
 * semicolons or tabs (decimal point or decimal comma). Blank lines are skipped; a cell that is not a number is
 * refused with its line and column. Stateless and thread-safe.
 */
public final class ReadingsCsv {
    private static final List<String> NAMES = List.of("reading", "readings", "value", "x");

    private ReadingsCsv() {
    }

    /** Reads a file of at most {@link BudgetJson#MAX_BYTES}. */
    public static double[] read(Path file) throws IOException, BudgetFormatException {
        return parse(BudgetJson.readText(file));
    }

    /**
     * @return the readings, in file order
     * @throws BudgetFormatException naming the line and column of a bad cell, or saying that there is no reading
     */
    public static double[] parse(String text) throws BudgetFormatException {
        String[] lines = text.split("\\R", -1);
        String sep = null;
        int column = -1;
        List<Double> out = new ArrayList<>();
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i].strip();
            if (line.isEmpty()) {
                continue;
            }
            if (sep == null) {
                sep = line.contains("\t") ? "\t" : line.contains(";") ? ";" : ",";
            }
            String[] cells = line.split(sep.equals("\t") ? "\t" : sep, -1);
            if (column < 0) {
                column = 0;
                boolean named = false;
                for (int c = 0; c < cells.length && !named; c++) {
                    if (NAMES.contains(unquote(cells[c]).toLowerCase(Locale.ROOT))) {
                        column = c;
                        named = true;
                    }
                }
                if (named) {
                    continue;
                }
            }
            if (column >= cells.length) {
                throw new BudgetFormatException("line " + (i + 1), "the row has " + cells.length
                        + " cells; the readings are in column " + (column + 1));
            }
            String cell = unquote(cells[column]);
            if (cell.isEmpty()) {
                continue;
            }
            String number = sep.equals(",") ? cell : cell.replace(',', '.');
            try {
                double v = Double.parseDouble(number);
                if (!Double.isFinite(v)) {
                    throw new NumberFormatException();
                }
                out.add(v);
            } catch (NumberFormatException e) {
                if (out.isEmpty() && i == firstLine(lines)) {
                    continue;
                }
                throw new BudgetFormatException("line " + (i + 1) + ", column " + (column + 1),
                        "'" + cell + "' is not a number");
            }
        }
        if (out.isEmpty()) {
            throw new BudgetFormatException("", "the file holds no readings");
        }
        double[] r = new double[out.size()];
        for (int k = 0; k < r.length; k++) {
            r[k] = out.get(k);
        }
        return r;
    }

    private static int firstLine(String[] lines) {
        for (int i = 0; i < lines.length; i++) {
            if (!lines[i].isBlank()) {
                return i;
            }
        }
        return -1;
    }

    private static String unquote(String s) {
        String t = s.strip();
        if (t.length() >= 2 && t.startsWith("\"") && t.endsWith("\"")) {
            t = t.substring(1, t.length() - 1).replace("\"\"", "\"").strip();
        }
        return t;
    }
}
