package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;
import javax.swing.JTable;
import org.junit.jupiter.api.Test;
import org.quire.app.common.Engine;
import org.quire.app.ui.calibration.FlowRangeWindow;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.budget.Budget;
import org.quire.engine.conformity.PointDecision;
import org.quire.engine.document.DocumentStore;
import org.quire.engine.gum.Figures;
import org.quire.engine.gum.FlowRange;
import org.quire.engine.gum.FlowRangeResult;

/**
 * Budget &gt; Flow range on the worked Tarrow Vale six-point budget of the electromagnetic meter TV-EM-07
 * (invented data; conformity against water-meter class 2): the table shows the figures of the engine's flow-range
 * evaluation computed here apart from the workbench, the chart is drawn, and a point opens its full budget.
 */
class FlowRangeViewGuiTest extends GuiTestSupport {
    private static final Path FILE = Path.of("..", "worked-examples", "tarrow-vale-emf-six-point.json");

    /** @return half a unit in the last digit of a figure as shown (its rounding), e.g. 0.0005 for "0.378" */
    private static double halfUnit(String shown) {
        String t = Figures.plain(shown);
        int dot = t.indexOf('.');
        int e = t.toLowerCase(java.util.Locale.ROOT).indexOf('e');
        int decimals = dot < 0 ? 0 : (e < 0 ? t.length() : e) - dot - 1;
        double scale = e < 0 ? 1 : Math.pow(10, Integer.parseInt(t.substring(e + 1)));
        return 0.5 * Math.pow(10, -decimals) * scale * (1 + 1e-9);
    }

    private static void near(double expected, String shown, String what) {
        double v = Double.parseDouble(Figures.plain(shown));
        assertTrue(Math.abs(v - expected) <= halfUnit(shown), what + ": shown " + shown + ", expected " + expected);
    }

