package org.quire.app.ui.calibration;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.function.BiConsumer;
import java.util.function.Supplier;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.SwingWorker;
import javax.swing.table.AbstractTableModel;
import org.quire.app.report.CalibrationCharts;
import org.quire.app.ui.chart.ChartView;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.common.Fmt;
import org.quire.app.ui.common.GuardedWorker;
import org.quire.app.ui.common.Windows;
import org.quire.engine.budget.Budget;
import org.quire.engine.conformity.ConformityAssessment;
import org.quire.engine.conformity.PointDecision;
import org.quire.engine.gum.Figures;
import org.quire.engine.gum.FlowRange;
import org.quire.engine.gum.FlowRangeResult;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.units.Units;

/**
 * A budget evaluated at each of its flow points, as the engine's {@link FlowRange} evaluates it: a table with one
 * row per point (flow, result, u, ν_eff, k, U and, when the budget asks for them, the MPE, the probability of
 * conformity and the decision), the tabulated output against flow with U as bars and the MPE envelope (the chart
 * the report draws), and a drill-down from a point to its full budget. The evaluation runs off the event thread
 * with progress and Cancel; every figure is the engine's.
 */
public final class FlowRangeWindow extends JFrame {
    private final FunctionLibrary library;
    private final Supplier<Budget> source;
    private final BiConsumer<String, Budget> openPoint;
    private final JLabel header = new JLabel(" ");
    private final JLabel state = new JLabel(" ");
    private final JProgressBar progress = new JProgressBar();
    private final JButton cancel = new JButton("Cancel");
    private final JButton again = new JButton("Evaluate again");
    private final Points points = new Points();
    private final JTable table = new JTable(points);
    private final ChartView chart = new ChartView();
    private Budget budget;
    private FlowRangeResult result;
    private SwingWorker<FlowRangeResult, Integer> worker;

