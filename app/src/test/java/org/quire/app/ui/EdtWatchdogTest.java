package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.EventQueue;
import java.util.concurrent.atomic.AtomicInteger;
import javax.swing.JTable;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * The event thread stays free while the results recalculate: a watchdog posts an empty task every few
 * milliseconds and fails the test if any waits more than 200 ms while the engineer types into the budget.
 */
class EdtWatchdogTest extends GuiTestSupport {
    private static final long LIMIT_MILLIS = 200;

    @Test
    void eventThreadIsNeverHeldLongerThan200MsWhileResultsRecalculate() throws Exception {
        BudgetEditor ed = openDemo();
        AtomicInteger answers = new AtomicInteger();
        onEdt(() -> { ed.addRecalculationListener(r -> answers.incrementAndGet()); return null; });
        EdtWatchdog dog = new EdtWatchdog(LIMIT_MILLIS);
        try {
            for (int i = 0; i < 40; i++) {
                String v = String.valueOf(1000.0 + i * 0.05);
                EventQueue.invokeLater(() -> {
                    JTable t = ed.inputsTable();
                    t.setValueAt(v, 0, 3);
                });
                Thread.sleep(i % 10 == 9 ? 250 : 30);
            }
            waitForCurrentResult(ed);
        } finally {
            dog.close();
        }
        assertTrue(answers.get() >= 3, "the results were recalculated while typing (" + answers.get() + " answers)");
        System.out.println("EDT watchdog: longest wait for the event thread " + dog.worstMillis() + " ms over "
                + answers.get() + " recalculations");
        assertTrue(dog.withinLimit(), "the event thread was held for " + dog.worstMillis() + " ms; "
                + dog.blockedIn());
    }
}