    @Test
    void theTableShowsTheEnginesFlowRangeAndAPointOpensItsBudget() throws Exception {
        Budget budget = DocumentStore.open(FILE).budget();
        FlowRangeResult expected = FlowRange.evaluate(budget, Engine.standard().library());
        BudgetEditor ed = await(onEdt(() -> frame.open(FILE))).orElseThrow();
        waitForCurrentResult(ed);
        AtomicReference<FlowRangeWindow> window = new AtomicReference<>();
        // the Results section offers the flow range of a budget that has flow points
        onEdt(() -> {
            javax.swing.JButton show = named(ed, "showFlowRange");
            assertTrue(show.getParent().isVisible(), "the Results section offers the flow range");
            show.doClick();
            return null;
        });
        waitFor("the flow range window", () -> java.util.Arrays.stream(java.awt.Window.getWindows())
                .anyMatch(x -> x instanceof FlowRangeWindow && x.isShowing()));
        onEdt(() -> {
            for (java.awt.Window x : java.awt.Window.getWindows()) {
                if (x instanceof FlowRangeWindow) {
                    x.dispose();
                }
            }
            frame.openFlowRange(ed, window::set);
            return null;
        });
        waitFor("the flow range evaluated", () -> window.get() != null && window.get().result() != null);
        FlowRangeWindow w = window.get();
        JTable t = w.pointsTable();
        int m = expected.points().size();
        assertEquals(6, m);
        assertEquals(m, (int) onEdt(t::getRowCount), "one row per flow point");
        java.util.List<String> names = onEdt(() -> {
            java.util.List<String> out = new java.util.ArrayList<>();
            for (int c = 0; c < t.getColumnCount(); c++) {
                out.add(t.getColumnName(c));
            }
            return out;
        });
        assertEquals(java.util.List.of("Point", "Flow / m\u00b3/h", "E / %", "u(E) / %", "\u03bd_eff", "k", "U / %",
                "Result, y \u00b1 U", "MPE", "p_c", "Decision"), names,
                "E is an error in % already, so no U/|y| column; the budget declares conformity, so MPE and decision");
        for (int i = 0; i < m; i++) {
            int row = i;
            FlowRangeResult.Point p = expected.points().get(i);
            PointDecision d = expected.conformity().decisions().get(i);
            String[] cells = onEdt(() -> {
                String[] out = new String[t.getColumnCount()];
                for (int c = 0; c < out.length; c++) {
                    out[c] = String.valueOf(t.getValueAt(row, c));
                }
                return out;
            });
            near(p.flow(), cells[1], "flow of point " + (i + 1));
            near(p.estimate(), cells[2], "E at point " + (i + 1));
            near(p.standardUncertainty(), cells[3], "u(E) at point " + (i + 1));
            near(p.result().coverageFactor(), cells[5], "k at point " + (i + 1));
            near(p.expandedUncertainty(), cells[6], "U at point " + (i + 1));
            near(d.probabilityOfConformity(), cells[9], "p_c at point " + (i + 1));
            assertEquals(d.decision().label(), cells[10], "decision at point " + (i + 1));
            assertEquals(d.limits().label(), cells[8], "MPE at point " + (i + 1));
        }
        // by hand, point 1 (q_ref = 0.1602 m3/h, q_ind = 0.16466 m3/h, e_ref = dq_res = 0):
        // E = 100 (0.16466 / 0.1602 - 1) = 2.78402 %;
        // c(q_ind) = 100 / q_ref = 624.22 %/(m3/h), c(q_ref) = -100 q_ind / q_ref^2 = -641.57 %/(m3/h),
        // c(e_ref) = -100 q_ind / q_ref = -102.784 %, c(dq_res) = c(q_ind);
        // u^2(E) = (624.22 * 0.0005)^2 + (641.57 * 8e-5)^2 + (102.784 * 0.001)^2 + (624.22 * 0.0005 / sqrt 3)^2
        //        = 0.097413 + 0.002634 + 0.010565 + 0.032471 = 0.143083, u(E) = 0.37826 %, U = 2 u = 0.7565 %
        String[] first = onEdt(() -> new String[] {(String) t.getValueAt(0, 2), (String) t.getValueAt(0, 3),
            (String) t.getValueAt(0, 6)});
        near(2.78402, first[0], "E at 0.1602 m3/h by hand");
        near(0.37826, first[1], "u(E) at 0.1602 m3/h by hand");
        near(0.7565, first[2], "U(E) at 0.1602 m3/h by hand (k = 2 fixed by the budget)");
        assertNotNull(onEdt(() -> ((org.quire.app.ui.chart.ChartView) WorkbenchEditingTest.find(w.getContentPane(),
                "flowRangeChart")).layoutShown()), "the error curve with its U and the MPE envelope is drawn");
        assertTrue(!onEdt(w::isRunning));

        int before = onEdt(() -> frame.editors().size());
        onEdt(() -> {
            t.changeSelection(1, 2, false, false);
            ((javax.swing.JButton) WorkbenchEditingTest.find(w.getContentPane(), "openFlowPoint")).doClick();
            return null;
        });
        waitFor("the point's budget opened", () -> frame.editors().size() == before + 1);
        BudgetEditor point = onEdt(() -> frame.editors().get(frame.editors().size() - 1));
        assertTrue(point.document().isReadOnly(), "a point's budget opens as a review copy");
        assertEquals("point 2 at 0.2504 m\u00b3/h of tarrow-vale-emf-six-point.json", point.document().name());
        assertEquals(FlowRange.atPoint(budget, 1), point.document().budget());
        waitForCurrentResult(point);
        org.quire.engine.gum.OutputResult e2 = onEdt(() -> point.latest().result().output("E"));
        assertEquals(expected.points().get(1).estimate(), e2.estimate(), 1e-12,
                "the point's budget gives the point's result");
        assertEquals(expected.points().get(1).standardUncertainty(), e2.standardUncertainty(), 1e-12);
        String shots = System.getProperty("quire.screenshots");
        if (shots != null) {
            java.awt.image.BufferedImage img = onEdt(() -> {
                java.awt.image.BufferedImage b = new java.awt.image.BufferedImage(w.getWidth(), w.getHeight(),
                        java.awt.image.BufferedImage.TYPE_INT_RGB);
                w.paint(b.getGraphics());
                return b;
            });
            javax.imageio.ImageIO.write(img, "png", Path.of(shots, "flow-range.png").toFile());
        }
        onEdt(() -> { w.dispose(); return null; });
    }

