package org.quire.app.ui.notebook;

import org.quire.app.ui.common.EditorContext;
import org.quire.app.ui.common.Section;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import javax.swing.DefaultCellEditor;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.ListSelectionModel;
import javax.swing.table.DefaultTableCellRenderer;
import org.quire.app.ui.table.SpreadsheetTable;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.Correlation;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.TypeB;

/** The input quantities as a table with inline editing; the inspector shows every option of the selection. */
final class InputsSection implements Section {
    private final EditorContext ctx;
    private final JPanel body = new JPanel(new BorderLayout(4, 4));
    private final InputsTableModel model;
    private final JTable table;
    private final JButton add = new JButton("Add input");
    private final JButton remove = new JButton("Remove input");

    InputsSection(EditorContext ctx) {
        this.ctx = ctx;
        this.model = new InputsTableModel(ctx);
        this.table = new JTable(model) {
            @Override
            public boolean editCellAt(int row, int column, java.util.EventObject e) {
                boolean started = super.editCellAt(row, column, e);
                if (started) {
                    SpreadsheetTable.overtype(this, e);
                }
                return started;
            }

            @Override
            public String getToolTipText(java.awt.event.MouseEvent e) {
                int r = rowAtPoint(e.getPoint());
                int c = columnAtPoint(e.getPoint());
                Object v = r < 0 || c < 0 ? null : getValueAt(r, c);
                String lock = r < 0 || c < 0 ? null : model.lockReason(r, convertColumnIndexToModel(c));
                String text = v == null || v.toString().isEmpty() ? null : v.toString();
                return lock == null ? text : (text == null ? "" : text + " \u2014 ") + lock;
            }
        };
        table.setToolTipText("");
        table.setName("inputs");
        table.setSelectionMode(ListSelectionModel.SINGLE_INTERVAL_SELECTION);
        table.setCellSelectionEnabled(true);
        SpreadsheetTable.install(table, c -> c == InputsTableModel.ESTIMATE || c == InputsTableModel.U
                || c == InputsTableModel.DOF, model::asOneEdit, m -> {
                    if (m != null) {
                        ctx.status(m, true);
                    }
                });
        table.putClientProperty("terminateEditOnFocusLost", Boolean.TRUE);
        table.setAutoResizeMode(JTable.AUTO_RESIZE_SUBSEQUENT_COLUMNS);
        int[] widths = {80, 230, 55, 95, 70, 95, 110, 80, 200};
        for (int i = 0; i < widths.length; i++) {
            table.getColumnModel().getColumn(i).setPreferredWidth(widths[i]);
        }
        table.getColumnModel().getColumn(InputsTableModel.DISTRIBUTION)
                .setCellEditor(new DefaultCellEditor(new JComboBox<>(TypeB.DISTRIBUTIONS.toArray(new String[0]))));
        DefaultTableCellRenderer right = new DefaultTableCellRenderer();
        right.setHorizontalAlignment(DefaultTableCellRenderer.RIGHT);
        for (int c : new int[] {InputsTableModel.ESTIMATE, InputsTableModel.U, InputsTableModel.DOF}) {
            table.getColumnModel().getColumn(c).setCellRenderer(right);
        }
        table.getSelectionModel().addListSelectionListener(e -> {
            if (!e.getValueIsAdjusting()) {
                int r = table.getSelectionModel().getLeadSelectionIndex();
                if (table.getSelectedRowCount() == 0 || r < 0 || r >= model.getRowCount()) {
                    ctx.selectInput(null);
                } else {
                    ctx.selectInput(model.input(r).name());
                }
            }
        });
        JScrollPane sp = new JScrollPane(table);
        sp.setPreferredSize(new Dimension(800, 300));
        body.add(sp, BorderLayout.CENTER);
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.LEFT, 4, 0));
        buttons.add(add);
        buttons.add(remove);
        body.add(buttons, BorderLayout.SOUTH);
        add.setToolTipText("Add an input quantity (starts as an exactly known constant 0)");
        add.addActionListener(e -> addInput());
        remove.addActionListener(e -> removeInput());
    }

    JTable table() { return table; }

    private void addInput() {
        Budget b = ctx.document().budget();
        String name = "x1";
        for (int i = 2; b.inputNames().contains(name) || b.outputNames().contains(name); i++) {
            name = "x" + i;
        }
        String n = name;
        List<InputQuantity> list = new ArrayList<>(b.inputs());
        list.add(InputQuantity.of(n, TypeB.of("constant", Map.of("estimate", 0.0))));
        if (ctx.edit("Add input " + n, "", x -> x.withInputs(list))) {
            table.getSelectionModel().setSelectionInterval(list.size() - 1, list.size() - 1);
            table.scrollRectToVisible(table.getCellRect(list.size() - 1, 0, true));
        }
    }

    private void removeInput() {
        int r = table.getSelectedRow();
        if (r < 0) {
            ctx.status("Select the input to remove first.", true);
            return;
        }
        String name = model.input(r).name();
        ctx.edit("Remove input " + name, "", b -> {
            List<InputQuantity> list = new ArrayList<>(b.inputs());
            list.removeIf(q -> q.name().equals(name));
            List<Correlation> cs = new ArrayList<>(b.correlations());
            cs.removeIf(c -> c.first().equals(name) || c.second().equals(name));
            return b.withInputs(list).withCorrelations(cs);
        });
    }

    /** Selects the row of an input. */
    void select(String name) {
        for (int r = 0; r < model.getRowCount(); r++) {
            if (model.input(r).name().equals(name)) {
                // a block of rows selected by the user (Shift+click, for Copy) is kept while its lead row is the input
                if (table.getSelectionModel().getLeadSelectionIndex() != r || !table.isRowSelected(r)) {
                    table.getSelectionModel().setSelectionInterval(r, r);
                }
                if (table.getSelectedColumnCount() == 0) {
                    table.getColumnModel().getSelectionModel().setSelectionInterval(0, 0);
                }
                return;
            }
        }
    }

    @Override public String title() { return "Inputs"; }
    @Override public JComponent body() { return body; }

    @Override
    public void budgetChanged(Budget b) {
        int r = table.getSelectedRow();
        String selected = r < 0 || r >= model.getRowCount() ? null : model.input(r).name();
        boolean resize = model.getRowCount() != b.inputs().size() || model.getRowCount() == 0;
        model.budgetChanged(b);
        if (resize) {
            SpreadsheetTable.fitColumns(table, 240);
        }
        if (selected != null && table.getSelectedRow() < 0) {
            select(selected);
        }
    }

    @Override
    public void readOnlyChanged(boolean ro) {
        add.setEnabled(!ro);
        remove.setEnabled(!ro);
    }
}
