package org.quire.engine.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Autosave copies in a recovery folder, and the scheduler that writes them. */
class RecoveryStoreTest {

    @Test
    void autosavedDocumentsAreListedWithOriginalPathAndTimeAndCanBeDiscarded(@TempDir Path dir) throws Exception {
        RecoveryStore store = RecoveryStore.of(dir.resolve("recovery"));
        BudgetDocument a = BudgetDocument.newDraft(Fixtures.sumBudget(4, 1), "Wren Halloway", Fixtures.T0);
        BudgetDocument b = BudgetDocument.newDraft(Fixtures.sumBudget(4, 2), "Ash Penrose", Fixtures.T0);
        Instant t1 = Instant.parse("2026-03-02T10:01:00Z");
        Instant t2 = Instant.parse("2026-03-02T10:02:00Z");
        store.autosave("doc-a", a, dir.resolve("a.json"), t1);
        store.autosave("doc-b", b, null, t2);
        Files.writeString(store.folder().resolve("broken.recovery.json"), "{\"format\": \"quire-recovery\"");
        List<String> unreadable = new ArrayList<>();
        List<RecoveryStore.Pending> p = store.pending(unreadable);
        assertEquals(2, p.size());
        assertEquals("doc-b", p.get(0).id());
        assertNull(p.get(0).originalPath());
        assertEquals(t2, p.get(0).saved());
        assertEquals(dir.resolve("a.json").toAbsolutePath(), p.get(1).originalPath());
        assertEquals(a, p.get(1).load());
        assertEquals(1, unreadable.size());
        assertTrue(unreadable.get(0).startsWith("broken.recovery.json"), unreadable.get(0));
        store.discard("doc-a");
        assertEquals(1, store.pending().size());
        assertThrows(IllegalArgumentException.class, () -> store.autosave("../escape", a, null));
    }

    @Test
    void anUnwritableRecoveryFolderGivesAMessageNamingIt(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("recovery");
        Files.writeString(file, "not a folder");
        RecoveryStore store = RecoveryStore.of(file);
        IOException e = assertThrows(IOException.class, () -> store.autosave("doc-a",
                BudgetDocument.newDraft(Fixtures.sumBudget(2, 1), "Wren Halloway", Fixtures.T0), null));
        assertTrue(e.getMessage().contains(file.toString()), e.getMessage());
    }

    @Test
    void theAutosaverWritesDirtyDocumentsAtItsPeriodAndOnClose(@TempDir Path dir) throws Exception {
        RecoveryStore store = RecoveryStore.of(dir);
        List<String> errors = new CopyOnWriteArrayList<>();
        BudgetDocument a = BudgetDocument.newDraft(Fixtures.sumBudget(3, 1), "Wren Halloway", Fixtures.T0);
        try (Autosaver s = Autosaver.start(store, Duration.ofMillis(20), (id, e) -> errors.add(id + e))) {
            assertEquals(Duration.ofMillis(20), s.period());
            s.markDirty("doc-a", a, null);
            long deadline = System.nanoTime() + 5_000_000_000L;
            while (s.pendingCount() > 0 && System.nanoTime() < deadline) {
                Thread.sleep(5);
            }
            assertEquals(0, s.pendingCount());
            assertEquals(a, store.pending().get(0).load());
            s.markSaved("doc-a");
            assertEquals(0, store.pending().size());
        }
        try (Autosaver s = Autosaver.start(store, Duration.ofHours(1), (id, e) -> errors.add(id + e))) {
            s.markDirty("doc-b", a, null);
        }
        assertEquals("doc-b", store.pending().get(0).id(), "close writes what is pending");
        assertTrue(errors.isEmpty(), errors.toString());
        assertEquals(Duration.ofSeconds(60), Autosaver.DEFAULT_PERIOD);
        assertThrows(IllegalArgumentException.class, () -> Autosaver.start(store, Duration.ZERO, (id, e) -> { }));
    }
}
