package org.quire.app.ui.compare;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Component;
import java.awt.Font;
import java.awt.Window;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.swing.BorderFactory;
import javax.swing.JDialog;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.table.AbstractTableModel;
import javax.swing.table.DefaultTableCellRenderer;
import org.quire.app.compare.Comparison;
import org.quire.app.compare.FieldChange;
import org.quire.app.compare.LineEdit;
import org.quire.app.compare.OutputEffect;
import org.quire.app.compare.QuantityChange;
import org.quire.app.ui.common.Colors;
import org.quire.engine.gum.Figures;
import org.quire.engine.gum.Rounding;
import org.quire.engine.budget.InputQuantity;

/**
 * Budget &gt; Compare with: two budgets side by side from a {@link Comparison}: each output's estimate and
 * expanded uncertainty in A and in B, what changed (inputs added, removed and changed field by field, outputs,
 * correlations, settings, title and notes), and the two model texts line against line, removed lines marked in
 * A and added lines in B.
 */
public final class CompareWindow extends JDialog {
    private static final long serialVersionUID = 1L;
    private final Comparison comparison;
    private final JTable effects;
    private final JTable changes;
    private final JTable model;

    /**
     * @param owner the workbench window
     * @param c the comparison of A with B
     * @param nameA what A is called (the file chosen, usually the earlier budget)
     * @param nameB what B is called (the open budget)
     */
    public CompareWindow(Window owner, Comparison c, String nameA, String nameB) {
        super(owner, "Compare " + nameA + " with " + nameB, ModalityType.MODELESS);
        this.comparison = c;
        setName("compare");
        setDefaultCloseOperation(DISPOSE_ON_CLOSE);
        org.quire.app.ui.common.Windows.closeOnEscapeAndCtrlW(getRootPane(), this);
        JLabel head = new JLabel("<html><b>A</b> " + esc(nameA) + " \u2014 " + esc(c.titleA()) + "<br><b>B</b> "
                + esc(nameB) + " \u2014 " + esc(c.titleB())
                + (c.problemA().isEmpty() ? "" : "<br>A cannot be evaluated: " + esc(c.problemA()))
                + (c.problemB().isEmpty() ? "" : "<br>B cannot be evaluated: " + esc(c.problemB()))
                + (c.identical() ? "<br>The two budgets have the same content." : "") + "</html>");
        head.setBorder(BorderFactory.createEmptyBorder(6, 8, 6, 8));
        effects = new JTable(new Rows(new String[] {"Output", "Unit", "y in A", "U in A", "k in A", "y in B", "U in B",
            "k in B", "U change"}, effectRows(c)));
        effects.setName("effects");
        changes = new JTable(new Rows(new String[] {"What", "Name", "Field", "A", "B"}, changeRows(c)));
        changes.setName("changes");
        changes.setDefaultRenderer(Object.class, new TipRenderer());
        // each column as wide as its widest entry (a long one keeps its tooltip), scrolled sideways when needed
        org.quire.app.ui.table.SpreadsheetTable.fitColumns(changes, 420);
        effects.setDefaultRenderer(Object.class, new TipRenderer());
        model = new JTable(new Rows(new String[] {"A", "Model in A", "B", "Model in B"}, modelRows(c.model())));
        model.setName("modelSideBySide");
        model.getColumnModel().getColumn(0).setMaxWidth(36);
        model.getColumnModel().getColumn(2).setMaxWidth(36);
        model.setDefaultRenderer(Object.class, new ModelRenderer());
        org.quire.app.ui.table.SpreadsheetTable.fitColumns(model, 900);
        JScrollPane effectScroll = titled(effects, "Effect on each output (GUM)");
        effectScroll.setPreferredSize(new java.awt.Dimension(600, effects.getRowHeight() * (c.effects().size() + 1) + 46));
        JSplitPane lower = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, titled(changes, "What changed from A to B"),
                titled(model, "Model, line against line"));
        lower.setResizeWeight(0.5);
        JPanel centre = new JPanel(new BorderLayout(0, 6));
        centre.add(effectScroll, BorderLayout.NORTH);
        centre.add(lower, BorderLayout.CENTER);
        getContentPane().add(head, BorderLayout.NORTH);
        getContentPane().add(centre, BorderLayout.CENTER);
        setSize(1200, 680);
        setLocationRelativeTo(owner);
        lower.setDividerLocation(0.5);
    }

    public Comparison comparison() { return comparison; }
    /** @return the table of changes, for tests */
    public JTable changesTable() { return changes; }
    /** @return the table of output effects, for tests */
    public JTable effectsTable() { return effects; }
    /** @return the side-by-side model table, for tests */
    public JTable modelTable() { return model; }

    private static JScrollPane titled(JTable t, String title) {
        JScrollPane s = new JScrollPane(t);
        s.setBorder(BorderFactory.createTitledBorder(title));
        return s;
    }

    private static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    /** @return y to the last digit of U shown with three significant digits */
    private static String est(double y, double u) {
        if (Double.isNaN(y)) {
            return "\u2014";
        }
        if (u > 0 && Double.isFinite(u) && Double.isFinite(y)) {
            return Rounding.estimate(y, u, 3).toPlainString().replace('-', '\u2212');
        }
        return Figures.estimate(y);
    }

    private static String unc(double v) {
        return Double.isNaN(v) ? "\u2014" : Figures.sig(v, 3);
    }

    static List<Object[]> effectRows(Comparison c) {
        List<Object[]> rows = new ArrayList<>();
        for (OutputEffect e : c.effects()) {
            double p = e.changePercent();
            rows.add(new Object[] {e.name(), org.quire.engine.units.Units.display(e.unit()), est(e.estimateA(), e.expandedA()), unc(e.expandedA()),
                unc(e.coverageFactorA()), est(e.estimateB(), e.expandedB()), unc(e.expandedB()), unc(e.coverageFactorB()),
                Double.isNaN(p) ? "\u2014" : String.format(Locale.ROOT, "%+.1f %%", p)});
        }
        return rows;
    }

    static List<Object[]> changeRows(Comparison c) {
        List<Object[]> rows = new ArrayList<>();
        for (FieldChange f : c.budgetChanges()) {
            rows.add(new Object[] {"budget", "", f.field(), f.before(), f.after()});
        }
        for (InputQuantity q : c.inputsRemoved()) {
            rows.add(new Object[] {"input", q.name(), "(removed)", q.evaluation().basis(), ""});
        }
        for (InputQuantity q : c.inputsAdded()) {
            rows.add(new Object[] {"input", q.name(), "(added)", "", q.evaluation().basis()});
        }
        quantities(rows, "input", c.inputsChanged());
        for (String n : c.outputsRemoved()) {
            rows.add(new Object[] {"output", n, "(removed)", n, ""});
        }
        for (String n : c.outputsAdded()) {
            rows.add(new Object[] {"output", n, "(added)", "", n});
        }
        quantities(rows, "output", c.outputsChanged());
        for (FieldChange f : c.correlations()) {
            rows.add(new Object[] {"correlation", f.field(), "", f.before(), f.after()});
        }
        for (FieldChange f : c.settings()) {
            rows.add(new Object[] {"setting", "", f.field(), f.before(), f.after()});
        }
        for (FieldChange f : c.otherFields()) {
            rows.add(new Object[] {"other", "", f.field(), f.before(), f.after()});
        }
        if (c.modelChanged()) {
            long removed = c.model().stream().filter(e -> e.kind() == LineEdit.Kind.REMOVED).count();
            long added = c.model().stream().filter(e -> e.kind() == LineEdit.Kind.ADDED).count();
            rows.add(new Object[] {"model", "", "lines", removed + " only in A", added + " only in B"});
        }
        return rows;
    }

    private static void quantities(List<Object[]> rows, String what, List<QuantityChange> list) {
        for (QuantityChange q : list) {
            for (FieldChange f : q.changes()) {
                rows.add(new Object[] {what, q.name(), f.field(), f.before(), f.after()});
            }
        }
    }

    /** @return the model lines side by side; a run of removed lines is set against the added lines that follow */
    static List<Object[]> modelRows(List<LineEdit> edits) {
        List<Object[]> rows = new ArrayList<>();
        int i = 0;
        while (i < edits.size()) {
            LineEdit e = edits.get(i);
            if (e.kind() == LineEdit.Kind.KEPT) {
                rows.add(new Object[] {e.lineA(), e.text(), e.lineB(), e.text(), LineEdit.Kind.KEPT});
                i++;
                continue;
            }
            List<LineEdit> removed = new ArrayList<>();
            List<LineEdit> added = new ArrayList<>();
            while (i < edits.size() && edits.get(i).kind() == LineEdit.Kind.REMOVED) {
                removed.add(edits.get(i++));
            }
            while (i < edits.size() && edits.get(i).kind() == LineEdit.Kind.ADDED) {
                added.add(edits.get(i++));
            }
            for (int k = 0; k < Math.max(removed.size(), added.size()); k++) {
                LineEdit r = k < removed.size() ? removed.get(k) : null;
                LineEdit a = k < added.size() ? added.get(k) : null;
                rows.add(new Object[] {r == null ? "" : r.lineA(), r == null ? "" : r.text(),
                    a == null ? "" : a.lineB(), a == null ? "" : a.text(), null});
            }
        }
        return rows;
    }

    /** A read-only table over rows of cells; a row may carry one extra, hidden value. */
    private static final class Rows extends AbstractTableModel {
        private static final long serialVersionUID = 1L;
        private final String[] columns;
        private final List<Object[]> rows;

        Rows(String[] columns, List<Object[]> rows) {
            this.columns = columns;
            this.rows = rows;
        }

        Object hidden(int r) {
            Object[] row = rows.get(r);
            return row.length > columns.length ? row[columns.length] : null;
        }

        @Override public int getRowCount() { return rows.size(); }
        @Override public int getColumnCount() { return columns.length; }
        @Override public String getColumnName(int c) { return columns[c]; }
        @Override public Object getValueAt(int r, int c) { return rows.get(r)[c]; }
    }

    /** Shows a cell's full text as its tooltip. */
    private static final class TipRenderer extends DefaultTableCellRenderer {
        private static final long serialVersionUID = 1L;

        @Override
        public Component getTableCellRendererComponent(JTable t, Object v, boolean sel, boolean focus, int r, int c) {
            super.getTableCellRendererComponent(t, v, sel, focus, r, c);
            setToolTipText(v == null || v.toString().isEmpty() ? null : v.toString());
            return this;
        }
    }

    /** Marks removed text in A and added text in B; keeps model text in a fixed-width font. */
    private static final class ModelRenderer extends DefaultTableCellRenderer {
        private static final long serialVersionUID = 1L;

        @Override
        public Component getTableCellRendererComponent(JTable t, Object v, boolean sel, boolean focus, int r, int c) {
            super.getTableCellRendererComponent(t, v, sel, focus, r, c);
            Rows m = (Rows) t.getModel();
            boolean kept = m.hidden(r) == LineEdit.Kind.KEPT;
            Font f = t.getFont();
            setFont(c % 2 == 1 ? new Font(Font.MONOSPACED, Font.PLAIN, f.getSize()) : f);
            setToolTipText(c % 2 == 1 && v != null && !v.toString().isEmpty() ? v.toString() : null);
            if (!sel) {
                Color bg = t.getBackground();
                if (!kept && c <= 1 && !"".equals(m.getValueAt(r, 1))) {
                    bg = Colors.get("Quire.compare.removed");
                } else if (!kept && c >= 2 && !"".equals(m.getValueAt(r, 3))) {
                    bg = Colors.get("Quire.compare.added");
                }
                setBackground(bg);
            }
            return this;
        }
    }
}
