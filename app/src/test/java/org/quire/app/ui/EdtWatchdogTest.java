package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.AWTEvent;
import java.awt.EventQueue;
import java.awt.Toolkit;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadInfo;
import java.lang.management.ThreadMXBean;
import java.util.concurrent.atomic.AtomicInteger;
import javax.swing.JTable;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * The event thread stays free while the results recalculate: while the engineer types into the budget, no single
 * task on the event thread may hold it for more than 200 ms.
 *
 * <p>What held the thread is measured inside the event queue itself (a queue pushed for the test wraps every
 * dispatch): the event thread's own CPU time during the task, plus the time it spent blocked on a monitor or
 * waiting (when the JVM can measure those). That is what the task cost the thread, and unlike the wall time it does
 * not grow when other processes keep the machine's cores busy, so the check holds on a loaded machine. The wall
 * time of the longest task is printed beside it, and a task that runs long has the event thread's stack captured
 * for the message.
 */
class EdtWatchdogTest extends GuiTestSupport {
    private static final long LIMIT_MILLIS = 200;

    /** Wraps each dispatch and records what the longest one cost the event thread. */
    private static final class MeasuringQueue extends EventQueue {
        private final ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        private final boolean contention;
        private int depth;
        private volatile long startedAt;
        private volatile Thread dispatcher;
        volatile long worstHeldNanos;
        volatile long worstWallNanos;
        volatile String worstEvent = "";
        volatile String stack = "";
        final AtomicInteger dispatched = new AtomicInteger();

        MeasuringQueue() {
            boolean c = threads.isThreadContentionMonitoringSupported();
            if (c) {
                threads.setThreadContentionMonitoringEnabled(true);
            }
            contention = c;
        }

        private long blockedAndWaitedMillis(Thread t) {
            if (!contention) {
                return 0;
            }
            ThreadInfo i = threads.getThreadInfo(t.getId());
            return i == null ? 0 : Math.max(0, i.getBlockedTime()) + Math.max(0, i.getWaitedTime());
        }

        @Override
        protected void dispatchEvent(AWTEvent event) {
            if (depth > 0) {
                // a nested loop (none is expected here): its time belongs to the outer task
                super.dispatchEvent(event);
                return;
            }
            Thread t = Thread.currentThread();
            dispatcher = t;
            long cpu0 = threads.getCurrentThreadCpuTime();
            long other0 = blockedAndWaitedMillis(t);
            long wall0 = System.nanoTime();
            startedAt = wall0;
            depth++;
            try {
                super.dispatchEvent(event);
            } finally {
                depth--;
                startedAt = 0;
                long held = threads.getCurrentThreadCpuTime() - cpu0
                        + (blockedAndWaitedMillis(t) - other0) * 1_000_000;
                long wall = System.nanoTime() - wall0;
                dispatched.incrementAndGet();
                if (wall > worstWallNanos) {
                    worstWallNanos = wall;
                }
                if (held > worstHeldNanos) {
                    worstHeldNanos = held;
                    worstEvent = event.toString();
                }
            }
        }

        /** Called by the sampler: when the current task has run for more than half the limit, keeps its stack. */
        void sample() {
            long s = startedAt;
            Thread t = dispatcher;
            if (s != 0 && t != null && (System.nanoTime() - s) / 1_000_000 > LIMIT_MILLIS / 2) {
                StringBuilder b = new StringBuilder("a long task on the event thread was in:\n");
                for (StackTraceElement f : t.getStackTrace()) {
                    b.append("  at ").append(f).append('\n');
                }
                stack = b.toString();
            }
        }

        void remove() {
            pop();
        }
    }

    @Test
    void eventThreadIsNeverHeldLongerThan200MsWhileResultsRecalculate() throws Exception {
        BudgetEditor ed = openDemo();
        AtomicInteger answers = new AtomicInteger();
        onEdt(() -> { ed.addRecalculationListener(r -> answers.incrementAndGet()); return null; });
        MeasuringQueue queue = new MeasuringQueue();
        Toolkit.getDefaultToolkit().getSystemEventQueue().push(queue);
        Thread sampler = new Thread(() -> {
            while (!Thread.currentThread().isInterrupted()) {
                queue.sample();
                try {
                    Thread.sleep(20);
                } catch (InterruptedException e) {
                    return;
                }
            }
        }, "edt-sampler");
        sampler.setDaemon(true);
        sampler.start();
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
            EventQueue.invokeAndWait(() -> { });
        } finally {
            sampler.interrupt();
            EventQueue.invokeAndWait(queue::remove);
        }
        assertTrue(queue.dispatched.get() >= 40, "the typing went through the measured queue ("
                + queue.dispatched.get() + " tasks)");
        long held = queue.worstHeldNanos / 1_000_000;
        System.out.println("EDT watchdog: " + queue.dispatched.get() + " tasks, the longest held the event thread "
                + held + " ms (CPU, blocked and waiting), longest wall time " + queue.worstWallNanos / 1_000_000
                + " ms, over " + answers.get() + " recalculations");
        assertTrue(held <= LIMIT_MILLIS, "a task held the event thread for " + held + " ms (" + queue.worstEvent
                + "); " + queue.stack);
        // how many recalculations answer depends on how fast the machine is (typing coalesces them); at least
        // one must have, so that the measurement covered the results arriving
        assertTrue(answers.get() >= 1, "the results were recalculated while typing (" + answers.get() + " answers)");
    }
}
