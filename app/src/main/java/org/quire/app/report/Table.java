package org.quire.app.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * A table of a report, in a form every renderer (HTML, PDF, CSV, the workbench) can draw: a key that names it
 * in files, a caption, columns with a typeset heading and a plain CSV name, and rows of cells. A numeric cell
 * keeps its full-precision value beside the text shown, so the CSV export loses nothing.
 *
 * @param key a short file-safe name, e.g. {@code budget-l}
 * @param caption the caption shown above the table
 * @param columns the columns
 * @param rows the rows; each has one cell per column
 *
 * <p>Immutable and thread-safe.
 */
public record Table(String key, MathText caption, List<Column> columns, List<List<Cell>> rows) {

    /** A table whose caption is words only. */
    public Table(String key, String caption, List<Column> columns, List<List<Cell>> rows) {
        this(key, Typesetter.prose(caption), columns, rows);
    }

    /** How a column's cells are aligned. */
    public enum Align { LEFT, RIGHT }

    /**
     * @param heading the heading as typeset mathematics or words
     * @param csvName the heading in CSV files: lower case, words joined by underscores
     * @param align alignment of the cells
     * @param weight the relative width in the PDF (1 = normal)
     */
    public record Column(MathText heading, String csvName, Align align, float weight) {
        public Column {
            Objects.requireNonNull(heading, "heading");
            Objects.requireNonNull(csvName, "csvName");
            Objects.requireNonNull(align, "align");
            if (!(weight > 0)) {
                throw new IllegalArgumentException("column weight must be positive, not " + weight);
            }
        }

        /**
         * @return a column whose heading is {@link Typesetter#labelWithUnit(String)} of {@code label}: label markup,
         *     with a unit in parentheses at the end set upright
         */
        public static Column of(String label, String csvName, Align align, float weight) {
            return new Column(Typesetter.labelWithUnit(label), csvName, align, weight);
        }
    }

    /**
     * @param text what the report shows, as mathematics (usually plain upright text)
     * @param value the full-precision number behind the text, or NaN for a text cell
     */
    public record Cell(MathText text, double value) {
        public Cell {
            Objects.requireNonNull(text, "text");
        }

        /** @return a cell of words, as {@link Typesetter#prose(String)} sets them ("±", m³) */
        public static Cell text(String s) {
            return new Cell(Typesetter.prose(s == null ? "" : s), Double.NaN);
        }

        /** @return a cell holding a unit as written in a budget, in its display form */
        public static Cell unit(String written) {
            return new Cell(Typesetter.unit(written), Double.NaN);
        }

        public static Cell math(MathText m) {
            return new Cell(m, Double.NaN);
        }

        public static Cell number(String shown, double value) {
            return new Cell(MathText.upright(shown), value);
        }

        /** @return whether a full-precision value stands behind the text */
        public boolean isNumber() {
            return !Double.isNaN(value);
        }
    }

    public Table {
        Objects.requireNonNull(key, "key");
        if (!key.matches("[a-z0-9][a-z0-9._-]*")) {
            throw new IllegalArgumentException("table key '" + key + "' must be lower-case letters, digits, '.', '-' or '_'");
        }
        Objects.requireNonNull(caption, "caption");
        columns = List.copyOf(columns);
        List<List<Cell>> copy = new ArrayList<>();
        for (int i = 0; i < rows.size(); i++) {
            if (rows.get(i).size() != columns.size()) {
                throw new IllegalArgumentException("row " + (i + 1) + " of table '" + key + "' has "
                        + rows.get(i).size() + " cells for " + columns.size() + " columns");
            }
            copy.add(List.copyOf(rows.get(i)));
        }
        rows = List.copyOf(copy);
    }

    /** @return whether the table has no rows */
    public boolean isEmpty() {
        return rows.isEmpty();
    }
}
