package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import javax.swing.JLabel;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.montecarlo.GumComparison;
import org.quire.engine.montecarlo.MonteCarloOutcome;

/**
 * The demo budget explains itself: its Monte Carlo check (the shipped trials and seed) does not validate the GUM
 * interval of E, and the screen says why in one sentence, the engine's, beside the verdict.
 */
class DemoMonteCarloExplainsTest extends GuiTestSupport {

    @Test
    void theDemosVerdictOnEComesWithTheSentenceThatSaysWhy() throws Exception {
        BudgetEditor ed = openDemo();
        onEdt(() -> { ed.runMonteCarlo(); return null; });
        long end = System.currentTimeMillis() + 120_000;
        while (onEdt(() -> WorkbenchEditingTest.find(ed, "mcVerdict:E")) == null && System.currentTimeMillis() < end) {
            Thread.sleep(200);
        }
        JLabel label = onEdt(() -> (JLabel) WorkbenchEditingTest.find(ed, "mcVerdict:E"));
        MonteCarloOutcome o = onEdt(() -> ed.monteCarloOutcome(ed.document().budget()));
        GumComparison c = o.output("E").orElseThrow().comparison();
        assertEquals(GumComparison.Verdict.NOT_VALIDATED, c.verdict(), "the demo's check, as shipped");
        assertFalse(c.explanation().isEmpty());
        String text = onEdt(label::getText);
        assertTrue(text.contains("NOT validated"), text);
        assertTrue(text.contains(c.explanation()),
                "the engine's sentence is on the screen: " + text);
        // the demo's flat-topped output (a rectangular input dominates): JCGM 101:2008 9.2.4 shows the same
        assertTrue(c.explanation().startsWith("The Monte Carlo interval is narrower"), c.explanation());
    }
}