    /**
     * A long flow range (1000 points made from the six of the worked budget): Cancel pressed at once leaves no
     * figure on screen, not the last result; Evaluate again then shows the range with the progress bar gone.
     */
    @Test
    void cancelShowsNoResultAndEvaluateAgainShowsTheRange() throws Exception {
        Budget six = DocumentStore.open(FILE).budget();
        org.quire.engine.budget.FlowPoints fp = six.flowPoints();
        java.util.List<org.quire.engine.budget.FlowPoints.Row> rows = new java.util.ArrayList<>();
        for (int i = 0; i < 1000; i++) {
            org.quire.engine.budget.FlowPoints.Row r = fp.rows().get(i % fp.rows().size());
            rows.add(new org.quire.engine.budget.FlowPoints.Row(r.flow() * (1 + i * 1e-6), r.values()));
        }
        Budget many = six.withFlowPoints(org.quire.engine.budget.FlowPoints.of(fp.flowUnit(), fp.columns(), rows)
                .withOutput("E"));
        BudgetEditor ed = onEdt(() -> frame.open(org.quire.app.ui.document.BudgetDocument.ofBudget(many,
                "thousand points", "Test Engineer")));
        AtomicReference<FlowRangeWindow> window = new AtomicReference<>();
        onEdt(() -> {
            frame.openFlowRange(ed, w -> {
                window.set(w);
                assertTrue(w.isRunning(), "the evaluation runs in the background");
                ((javax.swing.JButton) WorkbenchEditingTest.find(w.getContentPane(), "cancelFlowRange")).doClick();
            });
            return null;
        });
        FlowRangeWindow w = window.get();
        waitFor("the run ended", () -> !w.isRunning());
        onEdt(() -> {
            assertEquals(null, w.result());
            assertEquals(0, w.pointsTable().getRowCount(), "no stale rows");
            assertEquals(null, ((org.quire.app.ui.chart.ChartView) WorkbenchEditingTest.find(w.getContentPane(),
                    "flowRangeChart")).layoutShown(), "no stale chart");
            String state = ((javax.swing.JLabel) WorkbenchEditingTest.find(w.getContentPane(), "flowRangeState")).getText();
            assertTrue(state.startsWith("Cancelled"), state);
            ((javax.swing.JButton) WorkbenchEditingTest.find(w.getContentPane(), "evaluateAgain")).doClick();
            return null;
        });
        waitFor("the range evaluated again", () -> w.result() != null);
        onEdt(() -> {
            assertEquals(1000, w.pointsTable().getRowCount());
            assertTrue(!WorkbenchEditingTest.find(w.getContentPane(), "flowRangeProgress").isVisible());
            w.dispose();
            return null;
        });
    }

    /**
     * The same flow points tabulating the calibrated flow q_cal, with no conformity asked for: U/|y| is shown (the
     * output is not already relative) and no MPE or decision; the figures are the engine's.
     */
    @Test
    void anOutputThatIsNotAnErrorShowsItsRelativeUncertaintyAndNoDecision() throws Exception {
        Budget six = DocumentStore.open(FILE).budget();
        org.quire.engine.budget.FlowPoints fp = six.flowPoints();
        Budget qcal = six.withFlowPoints(org.quire.engine.budget.FlowPoints.of(fp.flowUnit(), fp.columns(), fp.rows())
                .withOutput("q_cal"));
        FlowRangeResult expected = FlowRange.evaluate(qcal, Engine.standard().library());
        BudgetEditor ed = onEdt(() -> frame.open(org.quire.app.ui.document.BudgetDocument.ofBudget(qcal,
                "calibrated flow", "Test Engineer")));
        AtomicReference<FlowRangeWindow> window = new AtomicReference<>();
        onEdt(() -> { frame.openFlowRange(ed, window::set); return null; });
        waitFor("the flow range evaluated", () -> window.get() != null && window.get().result() != null);
        JTable t = window.get().pointsTable();
        onEdt(() -> {
            java.util.List<String> names = new java.util.ArrayList<>();
            for (int c = 0; c < t.getColumnCount(); c++) {
                names.add(t.getColumnName(c));
            }
            assertEquals(java.util.List.of("Point", "Flow / m\u00b3/h", "q_cal / m\u00b3/h", "u(q_cal) / m\u00b3/h",
                    "\u03bd_eff", "k", "U / m\u00b3/h", "Result, y \u00b1 U", "U/|y| / %"), names);
            for (int i = 0; i < expected.points().size(); i++) {
                FlowRangeResult.Point p = expected.points().get(i);
                near(p.estimate(), (String) t.getValueAt(i, 2), "q_cal at point " + (i + 1));
                near(p.expandedUncertainty(), (String) t.getValueAt(i, 6), "U at point " + (i + 1));
                near(100 * p.relativeExpandedUncertainty(), (String) t.getValueAt(i, 8), "U/|y| at point " + (i + 1));
            }
            return null;
        });
        // an edit in the editor marks the figures as those of an earlier budget; Evaluate again clears the mark
        FlowRangeWindow w = window.get();
        java.util.function.Supplier<String> state = () -> ((javax.swing.JLabel) WorkbenchEditingTest.find(
                w.getContentPane(), "flowRangeState")).getText();
        assertTrue(onEdt(state::get).startsWith("Evaluated"), onEdt(state::get));
        onEdt(() -> { ed.edit("Edit title", "", b -> b.withTitle("calibrated flow, edited")); return null; });
        assertTrue(onEdt(state::get).startsWith("The budget has changed since this evaluation"), onEdt(state::get));
        onEdt(() -> { ((javax.swing.JButton) WorkbenchEditingTest.find(w.getContentPane(), "evaluateAgain")).doClick();
            return null; });
        waitFor("the range evaluated again", () -> !w.isRunning() && state.get().startsWith("Evaluated"));
        onEdt(() -> { w.dispose(); return null; });
        onEdt(() -> { ed.edit("Edit title", "", b -> b.withTitle("calibrated flow, again")); return null; });
        assertTrue(onEdt(() -> state.get().startsWith("Evaluated")), "a closed window is no longer told of edits");
    }
}
