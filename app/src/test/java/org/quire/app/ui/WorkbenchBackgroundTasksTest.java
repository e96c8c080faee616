package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.app.ui.calibration.CalibrationWindow;
import org.quire.app.ui.compare.CompareWindow;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * Compare, opening a calibration and writing a report leave the event thread free. The files to read are named
 * pipes (FIFOs) that give their content only when the test writes it, so a read on the event thread would hold it
 * until then and the {@link EdtWatchdog} would see it; the report is written while the test holds the event
 * thread.
 */
class WorkbenchBackgroundTasksTest extends GuiTestSupport {
    /**
     * The longest wait for the event thread allowed while a pipe is still unread. A read on the event thread would
     * hold it for the whole 1.5 s before the pipe is fed; a loaded build machine (garbage collection, both cores
     * busy) can delay a free event thread by a few hundred milliseconds, so the limit lies between the two.
     */
    private static final long LIMIT_MILLIS = 1000;

    @TempDir
    Path dir;

    private static Path fifo(Path p) throws Exception {
        Process mk = new ProcessBuilder("mkfifo", p.toString()).inheritIO().start();
        Assumptions.assumeTrue(mk.waitFor() == 0, "mkfifo is needed for this test");
        return p;
    }

    /** Feeds {@code content} into the pipe (blocks until the workbench opens it for reading). */
    private static Thread feed(Path pipe, byte[] content) {
        Thread t = new Thread(() -> {
            try (OutputStream out = Files.newOutputStream(pipe)) {
                out.write(content);
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        }, "fifo-feeder");
        t.setDaemon(true);
        return t;
    }

    @Test
    void comparingWithAFileStillBeingReadLeavesTheEventThreadFree() throws Exception {
        BudgetEditor ed = openDemo();
        Path saved = dir.resolve("earlier.json");
        assertTrue(await(onEdt(() -> frame.saveTo(ed, saved))));
        Path pipe = fifo(dir.resolve("earlier-pipe.json"));
        try (EdtWatchdog dog = new EdtWatchdog(LIMIT_MILLIS)) {
            onEdt(() -> { frame.compareWith(ed, pipe); return null; });
            try {
                Thread.sleep(1500); // the other budget cannot be read yet
                assertTrue(onEdt(frame::statusText).startsWith("Comparing with"), onEdt(frame::statusText));
                assertTrue(dog.withinLimit(), "the event thread was held for " + dog.worstMillis() + " ms; "
                        + dog.blockedIn());
            } finally {
                // fed whatever the checks found, so that no reader stays blocked on the pipe for later tests
                feed(pipe, Files.readAllBytes(saved)).start();
            }
            CompareWindow w = waitForWindow("compare", CompareWindow.class);
            onEdt(() -> { w.dispose(); return null; });
            System.out.println("EDT watchdog, compare: longest wait " + dog.worstMillis() + " ms");
        }
    }

    @Test
    void openingACalibrationStillBeingReadLeavesTheEventThreadFree() throws Exception {
        // the calibration names its method template by a relative path (../../templates/...)
        Path examples = Path.of("..", "worked-examples", "calibration");
        Path calDir = Files.createDirectories(dir.resolve("worked-examples").resolve("calibration"));
        Path templates = Files.createDirectories(dir.resolve("templates"));
        try (var s = Files.list(Path.of("..", "templates"))) {
            for (Path t : (Iterable<Path>) s::iterator) {
                if (Files.isRegularFile(t)) {
                    Files.copy(t, templates.resolve(t.getFileName()));
                }
            }
        }
        Path pipe = fifo(calDir.resolve("tarrow-vale-dn80-calibration.json"));
        AtomicReference<CalibrationWindow> window = new AtomicReference<>();
        try (EdtWatchdog dog = new EdtWatchdog(LIMIT_MILLIS)) {
            onEdt(() -> { frame.openCalibration(pipe, window::set); return null; });
            try {
                Thread.sleep(1500);
                assertEquals(null, window.get(), "nothing is shown before the file could be read");
                assertTrue(onEdt(frame::statusText).startsWith("Opening tarrow-vale-dn80-calibration.json"),
                        onEdt(frame::statusText));
                assertTrue(dog.withinLimit(), "the event thread was held for " + dog.worstMillis() + " ms; "
                        + dog.blockedIn());
            } finally {
                feed(pipe, Files.readAllBytes(examples.resolve("tarrow-vale-dn80-calibration.json"))).start();
            }
            waitFor("the calibration window", () -> window.get() != null);
            // building and showing the window is the event thread's own work, not measured against the limit
            System.out.println("EDT watchdog, open calibration: longest wait " + dog.worstMillis() + " ms");
        }
        onEdt(() -> { window.get().dispose(); return null; });
    }

    @Test
    void aReportIsWrittenWhileTheEventThreadIsHeldByTheTest() throws Exception {
        BudgetEditor ed = openDemo();
        waitForCurrentResult(ed);
        Path pdf = dir.resolve("report.pdf");
        // one task on the event thread: start the export, then hold the thread until the file appears; a report
        // written on the event thread would be there before the call returns, and one that needed the event
        // thread to finish would never appear
        boolean[] seen = onEdt(() -> {
            frame.exportReport(ed, pdf);
            boolean atReturn = Files.exists(pdf);
            long end = System.nanoTime() + 30_000_000_000L;
            while (!Files.exists(pdf) && System.nanoTime() < end) {
                Thread.sleep(20);
            }
            return new boolean[] {atReturn, Files.exists(pdf)};
        });
        assertFalse(seen[0], "the report is not written on the event thread");
        assertTrue(seen[1], "the report was written while the event thread was held");
        waitFor("the report", () -> frame.statusText().equals("Report written to " + pdf));
        assertTrue(Files.size(pdf) > 0);
    }
}
