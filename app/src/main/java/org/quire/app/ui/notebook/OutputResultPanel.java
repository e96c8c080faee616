package org.quire.app.ui.notebook;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.util.List;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.RowSorter;
import javax.swing.SortOrder;
import javax.swing.table.DefaultTableCellRenderer;
import javax.swing.table.TableRowSorter;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.common.Fmt;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.gum.Rounding;

/** The GUM result of one output: the figures in a summary line and the sortable budget table. */
final class OutputResultPanel extends JPanel {
    private final JLabel headline = new JLabel();
    private final JLabel figures = new JLabel();
    private final ContributionTableModel model = new ContributionTableModel();
    private final JTable table = new JTable(model);

    OutputResultPanel(String output) {
        super(new BorderLayout(4, 4));
        setName("result:" + output);
        table.setName("budget:" + output);
        TableRowSorter<ContributionTableModel> sorter = new TableRowSorter<>(model);
        sorter.setSortKeys(List.of(new RowSorter.SortKey(ContributionTableModel.SHARE, SortOrder.DESCENDING)));
        table.setRowSorter(sorter);
        DefaultTableCellRenderer numbers = new DefaultTableCellRenderer() {
            @Override
            protected void setValue(Object v) {
                setHorizontalAlignment(RIGHT);
                setText(v instanceof Double ? Fmt.short4((Double) v) : String.valueOf(v));
            }
        };
        table.setDefaultRenderer(Double.class, numbers);
        table.getColumnModel().getColumn(3).setCellRenderer(new DefaultTableCellRenderer() {
            @Override
            protected void setValue(Object v) {
                setHorizontalAlignment(RIGHT);
                setText(Fmt.num((Double) v));
            }
        });
        table.getColumnModel().getColumn(7).setCellRenderer(new DefaultTableCellRenderer() {
            @Override
            protected void setValue(Object v) {
                setHorizontalAlignment(RIGHT);
                setText(Fmt.dof((Double) v));
            }
        });
        table.getColumnModel().getColumn(ContributionTableModel.SHARE).setCellRenderer(new ShareBarRenderer());
        table.getColumnModel().getColumn(ContributionTableModel.SHARE).setPreferredWidth(170);
        headline.setFont(headline.getFont().deriveFont(java.awt.Font.BOLD, headline.getFont().getSize2D() + 1));
        headline.setForeground(Colors.get("Quire.result.emphasis"));
        JPanel top = new JPanel(new java.awt.GridLayout(2, 1));
        top.add(headline);
        top.add(figures);
        top.setBorder(javax.swing.BorderFactory.createEmptyBorder(2, 0, 4, 0));
        add(top, BorderLayout.NORTH);
        JScrollPane sp = new JScrollPane(table);
        add(sp, BorderLayout.CENTER);
        setBorder(javax.swing.BorderFactory.createEmptyBorder(4, 0, 10, 0));
    }

    void show(OutputResult o, int digits) {
        String unit = o.unit().isEmpty() ? "" : " " + o.unit();
        String rounded = Rounding.format(o.estimate(), o.expandedUncertainty(), digits);
        String dofNote = Double.isInfinite(o.effectiveDof()) ? "\u221e"
                : Fmt.dof(o.effectiveDof()) + (o.dofUsed() != o.effectiveDof() ? " (" + Fmt.dof(o.dofUsed()) + " used)" : "");
        set(headline, o.name() + " = (" + rounded + ")" + unit + ",  k = "
                + String.format(java.util.Locale.ROOT, "%.2f", o.coverageFactor()) + ",  p = "
                + Fmt.probability(o.coverageProbability()));
        set(figures, "y = " + Fmt.num(o.estimate()) + unit
                + "     u_c(y) = " + Rounding.uncertainty(o.standardUncertainty(), digits).toPlainString() + unit
                + "     \u03bd_eff = " + dofNote
                + "     k = " + String.format(java.util.Locale.ROOT, "%.3f", o.coverageFactor())
                + "     U = " + Rounding.uncertainty(o.expandedUncertainty(), digits).toPlainString() + unit
                + "     U/|y| = " + (Double.isNaN(o.relativeExpandedUncertainty()) ? "n/a"
                        : Rounding.uncertainty(100 * o.relativeExpandedUncertainty(), digits).toPlainString() + " %"));
        model.set(o.contributions());
        int h = table.getRowHeight() * Math.max(3, o.contributions().size()) + table.getTableHeader().getPreferredSize().height + 4;
        table.getParent().getParent().setPreferredSize(new Dimension(700, h));
    }

    JTable table() { return table; }

    String summaryText() { return headline.getText() + "\n" + figures.getText(); }

    /** Sets a label's text only when it differs: layout of text is the costly part of an update. */
    private static void set(JLabel l, String text) {
        if (!text.equals(l.getText())) {
            l.setText(text);
        }
    }
}
