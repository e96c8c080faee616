package org.quire.app.ui.notebook;

import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.util.List;
import javax.swing.JCheckBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.RowFilter;
import javax.swing.RowSorter;
import javax.swing.SortOrder;
import javax.swing.table.DefaultTableCellRenderer;
import javax.swing.table.JTableHeader;
import javax.swing.table.TableColumn;
import javax.swing.table.TableRowSorter;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.common.Fmt;
import org.quire.app.ui.table.SpreadsheetTable;
import org.quire.engine.gum.OutputResult;
import org.quire.engine.gum.Rounding;

/**
 * The GUM result of one output: the figures in a summary line, the sortable budget table with its total row,
 * and beside it the ranking of the contributions (the chart the report draws too).
 */
final class OutputResultPanel extends JPanel {
    private final JLabel headline = new JLabel();
    private final JLabel figures = new JLabel();
    private final JLabel figures2 = new JLabel();
    private final ContributionTableModel model = new ContributionTableModel(false);
    private final ContributionTableModel totalModel = new ContributionTableModel(true);
    private final JTable table = new JTable(model) {
        @Override
        protected JTableHeader createDefaultTableHeader() {
            return new JTableHeader(columnModel) {
                @Override
                public String getToolTipText(java.awt.event.MouseEvent e) {
                    int c = columnAtPoint(e.getPoint());
                    return c < 0 ? null : table.getColumnName(c);
                }
            };
        }
    };
    private final JTable total;
    private final JCheckBox showIdle = new JCheckBox("Show inputs with c\u1d62 = 0");
    private final JLabel idleNote = new JLabel();
    private final TableRowSorter<ContributionTableModel> sorter = new TableRowSorter<>(model);
    private final ContributionChart chart = new ContributionChart();
    private OutputResult shown;

