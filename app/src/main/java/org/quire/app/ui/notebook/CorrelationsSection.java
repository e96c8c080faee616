package org.quire.app.ui.notebook;

import org.quire.app.ui.common.EditorContext;
import org.quire.app.ui.common.Section;
import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.Dimension;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.table.AbstractTableModel;
import javax.swing.table.DefaultTableCellRenderer;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.common.Fmt;
import org.quire.app.ui.document.Problem;
import org.quire.app.ui.document.Recalculation;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.Correlation;
import org.quire.engine.budget.InputQuantity;

/**
 * The correlation coefficients as a matrix of the inputs that have an uncertainty. Editing either half sets
 * the one coefficient of the pair, so the matrix stays symmetric; 0 removes it. A matrix that is not positive
 * semi-definite is reported with the pairs the engine names, which are marked.
 */
final class CorrelationsSection implements Section {
    private static final Pattern PAIR = Pattern.compile("r\\(([^,()]+), ([^,()]+)\\)");
    private List<String> names = List.of();
    private List<Correlation> correlations = List.of();
    private final Set<String> offending = new HashSet<>();
    private final EditorContext ctx;
    private final JPanel body = new JPanel(new BorderLayout(4, 4));
    private final Matrix matrix = new Matrix();
    private final JTable table = new JTable(matrix);
    private final JLabel verdict = new JLabel(" ");

    CorrelationsSection(EditorContext ctx) {
        this.ctx = ctx;
        table.setName("correlations");
        table.setCellSelectionEnabled(true);
        table.putClientProperty("terminateEditOnFocusLost", Boolean.TRUE);
        table.setDefaultRenderer(Object.class, new CellRenderer());
        table.setAutoResizeMode(JTable.AUTO_RESIZE_OFF);
        JScrollPane sp = new JScrollPane(table);
        sp.setPreferredSize(new Dimension(700, 180));
        JLabel hint = new JLabel("Type a coefficient r in either half; the matrix stays symmetric. 0 removes the "
                + "correlation. Exactly known constants are left out.");
        hint.setForeground(Colors.get("Label.disabledForeground"));
        body.add(hint, BorderLayout.NORTH);
        body.add(sp, BorderLayout.CENTER);
        body.add(verdict, BorderLayout.SOUTH);
    }

    @Override public String title() { return "Correlations"; }
    @Override public JComponent body() { return body; }

    @Override
    public void budgetChanged(Budget b) {
        List<String> n = new ArrayList<>();
        for (InputQuantity q : b.inputs()) {
            if (q.evaluation().standardUncertainty() > 0) {
                n.add(q.name());
            }
        }
        correlations = b.correlations();
        if (!n.equals(names)) {
            names = n;
            matrix.fireTableStructureChanged();
            for (int c = 0; c < table.getColumnCount(); c++) {
                table.getColumnModel().getColumn(c).setPreferredWidth(c == 0 ? 80 : 62);
            }
        } else {
            matrix.fireTableDataChanged();
        }
    }

    @Override
    public void recalculated(Recalculation r) {
        offending.clear();
        String message = null;
        for (Problem p : r.problems()) {
            if (p.area() == Problem.Area.CORRELATIONS) {
                message = p.message();
                Matcher m = PAIR.matcher(p.message());
                while (m.find()) {
                    offending.add(m.group(1) + "\u0000" + m.group(2));
                    offending.add(m.group(2) + "\u0000" + m.group(1));
                }
            }
        }
        if (message == null) {
            verdict.setText(correlations.isEmpty() ? "No correlations: the inputs are taken as independent."
                    : correlations.size() + " correlated pair(s); the matrix is positive semi-definite.");
            verdict.setForeground(Colors.get("Label.foreground"));
        } else {
            verdict.setText("<html>" + escape(message) + "</html>");
            verdict.setForeground(Colors.get("Quire.error"));
        }
        table.repaint();
    }

    private static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;");
    }

    private Correlation find(String a, String b) {
        for (Correlation c : correlations) {
            if ((c.first().equals(a) && c.second().equals(b)) || (c.first().equals(b) && c.second().equals(a))) {
                return c;
            }
        }
        return null;
    }

    private void set(String a, String b, String text) {
        Correlation old = find(a, b);
        if (old != null && old.fromReadings()) {
            ctx.status("r(" + a + ", " + b + ") is computed from the readings.", true);
            return;
        }
        double r;
        try {
            r = text.isBlank() ? 0 : Fmt.parse(text);
        } catch (NumberFormatException e) {
            ctx.status(e.getMessage(), true);
            return;
        }
        ctx.edit("Set r(" + a + ", " + b + ")", "", budget -> {
            List<Correlation> list = new ArrayList<>(budget.correlations());
            list.remove(old);
            if (r != 0) {
                Correlation c = Correlation.of(a, b, r);
                list.add(old == null ? c : c.withJustification(old.justification()));
            }
            return budget.withCorrelations(list);
        });
    }

    private final class Matrix extends AbstractTableModel {
        @Override public int getRowCount() { return names.size(); }
        @Override public int getColumnCount() { return names.size() + 1; }
        @Override public String getColumnName(int c) { return c == 0 ? "" : names.get(c - 1); }

        @Override
        public boolean isCellEditable(int r, int c) {
            org.quire.engine.document.TemplateOrigin o = ctx.document().content().templateOrigin();
            // the correlations a template locks are the method's: read-only
            return c > 0 && r != c - 1 && !ctx.readOnly() && !(o != null && o.locked().contains("correlations"));
        }

        @Override
        public Object getValueAt(int r, int c) {
            if (c == 0) {
                return names.get(r);
            }
            if (r == c - 1) {
                return "1";
            }
            Correlation k = find(names.get(r), names.get(c - 1));
            return k == null ? "" : k.fromReadings() ? "readings" : Fmt.num(k.r());
        }

        @Override
        public void setValueAt(Object v, int r, int c) {
            set(names.get(r), names.get(c - 1), v == null ? "" : v.toString());
        }
    }

    private final class CellRenderer extends DefaultTableCellRenderer {
        @Override
        public Component getTableCellRendererComponent(JTable t, Object v, boolean sel, boolean focus, int r, int c) {
            super.getTableCellRendererComponent(t, v, sel, focus, r, c);
            setHorizontalAlignment(c == 0 ? LEFT : CENTER);
            if (!sel) {
                if (c == 0 || r == c - 1) {
                    setBackground(Colors.get("Quire.matrix.diagonal"));
                } else if (offending.contains(names.get(r) + "\u0000" + names.get(c - 1))) {
                    setBackground(Colors.get("Quire.matrix.offending"));
                } else {
                    setBackground(t.getBackground());
                }
            }
            return this;
        }
    }
}
