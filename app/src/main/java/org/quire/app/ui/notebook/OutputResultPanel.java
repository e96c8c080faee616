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
    /** Each column's width to show everything, and the least it is given (its header's longest word). */
    private int[] natural;
    private int[] least;

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
        table.getTableHeader().setDefaultRenderer(new WrappingHeader(table.getTableHeader().getDefaultRenderer()));
        sp.getViewport().addComponentListener(new java.awt.event.ComponentAdapter() {
            @Override
            public void componentResized(java.awt.event.ComponentEvent e) {
                layoutColumns();
            }
        });
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
        chart.show(o);
        fitHeight();
    }

    /** Makes the table's scroll pane as high as its header and rows, so that it never scrolls up and down. */
    private void fitHeight() {
        int h = table.getRowHeight() * Math.max(3, table.getRowCount()) + table.getTableHeader().getPreferredSize().height + 4;
        java.awt.Component sp = table.getParent().getParent();
        if (sp.getPreferredSize().height != h) {
            sp.setPreferredSize(new Dimension(700, h));
            sp.revalidate();
        }
    }

    /**
     * Works out each column's natural width (its header on the lines it is written in, and its widest cell) and
     * its least width (the longest word of its header), then lays the columns out in the visible width.
     */
    private void fitColumns() {
        int n = table.getColumnCount();
        natural = new int[n];
        least = new int[n];
        java.awt.FontMetrics fm = table.getTableHeader().getFontMetrics(table.getTableHeader().getFont());
        for (int c = 0; c < n; c++) {
            TableColumn col = table.getColumnModel().getColumn(c);
            String header = String.valueOf(col.getHeaderValue());
            int w = 0;
            for (String line : WrappingHeader.lines(header)) {
                w = Math.max(w, fm.stringWidth(line));
            }
            int word = 0;
            for (String line : WrappingHeader.lines(header)) {
                for (String part : line.split(" ")) {
                    word = Math.max(word, fm.stringWidth(part));
                }
            }
            for (JTable t : new JTable[] {table, total}) {
                for (int r = 0; r < t.getRowCount(); r++) {
                    Component k = t.prepareRenderer(t.getCellRenderer(r, c), r, c);
                    w = Math.max(w, k.getPreferredSize().width);
                }
            }
            natural[c] = w + 14;
            // the input's name and the degrees of freedom are never cut short; other columns give way down to their
            // header's longest word
            least[c] = c == ContributionTableModel.INPUT || c == ContributionTableModel.DOF ? natural[c]
                    : Math.min(natural[c], word + 14);
        }
        layoutColumns();
    }

    /**
     * Gives every column its natural width when they all fit the visible width of the table; else takes the
     * missing width from the columns in proportion to what each can give above its least width, so that the
     * table never scrolls sideways. A cell that no longer shows its whole text has it in its tooltip; headers
     * wrap onto more lines ({@link WrappingHeader}).
     */
    private void layoutColumns() {
        if (natural == null || natural.length != table.getColumnCount()) {
            return;
        }
        int n = natural.length;
        int avail = ((javax.swing.JViewport) table.getParent()).getWidth();
        int want = 0;
        int give = 0;
        for (int c = 0; c < n; c++) {
            want += natural[c];
            give += natural[c] - least[c];
        }
        int[] w = natural.clone();
        if (avail > 0 && want > avail) {
            int missing = want - avail;
            int left = missing;
            for (int c = 0; c < n && give > 0; c++) {
                int take = (int) Math.ceil((double) missing * (natural[c] - least[c]) / give);
                take = Math.min(take, Math.min(left, natural[c] - least[c]));
                w[c] -= take;
                left -= take;
            }
            if (left > 0) {
                // even the headers' longest words do not fit: every column gives way in proportion to its width,
                // down to a few characters (the tooltips keep the full text)
                int floor = table.getFontMetrics(table.getFont()).stringWidth("0000");
                int room = 0;
                for (int c = 0; c < n; c++) {
                    room += Math.max(0, w[c] - floor);
                }
                int still = left;
                for (int c = 0; c < n && room > 0; c++) {
                    int take = (int) Math.ceil((double) left * Math.max(0, w[c] - floor) / room);
                    take = Math.min(take, Math.min(still, Math.max(0, w[c] - floor)));
                    w[c] -= take;
                    still -= take;
                }
            }
        }
        for (int c = 0; c < n; c++) {
            TableColumn col = table.getColumnModel().getColumn(c);
            if (col.getPreferredWidth() != w[c] || col.getWidth() != w[c]) {
                col.setPreferredWidth(w[c]);
                col.setWidth(w[c]);
            }
        }
        // the header UI measures only the first column of a shared renderer: the height of the wrapped headers
        // is worked out here, over every column at its width
        javax.swing.table.JTableHeader header = table.getTableHeader();
        int height = 0;
        for (int c = 0; c < n; c++) {
            height = Math.max(height, header.getDefaultRenderer().getTableCellRendererComponent(table,
                    table.getColumnModel().getColumn(c).getHeaderValue(), false, false, -1, c).getPreferredSize().height);
        }
        Dimension size = new Dimension(table.getColumnModel().getTotalColumnWidth(), height + 4);
        if (!size.equals(header.getPreferredSize())) {
            header.setPreferredSize(size);
            header.revalidate();
            fitHeight();
        }
        header.repaint();
    }

    JTable table() { return table; }

    /** @return the ranking chart beside the table */
    ContributionChart chart() { return chart; }

    /**
     * The table's header renderer (the look and feel's own) with the header's words wrapped onto as many lines as
     * the column's width needs, each line centred; the full text is the header's tooltip.
     */
    static final class WrappingHeader implements javax.swing.table.TableCellRenderer {
        private final javax.swing.table.TableCellRenderer base;

        WrappingHeader(javax.swing.table.TableCellRenderer base) {
            this.base = base;
        }

        /** @return the lines a header is written in ({@code <br>} in an HTML header), tags removed */
        static List<String> lines(String header) {
            String t = header.replaceAll("(?i)</?html>", "");
            List<String> out = new java.util.ArrayList<>();
            for (String l : t.split("(?i)<br>")) {
                out.add(l.replaceAll("<[^>]*>", "").strip());
            }
            return out;
        }

        @Override
        public Component getTableCellRendererComponent(JTable t, Object v, boolean sel, boolean focus, int r, int c) {
            Component k = base.getTableCellRendererComponent(t, v, sel, focus, r, c);
            if (!(k instanceof JLabel) || c < 0 || c >= t.getColumnCount()) {
                return k;
            }
            JLabel l = (JLabel) k;
            int width = t.getColumnModel().getColumn(c).getWidth() - 10;
            java.awt.FontMetrics fm = l.getFontMetrics(l.getFont());
            List<String> out = new java.util.ArrayList<>();
            for (String line : lines(String.valueOf(v))) {
                StringBuilder cur = new StringBuilder();
                for (String word : line.split(" ")) {
                    String next = cur.length() == 0 ? word : cur + " " + word;
                    if (cur.length() > 0 && fm.stringWidth(next) > width) {
                        out.add(cur.toString());
                        cur = new StringBuilder(word);
                    } else {
                        cur = new StringBuilder(next);
                    }
                }
                out.add(cur.toString());
            }
            StringBuilder html = new StringBuilder("<html><center>");
            for (int i = 0; i < out.size(); i++) {
                html.append(i == 0 ? "" : "<br>").append(out.get(i).replace("&", "&amp;").replace("<", "&lt;"));
            }
            l.setText(html.append("</center></html>").toString());
            return l;
        }
    }

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
                    : new Dimension(Math.max(a.width, b.width), a.height + GAP + b.height);
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
                int bw = Math.min(w, pb.width);
                int bh = pb.width == 0 ? 0 : pb.height * bw / pb.width;
                a.setBounds(0, 0, w, Math.max(0, p.getHeight() - bh - GAP));
                b.setBounds(0, p.getHeight() - bh, bw, bh);
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
