package org.quire.app.ui;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JDialog;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.table.AbstractTableModel;
import org.quire.engine.document.RecoveryStore;

/**
 * Offered at start-up when the recovery folder holds copies of budgets changed in an earlier session and never
 * saved: one row per copy with its file and the time it was kept, checked to restore; unchecked copies are
 * discarded. "Decide later" leaves every copy where it is.
 */
final class RecoveryDialog extends JDialog {
    private static final long serialVersionUID = 1L;
    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss")
            .withZone(ZoneId.systemDefault());
    private final List<RecoveryStore.Pending> pending;
    private final boolean[] checked;
    private final JTable table;
    private boolean cancelled = true;

    RecoveryDialog(WorkbenchFrame owner, List<RecoveryStore.Pending> pending) {
        super(owner, "Recover unsaved budgets", ModalityType.APPLICATION_MODAL);
        setName("recovery");
        this.pending = List.copyOf(pending);
        this.checked = new boolean[pending.size()];
        java.util.Arrays.fill(checked, true);
        table = new JTable(new Model());
        table.setName("recoveryCopies");
        table.getColumnModel().getColumn(0).setMaxWidth(70);
        table.getColumnModel().getColumn(1).setPreferredWidth(420);
        table.getColumnModel().getColumn(2).setPreferredWidth(150);
        JLabel head = new JLabel("<html>Quire kept copies of these budgets, changed and not saved when it last "
                + "stopped. Restore the checked ones; the others are discarded.</html>");
        head.setBorder(BorderFactory.createEmptyBorder(8, 8, 8, 8));
        JButton restore = new JButton("Restore checked, discard the rest");
        restore.setName("restore");
        restore.addActionListener(e -> {
            cancelled = false;
            dispose();
        });
        JButton later = new JButton("Decide later");
        later.setName("later");
        later.addActionListener(e -> dispose());
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.RIGHT));
        buttons.add(restore);
        buttons.add(later);
        getContentPane().add(head, BorderLayout.NORTH);
        getContentPane().add(new JScrollPane(table), BorderLayout.CENTER);
        getContentPane().add(buttons, BorderLayout.SOUTH);
        getRootPane().setDefaultButton(restore);
        setSize(760, 300);
        setLocationRelativeTo(owner);
    }

    /** @return whether the user chose to decide later */
    boolean cancelled() {
        return cancelled;
    }

    /** @return the copies checked for restoring */
    List<RecoveryStore.Pending> restore() {
        List<RecoveryStore.Pending> out = new ArrayList<>();
        for (int i = 0; i < pending.size(); i++) {
            if (checked[i]) {
                out.add(pending.get(i));
            }
        }
        return out;
    }

    JTable table() {
        return table;
    }

    private final class Model extends AbstractTableModel {
        private static final long serialVersionUID = 1L;
        private final String[] columns = {"Restore", "File", "Kept at"};

        @Override public int getRowCount() { return pending.size(); }
        @Override public int getColumnCount() { return columns.length; }
        @Override public String getColumnName(int c) { return columns[c]; }
        @Override public Class<?> getColumnClass(int c) { return c == 0 ? Boolean.class : String.class; }
        @Override public boolean isCellEditable(int r, int c) { return c == 0; }

        @Override
        public Object getValueAt(int r, int c) {
            RecoveryStore.Pending p = pending.get(r);
            switch (c) {
                case 0: return checked[r];
                case 1: return p.originalPath() == null ? "(never saved)" : p.originalPath().toString();
                default: return WHEN.format(p.saved());
            }
        }

        @Override
        public void setValueAt(Object v, int r, int c) {
            checked[r] = Boolean.TRUE.equals(v);
            fireTableCellUpdated(r, c);
        }
    }
}
