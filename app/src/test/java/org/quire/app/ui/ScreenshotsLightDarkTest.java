package org.quire.app.ui;

import org.quire.app.ui.common.WorkbenchPrefs;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;
import javax.imageio.ImageIO;
import javax.swing.JRootPane;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.calibration.CalibrationWindow;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * Pictures of the main screens in the light and the dark theme at 1366 x 768, saved to
 * {@code app/target/screenshots/} to be looked at: the results with the ranking chart, the inspector, a model
 * error, the Monte Carlo check, and the calibration view.
 */
class ScreenshotsLightDarkTest extends GuiTestSupport {
    private static final Path OUT = Path.of("target", "screenshots");

    @Test
    void lightAndDark() throws Exception {
        Files.createDirectories(OUT);
        try {
            for (WorkbenchPrefs.Theme theme : WorkbenchPrefs.Theme.values()) {
                String t = theme.name().toLowerCase(java.util.Locale.ROOT);
                onEdt(() -> { Workbench.installLookAndFeel(theme); return null; });
                WorkbenchFrame f = newFrameOnSamePreferences();
                try {
                    screens(f, t);
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
            onEdt(() -> { Workbench.installLookAndFeel(WorkbenchPrefs.Theme.LIGHT); return null; });
        }
    }

    private void screens(WorkbenchFrame f, String t) throws Exception {
        onEdt(() -> { f.setBounds(0, 0, 1366, 768); f.validate(); return null; });
        BudgetEditor ed = onEdt(f::openDemo);
        waitForCurrentResult(ed);
        onEdt(() -> { ed.revealSection("Results (GUM)"); return null; });
        Thread.sleep(400);
        shot(f.getRootPane(), t + "-1-results-and-ranking");
        onEdt(() -> { ed.selectInput("V_ind"); ed.revealSection("Inputs"); return null; });
        Thread.sleep(300);
        shot(f.getRootPane(), t + "-2-inputs-inspector-type-a");
        onEdt(() -> { ed.selectInput("d_inst"); return null; });
        Thread.sleep(300);
        shot(f.getRootPane(), t + "-3-inspector-type-b");
        onEdt(() -> {
            ed.modelEditor().setText(ed.modelEditor().getText().replace("E = 100 * (V_m - V_ref) / V_ref",
                    "E = 100 * (V_m - V_ref / V_ref"));
            ed.revealSection("Model");
            return null;
        });
        waitFor("the model error", () -> !f.shownProblems().isEmpty());
        Thread.sleep(300);
        shot(f.getRootPane(), t + "-4-model-error");
        onEdt(() -> { ed.document().undo(); ed.edit("Fewer trials", "", b -> b.withSettings(b.settings()
                .withTrials(100_000))); return null; });
        waitForCurrentResult(ed);
        onEdt(() -> { ed.runMonteCarlo(); return null; });
        waitFor("the Monte Carlo verdict", () -> WorkbenchEditingTest.find(ed, "mcVerdict:E") != null);
        onEdt(() -> { ed.revealSection("Monte Carlo check"); return null; });
        Thread.sleep(400);
        shot(f.getRootPane(), t + "-5-monte-carlo");
        AtomicReference<CalibrationWindow> w = new AtomicReference<>();
        onEdt(() -> { f.openCalibration(Path.of("..", "worked-examples", "calibration",
                "tarrow-vale-dn80-calibration.json"), w::set); return null; });
        waitFor("the calibration", () -> w.get() != null && w.get().result() != null);
        onEdt(() -> { w.get().setBounds(0, 0, 1366, 768); w.get().validate(); return null; });
        Thread.sleep(400);
        shot(w.get().getRootPane(), t + "-6-calibration");
        onEdt(() -> { w.get().dispose(); return null; });
    }

    private static void shot(JRootPane root, String name) throws Exception {
        BufferedImage img = onEdt(() -> {
            root.validate();
            BufferedImage i = new BufferedImage(root.getWidth(), root.getHeight(), BufferedImage.TYPE_INT_RGB);
            Graphics2D g = i.createGraphics();
            root.printAll(g);
            g.dispose();
            return i;
        });
        ImageIO.write(img, "png", OUT.resolve(name + ".png").toFile());
    }
}
