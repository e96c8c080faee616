package org.quire.app.ui;

import org.quire.app.ui.common.WorkbenchPrefs;
import static org.junit.jupiter.api.Assertions.fail;

import java.awt.EventQueue;
import java.awt.GraphicsEnvironment;
import java.awt.Window;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;
import java.util.prefs.Preferences;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.quire.app.common.Engine;
import org.quire.app.ui.montecarlo.MonteCarloRunner;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * Base of the workbench tests: skips them loudly when there is no display (run them under Xvfb), builds a
 * workbench with a preferences node of its own, and offers helpers to act on the event thread and wait.
 */
abstract class GuiTestSupport {
    static final long WAIT_MILLIS = 10_000;
    protected WorkbenchFrame frame;
    protected Preferences node;
    /** The recovery folder of this test's preferences (never the user's own). */
    protected Path recoveryDir;

    @BeforeAll
    static void needsDisplay() {
        if (GraphicsEnvironment.isHeadless()) {
            String line = "*".repeat(100);
            System.err.println(line + "\n*** GUI TESTS SKIPPED: no display (java.awt.headless or no DISPLAY). "
                    + "Run ./run-tests, which starts Xvfb. ***\n" + line);
        }
        if (!GraphicsEnvironment.isHeadless()) {
            Workbench.installLookAndFeel(WorkbenchPrefs.Theme.LIGHT);
        }
    }

    /** @return the Monte Carlo runner the workbench gets: the engine's, unless a test says otherwise */
    MonteCarloRunner runner() {
        return MonteCarloRunner.engine(Engine.standard().library());
    }

