package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Component;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.image.BufferedImage;
import java.util.HashSet;
import java.util.Set;
import javax.swing.JComponent;
import javax.swing.SwingUtilities;
import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import javax.swing.JRootPane;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * Saves pictures of the main screens to {@code app/target/screenshots/} (kept by CI as build output): the demo
 * budget, an input in the inspector, a model error, the results, and a review copy. Each picture is checked: it
 * has the window's size, and the component it is taken for lies in the visible part of the window and is painted
 * with content (text, lines), not a flat fill.
 */
class ScreenshotsTest extends GuiTestSupport {
    private static final Path OUT = Path.of("target", "screenshots");

    @Test
    void savesScreenshotsOfTheMainScreens() throws Exception {
        Files.createDirectories(OUT);
        BudgetEditor ed = openDemo();
        waitForCurrentResult(ed);
        BufferedImage first = shot("01-demo-budget");
        assertTrue(distinctColours(first, new Rectangle(0, 0, first.getWidth(), first.getHeight())) > 20,
                "the demo budget is painted with content");
        onEdt(() -> { ed.selectInput("V_ind"); ed.revealSection("Inputs"); return null; });
        Thread.sleep(300);
        BufferedImage typeA = shot("02-inputs-and-inspector-type-a");
        assertShows(typeA, frame.getRootPane(), named(frame, "summary:mean"), "the Type A summary of V_ind");
        onEdt(() -> { ed.selectInput("d_inst"); return null; });
        Thread.sleep(200);
        BufferedImage typeB = shot("03-inspector-type-b");
        assertShows(typeB, frame.getRootPane(), named(frame, "distributionPlot"), "the distribution of d_inst");
        onEdt(() -> { ed.selectInput(null); ed.revealSection("Results (GUM)"); return null; });
        Thread.sleep(300);
        BufferedImage results = shot("04-results");
        assertShows(results, frame.getRootPane(), named(frame, "budget:E"), "the budget table of E");
        onEdt(() -> {
            ed.modelEditor().setText(ed.modelEditor().getText().replace("/ V_ref\n", "/ V_reff\n")
                    .replace("E = 100 * (V_m - V_ref) / V_ref", "E = 100 * (V_m - V_ref) / V_reff"));
            ed.revealSection("Model");
            return null;
        });
        waitFor("the model error", () -> !frame.shownProblems().isEmpty());
        Thread.sleep(300);
        BufferedImage error = shot("05-model-error");
        String problems = onEdt(() -> frame.shownProblems().toString());
        assertTrue(problems.contains("V_reff"), problems);
        assertShows(error, frame.getRootPane(), named(frame, "problemList"), "the problems list");
        assertShows(error, frame.getRootPane(), ed.modelEditor(), "the model editor");
        onEdt(() -> { ed.document().undo(); ed.document().setReadOnly(true); ed.revealSection("Purpose and notes"); return null; });
        Thread.sleep(300);
        BufferedImage review = shot("06-review-copy");
        assertTrue(onEdt(() -> ed.document().isReadOnly()), "the review copy is read-only");
        assertShows(review, frame.getRootPane(), named(frame, "title"), "the budget title");
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
            BufferedImage compare = shot(w.getRootPane(), "08-compare");
            assertShows(compare, w.getRootPane(), named(w, "changes"), "the list of changes");
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
            BufferedImage panel = shot("07-review-panel");
            javax.swing.JTable checklist = named(rev, "checklist");
            assertEquals("agreed", onEdt(() -> String.valueOf(checklist.getValueAt(0, 3))));
            assertShows(panel, frame.getRootPane(), checklist, "the checklist");
        } finally {
            deleteTree(dir);
        }
    }

    private BufferedImage shot(String name) throws Exception {
        return shot(frame.getRootPane(), name);
    }

    /** Paints the window's root pane into a picture, saves it, and checks that it has the window's size. */
    static BufferedImage shot(JRootPane root, String name) throws Exception {
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
        assertTrue(img.getWidth() >= 400 && img.getHeight() >= 300, name + ": the window is "
                + img.getWidth() + " x " + img.getHeight());
        return img;
    }

    /**
     * Asserts that {@code c} is showing, that some of it lies in the visible part of the window, and that this
     * part of the picture is painted with at least three colours (a component painted as one flat area, or not
     * at all, has one or two).
     */
    static void assertShows(BufferedImage img, JRootPane root, Component c, String what) throws Exception {
        assertNotNull(c, what + ": no such component");
        Rectangle r = onEdt(() -> {
            if (!c.isShowing()) {
                return null;
            }
            Rectangle visible = c instanceof JComponent j ? j.getVisibleRect() : new Rectangle(c.getSize());
            return SwingUtilities.convertRectangle(c, visible, root).intersection(new Rectangle(root.getSize()));
        });
        assertNotNull(r, what + " is not showing");
        assertTrue(r.width >= 16 && r.height >= 8, what + " is hidden (visible part " + r + ")");
        int colours = distinctColours(img, r);
        assertTrue(colours >= 3, what + " is painted as a flat area (" + colours + " colours in " + r + ")");
    }

    /** @return the number of distinct RGB values in that part of the picture */
    static int distinctColours(BufferedImage img, Rectangle r) {
        Set<Integer> seen = new HashSet<>();
        for (int y = r.y; y < r.y + r.height && y < img.getHeight(); y++) {
            for (int x = r.x; x < r.x + r.width && x < img.getWidth(); x++) {
                seen.add(img.getRGB(x, y) & 0xffffff);
            }
        }
        return seen.size();
    }

    /** @return the mean luminance (0 black to 1 white, ITU-R BT.601 weights) of the picture */
    static double meanLuminance(BufferedImage img) {
        double sum = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int p = img.getRGB(x, y);
                sum += (0.299 * ((p >> 16) & 255) + 0.587 * ((p >> 8) & 255) + 0.114 * (p & 255)) / 255;
            }
        }
        return sum / ((double) img.getWidth() * img.getHeight());
    }
}
