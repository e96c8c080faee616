package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.fail;

import java.awt.EventQueue;
import java.awt.GraphicsEnvironment;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;
import java.util.prefs.Preferences;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.quire.app.Engine;
import org.quire.app.ui.montecarlo.MonteCarloRunner;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * Base of the workbench tests: skips them loudly when there is no display (run them under Xvfb), builds a
 * workbench with a preferences node of its own, and offers helpers to act on the event thread and wait.
 */
abstract class GuiTestSupport {
    static final long WAIT_MILLIS = 10_000;
    protected WorkbenchFrame frame;
    private Preferences node;

    @BeforeAll
    static void needsDisplay() {
        if (GraphicsEnvironment.isHeadless()) {
            System.out.println("SKIPPED: workbench GUI tests need a display; run them with "
                    + "'xvfb-run -a mvn -B -o test -pl app -am'");
        }
        if (!GraphicsEnvironment.isHeadless()) {
            Workbench.installLookAndFeel(WorkbenchPrefs.Theme.LIGHT);
        }
    }

    /** @return the Monte Carlo runner the workbench gets; none unless a test says otherwise */
    Optional<MonteCarloRunner> runner() {
        return Optional.empty();
    }

    @BeforeEach
    void buildFrame() throws Exception {
        Assumptions.assumeFalse(GraphicsEnvironment.isHeadless(),
                "SKIPPED: no display (GraphicsEnvironment.isHeadless()); run the GUI tests under xvfb-run");
        node = Preferences.userRoot().node("org/quire/test/workbench-" + System.nanoTime());
        node.putInt("autosaveMinutes", 0);
        node.put("windowBounds", "0,0,1440,900");
        frame = onEdt(() -> {
            WorkbenchFrame f = new WorkbenchFrame(new WorkbenchPrefs(node), Engine.library(), runner());
            f.showRestored();
            return f;
        });
    }

    @AfterEach
    void disposeFrame() throws Exception {
        if (frame == null) {
            return;
        }
        onEdt(() -> {
            for (BudgetEditor e : frame.editors()) {
                frame.forceClose(e);
            }
            frame.dispose();
            return null;
        });
        node.removeNode();
    }

    /** Runs {@code c} on the event thread and returns its value. */
    static <T> T onEdt(Callable<T> c) throws Exception {
        AtomicReference<T> out = new AtomicReference<>();
        AtomicReference<Exception> err = new AtomicReference<>();
        EventQueue.invokeAndWait(() -> {
            try {
                out.set(c.call());
            } catch (Exception e) {
                err.set(e);
            }
        });
        if (err.get() != null) {
            throw err.get();
        }
        return out.get();
    }

    /** Waits until {@code condition} (checked on the event thread) holds. */
    static void waitFor(String what, BooleanSupplier condition) throws Exception {
        long end = System.currentTimeMillis() + WAIT_MILLIS;
        while (System.currentTimeMillis() < end) {
            if (onEdt(condition::getAsBoolean)) {
                return;
            }
            Thread.sleep(20);
        }
        fail("timed out after " + WAIT_MILLIS + " ms waiting for: " + what);
    }

    /** Opens the demo budget and waits for its first results. */
    BudgetEditor openDemo() throws Exception {
        BudgetEditor ed = onEdt(() -> frame.openDemo());
        waitForCurrentResult(ed);
        return ed;
    }

    /** Waits until the engine has answered for the editor's present budget. */
    static void waitForCurrentResult(BudgetEditor ed) throws Exception {
        waitFor("the engine's answer for the present budget", () -> ed.latest() != null
                && ed.latest().budget().equals(ed.document().budget()));
    }
}
