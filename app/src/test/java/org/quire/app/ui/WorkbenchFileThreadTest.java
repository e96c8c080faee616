package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import javax.swing.JButton;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.app.ui.document.BudgetDocument;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.TypeA;

/**
 * Files are read and written off the event thread: a slow disk (a reader held back until the test lets it go)
 * and a large file leave the event thread free, the status bar shows the work with Cancel, and Cancel opens
 * nothing.
 */
class WorkbenchFileThreadTest extends GuiTestSupport {
    private static final long LIMIT_MILLIS = 200;

    @TempDir
    Path dir;

    private Path savedDemo(String name) throws Exception {
        Path file = dir.resolve(name);
        BudgetEditor demo = openDemo();
        assertTrue(await(onEdt(() -> frame.saveTo(demo, file))));
        onEdt(() -> { frame.forceClose(demo); return null; });
        return file;
    }

    private static void awaitQuietly(CountDownLatch l) throws java.io.InterruptedIOException {
        try {
            l.await(20, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            throw new java.io.InterruptedIOException("cancelled");
        }
    }

    @Test
    void aSlowFileOpenLeavesTheEventThreadFreeAndShowsProgress() throws Exception {
        Path file = savedDemo("slow.json");
        CountDownLatch release = new CountDownLatch(1);
        onEdt(() -> {
            frame.files().setReader((f, user) -> {
                awaitQuietly(release); // the disk answers when the test says so
                return BudgetDocument.open(f, user);
            });
            return null;
        });
        CompletableFuture<Optional<BudgetEditor>> opened;
        try (EdtWatchdog dog = new EdtWatchdog(LIMIT_MILLIS)) {
            opened = onEdt(() -> frame.open(file));
            Thread.sleep(1500);
            assertFalse(opened.isDone(), "the file is still being read");
            assertTrue(onEdt(() -> named(frame.getContentPane(), "fileProgress").isShowing()),
                    "the status bar shows the file being read");
            assertTrue(onEdt(frame::statusText).startsWith("Opening slow.json"), onEdt(frame::statusText));
            assertTrue(dog.withinLimit(), "the event thread was held for " + dog.worstMillis() + " ms while the file "
                    + "was read; " + dog.blockedIn());
            release.countDown();
            BudgetEditor ed = await(opened).orElseThrow();
            assertEquals(file.toAbsolutePath(), ed.document().file());
            System.out.println("EDT watchdog, slow open: longest wait " + dog.worstMillis() + " ms");
        }
        assertFalse(onEdt(() -> named(frame.getContentPane(), "fileProgress").isShowing()), "the progress goes");
    }

    @Test
    void cancelWhileAFileIsReadOpensNothing() throws Exception {
        Path file = savedDemo("cancelled.json");
        CountDownLatch release = new CountDownLatch(1);
        onEdt(() -> {
            frame.files().setReader((f, user) -> {
                awaitQuietly(release);
                return BudgetDocument.open(f, user);
            });
            return null;
        });
        CompletableFuture<Optional<BudgetEditor>> opened = onEdt(() -> frame.open(file));
        JButton cancel = onEdt(() -> named(frame.getContentPane(), "cancelFileTask"));
        waitFor("the Cancel button", cancel::isShowing);
        onEdt(() -> { cancel.doClick(); return null; });
        assertTrue(await(opened).isEmpty(), "nothing opened");
        release.countDown();
        Thread.sleep(300);
        assertEquals(0, (int) onEdt(() -> frame.editors().size()), "no tab appears later either");
        assertEquals("Opening cancelled.json cancelled", onEdt(frame::statusText));
    }

    @Test
    void aLargeFileIsOpenedAndSavedWithoutHoldingTheEventThread() throws Exception {
        BudgetEditor demo = openDemo();
        double[] readings = new double[200_000];
        for (int i = 0; i < readings.length; i++) {
            readings[i] = 1002.3 + 0.001 * ((i * 7919) % 101 - 50);
        }
        onEdt(() -> demo.edit("Import readings", "", b -> b.withInput("V_ind",
                b.input("V_ind").withEvaluation(TypeA.ofReadings(readings)))));
        Path file = dir.resolve("large.json");
        try (EdtWatchdog dog = new EdtWatchdog(LIMIT_MILLIS)) {
            assertTrue(await(onEdt(() -> frame.saveTo(demo, file))));
            onEdt(() -> { frame.forceClose(demo); return null; });
            BudgetEditor ed = await(onEdt(() -> frame.open(file))).orElseThrow();
            Budget b = ed.document().budget();
            assertEquals(readings.length, ((TypeA) b.input("V_ind").evaluation()).readings().length);
            System.out.println("EDT watchdog, " + java.nio.file.Files.size(file) / 1024 + " KiB file saved and "
                    + "opened: longest wait " + dog.worstMillis() + " ms");
            assertTrue(dog.withinLimit(), "the event thread was held for " + dog.worstMillis() + " ms; "
                    + dog.blockedIn());
        }
    }
}
