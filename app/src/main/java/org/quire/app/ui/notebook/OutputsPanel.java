package org.quire.app.ui.notebook;

import org.quire.app.ui.common.EditorContext;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JButton;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.table.AbstractTableModel;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.OutputQuantity;

/** The declared outputs of the model: name, unit and description, editable in place. */
final class OutputsPanel extends JPanel {
    private final EditorContext ctx;
    private final Model model = new Model();
    private final JTable table = new JTable(model);
    private final JButton add = new JButton("Add output");
    private final JButton remove = new JButton("Remove output");
    private List<OutputQuantity> rows = List.of();
    private boolean readOnly;

    OutputsPanel(EditorContext ctx) {
        super(new BorderLayout(4, 4));
        this.ctx = ctx;
        table.setName("outputs");
        setBorder(javax.swing.BorderFactory.createTitledBorder("Declared outputs"));
        JScrollPane sp = new JScrollPane(table);
        sp.setPreferredSize(new Dimension(500, 70));
        add(sp, BorderLayout.CENTER);
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.LEFT, 4, 0));
        buttons.add(add);
        buttons.add(remove);
        add(buttons, BorderLayout.SOUTH);
        add.addActionListener(e -> addOutput());
        remove.addActionListener(e -> removeOutput());
    }

    private void addOutput() {
        Budget b = ctx.document().budget();
        String name = "Y";
        for (int i = 2; b.outputNames().contains(name) || b.inputNames().contains(name); i++) {
            name = "Y" + i;
        }
        String n = name;
        List<OutputQuantity> list = new ArrayList<>(b.outputs());
        list.add(OutputQuantity.of(n));
        ctx.edit("Add output " + n, "", x -> x.withOutputs(list));
    }

    private void removeOutput() {
        int r = table.getSelectedRow();
        if (r < 0) {
            ctx.status("Select the output to remove first.", true);
            return;
        }
        List<OutputQuantity> list = new ArrayList<>(rows);
        OutputQuantity gone = list.remove(r);
        ctx.edit("Remove output " + gone.name(), "", x -> x.withOutputs(list));
    }

    void budgetChanged(Budget b) {
        if (!b.outputs().equals(rows)) {
            rows = b.outputs();
            model.fireTableDataChanged();
        }
    }

    void readOnlyChanged(boolean ro) {
        readOnly = ro;
        add.setEnabled(!ro);
        remove.setEnabled(!ro);
    }

    private final class Model extends AbstractTableModel {
        private final String[] cols = {"Name", "Unit", "Description"};

        @Override public int getRowCount() { return rows.size(); }
        @Override public int getColumnCount() { return cols.length; }
        @Override public String getColumnName(int c) { return cols[c]; }
        @Override public boolean isCellEditable(int r, int c) { return !readOnly; }

        @Override
        public Object getValueAt(int r, int c) {
            OutputQuantity o = rows.get(r);
            return c == 0 ? o.name() : c == 1 ? o.unit() : o.description();
        }

        @Override
        public void setValueAt(Object v, int r, int c) {
            OutputQuantity o = rows.get(r);
            String s = String.valueOf(v).trim();
            List<OutputQuantity> list = new ArrayList<>(rows);
            ctx.edit("Edit output " + o.name(), "", b -> {
                list.set(r, new OutputQuantity(c == 0 ? s : o.name(), c == 1 ? s : o.unit(),
                        c == 2 ? s : o.description()));
                return b.withOutputs(list);
            });
        }
    }
}
