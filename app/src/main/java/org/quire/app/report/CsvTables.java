package org.quire.app.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * Writes every table of a report as CSV (RFC 4180: comma-separated, fields with commas, quotes or line breaks
 * quoted, CRLF line ends, UTF-8), one file per table named after the table's key ({@code inputs.csv},
 * {@code budget-l.csv}, {@code result-l.csv}, ...). The first row holds the columns' CSV names. Numeric cells are
 * written at full precision (up to 17 significant digits, {@code inf} for infinity), not as rounded for show,
 * so that a spreadsheet recomputes the same figures; text cells as shown, with subscripts written {@code x_i}.
 *
 * <p>Stateless and thread-safe.
 */
public final class CsvTables {
    private CsvTables() {
    }

    /** @return the table as CSV text */
    public static String render(Table t) {
        StringBuilder s = new StringBuilder();
        List<String> head = new ArrayList<>();
        for (Table.Column c : t.columns()) {
            head.add(cell(c.csvName()));
        }
        s.append(String.join(",", head)).append("\r\n");
        for (List<Table.Cell> row : t.rows()) {
            List<String> cells = new ArrayList<>();
            for (Table.Cell c : row) {
                cells.add(cell(c.isNumber() ? number(c.value()) : c.text().plain()));
            }
            s.append(String.join(",", cells)).append("\r\n");
        }
        return s.toString();
    }

    /**
     * Writes each table of the report to {@code dir}, each file whole or not at all.
     *
     * @return the files written, in table order
     * @throws IOException naming the folder or file that cannot be written
     */
    public static List<Path> write(ReportModel m, Path dir) throws IOException {
        if (!Files.isDirectory(dir)) {
            throw new IOException("cannot write CSV tables to " + dir + ": no such folder");
        }
        List<Path> written = new ArrayList<>();
        Set<String> used = new HashSet<>();
        for (Table t : m.tables()) {
            String name = t.key();
            for (int k = 2; !used.add(name); k++) {
                name = t.key() + "-" + k;
            }
            Path f = dir.resolve(name + ".csv");
            byte[] bytes = render(t).getBytes(StandardCharsets.UTF_8);
            org.quire.engine.document.DocumentStore.writeAtomically(f, out -> out.write(bytes));
            written.add(f);
        }
        return written;
    }

    static String number(double v) {
        if (Double.isNaN(v)) {
            return "";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "inf" : "-inf";
        }
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? String.format(Locale.ROOT, "%.0f", v) : Double.toString(v);
    }

    static String cell(String s) {
        if (s.contains(",") || s.contains("\"") || s.contains("\n") || s.contains("\r")) {
            return "\"" + s.replace("\"", "\"\"") + "\"";
        }
        return s;
    }
}
