package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;
import javax.swing.JRootPane;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.calibration.CalibrationWindow;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * Pictures of the main screens in the light and the dark theme at 1366 x 768, saved to
 * {@code app/target/screenshots/} to be looked at: the results with the ranking chart, the inspector, a model
 * error, the Monte Carlo check, the calibration view and the flow range of a budget with flow points. Each picture is checked for the component it is
 * taken for (see {@link ScreenshotsTest#assertShows}), and the dark theme's pictures must be darker than the
 * light theme's.
 */
class ScreenshotsLightDarkTest extends GuiTestSupport {
    private static final Path OUT = Path.of("target", "screenshots");

    @Test
    void lightAndDark() throws Exception {
        Files.createDirectories(OUT);
        java.util.Map<String, Double> luminance = new java.util.LinkedHashMap<>();
        try {
            for (org.quire.app.ui.common.WorkbenchPrefs.Theme theme : org.quire.app.ui.common.WorkbenchPrefs.Theme.values()) {
                String t = theme.name().toLowerCase(java.util.Locale.ROOT);
                onEdt(() -> { Workbench.installLookAndFeel(theme); return null; });
                WorkbenchFrame f = newFrameOnSamePreferences();
                try {
                    luminance.put(t, screens(f, t));
                } finally {
                    onEdt(() -> {
                        for (BudgetEditor e : f.editors()) {
                            f.forceClose(e);
                        }
                        f.dispose();
                        return null;
                    });
                }
            }
        } finally {
            onEdt(() -> { Workbench.installLookAndFeel(org.quire.app.ui.common.WorkbenchPrefs.Theme.LIGHT); return null; });
        }
        assertTrue(luminance.get("dark") < luminance.get("light") - 0.2, "the dark theme is not darker: " + luminance);
    }

    /** @return the mean luminance of the results picture */
    private double screens(WorkbenchFrame f, String t) throws Exception {
        onEdt(() -> { f.setBounds(0, 0, 1366, 768); f.validate(); return null; });
        BudgetEditor ed = onEdt(f::openDemo);
        waitForCurrentResult(ed);
        onEdt(() -> { ed.revealSection("Results (GUM)"); return null; });
        Thread.sleep(400);
        BufferedImage results = shot(f.getRootPane(), t + "-1-results-and-ranking");
        ScreenshotsTest.assertShows(results, f.getRootPane(), named(f, "budget:E"), t + ": the budget table of E");
        onEdt(() -> { ed.selectInput("V_ind"); ed.revealSection("Inputs"); return null; });
        Thread.sleep(300);
        ScreenshotsTest.assertShows(shot(f.getRootPane(), t + "-2-inputs-inspector-type-a"), f.getRootPane(),
                named(f, "summary:mean"), t + ": the Type A summary");
        onEdt(() -> { ed.selectInput("d_inst"); return null; });
        Thread.sleep(300);
        ScreenshotsTest.assertShows(shot(f.getRootPane(), t + "-3-inspector-type-b"), f.getRootPane(),
                named(f, "distributionPlot"), t + ": the distribution plot");
        onEdt(() -> {
            ed.modelEditor().setText(ed.modelEditor().getText().replace("E = 100 * (V_m - V_ref) / V_ref",
                    "E = 100 * (V_m - V_ref / V_ref"));
            ed.revealSection("Model");
            return null;
        });
        waitFor("the model error", () -> !f.shownProblems().isEmpty());
        Thread.sleep(300);
        ScreenshotsTest.assertShows(shot(f.getRootPane(), t + "-4-model-error"), f.getRootPane(),
                named(f, "problemList"), t + ": the problems list");
        onEdt(() -> { ed.document().undo(); ed.edit("Fewer trials", "", b -> b.withSettings(b.settings()
                .withTrials(100_000))); return null; });
        waitForCurrentResult(ed);
        onEdt(() -> { ed.runMonteCarlo(); return null; });
        waitFor("the Monte Carlo verdict", () -> WorkbenchEditingTest.find(ed, "mcVerdict:E") != null);
        onEdt(() -> { ed.revealSection("Monte Carlo check"); return null; });
        Thread.sleep(400);
        ScreenshotsTest.assertShows(shot(f.getRootPane(), t + "-5-monte-carlo"), f.getRootPane(),
                named(f, "mcHistogram:E"), t + ": the Monte Carlo histogram of E");
        AtomicReference<CalibrationWindow> w = new AtomicReference<>();
        onEdt(() -> { f.openCalibration(Path.of("..", "worked-examples", "calibration",
                "tarrow-vale-dn80-calibration.json"), w::set); return null; });
        waitFor("the calibration", () -> w.get() != null && w.get().result() != null);
        onEdt(() -> { w.get().setBounds(0, 0, 1366, 768); w.get().validate(); return null; });
        Thread.sleep(400);
        ScreenshotsTest.assertShows(shot(w.get().getRootPane(), t + "-6-calibration"), w.get().getRootPane(),
                named(w.get(), "errorCurve"), t + ": the error curve");
        onEdt(() -> { w.get().dispose(); return null; });
        BudgetEditor six = await(onEdt(() -> f.open(Path.of("..", "worked-examples", "tarrow-vale-emf-six-point.json"))))
                .orElseThrow();
        waitForCurrentResult(six);
        AtomicReference<org.quire.app.ui.calibration.FlowRangeWindow> range = new AtomicReference<>();
        onEdt(() -> { f.openFlowRange(six, range::set); return null; });
        waitFor("the flow range", () -> range.get() != null && range.get().result() != null);
        onEdt(() -> { range.get().setBounds(0, 0, 1366, 768); range.get().validate(); return null; });
        Thread.sleep(400);
        ScreenshotsTest.assertShows(shot(range.get().getRootPane(), t + "-7-flow-range"), range.get().getRootPane(),
                named(range.get(), "flowRangeChart"), t + ": the flow range's error curve");
        onEdt(() -> { range.get().dispose(); return null; });
        return ScreenshotsTest.meanLuminance(results);
    }

    private static BufferedImage shot(JRootPane root, String name) throws Exception {
        return ScreenshotsTest.shot(root, name);
    }
}
