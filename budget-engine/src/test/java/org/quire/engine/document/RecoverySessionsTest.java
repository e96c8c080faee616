package org.quire.engine.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** One recovery folder per running program, told apart by a lock file the operating system releases on exit. */
class RecoverySessionsTest {

    @Test
    void aRunningSessionsCopiesAreNotOfferedAndAStoppedOnesAre(@TempDir Path dir) throws Exception {
        RecoverySessions sessions = RecoverySessions.in(dir);
        BudgetDocument a = BudgetDocument.newDraft(Fixtures.sumBudget(3, 1), "Wren Halloway", Fixtures.T0);
        RecoverySessions.Session first = sessions.claim();
        first.store().autosave("doc-a", a, null);
        try (RecoverySessions.Session second = sessions.claim()) {
            assertFalse(first.folder().equals(second.folder()), "each session has a folder of its own");
            assertTrue(sessions.orphans().isEmpty(), "the running first session's copy is not offered");
            first.close(); // the first program stops with its copy kept
            List<RecoverySessions.Session> orphans = sessions.orphans();
            assertEquals(1, orphans.size());
            assertEquals(first.folder(), orphans.get(0).folder());
            assertEquals("doc-a", orphans.get(0).store().pending().get(0).id());
            assertTrue(sessions.orphans().isEmpty(), "an orphan being offered is locked against a third program");
            Path moved = second.adopt(orphans.get(0).store().pending().get(0).file());
            assertEquals(second.folder(), moved.getParent());
            orphans.get(0).close();
            assertFalse(Files.exists(first.folder()), "the emptied folder is removed");
            assertTrue(sessions.orphans().isEmpty(), "the adopted copy belongs to the running second session");
        }
        assertEquals(1, sessions.orphans().size(), "the second stopped with the copy: offered next time");
    }

    @Test
    void aSessionWithNothingKeptLeavesNoFolder(@TempDir Path dir) throws Exception {
        RecoverySessions sessions = RecoverySessions.in(dir);
        Path folder;
        try (RecoverySessions.Session s = sessions.claim()) {
            folder = s.folder();
            assertTrue(Files.exists(folder.resolve(RecoverySessions.LOCK_FILE)));
        }
        assertFalse(Files.exists(folder));
    }

    @Test
    void copiesOfAnEarlierVersionDirectlyInTheFolderAreOffered(@TempDir Path dir) throws Exception {
        RecoveryStore.of(dir).autosave("old", BudgetDocument.newDraft(Fixtures.sumBudget(2, 1), "Ash Penrose",
                Fixtures.T0), null);
        List<RecoverySessions.Session> orphans = RecoverySessions.in(dir).orphans();
        assertEquals(1, orphans.size());
        assertEquals(dir.toAbsolutePath(), orphans.get(0).folder());
    }

    /**
     * Another process holds its session while it runs; once it is killed (a crash: no clean-up ran) its copy is
     * offered.
     */
    @Test
    void anotherProcessesSessionIsOfferedOnlyAfterItIsKilled(@TempDir Path dir) throws Exception {
        String javaBin = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        String cp = System.getProperty("java.class.path") + java.io.File.pathSeparator
                + System.getProperty("jdk.module.path", "");
        Process p = new ProcessBuilder(javaBin, "-cp", cp, RecoverySessionHolder.class.getName(), dir.toString())
                .redirectErrorStream(true).start();
        try {
            BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
            String line = out.readLine();
            assertEquals("holding", line, "the helper process claimed a session");
            assertTrue(RecoverySessions.in(dir).orphans().isEmpty(), "a running program's copy is not offered");
        } finally {
            p.destroyForcibly();
            p.waitFor(10, TimeUnit.SECONDS);
        }
        List<RecoverySessions.Session> orphans = RecoverySessions.in(dir).orphans();
        assertEquals(1, orphans.size(), "the killed program's copy is offered");
        assertEquals("held", orphans.get(0).store().pending().get(0).id());
        orphans.get(0).close();
    }
}
