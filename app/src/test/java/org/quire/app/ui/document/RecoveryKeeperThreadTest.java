package org.quire.app.ui.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.engine.budget.Budget;
import org.quire.engine.document.RecoveryStore;

/**
 * The recovery copies are written and removed off the thread that edits (the event thread in the workbench):
 * every file operation of the keeper fails here, because the "folder" is a plain file, and the failure is
 * reported on the thread that touched the disk, which is never the calling one.
 */
class RecoveryKeeperThreadTest {
    @TempDir
    Path dir;

    private final Set<String> failedOn = ConcurrentHashMap.newKeySet();

    private RecoveryKeeper keeper(Duration period) throws IOException {
        Path notAFolder = Files.writeString(dir.resolve("not-a-folder"), "x");
        return new RecoveryKeeper(RecoveryStore.of(notAFolder), period,
                (id, e) -> failedOn.add(Thread.currentThread().getName()));
    }

    private static BudgetDocument changed() {
        BudgetDocument d = BudgetDocument.ofBudget(Budget.of("", List.of(), List.of()).withTitle("kept"), "kept",
                "Test Engineer");
        assertTrue(d.apply("Edit notes", "", b -> b.withNotes("not saved yet")));
        assertTrue(d.isDirty());
        return d;
    }

    @Test
    void aCopyIsWrittenOnTheRecoveryThreadNotTheCaller() throws Exception {
        RecoveryKeeper k = keeper(Duration.ofHours(1));
        k.track(changed());
        assertEquals(0, (int) k.flush().get(10, TimeUnit.SECONDS), "no copy can be written into a plain file");
        assertEquals(Set.of("quire-recovery"), failedOn);
        assertFalse(failedOn.contains(Thread.currentThread().getName()));
        k.close(() -> { }).get(10, TimeUnit.SECONDS);
    }

    @Test
    void theAutosaverWritesOnItsOwnThreadAtItsPeriod() throws Exception {
        RecoveryKeeper k = keeper(Duration.ofMillis(20));
        k.track(changed());
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(10);
        while (failedOn.isEmpty() && System.nanoTime() < end) {
            Thread.sleep(20);
        }
        assertTrue(failedOn.contains("quire-autosave"), String.valueOf(failedOn));
        assertFalse(failedOn.contains(Thread.currentThread().getName()));
        k.close(() -> { }).get(10, TimeUnit.SECONDS);
    }

    @Test
    void aCopyIsRemovedOffTheCallerWhenTheDocumentIsClosed() throws Exception {
        for (Duration period : new Duration[] {null, Duration.ofHours(1)}) {
            failedOn.clear();
            Files.deleteIfExists(dir.resolve("not-a-folder"));
            RecoveryKeeper k = keeper(period);
            BudgetDocument d = changed();
            k.track(d);
            k.forget(d); // closed without saving: its copy goes
            k.close(() -> { }).get(10, TimeUnit.SECONDS);
            assertEquals(1, failedOn.size(), "period " + period + ": " + failedOn);
            assertFalse(failedOn.contains(Thread.currentThread().getName()), "period " + period);
        }
    }

    @Test
    void closingWritesWhatIsPendingOffTheCallerAndThenRunsWhatComesAfter() throws Exception {
        RecoveryKeeper k = keeper(Duration.ofHours(1));
        k.track(changed());
        String[] afterOn = new String[1];
        k.close(() -> afterOn[0] = Thread.currentThread().getName()).get(10, TimeUnit.SECONDS);
        assertEquals(Set.of("quire-recovery"), failedOn, "the last write failed on the recovery thread");
        assertEquals("quire-recovery", afterOn[0], "the folder is released after the last write, on the same thread");
    }
}
