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
import org.quire.app.ui.Colors;
import org.quire.app.ui.Fmt;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.gum.Rounding;

/** The GUM result of one output: the figures in a summary line and the sortable budget table. */
final class OutputResultPanel extends JPanel {
    private final JLabel summary = new JLabel();
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
        table.getColumnModel().getColumn(7).setCellRenderer(new DefaultTableCellRenderer() {
            @Override
            protected void setValue(Object v) {
                setHorizontalAlignment(RIGHT);
                setText(Fmt.dof((Double) v));
            }
        });
        table.getColumnModel().getColumn(ContributionTableModel.SHARE).setCellRenderer(new ShareBarRenderer());
        table.getColumnModel().getColumn(ContributionTableModel.SHARE).setPreferredWidth(170);
        summary.setBorder(javax.swing.BorderFactory.createEmptyBorder(2, 0, 4, 0));
        add(summary, BorderLayout.NORTH);
        JScrollPane sp = new JScrollPane(table);
        add(sp, BorderLayout.CENTER);
        setBorder(javax.swing.BorderFactory.createEmptyBorder(4, 0, 10, 0));
    }

    void show(OutputResult o, int digits) {
        String unit = o.unit().isEmpty() ? "" : " " + o.unit();
        String rounded = Rounding.format(o.estimate(), o.expandedUncertainty(), digits);
        String dofNote = Double.isInfinite(o.effectiveDof()) ? "\u221e"
                : Fmt.dof(o.effectiveDof()) + (o.dofUsed() != o.effectiveDof() ? " (" + Fmt.dof(o.dofUsed()) + " used)" : "");
        String emphasis = String.format("#%06x", Colors.get("Quire.result.emphasis").getRGB() & 0xffffff);
        summary.setText("<html><b style='font-size:110%'>" + o.name() + unit + "</b> &nbsp; "
                + "<span style='color:" + emphasis + "'><b>" + o.name() + " = (" + rounded + ")" + unit + "</b></span>"
                + "<br>y = " + Fmt.num(o.estimate()) + unit
                + " &nbsp;&nbsp; u<sub>c</sub>(y) = " + Rounding.uncertainty(o.standardUncertainty(), digits).toPlainString() + unit
                + " &nbsp;&nbsp; \u03bd<sub>eff</sub> = " + dofNote
                + " &nbsp;&nbsp; k = " + String.format(java.util.Locale.ROOT, "%.3f", o.coverageFactor())
                + " (p = " + Fmt.probability(o.coverageProbability()) + ")"
                + " &nbsp;&nbsp; U = " + Rounding.uncertainty(o.expandedUncertainty(), digits).toPlainString() + unit
                + " &nbsp;&nbsp; U/|y| = " + (Double.isNaN(o.relativeExpandedUncertainty()) ? "n/a"
                        : Rounding.uncertainty(100 * o.relativeExpandedUncertainty(), digits).toPlainString() + " %")
                + "</html>");
        model.set(o.contributions());
        int h = table.getRowHeight() * Math.max(3, o.contributions().size()) + table.getTableHeader().getPreferredSize().height + 4;
        table.getParent().getParent().setPreferredSize(new Dimension(700, h));
    }

    JTable table() { return table; }

    String summaryText() { return summary.getText(); }
}
