package org.quire.app.ui.calibration;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.function.Consumer;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.table.AbstractTableModel;
import org.quire.app.report.CalibrationCharts;
import org.quire.app.ui.common.Colors;
import org.quire.app.ui.common.FileDropHandler;
import org.quire.app.ui.common.Fmt;
import org.quire.app.ui.common.GuardedWorker;
import org.quire.app.ui.common.Windows;
import org.quire.app.ui.chart.ChartView;
import org.quire.engine.calibration.Adjustment;
import org.quire.engine.calibration.AdjustmentResult;
import org.quire.engine.calibration.Calibration;
import org.quire.engine.calibration.CalibrationEvaluator;
import org.quire.engine.calibration.CalibrationException;
import org.quire.engine.calibration.CalibrationResult;
import org.quire.engine.calibration.PointConformity;
import org.quire.engine.calibration.PointResult;
import org.quire.engine.calibration.RunResult;
import org.quire.engine.calibration.RunsCsv;
import org.quire.engine.calibration.SeriesResult;
import org.quire.engine.csv.CsvOptions;
import org.quire.engine.csv.CsvReader;
import org.quire.engine.document.Template;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.model.ModelException;

/**
 * A meter's calibration across its range, as the engine evaluates it: the runs and points table (per run and per
 * point, as found and as left), the error curve against flow with the reported U as bars and the MPE at each
 * point, the adjustment with the old and new constant, the fitted line's residuals when the adjustment fits a
 * slope, conformity and CMC per point, and a drill-down from a point to its full budget. Runs come from the rig's
 * CSV file by Import or by dropping the file on the window; every figure is the engine's.
 */
public final class CalibrationWindow extends JFrame {
    private final Template method;
    private final FunctionLibrary library;
    private final Consumer<PointResult> openPoint;
    private Calibration calibration;
    private CalibrationResult result;
    private final JLabel header = new JLabel();
    private final JLabel adjustmentText = new JLabel();
    private final JLabel state = new JLabel(" ");
    private final Rows rows = new Rows();
    private final JTable table = new JTable(rows);
    private final ChartView errorCurve = new ChartView();
    private final ChartView residuals = new ChartView();
    private final JComboBox<String> adjustment = new JComboBox<>(new String[] {"Not adjusted",
        "Adjust by the weighted mean error", "Adjust by a fitted slope"});
    private boolean updating;

