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
    }

    private void shot(String name) throws Exception {
        BufferedImage img = onEdt(() -> {
            JRootPane root = frame.getRootPane();
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
