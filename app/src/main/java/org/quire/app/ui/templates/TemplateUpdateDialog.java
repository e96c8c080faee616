package org.quire.app.ui.templates;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.awt.Window;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JDialog;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.table.AbstractTableModel;
import org.quire.engine.document.Template;
import org.quire.engine.document.TemplateChange;

/**
 * The changes a newer version of a budget's template brings ({@code TemplateLibrary.compare}), field by field,
 * each with a check box; the checked ones are taken over ({@code TemplateLibrary.adopt}) by the caller.
 */
public final class TemplateUpdateDialog extends JDialog {
    private static final long serialVersionUID = 1L;
    private final ChangesModel model;
    private final JTable table;
    private List<TemplateChange> chosen = List.of();

    /**
     * @param owner the workbench window
     * @param newer the newer template
     * @param followed the version the budget follows
     * @param changes the differences, from {@code TemplateLibrary.compare}
     */
    public TemplateUpdateDialog(Window owner, Template newer, int followed, List<TemplateChange> changes) {
        super(owner, "Changes in template " + newer.id(), ModalityType.APPLICATION_MODAL);
        setName("templateUpdate");
        model = new ChangesModel(changes);
        table = new JTable(model);
        table.setName("changes");
        table.getColumnModel().getColumn(0).setMaxWidth(60);
        table.getColumnModel().getColumn(1).setPreferredWidth(130);
        table.getColumnModel().getColumn(2).setPreferredWidth(110);
        table.getColumnModel().getColumn(3).setPreferredWidth(260);
        table.getColumnModel().getColumn(4).setPreferredWidth(260);
        JLabel head = new JLabel("<html>This budget follows <b>" + newer.id() + "</b> version " + followed
                + "; the library has version " + newer.version() + ". Check the changes to take over; your own "
                + "parameter values are kept.</html>");
        head.setBorder(BorderFactory.createEmptyBorder(8, 8, 8, 8));
        JButton adopt = new JButton("Take over the checked changes");
        adopt.setName("adopt");
        adopt.addActionListener(e -> {
            chosen = model.checked();
            dispose();
        });
        JButton later = new JButton("Not now");
        later.addActionListener(e -> dispose());
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.RIGHT));
        buttons.add(adopt);
        buttons.add(later);
        getContentPane().add(head, BorderLayout.NORTH);
        getContentPane().add(new JScrollPane(table), BorderLayout.CENTER);
        getContentPane().add(buttons, BorderLayout.SOUTH);
        setSize(900, 420);
        setLocationRelativeTo(owner);
    }

    /** @return the changes checked when the user confirmed; empty when cancelled */
    public List<TemplateChange> chosen() {
        return chosen;
    }

    /** @return the table, for tests */
    public JTable table() {
        return table;
    }

    /** @return the kind of change in words, e.g. "estimate changed" */
    static String kind(TemplateChange.Kind k) {
        return k.name().toLowerCase(Locale.ROOT).replace('_', ' ');
    }

    private static final class ChangesModel extends AbstractTableModel {
        private static final long serialVersionUID = 1L;
        private static final String[] COLUMNS = {"Adopt", "Change", "Subject", "This budget", "Template"};
        private final List<TemplateChange> changes;
        private final boolean[] checked;

        ChangesModel(List<TemplateChange> changes) {
            this.changes = List.copyOf(changes);
            this.checked = new boolean[changes.size()];
        }

        List<TemplateChange> checked() {
            List<TemplateChange> out = new ArrayList<>();
            for (int i = 0; i < changes.size(); i++) {
                if (checked[i]) {
                    out.add(changes.get(i));
                }
            }
            return out;
        }

        @Override public int getRowCount() { return changes.size(); }
        @Override public int getColumnCount() { return COLUMNS.length; }
        @Override public String getColumnName(int c) { return COLUMNS[c]; }
        @Override public Class<?> getColumnClass(int c) { return c == 0 ? Boolean.class : String.class; }
        @Override public boolean isCellEditable(int r, int c) { return c == 0; }

        @Override
        public Object getValueAt(int r, int c) {
            TemplateChange t = changes.get(r);
            switch (c) {
                case 0: return checked[r];
                case 1: return kind(t.kind());
                case 2: return t.subject();
                case 3: return t.before();
                default: return t.after();
            }
        }

        @Override
        public void setValueAt(Object v, int r, int c) {
            if (c == 0) {
                checked[r] = Boolean.TRUE.equals(v);
                fireTableCellUpdated(r, c);
            }
        }
    }
}
