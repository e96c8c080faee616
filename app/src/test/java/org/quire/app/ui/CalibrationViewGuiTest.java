package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;
import javax.swing.JTable;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.calibration.CalibrationWindow;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.calibration.CalibrationResult;

/**
 * The calibration view from a rig's runs CSV: the worked Tarrow Vale DN 80 calibration (invented data) is opened,
 * its runs are imported again from the CSV file after one reading is changed, and the table, the charts and the
 * drill-down to a point's budget follow.
 */
class CalibrationViewGuiTest extends GuiTestSupport {
    private static final Path EXAMPLES = Path.of("..", "worked-examples", "calibration");

    @Test
    void runsFromACsvFileAreShownPerRunAndPerPointWithTheirCharts() throws Exception {
        Path cal = EXAMPLES.resolve("tarrow-vale-dn80-calibration.json");
        Path runs = EXAMPLES.resolve("tarrow-vale-dn80-runs.csv");
        AtomicReference<CalibrationWindow> window = new AtomicReference<>();
        onEdt(() -> { frame.openCalibration(cal, window::set); return null; });
        waitFor("the calibration evaluated", () -> window.get() != null && window.get().result() != null);
        CalibrationWindow w = window.get();
        CalibrationResult first = w.result();
        // a copy of the rig's file with the first run's full-tank weighing 0.5 kg heavier
        Path dir = Files.createTempDirectory("quire-runs");
        try {
            java.util.List<String> lines = Files.readAllLines(runs);
            int at = -1;
            for (int i = 0; i < lines.size(); i++) {
                if (lines.get(i).startsWith("as-found,P1,1,")) {
                    at = i;
                }
            }
            assertTrue(at > 0, "the runs file has run 1 of P1 as found");
            String[] cells = lines.get(at).split(",");
            cells[3] = new java.math.BigDecimal(cells[3]).add(new java.math.BigDecimal("0.5")).toPlainString();
            lines.set(at, String.join(",", cells));
            Path changed = dir.resolve("runs.csv");
            Files.write(changed, lines);
            onEdt(() -> { w.importRuns(changed); return null; });
            waitFor("the imported runs evaluated", () -> w.result() != first);
        } finally {
            deleteTree(dir);
        }
        CalibrationResult r = w.result();
        // more water weighed for the same indication: the meter's error at P1 goes down
        assertTrue(r.asFound().points().get(0).error() < first.asFound().points().get(0).error());
        JTable t = w.runsTable();
        int points = r.asFound().points().size() + (r.asLeft() == null ? 0 : r.asLeft().points().size());
        int runCount = r.asFound().points().stream().mapToInt(p -> p.runs().size()).sum()
                + (r.asLeft() == null ? 0 : r.asLeft().points().stream().mapToInt(p -> p.runs().size()).sum());
        assertEquals(points + runCount, onEdt(t::getRowCount), "one row per point and one per run");
        assertEquals("P1", onEdt(() -> t.getValueAt(0, 1)));
        assertNotNull(onEdt(() -> ((org.quire.app.ui.chart.ChartView) WorkbenchEditingTest.find(w.getContentPane(),
                "errorCurve")).layoutShown()), "the error curve is drawn");
        int before = onEdt(() -> frame.editors().size());
        onEdt(() -> {
            t.changeSelection(0, 1, false, false);
            ((javax.swing.JButton) WorkbenchEditingTest.find(w.getContentPane(), "openPoint")).doClick();
            return null;
        });
        waitFor("the point's budget opened", () -> frame.editors().size() == before + 1);
        BudgetEditor ed = onEdt(() -> frame.editors().get(frame.editors().size() - 1));
        assertTrue(ed.document().isReadOnly(), "a point's budget opens as a review copy");
        assertEquals(r.asFound().points().get(0).budget(), ed.document().budget());
        onEdt(() -> { w.dispose(); return null; });
    }
}
