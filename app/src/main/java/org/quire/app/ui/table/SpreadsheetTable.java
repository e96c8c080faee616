package org.quire.app.ui.table;

import java.awt.Component;
import java.awt.datatransfer.DataFlavor;
import java.awt.datatransfer.StringSelection;
import java.awt.datatransfer.Transferable;
import java.util.ArrayList;
import java.util.EventObject;
import java.util.List;
import java.util.function.Consumer;
import java.util.function.IntPredicate;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JTable;
import javax.swing.TransferHandler;
import javax.swing.table.TableCellRenderer;
import javax.swing.text.JTextComponent;
import org.quire.engine.csv.CsvException;
import org.quire.engine.csv.CsvOptions;
import org.quire.engine.csv.CsvReader;
import org.quire.engine.csv.CsvRow;
import org.quire.engine.csv.CsvTable;

/**
 * A table that behaves like a spreadsheet: typing into a selected cell replaces its value, Copy puts the selected
 * block (or the whole table) on the clipboard with its column headers and the numbers as shown, and Paste takes
 * a cell, a row or a block separated by tabs or {@code ;} from the selected cell on. Pasted numbers are read by
 * the engine's one number rule ({@link CsvRow#number(int)}: a decimal comma only where it is unambiguous); a
 * pasted header row (as Copy writes it) is skipped.
 */
public final class SpreadsheetTable {
    private SpreadsheetTable() {
    }

    /** What a paste does with the cells it reads. */
    public interface Sink {
        /**
         * Runs the paste's writes as one edit (one undo step).
         *
         * @param writes the writes
         */
        void asOneEdit(Runnable writes);
    }

    /**
     * Gives a table the spreadsheet's copy, paste and overtyping.
     *
     * @param table the table
     * @param numeric whether a model column holds numbers (read by the number rule when pasted)
     * @param sink how a paste's writes become one edit
     * @param problem told of a refused paste, with the cell and why
     */
    public static void install(JTable table, IntPredicate numeric, Sink sink, Consumer<String> problem) {
        table.setTransferHandler(new Handler(table, numeric, sink, problem));
        table.putClientProperty("JTable.autoStartsEdit", Boolean.TRUE);
        table.setSurrendersFocusOnKeystroke(false);
    }

    /**
     * Starts editing a cell for a keystroke with an empty editor, so that the typed character replaces the value
     * (call from {@link JTable#editCellAt(int, int, EventObject)}).
     *
     * @param table the table that just started editing
     * @param e the event that started it
     */
    public static void overtype(JTable table, EventObject e) {
        if (e instanceof java.awt.event.KeyEvent && table.getEditorComponent() instanceof JTextComponent) {
            ((JTextComponent) table.getEditorComponent()).setText("");
        }
    }

    /**
     * Sizes each column to its header and its widest cell, up to {@code maxWidth} (longer text keeps its
     * tooltip), and lets the header show each column's full name as a tooltip.
     */
    public static void fitColumns(JTable t, int maxWidth) {
        t.setAutoResizeMode(JTable.AUTO_RESIZE_OFF);
        fitColumnWidths(t, maxWidth);
        if (!(t.getTableHeader() instanceof TippedHeader) && t.getTableHeader() != null) {
            t.setTableHeader(new TippedHeader(t.getColumnModel()));
        }
    }

    /**
     * Sets each column's preferred width to that of its header or its widest cell (of the first 500 rows), plus a
     * margin, at most {@code maxWidth}; the table's resize mode and header are left as they are.
     */
    public static void fitColumnWidths(JTable t, int maxWidth) {
        for (int c = 0; c < t.getColumnCount(); c++) {
            javax.swing.table.TableColumn col = t.getColumnModel().getColumn(c);
            Component h = t.getTableHeader().getDefaultRenderer().getTableCellRendererComponent(t,
                    col.getHeaderValue(), false, false, -1, c);
            int w = h.getPreferredSize().width;
            for (int r = 0; r < Math.min(t.getRowCount(), 500); r++) {
                w = Math.max(w, t.prepareRenderer(t.getCellRenderer(r, c), r, c).getPreferredSize().width);
            }
            col.setPreferredWidth(Math.min(maxWidth, w + 12));
        }
    }

