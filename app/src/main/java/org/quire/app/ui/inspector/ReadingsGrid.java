package org.quire.app.ui.inspector;

import java.awt.Toolkit;
import java.util.List;
import java.awt.datatransfer.DataFlavor;
import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.util.List;
import javax.swing.AbstractAction;
import javax.swing.JComponent;
import javax.swing.JTable;
import javax.swing.KeyStroke;
import javax.swing.table.DefaultTableModel;
import org.quire.app.ui.common.Fmt;
import org.quire.engine.csv.CsvException;
import org.quire.engine.csv.CsvOptions;
import org.quire.engine.csv.CsvReadings;

/**
 * The readings of a Type A evaluation as a one-column grid that takes a paste from a spreadsheet (a column, or
 * a row of tab-separated cells). Pasted text and the grid's cells are read by the engine's CSV reader, the same
 * rule as a file import: blank lines are skipped; an ambiguous number ({@code 1,002}) or text that is not a
 * number is refused with its line.
 */
final class ReadingsGrid extends JTable {
    private final DefaultTableModel model = new DefaultTableModel(new Object[] {"#", "Reading"}, 0) {
        @Override
        public boolean isCellEditable(int r, int c) {
            return c == 1 && editable;
        }
    };
    private boolean editable = true;

    ReadingsGrid() {
        setModel(model);
        setName("readings");
        getColumnModel().getColumn(0).setMaxWidth(40);
        putClientProperty("terminateEditOnFocusLost", Boolean.TRUE);
        org.quire.app.ui.table.SpreadsheetTable.install(this, c -> c == 1, w -> w.run(),
                m -> firePropertyChange("pasteProblem", null, m));
        KeyStroke paste = KeyStroke.getKeyStroke(KeyEvent.VK_V, Toolkit.getDefaultToolkit().getMenuShortcutKeyMaskEx());
        getInputMap(JComponent.WHEN_FOCUSED).put(paste, "pasteReadings");
        getActionMap().put("pasteReadings", new AbstractAction() {
            @Override
            public void actionPerformed(ActionEvent e) {
                if (!editable) {
                    return;
                }
                try {
                    Object text = Toolkit.getDefaultToolkit().getSystemClipboard().getData(DataFlavor.stringFlavor);
                    pasteAtSelection(String.valueOf(text));
                } catch (IllegalArgumentException ex) {
                    firePropertyChange("pasteProblem", null, ex.getMessage());
                } catch (Exception ex) {
                    firePropertyChange("pasteProblem", null, "the clipboard holds no text");
                }
            }
        });
    }

    void setEditableGrid(boolean on) { editable = on; }

    /**
     * Pastes numbers (a cell, a column, a row or a block, read in reading order) from the selected row on,
     * overwriting the readings there and adding rows as needed; with no row selected they replace all readings.
     */
    void pasteAtSelection(String text) {
        double[] pasted;
        try {
            pasted = text.isBlank() ? new double[0] : CsvReadings.parseBlock("pasted text", text,
                    org.quire.app.ui.table.SpreadsheetTable.pasteOptions(text));
        } catch (CsvException e) {
            throw new IllegalArgumentException(e.getMessage(), e);
        }
        int at = getSelectionModel().getLeadSelectionIndex();
        if (at < 0 || getSelectedRowCount() == 0) {
            setReadings(pasted);
            return;
        }
        if (isEditing()) {
            getCellEditor().cancelCellEditing();
        }
        java.util.List<String> texts = new java.util.ArrayList<>();
        for (int i = 0; i < model.getRowCount(); i++) {
            Object v = model.getValueAt(i, 1);
            texts.add(v == null ? "" : v.toString());
        }
        while (texts.size() < at + pasted.length) {
            texts.add("");
        }
        for (int i = 0; i < pasted.length; i++) {
            texts.set(at + i, Fmt.num(pasted[i]));
        }
        setReadingTexts(texts);
        getSelectionModel().setSelectionInterval(at, at + Math.max(0, pasted.length - 1));
    }

    @Override
    public boolean editCellAt(int row, int column, java.util.EventObject e) {
        boolean started = super.editCellAt(row, column, e);
        if (started) {
            org.quire.app.ui.table.SpreadsheetTable.overtype(this, e);
        }
        return started;
    }

    /**
     * @param source the name in messages ({@code pasted text}, {@code readings grid})
     * @return the numbers in pasted text, in order, by the rule of the CSV reader (the same as a file import:
     *     {@code 1,002} is refused as ambiguous, never read as 1.002)
     * @throws IllegalArgumentException naming the line and why
     */
    static double[] parse(String source, String text) {
        if (text.isBlank()) {
            return new double[0];
        }
        try {
            return CsvReadings.parse(source, text, CsvOptions.defaults());
        } catch (CsvException e) {
            throw new IllegalArgumentException(e.getMessage(), e);
        }
    }

    void setReadings(double[] r) {
        model.setRowCount(0);
        if (r != null) {
            for (int i = 0; i < r.length; i++) {
                model.addRow(new Object[] {i + 1, Fmt.num(r[i])});
            }
        }
        model.addRow(new Object[] {model.getRowCount() + 1, ""});
    }

    /** Shows readings as text (a draft kept while not applied). */
    void setReadingTexts(List<String> texts) {
        model.setRowCount(0);
        for (String t : texts) {
            if (!t.isBlank()) {
                model.addRow(new Object[] {model.getRowCount() + 1, t});
            }
        }
        model.addRow(new Object[] {model.getRowCount() + 1, ""});
    }

    /** @return the readings entered; blank rows skipped */
    double[] readings() {
        if (isEditing()) {
            getCellEditor().stopCellEditing();
        }
        StringBuilder s = new StringBuilder();
        for (int i = 0; i < model.getRowCount(); i++) {
            Object v = model.getValueAt(i, 1);
            s.append(v == null ? "" : v.toString().replace('\u2212', '-')).append('\n');
        }
        return parse("readings grid", s.toString());
    }
}
