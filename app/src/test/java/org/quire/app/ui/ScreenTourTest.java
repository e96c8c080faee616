package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.EventQueue;
import java.awt.Window;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.calibration.CalibrationWindow;
import org.quire.app.ui.common.WorkbenchPrefs;
import org.quire.app.ui.compare.CompareWindow;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * A tour of every main screen in the light and the dark theme, captured from the X display as the user sees it
 * ({@code import -window root}) into the folder named by {@code -Dquire.tour=DIR}, with the PDF report's pages
 * ({@code pdftoppm}); to be looked at, not checked by pixels. Skipped unless the property is given. Run on an
 * Xvfb display of 1366 x 768: {@code Xvfb :77 -screen 0 1366x768x24 & DISPLAY=:77 mvn ... -Dtest=ScreenTourTest
 * -Dquire.tour=DIR}.
 */
class ScreenTourTest extends GuiTestSupport {
    private static Path out() {
        String d = System.getProperty("quire.tour");
        Assumptions.assumeTrue(d != null && !d.isBlank(), "a tour only when -Dquire.tour=DIR is given");
        return Path.of(d);
    }

    private static void run(String... cmd) throws Exception {
        Process p = new ProcessBuilder(cmd).inheritIO().start();
        assertTrue(p.waitFor(60, TimeUnit.SECONDS) && p.exitValue() == 0, String.join(" ", cmd));
    }

    private static void capture(Path dir, String name) throws Exception {
        EventQueue.invokeAndWait(() -> { });
        Thread.sleep(700);
        run("import", "-window", "root", dir.resolve(name + ".png").toString());
    }

    @Test
    void everyMainScreenInLightAndDark() throws Exception {
        Path dir = out();
        Files.createDirectories(dir);
        onEdt(() -> { frame.dispose(); return null; });
        try {
            for (WorkbenchPrefs.Theme theme : WorkbenchPrefs.Theme.values()) {
                String t = theme.name().toLowerCase(Locale.ROOT);
                onEdt(() -> { Workbench.installLookAndFeel(theme); return null; });
                WorkbenchFrame f = newFrameOnSamePreferences();
                try {
                    tour(f, dir, t);
                } finally {
                    onEdt(() -> {
                        for (Window w : Window.getWindows()) {
                            if (w != f && w.isShowing()) {
                                w.dispose();
                            }
                        }
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

    private void tour(WorkbenchFrame f, Path dir, String t) throws Exception {
        onEdt(() -> { f.toFront(); return null; });
        BudgetEditor ed = onEdt(f::openDemo);
        waitForCurrentResult(ed);
        capture(dir, t + "-01-start");
        onEdt(() -> { ed.revealSection("Model"); return null; });
        capture(dir, t + "-02-model-editor");
        onEdt(() -> { ed.selectInput("V_ind"); ed.revealSection("Inputs"); return null; });
        capture(dir, t + "-03-inputs-inspector-type-a");
        onEdt(() -> { ed.selectInput("d_inst"); return null; });
        capture(dir, t + "-04-inspector-type-b");
        onEdt(() -> { ed.revealSection("Results (GUM)"); return null; });
        capture(dir, t + "-05-results-and-contributions");
        onEdt(() -> { ed.edit("Fewer trials", "", b -> b.withSettings(b.settings().withTrials(200_000))); return null; });
        waitForCurrentResult(ed);
        onEdt(() -> { ed.runMonteCarlo(); return null; });
        waitFor("the Monte Carlo verdict", () -> WorkbenchEditingTest.find(ed, "mcVerdict:E") != null);
        onEdt(() -> { ed.revealSection("Monte Carlo check"); return null; });
        capture(dir, t + "-06-monte-carlo");
        if (t.equals("light")) {
            Path pdf = dir.resolve("report.pdf");
            onEdt(() -> { f.exportReport(ed, pdf); return null; });
            waitFor("the report", () -> f.statusText().equals("Report written to " + pdf));
            run("pdftoppm", "-png", "-r", "60", pdf.toString(), dir.resolve("report-page").toString());
        }

        Path earlier = dir.resolve(t + "-earlier.json");
        assertTrue(await(onEdt(() -> f.saveTo(ed, earlier))));
        onEdt(() -> ed.edit("Change source", "", b -> b.withInput("T_tank", b.input("T_tank")
                .withEvaluation(org.quire.engine.budget.TypeB.of("normal", java.util.Map.of("estimate", 20.42, "standardUncertainty", 0.08))))));
        onEdt(() -> { f.compareWith(ed, earlier); return null; });
        CompareWindow cw = waitForWindow("compare", CompareWindow.class);
        capture(dir, t + "-08-compare");
        onEdt(() -> { cw.dispose(); return null; });
        // a copy sent for review: the earlier file is open in the editor already
        Path sent = Files.copy(earlier, dir.resolve(t + "-sent-for-review.json"),
                java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        BudgetEditor review = await(onEdt(() -> f.open(sent, true))).orElseThrow();
        waitForCurrentResult(review);
        Thread.sleep(500);
        onEdt(() -> { review.revealSection(org.quire.app.ui.review.ReviewPanel.TITLE); return null; });
        capture(dir, t + "-07-review");
        onEdt(() -> { f.forceClose(review); return null; });
        Files.deleteIfExists(earlier);
        Files.deleteIfExists(sent);

        EventQueue.invokeLater(() -> PreferencesDialog.show(f));
        Thread.sleep(800);
        capture(dir, t + "-09-preferences");
        closeDialogs(f);
        EventQueue.invokeLater(() -> AboutDialog.show(f));
        Thread.sleep(800);
        capture(dir, t + "-10-about");
        closeDialogs(f);

        AtomicReference<CalibrationWindow> w = new AtomicReference<>();
        Path examples = Path.of("..", "worked-examples", "calibration");
        onEdt(() -> { f.openCalibration(examples.resolve("tarrow-vale-dn80-calibration.json"), w::set); return null; });
        waitFor("the calibration", () -> w.get() != null && w.get().result() != null);
        var first = w.get().result();
        onEdt(() -> { w.get().importRuns(examples.resolve("tarrow-vale-dn80-runs.csv")); return null; });
        waitFor("the runs imported", () -> w.get().result() != first);
        capture(dir, t + "-11-calibration-from-runs-csv");
        onEdt(() -> { w.get().dispose(); return null; });

    }

    private static void closeDialogs(WorkbenchFrame f) throws Exception {
        onEdt(() -> {
            for (Window w : Window.getWindows()) {
                if (w != f && w.isShowing() && w instanceof java.awt.Dialog) {
                    w.dispose();
                }
            }
            return null;
        });
        Thread.sleep(300);
    }
}
