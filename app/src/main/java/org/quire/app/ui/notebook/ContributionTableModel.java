package org.quire.app.ui.notebook;

import java.util.List;
import javax.swing.table.AbstractTableModel;
import org.quire.engine.gum.Contribution;

/** The budget table of one output: the engine's contribution rows, as they are. */
final class ContributionTableModel extends AbstractTableModel {
    static final int SHARE = 8;
    private static final String[] COLUMNS = {"Input", "Evaluation", "Distribution", "Estimate x\u1d62",
        "u(x\u1d62)", "Sensitivity c\u1d62", "Contribution u\u1d62(y)", "\u03bd\u1d62", "Share of u\u1d9c\u00b2(y)"};
    private List<Contribution> rows = List.of();

    void set(List<Contribution> c) {
        rows = c;
        fireTableDataChanged();
    }

    @Override public int getRowCount() { return rows.size(); }
    @Override public int getColumnCount() { return COLUMNS.length; }
    @Override public String getColumnName(int c) { return COLUMNS[c]; }

    @Override
    public Class<?> getColumnClass(int c) {
        return c <= 2 ? String.class : Double.class;
    }

    @Override
    public Object getValueAt(int r, int c) {
        Contribution k = rows.get(r);
        switch (c) {
            case 0: return k.input();
            case 1: return "Type " + k.type();
            case 2: return k.distribution();
            case 3: return k.estimate();
            case 4: return k.standardUncertainty();
            case 5: return k.sensitivity();
            case 6: return k.contribution();
            case 7: return k.dof();
            default: return k.share();
        }
    }
}