    /** A header that shows each column's full name as its tooltip. */
    private static final class TippedHeader extends javax.swing.table.JTableHeader {
        TippedHeader(javax.swing.table.TableColumnModel m) {
            super(m);
        }

        @Override
        public String getToolTipText(java.awt.event.MouseEvent e) {
            int c = columnAtPoint(e.getPoint());
            return c < 0 ? null : plain(String.valueOf(getColumnModel().getColumn(c).getHeaderValue()));
        }
    }

    /** @return the selected block (or the whole table) as tab-separated text with headers, as displayed */
    public static String copyText(JTable t) {
        int[] rows = t.getSelectedRows();
        int[] cols = t.getSelectedColumns();
        if (rows.length == 0) {
            rows = range(t.getRowCount());
        }
        if (cols.length == 0 || !t.getColumnSelectionAllowed() && !t.getCellSelectionEnabled()) {
            cols = range(t.getColumnCount());
        }
        StringBuilder s = new StringBuilder();
        for (int i = 0; i < cols.length; i++) {
            s.append(i == 0 ? "" : "\t").append(plain(t.getColumnName(cols[i])));
        }
        s.append('\n');
        for (int r : rows) {
            for (int i = 0; i < cols.length; i++) {
                s.append(i == 0 ? "" : "\t").append(plain(displayed(t, r, cols[i])));
            }
            s.append('\n');
        }
        return s.toString();
    }

    /**
     * The client property of a renderer component whose value (a String) is the cell's text in full, where the
     * cell shows it shortened or on several lines for its column's width: Copy takes it.
     */
    public static final String COPY_TEXT = "SpreadsheetTable.copyText";

    /** @return the text a cell shows (its renderer's, or its {@link #COPY_TEXT}), view indices */
    public static String displayed(JTable t, int row, int col) {
        TableCellRenderer r = t.getCellRenderer(row, col);
        Component c = r.getTableCellRendererComponent(t, t.getValueAt(row, col), false, false, row, col);
        if (c instanceof javax.swing.JComponent
                && ((javax.swing.JComponent) c).getClientProperty(COPY_TEXT) instanceof String) {
            return (String) ((javax.swing.JComponent) c).getClientProperty(COPY_TEXT);
        }
        if (c instanceof JLabel) {
            return ((JLabel) c).getText();
        }
        Object v = t.getValueAt(row, col);
        return v == null ? "" : v.toString();
    }

    private static String plain(String s) {
        String p = s == null ? "" : s.replaceAll("<[^>]*>", " ").replace("&lt;", "<").replace("&amp;", "&");
        return p.replaceAll("[\\t\\r\\n]+", " ").replaceAll(" {2,}", " ").trim();
    }

    private static int[] range(int n) {
        int[] a = new int[n];
        for (int i = 0; i < n; i++) {
            a[i] = i;
        }
        return a;
    }

    /**
     * Reads pasted text: cells separated by tabs, or by {@code ;} when there is no tab; one cell per line
     * otherwise (a comma never separates pasted cells: it is a decimal comma or refused by the number rule).
     *
     * @return the table of cells
     * @throws CsvException naming the pasted line and why
     */
    public static CsvTable read(String text) throws CsvException {
        return CsvReader.parse("pasted text", text, pasteOptions(text).withHeader(false));
    }

    /**
     * @return the reader's options for pasted text: separated by tabs when it has one, else by {@code ;} when it
     *     has one, else one cell a line
     */
    public static CsvOptions pasteOptions(String text) {
        CsvOptions.Separator sep = text.indexOf('\t') >= 0 ? CsvOptions.Separator.TAB
                : text.indexOf(';') >= 0 ? CsvOptions.Separator.SEMICOLON : CsvOptions.Separator.TAB;
        return CsvOptions.defaults().withSeparator(sep);
    }

