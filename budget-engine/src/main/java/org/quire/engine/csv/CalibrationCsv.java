package org.quire.engine.csv;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.quire.engine.line.CalibrationData;
import org.quire.engine.line.CalibrationPoint;

/**
 * Calibration data sets in CSV form, read by the one CSV reader ({@link CsvReader}, so separator, decimal mark
 * and numbers follow its rules).
 *
 * <p>The header names the columns {@code x}, {@code y}, {@code u_x}, {@code u_y} (case ignored) in any order;
 * {@code x} and {@code y} are required, each name may occur once, and no other name is accepted. A missing
 * {@code u_x} or {@code u_y} column means "not stated" (zero). Lines that are empty or start with {@code #}
 * are skipped. Every error is a {@link CsvException} that names the source, the line and, for a bad cell, the
 * column. Stateless and thread-safe.
 */
public final class CalibrationCsv {

    /** The accepted column names, in the canonical order. */
    public static final List<String> COLUMNS = List.of("x", "y", "u_x", "u_y");

    private CalibrationCsv() {
    }

    /**
     * Reads a data set from a CSV file; its name is the file name.
     *
     * @throws IOException when the file cannot be read
     * @throws CsvException when the file is not a calibration data set; the message names line and column
     */
    public static CalibrationData read(Path file, String xUnit, String yUnit) throws IOException, CsvException {
        CsvTable t = CsvReader.read(file, CsvOptions.defaults());
        return of(t, t.sourceName(), xUnit, yUnit);
    }

    /**
     * Reads a data set from CSV text.
     *
     * @param text the CSV text
     * @param name the data set's name, also the source name in messages
     * @param xUnit unit of x
     * @param yUnit unit of y
     * @return the checked data set
     * @throws CsvException when the text is malformed or a point is invalid; the message names line and column
     */
    public static CalibrationData parse(String text, String name, String xUnit, String yUnit) throws CsvException {
        if (text == null) {
            throw new IllegalArgumentException("CSV text is missing");
        }
        return of(CsvReader.parse(name, text, CsvOptions.defaults()), name, xUnit, yUnit);
    }

    /** @return the data set in a table read by the CSV reader */
    public static CalibrationData of(CsvTable t, String name, String xUnit, String yUnit) throws CsvException {
        List<String> header = t.header();
        int[] columnOf = new int[COLUMNS.size()];
        java.util.Arrays.fill(columnOf, -1);
        for (int f = 0; f < header.size(); f++) {
            String nm = header.get(f).toLowerCase(Locale.ROOT);
            int idx = COLUMNS.indexOf(nm);
            if (idx < 0 || columnOf[idx] >= 0) {
                // a wrong separator shows as one unknown column: let the table say so
                if (header.size() == 1) {
                    t.requireColumns("x", "y");
                }
                throw problem(t, f, idx < 0
                        ? String.format(Locale.ROOT, "unknown column name '%s'; expected x, y, u_x, u_y", header.get(f))
                        : String.format(Locale.ROOT, "column '%s' is named twice", nm));
            }
            columnOf[idx] = f;
        }
        for (int req = 0; req < 2; req++) {
            if (columnOf[req] < 0) {
                t.requireColumns(COLUMNS.get(req));
            }
        }
        List<CalibrationPoint> points = new ArrayList<>();
        int lastLine = 0;
        for (CsvRow r : t.rows()) {
            double[] v = new double[COLUMNS.size()];
            for (int k = 0; k < COLUMNS.size(); k++) {
                v[k] = columnOf[k] < 0 ? 0 : r.number(columnOf[k]);
            }
            try {
                points.add(CalibrationPoint.of(v[0], v[1], v[2], v[3]));
            } catch (IllegalArgumentException e) {
                throw r.problem(-1, e.getMessage());
            }
            lastLine = r.line();
        }
        try {
            return CalibrationData.of(name, xUnit, yUnit, points);
        } catch (IllegalArgumentException e) {
            throw t.rows().isEmpty() ? problem(t, -1, e.getMessage())
                    : t.rows().get(t.rows().size() - 1).problem(-1, e.getMessage() + " (up to line " + lastLine + ")");
        }
    }

    private static CsvException problem(CsvTable t, int column, String reason) {
        return t.headerProblem(column, reason);
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