    OutputResultPanel(String output) {
        super(new BorderLayout(4, 4));
        setName("result:" + output);
        table.setName("budget:" + output);
        sorter.setSortKeys(List.of(new RowSorter.SortKey(ContributionTableModel.SHARE, SortOrder.DESCENDING)));
        table.setRowSorter(sorter);
        table.setAutoResizeMode(JTable.AUTO_RESIZE_OFF);
        table.setCellSelectionEnabled(true);
        DefaultTableCellRenderer cells = new DefaultTableCellRenderer() {
            @Override
            public Component getTableCellRendererComponent(JTable t, Object v, boolean sel, boolean focus, int r,
                    int c) {
                super.getTableCellRendererComponent(t, v, sel, focus, r, c);
                ContributionTableModel m = (ContributionTableModel) t.getModel();
                int mr = t.getRowSorter() == null ? r : t.convertRowIndexToModel(r);
                int mc = t.convertColumnIndexToModel(c);
                setText(m.shown(mr, mc));
                setHorizontalAlignment(mc <= 2 ? LEFT : RIGHT);
                setToolTipText(getText().isEmpty() ? null : getText());
                return this;
            }
        };
        table.setDefaultRenderer(Object.class, cells);
        table.setDefaultRenderer(String.class, cells);
        table.setDefaultRenderer(Double.class, cells);
        SpreadsheetTable.install(table, c -> false, Runnable::run, m -> { });
        total = new JTable(totalModel, table.getColumnModel());
        total.setName("budgetTotal:" + output);
        total.setAutoResizeMode(JTable.AUTO_RESIZE_OFF);
        total.setDefaultRenderer(Object.class, cells);
        total.setDefaultRenderer(String.class, cells);
        total.setDefaultRenderer(Double.class, cells);
        total.setFont(total.getFont().deriveFont(java.awt.Font.BOLD));
        total.setFocusable(false);
        total.setRowSelectionAllowed(false);
        total.setTableHeader(null);
        showIdle.setName("showIdle:" + output);
        showIdle.addActionListener(e -> applyFilter());
        headline.setFont(headline.getFont().deriveFont(java.awt.Font.BOLD, headline.getFont().getSize2D() + 1));
        headline.setForeground(Colors.get("Quire.result.emphasis"));
        JPanel top = new JPanel(new java.awt.GridLayout(3, 1));
        top.add(headline);
        top.add(figures);
        top.add(figures2);
        top.setBorder(javax.swing.BorderFactory.createEmptyBorder(2, 0, 4, 0));
        add(top, BorderLayout.NORTH);
        JScrollPane sp = new JScrollPane(table);
        sp.setColumnHeaderView(table.getTableHeader());
        JPanel tableAndTotal = new JPanel(new BorderLayout());
        tableAndTotal.add(sp, BorderLayout.CENTER);
        JScrollPane totalScroll = new JScrollPane(total, JScrollPane.VERTICAL_SCROLLBAR_NEVER,
                JScrollPane.HORIZONTAL_SCROLLBAR_NEVER);
        totalScroll.getHorizontalScrollBar().setModel(sp.getHorizontalScrollBar().getModel());
        totalScroll.setPreferredSize(new Dimension(100, total.getRowHeight() + 4));
        totalScroll.setBorder(javax.swing.BorderFactory.createMatteBorder(0, 1, 1, 1,
                Colors.get("Quire.section.rule")));
        tableAndTotal.add(totalScroll, BorderLayout.SOUTH);
        JPanel options = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 0));
        options.add(showIdle);
        options.add(idleNote);
        idleNote.setForeground(Colors.get("Label.disabledForeground"));
        JPanel left = new JPanel(new BorderLayout());
        left.add(tableAndTotal, BorderLayout.CENTER);
        left.add(options, BorderLayout.SOUTH);
        JPanel centre = new JPanel(new BesideOrBelow());
        centre.add(left);
        chart.setName("ranking:" + output);
        centre.add(chart);
        add(centre, BorderLayout.CENTER);
        setBorder(javax.swing.BorderFactory.createEmptyBorder(4, 0, 10, 0));
    }

    private void applyFilter() {
        sorter.setRowFilter(showIdle.isSelected() ? null : new RowFilter<ContributionTableModel, Integer>() {
            @Override
            public boolean include(Entry<? extends ContributionTableModel, ? extends Integer> e) {
                return e.getModel().row(e.getIdentifier()).sensitivity() != 0;
            }
        });
        int idle = 0;
        for (int r = 0; r < model.getRowCount(); r++) {
            if (model.row(r).sensitivity() == 0) {
                idle++;
            }
        }
        showIdle.setVisible(idle > 0);
        idleNote.setText(idle == 0 || showIdle.isSelected() ? "" : idle + (idle == 1 ? " input" : " inputs")
                + " with no effect on this output hidden");
    }

    /**
     * Says in the headline that the figures below are not those of the present budget (it cannot be evaluated),
     * and greys them.
     */
    void markNotCurrent(String why) {
        String name = shown == null ? "" : shown.name();
        headline.setText(name + ": " + why);
        headline.setToolTipText(null);
        headline.setForeground(Colors.get("Quire.error"));
        figures.setForeground(Colors.get("Label.disabledForeground"));
        figures2.setForeground(Colors.get("Label.disabledForeground"));
    }

    /** @return the headline as shown, for tests */
    String headlineText() {
        return headline.getText();
    }

    void show(OutputResult o, int digits) {
        headline.setForeground(Colors.get("Quire.result.emphasis"));
        figures.setForeground(Colors.get("Label.foreground"));
        figures2.setForeground(Colors.get("Label.foreground"));
        String unit = o.unit().isEmpty() ? "" : " " + org.quire.engine.units.Units.display(o.unit());
        String rounded = Rounding.format(o.estimate(), o.expandedUncertainty(), digits);
        String dofNote = Double.isInfinite(o.effectiveDof()) ? "\u221e"
                : Fmt.dof(o.effectiveDof()) + (o.dofUsed() != o.effectiveDof() ? " (" + Fmt.dof(o.dofUsed()) + " used)" : "");
        set(headline, o.name() + " = (" + rounded + ")" + unit + ",  k = "
                + org.quire.engine.gum.Figures.coverageFactor(o.coverageFactor()) + ",  p = "
                + Fmt.probability(o.coverageProbability()));
        set(figures, "<html>y = " + Fmt.num(o.estimate()) + unit
                + "&nbsp;&nbsp;&nbsp;&nbsp; u<sub>c</sub>(y) = "
                + Rounding.uncertainty(o.standardUncertainty(), digits).toPlainString() + unit
                + "&nbsp;&nbsp;&nbsp;&nbsp; \u03bd<sub>eff</sub> = " + dofNote + "</html>");
        set(figures2, "k = " + org.quire.engine.gum.Figures.coverageFactor(o.coverageFactor())
                + "     U = " + Rounding.uncertainty(o.expandedUncertainty(), digits).toPlainString() + unit
                // a relative U only where it means something: not for a quantity that is itself in % (an error)
                + (!org.quire.engine.gum.Figures.relativeUncertaintyMeaningful(o.unit(), o.estimate(),
                        o.expandedUncertainty()) ? ""
                        : "     U/|y| = " + Rounding.uncertainty(100 * o.relativeExpandedUncertainty(), digits)
                                .toPlainString() + " %"));
        boolean columnsChanged = shown == null || !shown.unit().equals(o.unit());
        shown = o;
        model.set(o);
        totalModel.set(o);
        if (columnsChanged) {
            model.fireTableStructureChanged();
            table.setRowSorter(sorter);
        }
        applyFilter();
        fitColumns();
        javax.swing.table.JTableHeader header = table.getTableHeader();
        int headerHeight = 0;
        for (int c = 0; c < table.getColumnCount(); c++) {
            headerHeight = Math.max(headerHeight, header.getDefaultRenderer().getTableCellRendererComponent(table,
                    table.getColumnModel().getColumn(c).getHeaderValue(), false, false, -1, c).getPreferredSize().height);
        }
        header.setPreferredSize(new Dimension(table.getColumnModel().getTotalColumnWidth(), headerHeight + 4));
        header.revalidate();
        chart.show(o);
        int h = table.getRowHeight() * Math.max(3, table.getRowCount()) + table.getTableHeader().getPreferredSize().height + 4;
        table.getParent().getParent().setPreferredSize(new Dimension(700, h));
    }

    /** Sizes every column to its header and its widest cell, so that nothing is clipped. */
    private void fitColumns() {
        for (int c = 0; c < table.getColumnCount(); c++) {
            TableColumn col = table.getColumnModel().getColumn(c);
            Component h = table.getTableHeader().getDefaultRenderer().getTableCellRendererComponent(table,
                    col.getHeaderValue(), false, false, -1, c);
            int w = h.getPreferredSize().width;
            for (JTable t : new JTable[] {table, total}) {
                for (int r = 0; r < t.getRowCount(); r++) {
                    Component k = t.prepareRenderer(t.getCellRenderer(r, c), r, c);
                    w = Math.max(w, k.getPreferredSize().width);
                }
            }
            col.setPreferredWidth(w + 14);
        }
    }

    JTable table() { return table; }

    /** @return the ranking chart beside the table */
    ContributionChart chart() { return chart; }

    /**
     * Puts the chart (the second component) beside the table (the first) when both fit the width at their
     * preferred sizes, else below it, so that neither is squeezed.
     */
    private static final class BesideOrBelow implements java.awt.LayoutManager {
        private static final int GAP = 12;

        @Override public void addLayoutComponent(String name, Component c) { }
        @Override public void removeLayoutComponent(Component c) { }

        private static boolean beside(java.awt.Container p, int width) {
            Dimension a = p.getComponent(0).getPreferredSize();
            Dimension b = p.getComponent(1).getPreferredSize();
            return a.width + GAP + b.width <= width;
        }

        @Override
        public Dimension preferredLayoutSize(java.awt.Container p) {
            Dimension a = p.getComponent(0).getPreferredSize();
            Dimension b = p.getComponent(1).getPreferredSize();
            int w = p.getWidth() > 0 ? p.getWidth() : a.width + GAP + b.width;
            return beside(p, w) ? new Dimension(a.width + GAP + b.width, Math.max(a.height, b.height))
                    : new Dimension(Math.max(a.width, b.width), a.height + GAP + below(p, w));
        }

        /** @return the chart's height below the table, as wide as the panel (its text keeps the UI font size) */
        private static int below(java.awt.Container p, int width) {
            Component b = p.getComponent(1);
            return b instanceof org.quire.app.ui.chart.ChartView v ? v.heightFor(width) : b.getPreferredSize().height;
        }

        @Override
        public Dimension minimumLayoutSize(java.awt.Container p) {
            return new Dimension(200, 100);
        }

        @Override
        public void layoutContainer(java.awt.Container p) {
            Component a = p.getComponent(0);
            Component b = p.getComponent(1);
            Dimension pa = a.getPreferredSize();
            Dimension pb = b.getPreferredSize();
            int w = p.getWidth();
            if (beside(p, w)) {
                a.setBounds(0, 0, w - pb.width - GAP, p.getHeight());
                b.setBounds(w - pb.width, 0, pb.width, pb.height);
            } else {
                int bh = below(p, w);
                a.setBounds(0, 0, w, Math.max(0, p.getHeight() - bh - GAP));
                b.setBounds(0, p.getHeight() - bh, w, bh);
            }
        }
    }

    String summaryText() {
        String plain = figures.getText().replace("&nbsp;", " ").replace("<sub>", "_").replaceAll("<[^>]*>", "");
        return headline.getText() + "\n" + plain + "\n" + figures2.getText();
    }

    /** Sets a label's text only when it differs: layout of text is the costly part of an update. */
    private static void set(JLabel l, String text) {
        if (!text.equals(l.getText())) {
            l.setText(text);
        }
    }
}
