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
    /**
     * Each column's width to show everything on one line; the width down to which it gives way before a header's
     * longest word is cut; and the least it is ever given (its widest figure or unit, which are never cut).
     */
    private int[] natural;
    private int[] soft;
    private int[] least;
    /** The columns of figures, whose unit goes onto a second line when the column is narrow. */
    private static final int[] FIGURES = {ContributionTableModel.ESTIMATE, ContributionTableModel.U,
        ContributionTableModel.SENSITIVITY, ContributionTableModel.CONTRIBUTION, ContributionTableModel.SHARE};
    /** The columns of words, which give way first (wrapping their words, the evaluation written short). */
    private static final int[] WORDS = {ContributionTableModel.EVALUATION, ContributionTableModel.DISTRIBUTION};
    private static final int PAD = 14;
    /** A row's height with one line of text. */
    private final int lineRow;

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
                setHorizontalAlignment(mc <= 2 ? LEFT : RIGHT);
                java.awt.Insets in = getInsets();
                List<String> lines = lines(m, mr, mc, getFontMetrics(getFont()),
                        t.getColumnModel().getColumn(c).getWidth() - in.left - in.right);
                if (lines.size() == 1) {
                    setText(lines.get(0));
                } else {
                    // the unit under its figure, right-aligned like it, in the secondary colour
                    StringBuilder html = new StringBuilder(mc <= 2 ? "<html>" : "<html><div align=right>");
                    for (int i = 0; i < lines.size(); i++) {
                        String line = lines.get(i).replace("&", "&amp;").replace("<", "&lt;");
                        boolean unit = i > 0 && mc > 2 && !sel;
                        html.append(i == 0 ? "" : "<br>").append(unit ? "<font color=" + hex(
                                Colors.get("Label.disabledForeground")) + ">" + line + "</font>" : line);
                    }
                    setText(html.append(mc <= 2 ? "</html>" : "</div></html>").toString());
                }
                String full = m.full(mr, mc);
                setToolTipText(full.isEmpty() ? null : full);
                putClientProperty(SpreadsheetTable.COPY_TEXT, full);
                return this;
            }
        };
        table.setDefaultRenderer(Object.class, cells);
        table.setDefaultRenderer(String.class, cells);
        table.setDefaultRenderer(Double.class, cells);
        lineRow = table.getRowHeight();
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
        showIdle.addActionListener(e -> {
            applyFilter();
            fitColumns();
        });
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
        // the columns give way by their kind (figures, words), read by model index: they keep their order
        table.getTableHeader().setReorderingAllowed(false);
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
        String rounded = org.quire.engine.gum.Figures.statedResult(o.estimate(), o.expandedUncertainty(), digits);
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

    /**
     * The lines a cell is written in at a width: its text on one line when it fits; else a figure on the first
     * line and its unit on the second, words wrapped onto lines. A figure is never cut ({@link #fitColumns} gives
     * its column the width of the widest).
     */
    private static List<String> lines(ContributionTableModel m, int r, int c, java.awt.FontMetrics fm, int room) {
        String text = m.shown(r, c);
        if (fm.stringWidth(text) <= room) {
            return List.of(text);
        }
        String unit = m.unit(r, c);
        if (!unit.isEmpty()) {
            return List.of(m.figure(r, c), unit);
        }
        if (c != ContributionTableModel.EVALUATION && c != ContributionTableModel.DISTRIBUTION) {
            return List.of(text);
        }
        List<String> out = new java.util.ArrayList<>();
        String cur = "";
        for (String word : text.split(" ")) {
            String next = cur.isEmpty() ? word : cur + " " + word;
            if (!cur.isEmpty() && fm.stringWidth(next) > room) {
                out.add(cur);
                cur = word;
            } else {
                cur = next;
            }
        }
        out.add(cur);
        return out;
    }

    private static String hex(java.awt.Color c) {
        return String.format("#%06x", c.getRGB() & 0xffffff);
    }

    /** Makes the table's scroll pane as high as its header and rows, so that it never scrolls up and down. */
    private void fitHeight() {
        int h = Math.max(table.getPreferredSize().height, lineRow * 3) + table.getTableHeader().getPreferredSize().height + 4;
        java.awt.Component sp = table.getParent().getParent();
        if (sp.getPreferredSize().height != h) {
            sp.setPreferredSize(new Dimension(700, h));
            sp.revalidate();
        }
    }

    /**
     * Works out each column's natural width (its header on the lines it is written in, and its widest cell on one
     * line), the width down to which it gives way before its header's longest word is cut, and its least width:
     * its widest figure or unit for a column of figures (never cut), its widest word for a column of words ("B"
     * and "Type" for the evaluation written short), the natural width for the input and the degrees of freedom.
     */
    private void fitColumns() {
        int n = table.getColumnCount();
        natural = new int[n];
        soft = new int[n];
        least = new int[n];
        java.awt.FontMetrics fm = table.getTableHeader().getFontMetrics(table.getTableHeader().getFont());
        for (int c = 0; c < n; c++) {
            TableColumn col = table.getColumnModel().getColumn(c);
            int mc = col.getModelIndex();
            String header = mc == ContributionTableModel.EVALUATION ? "Evaluation" : model.getColumnName(mc);
            int w = 0;
            int word = 0;
            for (String line : WrappingHeader.lines(header)) {
                w = Math.max(w, fm.stringWidth(line));
                for (String part : line.split(" ")) {
                    word = Math.max(word, fm.stringWidth(part));
                }
            }
            // a header's words may be cut as a last resort (its tooltip has them), a figure or unit never
            int min = mc == ContributionTableModel.EVALUATION ? fm.stringWidth("Type")
                    : mc == ContributionTableModel.DISTRIBUTION ? word : 0;
            for (JTable t : new JTable[] {table, total}) {
                ContributionTableModel m = (ContributionTableModel) t.getModel();
                java.awt.FontMetrics cf = t.getFontMetrics(t.getFont());
                int in = 6;
                if (t.getRowCount() > 0) {
                    java.awt.Insets i = ((javax.swing.JComponent) t.prepareRenderer(t.getCellRenderer(0, c), 0, c))
                            .getInsets();
                    in = i.left + i.right;
                }
                // the rows shown (an input with c_i = 0 may be hidden)
                for (int vr = 0; vr < t.getRowCount(); vr++) {
                    int r = t.convertRowIndexToModel(vr);
                    w = Math.max(w, cf.stringWidth(m.full(r, mc)) + in);
                    if (mc == ContributionTableModel.EVALUATION) {
                        min = Math.max(min, cf.stringWidth(m == model ? m.row(r).type() : m.full(r, mc)) + in);
                    } else if (mc == ContributionTableModel.DISTRIBUTION) {
                        for (String part : m.full(r, mc).split(" ")) {
                            min = Math.max(min, cf.stringWidth(part) + in);
                        }
                    } else {
                        min = Math.max(min, Math.max(cf.stringWidth(m.figure(r, mc)), cf.stringWidth(m.unit(r, mc)))
                                + in);
                    }
                }
            }
            natural[c] = w + PAD;
            boolean whole = mc == ContributionTableModel.INPUT || mc == ContributionTableModel.DOF;
            least[c] = whole ? natural[c] : Math.min(natural[c], min + 6);
            soft[c] = whole ? natural[c] : Math.max(least[c], Math.min(natural[c], word + PAD));
        }
        layoutColumns();
    }

    /**
     * Takes up to {@code missing} pixels from the given columns, in proportion to what each can give above its
     * floor.
     *
     * @return the pixels still missing
     */
    private static int giveWay(int[] w, int[] floor, int[] cols, int missing) {
        int room = 0;
        for (int c : cols) {
            room += Math.max(0, w[c] - floor[c]);
        }
        int left = missing;
        for (int c : cols) {
            if (room <= 0 || left <= 0) {
                break;
            }
            int can = Math.max(0, w[c] - floor[c]);
            int take = Math.min(Math.min(left, can), (int) Math.ceil((double) missing * can / room));
            w[c] -= take;
            left -= take;
        }
        return left;
    }

    /**
     * Gives every column its natural width when they all fit the visible width of the table; else the columns of
     * words give way first (wrapping, the evaluation written short), then the columns of figures down to their
     * headers' longest words, then down to their widest figure or unit, so that the table does not scroll
     * sideways and no figure is cut: a figure whose unit does not fit beside it has it on a second line, and the
     * rows grow to their lines. Headers wrap onto more lines ({@link WrappingHeader}); the tooltips keep the full
     * text.
     */
    private void layoutColumns() {
        if (natural == null || natural.length != table.getColumnCount()) {
            return;
        }
        int n = natural.length;
        int avail = ((javax.swing.JViewport) table.getParent()).getWidth();
        int want = 0;
        for (int c = 0; c < n; c++) {
            want += natural[c];
        }
        int[] w = natural.clone();
        if (avail > 0 && want > avail) {
            int missing = giveWay(w, least, WORDS, want - avail);
            missing = giveWay(w, soft, FIGURES, missing);
            giveWay(w, least, FIGURES, missing);
        }
        // one rule for the evaluation: written short whenever its column is narrower than its natural width
        boolean shortEvaluation = w[ContributionTableModel.EVALUATION] < natural[ContributionTableModel.EVALUATION];
        model.shortEvaluation(shortEvaluation);
        TableColumn evaluation = table.getColumnModel().getColumn(ContributionTableModel.EVALUATION);
        String title = shortEvaluation ? "Type" : model.getColumnName(ContributionTableModel.EVALUATION);
        if (!title.equals(evaluation.getHeaderValue())) {
            evaluation.setHeaderValue(title);
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
        }
        // every row as high as its most lines
        for (JTable t : new JTable[] {table, total}) {
            for (int r = 0; r < t.getRowCount(); r++) {
                int h = lineRow;
                for (int c = 0; c < n; c++) {
                    h = Math.max(h, t.prepareRenderer(t.getCellRenderer(r, c), r, c).getPreferredSize().height);
                }
                if (t.getRowHeight(r) != h) {
                    t.setRowHeight(r, h);
                }
            }
        }
        fitHeight();
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
