package org.quire.engine.document;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jakarta.json.Json;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.engine.budget.Budget;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.BudgetJson;

/** Budget file format version 2: round trip, migration of version 1, refusal of newer versions. */
class DocumentFormatTest {

    @Test
    void aVersion2DocumentReadsBackEqualAfterWriting() throws Exception {
        BudgetDocument d = Fixtures.doc("tvfl-gravimetric-water-v1.json")
                .moveTo(DocumentStatus.IN_REVIEW, "Wren Halloway", Fixtures.T0.plusSeconds(60), "ready")
                .moveTo(DocumentStatus.APPROVED, "Ash Penrose", Fixtures.T0.plusSeconds(120), "checked")
                .withResults(ResultSnapshot.of(Json.createObjectBuilder().add("format", "quire-result")
                        .add("outputs", Json.createArrayBuilder()).build(), Fixtures.T0.plusSeconds(30)));
        String text = DocumentJson.write(d);
        BudgetDocument back = DocumentJson.read(text, Instant.EPOCH);
        assertEquals(d, back);
        assertEquals(text, DocumentJson.write(back));
        assertTrue(text.contains("\"formatVersion\": 2"));
        assertEquals("TVFL-QM-7.2", back.budget().extensions().getString("laboratoryReference"));
        assertEquals(DocumentStatus.APPROVED, back.status());
        assertTrue(back.approvalIntact());
    }

    @Test
    void aVersion1FileIsMigratedAndItsUnknownFieldsAreKept(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("tv0412.json");
        Files.writeString(f, Fixtures.text("tvfl-meter-tv0412-v1.json"));
        Instant mtime = Instant.parse("2025-11-03T07:45:00Z");
        Files.setLastModifiedTime(f, FileTime.from(mtime));
        BudgetDocument d = DocumentStore.open(f);
        assertEquals(1, d.migratedFrom());
        assertEquals(1, d.revision());
        assertEquals(DocumentStatus.DRAFT, d.status());
        assertEquals(mtime, d.created());
        assertEquals(8, d.budget().inputs().size());
        assertEquals(17, d.budget().extensions().getJsonObject("rigLog").getInt("run"));
        DocumentStore.save(d, f);
        String saved = Files.readString(f);
        assertTrue(saved.contains("\"formatVersion\": 2"));
        assertTrue(saved.contains("\"rigLog\""));
        BudgetDocument again = DocumentStore.open(f);
        assertEquals(0, again.migratedFrom());
        assertEquals(d.budget(), again.budget());
        assertEquals(d.contentHash(), again.contentHash());
        assertTrue(Files.readString(DocumentStore.backupOf(f)).contains("\"formatVersion\": 1"));
    }

    @Test
    void everyWorkedExampleOfVersion1OpensAsADocument() throws Exception {
        Path examples = Path.of("..", "worked-examples");
        if (!Files.isDirectory(examples)) {
            examples = Path.of("worked-examples");
        }
        List<Path> files;
        try (Stream<Path> s = Files.list(examples)) {
            files = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
        List<Path> budgets = new java.util.ArrayList<>();
        for (Path p : files) {
            if (Files.readString(p).contains("\"format\": \"quire-budget\"")) {
                budgets.add(p);
            }
        }
        assertTrue(budgets.size() >= 6, "worked examples found in " + examples.toAbsolutePath());
        for (Path p : budgets) {
            BudgetDocument d = DocumentStore.open(p);
            Budget b = BudgetJson.read(p);
            assertEquals(b.model(), d.budget().model(), p.toString());
            BudgetDocument back = DocumentJson.read(DocumentJson.write(d), Instant.EPOCH);
            assertEquals(d.budget(), back.budget(), p.toString());
        }
    }

    @Test
    void aFileOfANewerVersionIsRefusedAndLeftUntouched(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("future.json");
        String text = Fixtures.text("tvfl-gravimetric-water-v1.json").replace("\"formatVersion\": 2",
                "\"formatVersion\": 3");
        Files.writeString(f, text);
        FileTime before = Files.getLastModifiedTime(f);
        BudgetFormatException e = assertThrows(BudgetFormatException.class, () -> DocumentStore.open(f));
        assertEquals("$.formatVersion", e.path());
        assertTrue(e.getMessage().contains("newer Quire"), e.getMessage());
        assertTrue(e.getMessage().contains("not changed"), e.getMessage());
        assertThrows(BudgetFormatException.class, () -> BudgetJson.read(f));
        assertArrayEquals(text.getBytes(StandardCharsets.UTF_8), Files.readAllBytes(f));
        assertEquals(before, Files.getLastModifiedTime(f));
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(1, s.count(), "no backup or temporary file was made");
        }
    }

    @Test
    void theBudgetReaderOfTheCommandLineReadsVersion2AndKeepsTheDocumentFields() throws Exception {
        String text = Fixtures.text("tvfl-gravimetric-water-v1.json");
        Budget b = BudgetJson.read(text);
        assertEquals(8, b.inputs().size());
        assertNotNull(b.extensions().get("document"));
        assertNotNull(b.extensions().get("template"));
        BudgetDocument viaBudgetWriter = DocumentJson.read(BudgetJson.write(b), Instant.EPOCH);
        assertEquals(Fixtures.doc("tvfl-gravimetric-water-v1.json").contentHash(), viaBudgetWriter.contentHash());
    }

    @Test
    void aVersion1FileUsingAVersion2FieldNameIsRefused() {
        String text = "{\"format\":\"quire-budget\",\"formatVersion\":1,\"model\":\"y = x\",\"outputs\":[\"y\"],"
                + "\"inputs\":[{\"name\":\"x\",\"evaluation\":{\"type\":\"B\",\"distribution\":\"normal\","
                + "\"estimate\":1,\"standardUncertainty\":0.1}}],\"history\":\"paper log book 3\"}";
        BudgetFormatException e = assertThrows(BudgetFormatException.class, () -> DocumentJson.read(text,
                Instant.EPOCH));
        assertEquals("$.history", e.path());
    }

    @Test
    void aVersion2FileWithoutDocumentSectionReadsAsRevision1Draft() throws Exception {
        String text = "{\"format\":\"quire-budget\",\"formatVersion\":2,\"model\":\"y = x\",\"outputs\":[\"y\"],"
                + "\"inputs\":[{\"name\":\"x\",\"evaluation\":{\"type\":\"B\",\"distribution\":\"normal\","
                + "\"estimate\":1,\"standardUncertainty\":0.1}}]}";
        BudgetDocument d = DocumentJson.read(text, Fixtures.T0);
        assertEquals(DocumentStatus.DRAFT, d.status());
        assertEquals(Fixtures.T0, d.created());
        assertNull(d.template());
        assertEquals(0, d.migratedFrom());
    }
}