    /**
     * @param calibration the calibration, as loaded from its file
     * @param method its method template
     * @param library the function library
     * @param openPoint opens a point's full budget in the workbench
     */
    public CalibrationWindow(Calibration calibration, Template method, FunctionLibrary library,
            Consumer<PointResult> openPoint) {
        super("Calibration \u2013 " + calibration.title());
        this.calibration = calibration;
        this.method = method;
        this.library = library;
        this.openPoint = openPoint;
        setName("calibration");
        setDefaultCloseOperation(DISPOSE_ON_CLOSE);
        Windows.closeOnEscapeAndCtrlW(getRootPane(), this);
        table.setName("calibrationRuns");
        PointsTable.install(table, c -> c >= 3 && c <= 10, r -> rows.row(r).run() == null,
                r -> rows.row(r).run() == null && rows.row(r).point().budget() != null
                        ? "Double-click to open the full budget of point " + rows.row(r).point().label() : null,
                this::drillDown);
        JButton importRuns = new JButton("Import runs CSV\u2026");
        importRuns.setName("importRuns");
        importRuns.setMnemonic('I');
        importRuns.addActionListener(e -> {
            javax.swing.JFileChooser c = new javax.swing.JFileChooser();
            c.setDialogTitle("Import the runs of the rig");
            c.setFileFilter(new javax.swing.filechooser.FileNameExtensionFilter("CSV files", "csv", "txt"));
            if (c.showOpenDialog(this) == javax.swing.JFileChooser.APPROVE_OPTION) {
                importRuns(c.getSelectedFile().toPath());
            }
        });
        JButton open = new JButton("Open point budget");
        open.setName("openPoint");
        open.addActionListener(e -> drillDown(table.getSelectedRow()));
        adjustment.setName("adjustmentKind");
        adjustment.addActionListener(e -> {
            if (!updating) {
                Adjustment.Kind k = adjustment.getSelectedIndex() == 0 ? Adjustment.Kind.NONE
                        : adjustment.getSelectedIndex() == 1 ? Adjustment.Kind.WEIGHTED_MEAN : Adjustment.Kind.FITTED_SLOPE;
                evaluate(this.calibration.withAdjustment(new Adjustment(k, Double.NaN)));
            }
        });
        JPanel tools = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 2));
        tools.add(importRuns);
        tools.add(open);
        tools.add(new JLabel("Adjustment"));
        tools.add(adjustment);
        tools.add(state);
        state.setName("calibrationState");
        JPanel north = new JPanel(new BorderLayout());
        header.setBorder(BorderFactory.createEmptyBorder(6, 8, 2, 8));
        adjustmentText.setBorder(BorderFactory.createEmptyBorder(2, 8, 4, 8));
        adjustmentText.setName("adjustment");
        north.add(header, BorderLayout.NORTH);
        north.add(adjustmentText, BorderLayout.CENTER);
        north.add(tools, BorderLayout.SOUTH);
        errorCurve.setName("errorCurve");
        residuals.setName("residuals");
        JScrollPane charts = org.quire.app.ui.chart.ChartStack.of(errorCurve, residuals);
        JScrollPane runs = new JScrollPane(table);
        // the table scrolls sideways; the charts get about half the width, their text at the UI font size
        runs.setPreferredSize(new Dimension(600, 300));
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, runs, charts);
        split.setResizeWeight(0.5);
        getContentPane().add(north, BorderLayout.NORTH);
        getContentPane().add(split, BorderLayout.CENTER);
        setTransferHandler(new FileDropHandler(this::importRuns));
        setSize(new Dimension(1280, 720));
        split.setDividerLocation(1280 / 2);
        evaluate(calibration);
    }

    /** @return the result shown, or null before the first */
    public CalibrationResult result() {
        return result;
    }

    /** @return the runs and points table */
    public JTable runsTable() {
        return table;
    }

    /**
     * Replaces the runs by those of a rig's CSV file (columns point, phase, run and the method's per-run
     * quantities, read by the engine's one CSV reader) and evaluates again, off the event thread.
     */
    public void importRuns(Path csv) {
        state.setText("Reading " + csv.getFileName() + "\u2026");
        Calibration base = calibration;
        new GuardedWorker<Calibration, Void>() {
            @Override
            protected Calibration doInBackground() throws Exception {
                List<RunsCsv.MeterRuns> all = RunsCsv.read(CsvReader.read(csv, CsvOptions.defaults()), method);
                if (all.size() != 1) {
                    throw new IllegalArgumentException(csv.getFileName() + " holds the runs of " + all.size()
                            + " meters; this calibration is of one meter");
                }
                RunsCsv.MeterRuns m = all.get(0);
                Calibration c = base.withAsFound(m.asFound()).withAsLeft(m.asLeft());
                if (!Double.isNaN(m.constant()) && c.constant() != null) {
                    c = c.withConstant(c.constant().withAsFound(m.constant()));
                }
                return c;
            }

            @Override
            protected void finished() {
                try {
                    evaluate(get());
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    failed(csv.getFileName() + ": " + e.getCause().getMessage());
                }
            }
        }.execute();
    }

    private void evaluate(Calibration c) {
        state.setText("Evaluating\u2026");
        state.setForeground(Colors.get("Label.foreground"));
        new GuardedWorker<CalibrationResult, Void>() {
            @Override
            protected CalibrationResult doInBackground() throws ModelException, CalibrationException {
                return CalibrationEvaluator.of(method, library).evaluate(c);
            }

            @Override
            protected void finished() {
                try {
                    CalibrationResult r = get();
                    calibration = c;
                    show(r);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    failed(e.getCause().getMessage());
                }
            }
        }.execute();
    }

    private void failed(String message) {
        state.setText("<html>Not evaluated: " + esc(String.valueOf(message)) + "</html>");
        state.setForeground(Colors.get("Quire.error"));
    }

    private void show(CalibrationResult r) {
        result = r;
        updating = true;
        try {
            Adjustment.Kind k = r.calibration().adjustment() == null ? Adjustment.Kind.NONE : r.calibration().adjustment().kind();
            adjustment.setSelectedIndex(k == Adjustment.Kind.FITTED_SLOPE ? 2 : k == Adjustment.Kind.WEIGHTED_MEAN ? 1 : 0);
            adjustment.setEnabled(k != Adjustment.Kind.CHOSEN);
        } finally {
            updating = false;
        }
        StringBuilder h = new StringBuilder("<html><b>").append(esc(r.calibration().title())).append("</b><br>Method: ")
                .append(esc(r.methodTitle())).append(" (").append(esc(r.calibration().method().id())).append(" version ")
                .append(r.calibration().method().version()).append("); repeatability: ")
                .append(esc(r.calibration().repeatability().text()));
        for (String f : r.findings()) {
            h.append("<br><span style='color:").append(hex("Quire.warning")).append("'>").append(esc(f)).append("</span>");
        }
        header.setText(h.append("</html>").toString());
        AdjustmentResult adj = r.adjustment();
        if (adj == null) {
            adjustmentText.setText("<html>Not adjusted: the as-found results stand as left.</html>");
        } else {
            String unit = adj.constantUnit().isEmpty() ? "" : " " + adj.constantUnit();
            adjustmentText.setText("<html><b>Adjustment</b> (" + esc(adj.kind().text()) + "): " + esc(adj.constantName())
                    + " as found " + Fmt.num(adj.oldConstant()) + unit + ", as left " + org.quire.engine.gum.Figures.compact(adj.newConstant(), 6) + unit
                    + " (u = " + Fmt.working(adj.newConstantUncertainty()) + unit + "); error removed "
                    + Fmt.working(adj.errorRemoved()) + " %"
                    + (adj.notes().isEmpty() ? "" : "<br>" + esc(String.join(" ", adj.notes()))) + "</html>");
        }
        rows.set(r);
        PointsTable.fitColumns(table);
        errorCurve.setChart(CalibrationCharts.errorCurve(r));
        residuals.setChart(CalibrationCharts.residuals(r));
        state.setText(r.asFound().points().size() + (r.asFound().points().size() == 1 ? " point" : " points")
                + " evaluated; double-click a point (bold) for its full budget.");
        state.setForeground(Colors.get("Label.foreground"));
    }

    private void drillDown(int r) {
        if (r < 0 || r >= rows.getRowCount()) {
            state.setText("Select a point first.");
            return;
        }
        PointResult p = rows.row(r).point();
        if (p.budget() == null) {
            state.setText("Point " + p.label() + " is predicted from the as-found runs; it has no budget of its own.");
            return;
        }
        openPoint.accept(p);
    }

    private static String hex(String key) {
        return String.format("#%06x", Colors.get(key).getRGB() & 0xffffff);
    }

    private static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;");
    }

    /** One line of the table: a point (run null) or one of its runs. */
    record Row(SeriesResult series, PointResult point, RunResult run, PointConformity conformity) {
    }

    /** The runs and points of every series, each point followed by its runs. */
    static final class Rows extends AbstractTableModel {
        private static final String[] COLUMNS = {"Series", "Point", "Run (CSV line)", "Flow", "Error / %",
            "s of runs / %", "u(repeatability) / %", "U / %", "k", "CMC (U) / %", "Reported U / %", "MPE / %",
            "Decision", "U within MPE / ratio"};
        private final List<Row> rows = new ArrayList<>();
        private String flowUnit = "";

        void set(CalibrationResult r) {
            rows.clear();
            flowUnit = r.flowUnit();
            for (SeriesResult s : r.asLeft() == null ? List.of(r.asFound()) : List.of(r.asFound(), r.asLeft())) {
                for (int i = 0; i < s.points().size(); i++) {
                    PointResult p = s.points().get(i);
                    PointConformity pc = s.conformity() == null ? null : s.conformity().points().get(i);
                    rows.add(new Row(s, p, null, pc));
                    for (RunResult run : p.runs()) {
                        rows.add(new Row(s, p, run, null));
                    }
                }
            }
            fireTableStructureChanged();
        }

        Row row(int r) {
            return rows.get(r);
        }

        @Override public int getRowCount() { return rows.size(); }
        @Override public int getColumnCount() { return COLUMNS.length; }

        @Override
        public String getColumnName(int c) {
            return c == 3 ? "Flow / " + org.quire.engine.units.Units.display(flowUnit) : COLUMNS[c];
        }

        @Override
        public Object getValueAt(int r, int c) {
            Row row = rows.get(r);
            PointResult p = row.point();
            if (row.run() != null) {
                RunResult run = row.run();
                switch (c) {
                    case 0: return "";
                    case 1: return "";
                    case 2: return run.sourceRow() > 0 ? Integer.toString(run.sourceRow()) : "\u2013";
                    case 3: return Fmt.working(run.flow());
                    case 4: return Fmt.working(run.error());
                    default: return "";
                }
            }
            PointConformity pc = row.conformity();
            switch (c) {
                case 0: return row.series().phase().label();
                case 1: return p.label();
                case 2: return p.runCount() + (p.runCount() == 1 ? " run" : " runs");
                case 3: return Fmt.working(p.flow());
                case 4: return Fmt.working(p.error());
                case 5: return Double.isNaN(p.runStandardDeviation()) ? "\u2013" : Fmt.working(p.runStandardDeviation());
                case 6: return Fmt.working(p.repeatabilityUncertainty());
                case 7: return Fmt.working(p.expandedUncertainty());
                case 8: return org.quire.engine.gum.Figures.coverageFactor(p.coverageFactor());
                case 9: return Double.isNaN(p.cmc()) ? "\u2013" : Fmt.working(p.cmc());
                case 10: return Fmt.working(p.reportedExpandedUncertainty()) + (p.raisedToCmc() ? " (at the CMC)" : "");
                case 11: return pc == null ? "\u2013" : Fmt.working(pc.mpe());
                case 12: return pc == null ? "no limits given" : pc.decision().decision().label();
                default: return pc == null ? "\u2013" : pc.ratioMet() ? "met (1 : " + Fmt.num(pc.uncertaintyRatio()) + ")"
                        : "not met: " + pc.finding();
            }
        }
    }
}