    private static final class Handler extends TransferHandler {
        private final JTable table;
        private final IntPredicate numeric;
        private final Sink sink;
        private final Consumer<String> problem;

        Handler(JTable table, IntPredicate numeric, Sink sink, Consumer<String> problem) {
            this.table = table;
            this.numeric = numeric;
            this.sink = sink;
            this.problem = problem;
        }

        @Override
        public int getSourceActions(JComponent c) {
            return COPY;
        }

        @Override
        protected Transferable createTransferable(JComponent c) {
            return new StringSelection(copyText(table));
        }

        @Override
        public boolean canImport(TransferSupport s) {
            return s.isDataFlavorSupported(DataFlavor.stringFlavor);
        }

        @Override
        public boolean importData(TransferSupport s) {
            if (!canImport(s)) {
                return false;
            }
            try {
                paste((String) s.getTransferable().getTransferData(DataFlavor.stringFlavor));
                return true;
            } catch (CsvException | IllegalArgumentException e) {
                problem.accept(e.getMessage());
                return false;
            } catch (java.awt.datatransfer.UnsupportedFlavorException | java.io.IOException e) {
                problem.accept("the clipboard holds no text");
                return false;
            }
        }

        private void paste(String text) throws CsvException {
            if (table.isEditing()) {
                table.getCellEditor().stopCellEditing();
            }
            CsvTable cells = read(text);
            List<CsvRow> rows = new ArrayList<>(cells.rows());
            if (!rows.isEmpty() && isHeader(rows.get(0))) {
                rows.remove(0);
            }
            int r0 = Math.max(0, table.getSelectionModel().getLeadSelectionIndex());
            int c0 = Math.max(0, table.getColumnModel().getSelectionModel().getLeadSelectionIndex());
            if (!table.getColumnSelectionAllowed() && !table.getCellSelectionEnabled()) {
                c0 = Math.max(0, c0);
            }
            List<Object[]> writes = new ArrayList<>();
            int skipped = 0;
            for (int i = 0; i < rows.size(); i++) {
                CsvRow row = rows.get(i);
                for (int j = 0; j < row.size(); j++) {
                    int r = r0 + i;
                    int c = c0 + j;
                    if (r >= table.getRowCount() || c >= table.getColumnCount()) {
                        skipped++;
                        continue;
                    }
                    if (!table.isCellEditable(r, c)) {
                        if (!plain(displayed(table, r, c)).equals(row.text(j))) {
                            skipped++;
                        }
                        continue;
                    }
                    int mc = table.convertColumnIndexToModel(c);
                    String cell = row.text(j);
                    Object value = cell;
                    if (numeric.test(mc) && !cell.isEmpty() && !isInfinity(cell)) {
                        value = row.number(j);
                    }
                    writes.add(new Object[] {value, r, c});
                }
            }
            sink.asOneEdit(() -> {
                for (Object[] w : writes) {
                    table.setValueAt(w[0], (Integer) w[1], (Integer) w[2]);
                }
            });
            int rowsDone = rows.size();
            if (skipped > 0) {
                problem.accept(skipped + (skipped == 1 ? " pasted cell was" : " pasted cells were")
                        + " not taken: beyond the table or not editable there");
            } else if (rowsDone > 0) {
                problem.accept(null);
            }
        }

        private boolean isHeader(CsvRow row) {
            int c0 = Math.max(0, table.getColumnModel().getSelectionModel().getLeadSelectionIndex());
            int matches = 0;
            for (int j = 0; j < row.size(); j++) {
                for (int c = 0; c < table.getColumnCount(); c++) {
                    if (plain(table.getColumnName(c)).equals(row.cells().get(j))) {
                        matches++;
                        break;
                    }
                }
            }
            return matches > 0 && matches == row.size() && c0 >= 0;
        }

        private static boolean isInfinity(String s) {
            return s.equalsIgnoreCase("inf") || s.equals("\u221e");
        }
    }
}