    /**
     * @param name the budget's name, for the title
     * @param source the budget to evaluate (read again by Evaluate again: the editor's present budget)
     * @param library the function library
     * @param openPoint opens the full budget of a point (its label, e.g. "point 2 at 0.2504 m³/h", and the
     *     engine's budget of the point)
     */
    public FlowRangeWindow(String name, Supplier<Budget> source, FunctionLibrary library,
            BiConsumer<String, Budget> openPoint) {
        super("Flow range \u2013 " + name);
        this.library = library;
        this.source = source;
        this.openPoint = openPoint;
        setName("flowRange");
        setDefaultCloseOperation(DISPOSE_ON_CLOSE);
        Windows.closeOnEscapeAndCtrlW(getRootPane(), this);
        table.setName("flowPoints");
        PointsTable.install(table, c -> !points.getColumnName(c).startsWith("Result") && !points.getColumnName(c)
                .startsWith("MPE") && !points.getColumnName(c).equals("Decision"), r -> false,
                r -> "Double-click to open the full budget at this flow point", this::drillDown);
        JButton open = new JButton("Open point budget");
        open.setName("openFlowPoint");
        open.setMnemonic('O');
        open.addActionListener(e -> drillDown(table.getSelectedRow()));
        again.setName("evaluateAgain");
        again.setToolTipText("Evaluate the budget as it is now in its editor");
        again.addActionListener(e -> evaluate(source.get()));
        cancel.setName("cancelFlowRange");
        cancel.addActionListener(e -> cancelRun());
        progress.setName("flowRangeProgress");
        progress.setStringPainted(true);
        progress.setVisible(false);
        state.setName("flowRangeState");
        JPanel tools = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 2));
        tools.add(open);
        tools.add(again);
        tools.add(progress);
        tools.add(cancel);
        tools.add(state);
        header.setName("flowRangeHeader");
        header.setBorder(BorderFactory.createEmptyBorder(6, 8, 4, 8));
        JPanel north = new JPanel(new BorderLayout());
        north.add(header, BorderLayout.NORTH);
        north.add(tools, BorderLayout.SOUTH);
        chart.setName("flowRangeChart");
        JScrollPane tableScroll = new JScrollPane(table);
        tableScroll.setPreferredSize(new Dimension(900, table.getRowHeight() * 8 + 32));
        tableScroll.setMinimumSize(new Dimension(200, table.getRowHeight() * 3 + 32));
        chart.setMinimumSize(new Dimension(200, 150));
        JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, tableScroll,
                org.quire.app.ui.chart.ChartStack.of(chart)); // scrolls, never cuts, where the chart is taller
        split.setResizeWeight(0);
        getContentPane().add(north, BorderLayout.NORTH);
        getContentPane().add(split, BorderLayout.CENTER);
        setSize(new Dimension(1280, 720));
        evaluate(source.get());
    }

    /**
     * Told that the editor's budget has changed: figures shown for an earlier budget are marked as such (they
     * stay, for comparison, until Evaluate again).
     */
    public void sourceChanged() {
        if (result != null && !isRunning() && !source.get().equals(budget)) {
            state.setText("The budget has changed since this evaluation; Evaluate again for the present budget.");
            state.setForeground(Colors.get("Quire.warning"));
        } else if (result != null && !isRunning()) {
            shownCurrent();
        }
    }

    /** @return the result shown, or null before the first or after a cancelled run */
    public FlowRangeResult result() {
        return result;
    }

    /** @return whether an evaluation is running */
    public boolean isRunning() {
        return worker != null && !worker.isDone();
    }

    /** @return the table of the points */
    public JTable pointsTable() {
        return table;
    }

    /** Evaluates {@code b} at its flow points off the event thread; a run already going is cancelled. */
    public void evaluate(Budget b) {
        cancelRun();
        if (b.flowPoints() == null) {
            worker = null;
            runEnded();
            cleared(org.quire.app.ui.common.Fmt.sentence(FlowRange.NO_FLOW_POINTS) + ".");
            return;
        }
        Budget evaluated = b;
        state.setText("Evaluating the budget at each flow point\u2026");
        state.setForeground(Colors.get("Label.foreground"));
        progress.setVisible(true);
        cancel.setEnabled(true);
        again.setEnabled(false);
        int m = b.flowPoints().rows().size();
        progress.setIndeterminate(false);
        progress.setMaximum(m);
        progress.setValue(0);
        progress.setString("0 of " + m + " points");
        SwingWorker<FlowRangeResult, Integer> w = new GuardedWorker<>() {
            @Override
            protected FlowRangeResult doInBackground() throws Exception {
                SwingWorker<FlowRangeResult, Integer> self = this;
                return FlowRange.evaluate(evaluated, library, new FlowRange.Listener() {
                    @Override
                    public void pointDone(int done, int of) {
                        publish(done);
                    }

                    @Override
                    public boolean cancelled() {
                        return self.isCancelled();
                    }
                });
            }

            @Override
            protected void received(List<Integer> done) {
                if (worker == this) {
                    int d = done.get(done.size() - 1);
                    progress.setValue(d);
                    progress.setString(d + " of " + m + " points");
                }
            }

            @Override
            protected void finished() {
                if (worker != this) {
                    return;
                }
                runEnded();
                try {
                    FlowRangeResult shown = get();
                    budget = evaluated; // only a budget whose figures are shown is the one drilled into
                    show(shown);
                    sourceChanged(); // the editor's budget may have changed during the run
                } catch (CancellationException e) {
                    cleared("Cancelled: no result shown; Evaluate again to start over.");
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    cleared("<html>Not evaluated: " + esc(String.valueOf(e.getCause().getMessage())) + "</html>");
                    state.setForeground(Colors.get("Quire.error"));
                }
            }
        };
        worker = w;
        w.execute();
    }

    private void cancelRun() {
        if (worker != null && !worker.isDone()) {
            worker.cancel(true);
        }
    }

    private void runEnded() {
        progress.setVisible(false);
        cancel.setEnabled(false);
        again.setEnabled(true);
    }

    /** Shows no figures at all (never the last result next to a message that there is none). */
    private void cleared(String message) {
        result = null;
        points.set(null, 2);
        chart.setChart(null);
        header.setText(" ");
        state.setText(message);
        state.setForeground(Colors.get("Label.foreground"));
    }

    private void show(FlowRangeResult r) {
        result = r;
        ConformityAssessment a = r.conformity();
        StringBuilder h = new StringBuilder("<html><b>").append(esc(budget.title().isBlank() ? getTitle()
                : budget.title())).append("</b><br>").append(r.points().size()).append(" flow points; output ")
                .append(esc(r.output())).append(r.unit().isBlank() ? "" : " in " + esc(Units.display(r.unit())))
                .append(". Inputs read afresh at each point are independent between points; inputs shared by all "
                        + "points correlate the results (JCGM 102:2011 6.2.1.3).");
        if (a != null) {
            h.append("<br>Conformity against ").append(esc(a.envelope().name())).append(" (")
                    .append(esc(a.rule().kind().title())).append("): <b>").append(esc(a.overall().label()))
                    .append("</b>. ").append(esc(a.statement()));
        }
        header.setText(h.append("</html>").toString());
        points.set(r, budget.settings().significantDigits());
        PointsTable.fitColumns(table);
        chart.setChart(CalibrationCharts.flowRange(r));
        shownCurrent();
    }

    private void shownCurrent() {
        state.setText("Evaluated; double-click a point for its full budget.");
        state.setForeground(Colors.get("Label.foreground"));
    }

    private void drillDown(int row) {
        if (result == null || row < 0 || row >= points.getRowCount()) {
            state.setText("Select a flow point first.");
            return;
        }
        FlowRangeResult.Point p = result.points().get(row);
        openPoint.accept("point " + (row + 1) + " at " + Fmt.num(p.flow()) + (result.flowUnit().isBlank() ? ""
                : " " + Units.display(result.flowUnit())), FlowRange.atPoint(budget, row));
    }

    private static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;");
    }

    /** One row per flow point: the engine's figures as shown. */
    static final class Points extends AbstractTableModel {
        private FlowRangeResult r;
        private int digits = 2;
        private final List<String> columns = new ArrayList<>();
        /** Whether U/|y| means something at some point (not for an output that is an error in % already). */
        private boolean relative;

        void set(FlowRangeResult result, int significantDigits) {
            r = result;
            digits = significantDigits;
            columns.clear();
            if (r != null) {
                String fu = r.flowUnit().isBlank() ? "" : " / " + Units.display(r.flowUnit());
                String yu = r.unit().isBlank() ? "" : " / " + Units.display(r.unit());
                columns.addAll(List.of("Point", "Flow" + fu, r.output() + yu, "u(" + r.output() + ")" + yu,
                        "\u03bd_eff", "k", "U" + yu, "Result, y \u00b1 U"));
                relative = false;
                for (FlowRangeResult.Point p : r.points()) {
                    relative |= Figures.relativeUncertaintyMeaningful(r.unit(), p.estimate(), p.expandedUncertainty());
                }
                if (relative) {
                    columns.add("U/|y| / %");
                }
                if (r.conformity() != null) {
                    columns.addAll(List.of("MPE", "p_c", "Decision"));
                }
            }
            fireTableStructureChanged();
        }

        @Override public int getRowCount() { return r == null ? 0 : r.points().size(); }
        @Override public int getColumnCount() { return columns.size(); }
        @Override public String getColumnName(int c) { return columns.get(c); }

        @Override
        public Object getValueAt(int row, int c) {
            FlowRangeResult.Point p = r.points().get(row);
            PointDecision d = r.conformity() == null ? null : r.conformity().decisions().get(row);
            int k = !relative && c >= 8 ? c + 1 : c;
            switch (k) {
                case 0: return Integer.toString(row + 1);
                case 1: return Fmt.num(p.flow());
                case 2: return Fmt.working(p.estimate());
                case 3: return Fmt.working(p.standardUncertainty());
                case 4: return Fmt.dof(p.result().dofUsed());
                case 5: return Figures.coverageFactor(p.result().coverageFactor());
                case 6: return Fmt.working(p.expandedUncertainty());
                case 7: return "(" + org.quire.engine.gum.Figures.statedResult(p.estimate(), p.expandedUncertainty(), digits) + ")"
                        + (r.unit().isBlank() ? "" : " " + Units.display(r.unit()));
                case 8: return Figures.relativeUncertaintyMeaningful(r.unit(), p.estimate(), p.expandedUncertainty())
                        ? Fmt.working(100 * p.relativeExpandedUncertainty()) : "\u2013";
                case 9: return d.limits().label();
                case 10: return String.format(java.util.Locale.ROOT, "%.4f", d.probabilityOfConformity());
                default: return d.decision().label();
            }
        }
    }
}
