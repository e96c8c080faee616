package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JLabel;
import javax.swing.JProgressBar;
import javax.swing.JTextField;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * Trials, seed and the adaptive mode are settings of the open budget, edited in its Monte Carlo section; a
 * cancelled run leaves no histogram of an earlier run beside "no result".
 */
class MonteCarloSettingsGuiTest extends GuiTestSupport {

    @Test
    void trialsSeedAndAdaptiveAreEditedForTheOpenBudgetOnly() throws Exception {
        BudgetEditor first = openDemo();
        BudgetEditor second = openDemo();
        long otherTrials = second.document().budget().settings().trials();
        onEdt(() -> {
            JTextField trials = WorkbenchEditingTest.find(first, "mcTrials") instanceof JTextField t ? t : null;
            JTextField seed = (JTextField) WorkbenchEditingTest.find(first, "mcSeed");
            trials.setText("20000");
            trials.postActionEvent();
            seed.setText("4242");
            seed.postActionEvent();
            ((JCheckBox) WorkbenchEditingTest.find(first, "mcAdaptive")).doClick();
            return null;
        });
        var s = first.document().budget().settings();
        assertEquals(20_000, s.trials());
        assertEquals(4242, s.seed());
        assertTrue(s.adaptive());
        assertEquals(otherTrials, second.document().budget().settings().trials(), "the other budget keeps its own");
        assertNotEquals(20_000, otherTrials);
        onEdt(() -> { first.document().undo(); return null; });
        assertTrue(!first.document().budget().settings().adaptive(), "the change is an undoable edit");
    }

    @Test
    void aRunUsesTheBudgetsTrialsAndACancelClearsTheEarlierHistogram() throws Exception {
        BudgetEditor ed = openDemo();
        onEdt(() -> {
            JTextField trials = (JTextField) WorkbenchEditingTest.find(ed, "mcTrials");
            trials.setText("50000");
            trials.postActionEvent();
            return null;
        });
        waitForCurrentResult(ed);
        onEdt(() -> { ed.runMonteCarlo(); return null; });
        waitFor("the verdict of E", () -> WorkbenchEditingTest.find(ed, "mcVerdict:E") != null);
        String done = onEdt(() -> ((JLabel) WorkbenchEditingTest.find(ed, "mcState")).getText());
        assertTrue(done.contains("50" + org.quire.engine.gum.Figures.GROUP + "000 trials"), done);
        onEdt(() -> {
            JTextField trials = (JTextField) WorkbenchEditingTest.find(ed, "mcTrials");
            trials.setText("200000000");
            trials.postActionEvent();
            return null;
        });
        waitForCurrentResult(ed);
        onEdt(() -> { ed.runMonteCarlo(); return null; });
        waitFor("Cancel to be offered", () -> ((JButton) WorkbenchEditingTest.find(ed, "mcCancel")).isEnabled());
        onEdt(() -> { ((JButton) WorkbenchEditingTest.find(ed, "mcCancel")).doClick(); return null; });
        waitFor("the run to end", () -> !((JButton) WorkbenchEditingTest.find(ed, "mcCancel")).isEnabled());
        assertNull(onEdt(() -> WorkbenchEditingTest.find(ed, "mc:E")), "no histogram of the earlier run is left");
        assertTrue(onEdt(() -> ((JLabel) WorkbenchEditingTest.find(ed, "mcState")).getText()).contains("cancelled"));
        JProgressBar bar = onEdt(() -> findBar(ed));
        boolean fits = onEdt(() -> bar.getFontMetrics(bar.getFont()).stringWidth(
                "200 000 000 of 200 000 000 trials") <= bar.getWidth() + 40);
        assertTrue(fits, "the progress text fits its bar");
    }

    private static JProgressBar findBar(java.awt.Container c) {
        for (java.awt.Component k : c.getComponents()) {
            if (k instanceof JProgressBar) {
                return (JProgressBar) k;
            }
            if (k instanceof java.awt.Container) {
                JProgressBar b = findBar((java.awt.Container) k);
                if (b != null) {
                    return b;
                }
            }
        }
        return null;
    }
}
