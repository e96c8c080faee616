package org.quire.app.ui.inspector;

import java.awt.Toolkit;
import java.awt.datatransfer.DataFlavor;
import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.util.ArrayList;
import java.util.List;
import javax.swing.AbstractAction;
import javax.swing.JComponent;
import javax.swing.JTable;
import javax.swing.KeyStroke;
import javax.swing.table.DefaultTableModel;
import org.quire.app.ui.Fmt;

/**
 * The readings of a Type A evaluation as a one-column grid that takes a paste from a spreadsheet: numbers
 * separated by line breaks, tabs, semicolons or spaces. Blank lines are skipped; text that is not a number is
 * refused with its line.
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
                    setReadings(parse(String.valueOf(text)));
                } catch (IllegalArgumentException ex) {
                    firePropertyChange("pasteProblem", null, ex.getMessage());
                } catch (Exception ex) {
                    firePropertyChange("pasteProblem", null, "the clipboard holds no text");
                }
            }
        });
    }

    void setEditableGrid(boolean on) { editable = on; }

    /** @return the numbers in pasted text, in order */
    static double[] parse(String text) {
        List<Double> out = new ArrayList<>();
        String[] lines = text.split("\\R");
        for (int i = 0; i < lines.length; i++) {
            for (String cell : lines[i].split("[\\t;]+|\\s{1,}")) {
                if (cell.isBlank()) {
                    continue;
                }
                try {
                    out.add(Fmt.parse(cell.replace(',', '.')));
                } catch (NumberFormatException e) {
                    throw new IllegalArgumentException("pasted line " + (i + 1) + ": " + e.getMessage());
                }
            }
        }
        double[] r = new double[out.size()];
        for (int i = 0; i < r.length; i++) {
            r[i] = out.get(i);
        }
        return r;
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
            s.append(model.getValueAt(i, 1)).append('\n');
        }
        return parse(s.toString().replace("null", ""));
    }
}
