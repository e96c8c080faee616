package org.quire.engine.document;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Safe saving: temporary file, forced write, atomic replace, backup, clear errors. */
class DocumentStoreTest {

    private static long count(Path dir) throws Exception {
        try (Stream<Path> s = Files.list(dir)) {
            return s.count();
        }
    }

    @Test
    void savingTwiceKeepsThePreviousVersionAsBak(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("tv0412.json");
        BudgetDocument g1 = BudgetDocument.newDraft(Fixtures.sumBudget(5, 1), "Wren Halloway", Fixtures.T0);
        BudgetDocument g2 = g1.withBudget(Fixtures.sumBudget(5, 2), "Wren Halloway", Fixtures.T0.plusSeconds(1));
        DocumentStore.save(g1, f);
        assertFalse(Files.exists(DocumentStore.backupOf(f)));
        DocumentStore.save(g2, f);
        assertEquals(g2, DocumentStore.open(f));
        assertEquals(g1, DocumentStore.open(DocumentStore.backupOf(f)));
        assertEquals(2, count(dir), "no temporary file is left");
    }

    @Test
    void aFolderThatIsARegularFileGivesAMessageNamingTheFolder(@TempDir Path dir) throws Exception {
        Path notAFolder = dir.resolve("rig-notes.txt");
        Files.writeString(notAFolder, "TV-G2");
        BudgetDocument d = BudgetDocument.newDraft(Fixtures.sumBudget(3, 1), "Wren Halloway", Fixtures.T0);
        DocumentSaveException e = assertThrows(DocumentSaveException.class,
                () -> DocumentStore.save(d, notAFolder.resolve("budget.json")));
        assertTrue(e.getMessage().contains("in the folder " + notAFolder.toAbsolutePath()), e.getMessage());
        assertTrue(e.getMessage().contains("not a folder"), e.getMessage());
        assertEquals("TV-G2", Files.readString(notAFolder));
    }

    @Test
    void aMissingFolderGivesAMessageNamingTheFolder(@TempDir Path dir) {
        BudgetDocument d = BudgetDocument.newDraft(Fixtures.sumBudget(3, 1), "Wren Halloway", Fixtures.T0);
        Path f = dir.resolve("no-such-folder").resolve("budget.json");
        DocumentSaveException e = assertThrows(DocumentSaveException.class, () -> DocumentStore.save(d, f));
        assertTrue(e.getMessage().contains("does not exist"), e.getMessage());
        assertTrue(e.getMessage().contains(dir.resolve("no-such-folder").toAbsolutePath().toString()));
    }

    @Test
    void whenTheBackupCannotBeMadeTheOldFileStaysAndNoTemporaryIsLeft(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("budget.json");
        BudgetDocument g1 = BudgetDocument.newDraft(Fixtures.sumBudget(3, 1), "Wren Halloway", Fixtures.T0);
        DocumentStore.save(g1, f);
        byte[] before = Files.readAllBytes(f);
        Path bak = DocumentStore.backupOf(f);
        Files.createDirectories(bak.resolve("occupied"));
        BudgetDocument g2 = g1.withBudget(Fixtures.sumBudget(3, 2), "Wren Halloway", Fixtures.T0.plusSeconds(1));
        DocumentSaveException e = assertThrows(DocumentSaveException.class, () -> DocumentStore.save(g2, f));
        assertTrue(e.getMessage().startsWith("cannot save budget.json in the folder " + dir.toAbsolutePath()),
                e.getMessage());
        assertArrayEquals(before, Files.readAllBytes(f));
        try (Stream<Path> s = Files.list(dir)) {
            assertTrue(s.noneMatch(p -> p.getFileName().toString().endsWith(".tmp")
                    && p.getFileName().toString().startsWith(".budget.json.") && !p.toString().contains(".bak.")));
        }
    }

    @Test
    void aFolderInTheWayOfTheFileIsRefused(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("budget.json");
        Files.createDirectories(f);
        BudgetDocument d = BudgetDocument.newDraft(Fixtures.sumBudget(3, 1), "Wren Halloway", Fixtures.T0);
        DocumentSaveException e = assertThrows(DocumentSaveException.class, () -> DocumentStore.save(d, f));
        assertTrue(e.getMessage().contains("a folder of that name is in the way"), e.getMessage());
        assertTrue(Files.isDirectory(f));
    }
}
