package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.EventQueue;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
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
        AtomicBoolean running = new AtomicBoolean(true);
        AtomicLong worst = new AtomicLong();
        AtomicLong pingSent = new AtomicLong();
        StringBuilder blocked = new StringBuilder();
        Thread[] edt = new Thread[1];
        EventQueue.invokeAndWait(() -> edt[0] = Thread.currentThread());
        Thread watchdog = new Thread(() -> {
            while (running.get()) {
                long t0 = System.nanoTime();
                pingSent.set(t0);
                try {
                    EventQueue.invokeAndWait(() -> { });
                } catch (Exception e) {
                    return;
                }
                pingSent.set(0);
                worst.accumulateAndGet((System.nanoTime() - t0) / 1_000_000, Math::max);
                try {
                    Thread.sleep(5);
                } catch (InterruptedException e) {
                    return;
                }
            }
        }, "edt-watchdog");
        Thread sampler = new Thread(() -> {
            while (running.get()) {
                long sent = pingSent.get();
                if (sent != 0 && (System.nanoTime() - sent) / 1_000_000 > LIMIT_MILLIS / 2) {
                    synchronized (blocked) {
                        blocked.setLength(0);
                        blocked.append("the event thread was busy in:\n");
                        for (StackTraceElement f : edt[0].getStackTrace()) {
                            blocked.append("  at ").append(f).append('\n');
                        }
                    }
                }
                try {
                    Thread.sleep(20);
                } catch (InterruptedException e) {
                    return;
                }
            }
        }, "edt-sampler");
        sampler.setDaemon(true);
        sampler.start();
        watchdog.start();
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
            running.set(false);
            watchdog.join();
        }
        assertTrue(answers.get() >= 3, "the results were recalculated while typing (" + answers.get() + " answers)");
        System.out.println("EDT watchdog: longest wait for the event thread " + worst.get() + " ms over "
                + answers.get() + " recalculations");
        synchronized (blocked) {
            assertTrue(worst.get() <= LIMIT_MILLIS, "the event thread was held for " + worst.get() + " ms; "
                    + blocked);
        }
    }
}