    @BeforeEach
    void buildFrame() throws Exception {
        Assumptions.assumeFalse(GraphicsEnvironment.isHeadless(),
                "SKIPPED: no display (GraphicsEnvironment.isHeadless()); run the GUI tests under xvfb-run");
        node = Preferences.userRoot().node("org/quire/test/workbench-" + System.nanoTime());
        node.putInt("autosaveMinutes", 0);
        recoveryDir = Files.createTempDirectory("quire-recovery-test");
        node.put("recoveryFolder", recoveryDir.toString());
        node.put("userName", "Test Engineer");
        node.put("windowBounds", "0,0,1440,900");
        frame = onEdt(() -> {
            WorkbenchFrame f = new WorkbenchFrame(new WorkbenchPrefs(node), Engine.standard().library(), runner());
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
        deleteTree(recoveryDir);
    }

    /**
     * Deletes a folder and what it holds. The workbench's recovery thread may still be releasing its session folder
     * inside it (it works off the event thread, after the frame is gone): files that vanish meanwhile are skipped,
     * and a folder that gains a file meanwhile is tried again.
     */
    static void deleteTree(Path dir) throws Exception {
        for (int attempt = 0; dir != null && Files.exists(dir); attempt++) {
            try {
                Files.walkFileTree(dir, new java.nio.file.SimpleFileVisitor<Path>() {
                    @Override
                    public java.nio.file.FileVisitResult visitFile(Path f, java.nio.file.attribute.BasicFileAttributes a)
                            throws java.io.IOException {
                        Files.deleteIfExists(f);
                        return java.nio.file.FileVisitResult.CONTINUE;
                    }

                    @Override
                    public java.nio.file.FileVisitResult visitFileFailed(Path f, java.io.IOException e)
                            throws java.io.IOException {
                        if (e instanceof java.nio.file.NoSuchFileException) {
                            return java.nio.file.FileVisitResult.CONTINUE;
                        }
                        throw e;
                    }

                    @Override
                    public java.nio.file.FileVisitResult postVisitDirectory(Path d, java.io.IOException e)
                            throws java.io.IOException {
                        if (e != null && !(e instanceof java.nio.file.NoSuchFileException)) {
                            throw e;
                        }
                        Files.deleteIfExists(d);
                        return java.nio.file.FileVisitResult.CONTINUE;
                    }
                });
            } catch (java.nio.file.DirectoryNotEmptyException | java.nio.file.NoSuchFileException e) {
                if (attempt >= 50) {
                    throw e;
                }
                Thread.sleep(20);
            }
        }
    }

    /** @return a frame on the same preferences (a restart of the workbench), shown */
    WorkbenchFrame newFrameOnSamePreferences() throws Exception {
        return onEdt(() -> {
            WorkbenchFrame f = new WorkbenchFrame(new WorkbenchPrefs(node), Engine.standard().library(), runner());
            f.showRestored();
            return f;
        });
    }

    /** @return the showing dialog named {@code name}, waiting for it */
    static <T extends Window> T waitForWindow(String name, Class<T> type) throws Exception {
        AtomicReference<T> found = new AtomicReference<>();
        waitFor("the window '" + name + "'", () -> {
            for (Window w : Window.getWindows()) {
                if (w.isShowing() && name.equals(w.getName()) && type.isInstance(w)) {
                    found.set(type.cast(w));
                    return true;
                }
            }
            return false;
        });
        return found.get();
    }

    /** @return the showing option pane's message, waiting for one; the pane's dialog is closed */
    static String takeMessageBox() throws Exception {
        AtomicReference<String> msg = new AtomicReference<>();
        waitFor("a message box", () -> {
            for (Window w : Window.getWindows()) {
                if (w.isShowing() && w instanceof javax.swing.JDialog) {
                    javax.swing.JOptionPane p = findOptionPane(((javax.swing.JDialog) w).getContentPane());
                    if (p != null) {
                        msg.set(((javax.swing.JDialog) w).getTitle() + ": " + p.getMessage());
                        w.dispose();
                        return true;
                    }
                }
            }
            return false;
        });
        return msg.get();
    }

    private static javax.swing.JOptionPane findOptionPane(java.awt.Container c) {
        for (java.awt.Component k : c.getComponents()) {
            if (k instanceof javax.swing.JOptionPane) {
                return (javax.swing.JOptionPane) k;
            }
            if (k instanceof java.awt.Container) {
                javax.swing.JOptionPane p = findOptionPane((java.awt.Container) k);
                if (p != null) {
                    return p;
                }
            }
        }
        return null;
    }

    /** @return the component named {@code name} inside {@code c}, failing when there is none */
    @SuppressWarnings("unchecked")
    static <T extends java.awt.Component> T named(java.awt.Container c, String name) {
        java.awt.Component k = WorkbenchEditingTest.find(c, name);
        if (k == null) {
            fail("no component named '" + name + "' in " + c.getName());
        }
        return (T) k;
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

    /** @return the value of a future the workbench completes on the event thread, waiting for it (not on the EDT) */
    static <T> T await(java.util.concurrent.CompletableFuture<T> f) throws Exception {
        return f.get(WAIT_MILLIS, java.util.concurrent.TimeUnit.MILLISECONDS);
    }

    /** @return the recovery copies anywhere under the test's recovery folder (every workbench's own folder) */
    long recoveryCopies() throws java.io.IOException {
        // the recovery thread may remove a copy or a stopped workbench's folder while the tree is walked: walk again
        for (int attempt = 0; ; attempt++) {
            try (java.util.stream.Stream<Path> s = Files.walk(recoveryDir)) {
                return s.filter(p -> p.getFileName().toString().endsWith(".recovery.json")).count();
            } catch (java.io.UncheckedIOException e) {
                if (!(e.getCause() instanceof java.nio.file.NoSuchFileException) || attempt == 20) {
                    throw e;
                }
            }
        }
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
        // say what the background threads were doing, so that a timeout on a loaded machine can be told from a hang
        StringBuilder busy = new StringBuilder();
        for (java.util.Map.Entry<Thread, StackTraceElement[]> e : Thread.getAllStackTraces().entrySet()) {
            String n = e.getKey().getName();
            if (n.startsWith("SwingWorker") || n.startsWith("quire")) {
                busy.append("\n  ").append(n).append(' ').append(e.getKey().getState());
                for (int i = 0; i < Math.min(4, e.getValue().length); i++) {
                    busy.append("\n    at ").append(e.getValue()[i]);
                }
            }
        }
        fail("timed out after " + WAIT_MILLIS + " ms waiting for: " + what + "; background threads:" + busy);
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
                && ed.latest().budget().equals(ed.document().budget()) && ed.reviewPanel().isCurrent());
    }
}
