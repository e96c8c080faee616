package org.quire.app.ui;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import javax.swing.JRootPane;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * Saves pictures of the main screens to {@code app/target/screenshots/} (kept by CI as build output): the demo
 * budget, an input in the inspector, a model error, the results, and a review copy.
 */
class ScreenshotsTest extends GuiTestSupport {
    private static final Path OUT = Path.of("target", "screenshots");

    @Test
    void savesScreenshotsOfTheMainScreens() throws Exception {
        Files.createDirectories(OUT);
        BudgetEditor ed = openDemo();
        shot("01-demo-budget");
        onEdt(() -> { ed.selectInput("V_ind"); ed.revealSection("Inputs"); return null; });
        Thread.sleep(300);
        shot("02-inputs-and-inspector-type-a");
        onEdt(() -> { ed.selectInput("d_inst"); return null; });
        Thread.sleep(200);
        shot("03-inspector-type-b");
        onEdt(() -> { ed.selectInput(null); ed.revealSection("Results (GUM)"); return null; });
        Thread.sleep(300);
        shot("04-results");
        onEdt(() -> {
            ed.modelEditor().setText(ed.modelEditor().getText().replace("/ V_ref\n", "/ V_reff\n")
                    .replace("E = 100 * (V_m - V_ref) / V_ref", "E = 100 * (V_m - V_ref) / V_reff"));
            ed.revealSection("Model");
            return null;
        });
        waitFor("the model error", () -> !frame.shownProblems().isEmpty());
        Thread.sleep(300);
        shot("05-model-error");
        onEdt(() -> { ed.document().undo(); ed.document().setReadOnly(true); ed.revealSection("Purpose and notes"); return null; });
        Thread.sleep(300);
        shot("06-review-copy");
        Path dir = Files.createTempDirectory("quire-shots");
        try {
            Path file = dir.resolve("point-30.json");
            Path earlier = dir.resolve("point-30-2025.json");
            onEdt(() -> {
                ed.document().setReadOnly(false);
                org.quire.engine.document.DocumentStore.save(ed.document().content(), earlier);
                ed.edit("Edit notes", "", b -> b.withInput("I_net", b.input("I_net").withNotes(
                        "Mean of five runs; the dominant contribution comes from the balance repeatability.")));
                ed.edit("Edit estimate", "", b -> b.withInput("d_evap", b.input("d_evap").withSource(
                        "TVFL evaporation study 2026")).withNotes(b.notes() + "\nSecond run with the new diverter."));
                ed.edit("Edit uncertainty", "", b -> b.withInput("d_res", b.input("d_res").withEvaluation(
                        org.quire.engine.budget.TypeB.of("rectangular",
                                java.util.Map.of("estimate", 0.0, "halfWidth", 0.01)))));
                ed.modelEditor().setText(ed.modelEditor().getText().replace("E = 100", "# error of the meter\nE = 100"));
                return null;
            });
            waitForCurrentResult(ed);
            org.junit.jupiter.api.Assertions.assertTrue(await(onEdt(() -> frame.saveTo(ed, file))));
            onEdt(() -> { frame.compareWith(ed, earlier); return null; });
            org.quire.app.ui.compare.CompareWindow w = waitForWindow("compare", org.quire.app.ui.compare.CompareWindow.class);
            Thread.sleep(300);
            shot(w.getRootPane(), "08-compare");
            onEdt(() -> { w.dispose(); frame.forceClose(ed); return null; });
            BudgetEditor rev = await(onEdt(() -> frame.open(file, true))).orElseThrow();
            waitForCurrentResult(rev);
            onEdt(() -> {
                javax.swing.JTable t = named(rev, "checklist");
                t.setValueAt("agreed", 0, 3);
                t.setValueAt("remark", 2, 3);
                t.setValueAt("ν of the Type B inputs taken as infinite; acceptable here", 2, 4);
                rev.setAllOpen(false);
                rev.revealSection(org.quire.app.ui.review.ReviewPanel.TITLE);
                return null;
            });
            Thread.sleep(400);
            shot("07-review-panel");
        } finally {
            deleteTree(dir);
        }
    }

    private void shot(String name) throws Exception {
        shot(frame.getRootPane(), name);
    }

    static void shot(JRootPane root, String name) throws Exception {
        BufferedImage img = onEdt(() -> {
            root.validate();
            BufferedImage i = new BufferedImage(root.getWidth(), root.getHeight(), BufferedImage.TYPE_INT_RGB);
            Graphics2D g = i.createGraphics();
            root.printAll(g);
            g.dispose();
            return i;
        });
        File f = OUT.resolve(name + ".png").toFile();
        ImageIO.write(img, "png", f);
        System.out.println("screenshot: " + f.getAbsolutePath());
    }
}
