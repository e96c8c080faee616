package org.quire.engine.line;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;

/**
 * A small strict reader of calibration data sets in CSV form.
 *
 * <p>The format:
 * <ul>
 *   <li>Lines that are empty or start with {@code #} are ignored.</li>
 *   <li>The first other line is the header. It names the columns {@code x}, {@code y}, {@code u_x},
 *   {@code u_y} (case ignored) in any order; {@code x} and {@code y} are required, each name may occur once,
 *   and no other name is accepted. A missing {@code u_x} or {@code u_y} column means "not stated" (zero).</li>
 *   <li>The field separator is a semicolon if the header contains one, otherwise a comma; it is the same on
 *   every line.</li>
 *   <li>Every data line has as many fields as the header. Each field is a decimal number with a decimal point
 *   and an optional exponent ({@code 1.25}, {@code -3e-4}); a decimal comma, a thousands separator, quotes,
 *   {@code NaN} or {@code Infinity} are errors.</li>
 * </ul>
 * Every error is a {@link CalibrationCsvException} that names the line and, for a bad cell, the column.
 * Stateless and thread-safe.
 */
public final class CalibrationCsv {

    /** The accepted column names, in the canonical order. */
    public static final List<String> COLUMNS = List.of("x", "y", "u_x", "u_y");

    private static final Pattern NUMBER =
            Pattern.compile("[+-]?(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+)(?:[eE][+-]?[0-9]+)?");

    private CalibrationCsv() {
    }

    /**
     * Reads a data set from CSV text.
     *
     * @param text the CSV text
     * @param name the data set's name
     * @param xUnit unit of x
     * @param yUnit unit of y
     * @return the checked data set
     * @throws CalibrationCsvException when the text is malformed or a point is invalid; the message names the
     *     line and column
     */
    public static CalibrationData parse(String text, String name, String xUnit, String yUnit) {
        if (text == null) {
            throw new IllegalArgumentException(LineMessages.missing("CSV text"));
        }
        return read(new StringReader(text), name, xUnit, yUnit);
    }

    /**
     * Reads a data set from a character stream (the caller opens and closes it, choosing the encoding).
     *
     * @throws CalibrationCsvException when the text is malformed or a point is invalid
     * @throws UncheckedIOException when the stream cannot be read
     * @see #parse(String, String, String, String)
     */
    public static CalibrationData read(Reader in, String name, String xUnit, String yUnit) {
        List<String> lines = new ArrayList<>();
        try {
            BufferedReader br = new BufferedReader(in);
            for (String s = br.readLine(); s != null; s = br.readLine()) {
                lines.add(s);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the calibration CSV: " + e.getMessage(), e);
        }
        int[] columnOf = null; // columnOf[field] = index into COLUMNS
        String separator = null;
        int headerFields = 0;
        List<CalibrationPoint> points = new ArrayList<>();
        int lastLine = 0;
        for (int li = 0; li < lines.size(); li++) {
            int lineNo = li + 1;
            String raw = lines.get(li);
            if (li == 0 && raw.startsWith("\uFEFF")) {
                raw = raw.substring(1);
            }
            String line = raw.strip();
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            if (columnOf == null) {
                separator = line.contains(";") ? ";" : ",";
                String[] names = line.split(Pattern.quote(separator), -1);
                headerFields = names.length;
                columnOf = new int[names.length];
                boolean[] seen = new boolean[COLUMNS.size()];
                for (int f = 0; f < names.length; f++) {
                    String nm = names[f].strip().toLowerCase(Locale.ROOT);
                    int idx = COLUMNS.indexOf(nm);
                    if (idx < 0) {
                        throw new CalibrationCsvException(lineNo, f + 1, LineMessages.fmt(
                                "line %d, column %d: unknown column name '%s'; expected x, y, u_x, u_y",
                                lineNo, f + 1, names[f].strip()));
                    }
                    if (seen[idx]) {
                        throw new CalibrationCsvException(lineNo, f + 1, LineMessages.fmt(
                                "line %d, column %d: column '%s' is named twice", lineNo, f + 1, nm));
                    }
                    seen[idx] = true;
                    columnOf[f] = idx;
                }
                for (int req = 0; req < 2; req++) {
                    if (!seen[req]) {
                        throw new CalibrationCsvException(lineNo, 0, LineMessages.fmt(
                                "line %d: the header has no column '%s' (found: %s)", lineNo, COLUMNS.get(req),
                                Arrays.toString(names).replace("[", "").replace("]", "")));
                    }
                }
                continue;
            }
            String[] cells = line.split(Pattern.quote(separator), -1);
            if (cells.length != headerFields) {
                String hint = separator.equals(",") && line.contains(";")
                        ? " (the header uses ',' as separator)" : "";
                throw new CalibrationCsvException(lineNo, 0, LineMessages.fmt(
                        "line %d: %d fields, but the header has %d%s", lineNo, cells.length, headerFields, hint));
            }
            double[] v = new double[COLUMNS.size()];
            for (int f = 0; f < cells.length; f++) {
                String cell = cells[f].strip();
                String col = COLUMNS.get(columnOf[f]);
                if (!NUMBER.matcher(cell).matches()) {
                    String why = cell.isEmpty() ? "is empty"
                            : "'" + cell + "' is not a number" + (cell.matches("[+-]?[0-9]*,[0-9]+")
                                    ? " (use a decimal point, not a decimal comma)" : "");
                    throw new CalibrationCsvException(lineNo, f + 1, LineMessages.fmt(
                            "line %d, column %d (%s): %s", lineNo, f + 1, col, why));
                }
                double d = Double.parseDouble(cell);
                if (!Double.isFinite(d)) {
                    throw new CalibrationCsvException(lineNo, f + 1, LineMessages.fmt(
                            "line %d, column %d (%s): '%s' is out of range", lineNo, f + 1, col, cell));
                }
                v[columnOf[f]] = d;
            }
            try {
                points.add(CalibrationPoint.of(v[0], v[1], v[2], v[3]));
            } catch (IllegalArgumentException e) {
                throw new CalibrationCsvException(lineNo, 0, LineMessages.line(lineNo, e.getMessage()));
            }
            lastLine = lineNo;
        }
        if (columnOf == null) {
            throw new CalibrationCsvException(0, 0, "the CSV text has no header line naming the columns x, y, u_x, u_y");
        }
        try {
            return CalibrationData.of(name, xUnit, yUnit, points);
        } catch (IllegalArgumentException e) {
            throw new CalibrationCsvException(lastLine, 0, "calibration CSV '" + name + "': " + e.getMessage());
        }
    }

    /**
     * Writes a data set as CSV text in the format {@link #parse} reads (comma separator, columns x, y, u_x,
     * u_y, shortest round-trip decimal representation). The covariance matrix is not written.
     */
    public static String format(CalibrationData data) {
        StringBuilder sb = new StringBuilder("x,y,u_x,u_y\n");
        for (CalibrationPoint p : data.points()) {
            sb.append(p.x()).append(',').append(p.y()).append(',').append(p.ux()).append(',').append(p.uy())
                    .append('\n');
        }
        return sb.toString();
    }
}
