package org.quire.app.ui;

import org.quire.app.ui.common.WorkbenchPrefs;
import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLaf;
import com.formdev.flatlaf.FlatLightLaf;
import java.awt.EventQueue;
import java.nio.file.Path;
import org.quire.app.common.Engine;
import org.quire.app.ui.montecarlo.MonteCarloRunner;

/**
 * Starts the workbench in a fixed order: platform properties, the look and feel (light or dark from the
 * preferences, with Quire's own theme files), then the window, built on the event thread with the budget
 * opened in it before it is shown.
 */
public final class Workbench {
    private Workbench() {
    }

    /**
     * @param file a budget file to open, or null for the demo budget
     * @param review whether to open the file read-only, for an assessor
     */
    public static void start(Path file, boolean review) {
        // what needs no look and feel is made on the other core meanwhile: the engine's function set and the demo
        // budget, read from the application
        java.util.concurrent.FutureTask<Prepared> prepared = new java.util.concurrent.FutureTask<>(
                () -> prepare(file == null));
        Thread preparing = new Thread(prepared, "quire-start");
        preparing.setDaemon(true);
        preparing.start();
        System.setProperty("apple.laf.useScreenMenuBar", "true");
        System.setProperty("apple.awt.application.name", "Quire");
        System.setProperty("flatlaf.uiScale.allowScaleDown", "true");
        WorkbenchPrefs prefs = WorkbenchPrefs.user();
        installLookAndFeel(prefs.theme());
        Thread.setDefaultUncaughtExceptionHandler(Workbench::uncaught);
        // the recovery folder is created and locked here, on the starting thread: the event thread touches no file
        WorkbenchRecovery.Claimed recovery = WorkbenchRecovery.claim(prefs);
        EventQueue.invokeLater(() -> {
            Prepared p = join(prepared);
            Engine engine = p.engine();
            WorkbenchFrame frame = new WorkbenchFrame(prefs, engine.library(),
                    MonteCarloRunner.engine(engine.library()), recovery);
            frame.setIconImages(AppIcon.images());
            // the demo budget first, then the window: its first paint shows the content, not an empty grey frame;
            // a file is read off the event thread once the window shows
            if (file == null) {
                frame.openDemo(p.demo());
            }
            frame.showRestored();
            if (file != null) {
                frame.open(file, review);
            }
            if (Boolean.getBoolean(TIMING_PROPERTY)) {
                EventQueue.invokeLater(() -> reportPainted(frame));
            }
            EventQueue.invokeLater(frame::offerRecovery);
        });
    }

    /** What the start-up makes off the event thread: the engine configuration, and the demo budget or null. */
    private record Prepared(Engine engine, org.quire.engine.document.BudgetDocument demo) {
    }

    private static Prepared prepare(boolean demo) {
        Engine engine = Engine.standard();
        org.quire.engine.document.BudgetDocument d = demo ? WorkbenchFrame.readDemo() : null;
        return new Prepared(engine, d);
    }

    /** @return the prepared start-up, waiting for it; its failure is thrown as it was */
    private static Prepared join(java.util.concurrent.FutureTask<Prepared> prepared) {
        boolean interrupted = false;
        try {
            while (true) {
                try {
                    return prepared.get();
                } catch (InterruptedException e) {
                    interrupted = true;
                } catch (java.util.concurrent.ExecutionException e) {
                    if (e.getCause() instanceof RuntimeException r) {
                        throw r;
                    }
                    if (e.getCause() instanceof Error r) {
                        throw r;
                    }
                    throw new IllegalStateException(e.getCause());
                }
            }
        } finally {
            if (interrupted) {
                Thread.currentThread().interrupt();
            }
        }
    }

    /**
     * With {@code -Dquire.timing=true} the workbench prints {@code workbench_content_painted_ms=N} on standard
     * error once the window's content (menu, panes and the opened budget) has been painted, N counted from the
     * start of the process as {@code ProcessHandle.info().startInstant()} gives it: the startup benchmark of
     * {@code app/src/test/resources/bench/run-benchmarks.sh}. On Linux that start is early by the part of a second
     * that {@code /proc/stat} drops from the boot time; the script measures that amount and takes it off.
     */
    public static final String TIMING_PROPERTY = "quire.timing";

    private static void reportPainted(javax.swing.JFrame frame) {
        javax.swing.JRootPane root = frame.getRootPane();
        root.paintImmediately(0, 0, root.getWidth(), root.getHeight());
        java.time.Instant started = ProcessHandle.current().info().startInstant().orElse(null);
        if (started != null) {
            System.err.println("workbench_content_painted_ms="
                    + java.time.Duration.between(started, java.time.Instant.now()).toMillis());
        }
    }

    /**
     * The last resort for a fault of Quire itself: the message is shown and the workbench stays open with every
     * budget as it was (recovery copies keep being written), so that the engineer can save the work.
     */
    static void uncaught(Thread t, Throwable e) {
        e.printStackTrace();
        Runnable show = () -> javax.swing.JOptionPane.showMessageDialog(null, "<html>Quire met an internal error and "
                + "stopped what it was doing:<br><br>" + String.valueOf(e).replace("<", "&lt;") + "<br><br>Your budgets "
                + "are still open; save them, and report the error with what you were doing.</html>",
                "Internal error", javax.swing.JOptionPane.ERROR_MESSAGE);
        if (EventQueue.isDispatchThread()) {
            show.run();
        } else {
            EventQueue.invokeLater(show);
        }
    }

    /** Installs FlatLaf with Quire's theme files ({@code org/quire/app/ui/themes/*.properties}). */
    public static void installLookAndFeel(WorkbenchPrefs.Theme theme) {
        FlatLaf.registerCustomDefaultsSource("org.quire.app.ui.themes");
        if (theme == WorkbenchPrefs.Theme.DARK) {
            FlatDarkLaf.setup();
        } else {
            FlatLightLaf.setup();
        }
    }
}
