package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import javax.swing.JButton;
import javax.swing.JLabel;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.montecarlo.MonteCarloSection;
import org.quire.app.ui.notebook.BudgetEditor;

/** The Monte Carlo section with the engine behind it, as the installed workbench runs it: a run, and a cancel. */
class MonteCarloOnTheEngineGuiTest extends GuiTestSupport {

    @Test
    void theDemoRunsAndEveryOutputGetsAVerdict() throws Exception {
        BudgetEditor ed = openDemo();
        onEdt(() -> ed.edit("Fewer trials", "", b -> b.withSettings(b.settings().withTrials(200_000))));
        waitFor("the results of the changed budget", () -> ed.latest() != null && ed.latest().result() != null
                && ed.latest().budget().equals(ed.document().budget()));
        onEdt(() -> { ed.runMonteCarlo(); return null; });
        waitFor("the verdict of E", () -> WorkbenchEditingTest.find(ed, "mcVerdict:E") != null);
        JLabel label = onEdt(() -> (JLabel) WorkbenchEditingTest.find(ed, "mcVerdict:E"));
        String e = onEdt(label::getText);
        // the label shows the engine's verdict, in its one wording, with the engine's reason
        var verdict = (org.quire.engine.montecarlo.GumComparison.Verdict) label.getClientProperty(
                MonteCarloSection.VERDICT);
        assertTrue(verdict != null, "the label carries the engine's verdict");
        String shown = verdict == org.quire.engine.montecarlo.GumComparison.Verdict.VALIDATED
                ? "GUM result validated" : "GUM result NOT validated";
        assertTrue(e.contains(shown) && !e.contains(verdict == org.quire.engine.montecarlo.GumComparison.Verdict
                .VALIDATED ? "NOT validated" : "GUM result validated"), e);
        assertTrue(e.contains("JCGM 101:2008"), "the reason is shown: " + e);
        assertTrue(onEdt(() -> WorkbenchEditingTest.find(ed, "mcVerdict:q")) != null, "q has its own verdict");
        onEdt(() -> { ed.revealSection("Monte Carlo check"); return null; });
        Thread.sleep(400);
        java.awt.image.BufferedImage img = onEdt(() -> {
            javax.swing.JRootPane root = frame.getRootPane();
            root.validate();
            java.awt.image.BufferedImage i = new java.awt.image.BufferedImage(root.getWidth(), root.getHeight(),
                    java.awt.image.BufferedImage.TYPE_INT_RGB);
            java.awt.Graphics2D g = i.createGraphics();
            root.printAll(g);
            g.dispose();
            return i;
        });
        java.nio.file.Path out = java.nio.file.Path.of("target", "screenshots");
        java.nio.file.Files.createDirectories(out);
        javax.imageio.ImageIO.write(img, "png", out.resolve("09-monte-carlo.png").toFile());
    }

    @Test
    void aLongRunCanBeCancelled() throws Exception {
        BudgetEditor ed = openDemo();
        onEdt(() -> ed.edit("Many trials", "", b -> b.withSettings(b.settings().withTrials(200_000_000))));
        waitFor("the results of the changed budget", () -> ed.latest() != null && ed.latest().result() != null
                && ed.latest().budget().equals(ed.document().budget()));
        onEdt(() -> { ed.runMonteCarlo(); return null; });
        waitFor("Cancel to be offered", () -> ((JButton) WorkbenchEditingTest.find(ed, "mcCancel")).isEnabled());
        Thread.sleep(200);
        onEdt(() -> { ((JButton) WorkbenchEditingTest.find(ed, "mcCancel")).doClick(); return null; });
        waitFor("the run to end", () -> !((JButton) WorkbenchEditingTest.find(ed, "mcCancel")).isEnabled());
        assertNull(onEdt(() -> WorkbenchEditingTest.find(ed, "mcVerdict:E")), "no result after a cancel");
        Thread.sleep(300);
        assertTrue(Thread.getAllStackTraces().keySet().stream().noneMatch(t -> t.getName().startsWith("quire-montecarlo")),
                "no Monte Carlo worker thread is left behind");
    }
}
