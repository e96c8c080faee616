package org.quire.engine.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.BudgetJson;

/** Reading of version 2 files is strict and bounded, and every error says where. */
class DocumentReadingStrictnessTest {

    private static String valid;

    private static synchronized String valid() throws Exception {
        if (valid == null) {
            valid = build();
        }
        return valid;
    }

    private static String build() throws Exception {
        BudgetDocument d = Fixtures.doc("tvfl-gravimetric-water-v1.json")
                .moveTo(DocumentStatus.IN_REVIEW, "Wren Halloway", Fixtures.T0.plusSeconds(60), "")
                .moveTo(DocumentStatus.APPROVED, "Ash Penrose", Fixtures.T0.plusSeconds(90), "");
        d = d.withBudget(d.budget().withNotes("rig TV-G2 after the 2026 overhaul"), "Wren Halloway",
                Fixtures.T0.plusSeconds(200));
        assertEquals(2, d.revision());
        return DocumentJson.write(d);
    }

    /** Replaces the first match of a regular expression (the document's own sections come before the history). */
    private static String first(String text, String regex, String replacement) {
        String r = text.replaceFirst(regex, replacement);
        assertTrue(!r.equals(text), "the test's edit " + regex + " found nothing to change");
        return r;
    }

    private static BudgetFormatException refused(String text) {
        return assertThrows(BudgetFormatException.class, () -> DocumentJson.read(text, Instant.EPOCH));
    }

    private static void refusedAt(String text, String path, String words) {
        BudgetFormatException e = refused(text);
        assertEquals(path, e.path(), e.getMessage());
        assertTrue(e.getMessage().contains(words), e.getMessage());
    }

    @Test
    void malformedJsonIsRefusedWithLineAndColumn() throws Exception {
        String t = valid().replaceFirst("\"laboratory\": ", "\"laboratory\" ");
        BudgetFormatException e = refused(t);
        assertTrue(e.path().matches("line \\d+, column \\d+"), e.path());
        assertTrue(e.getMessage().contains("malformed JSON"), e.getMessage());
    }

    @Test
    void aFileCutAtAnyOfManyPointsIsRefusedAndNeverReadAsADocument() throws Exception {
        String t = valid();
        int step = Math.max(1, t.length() / 97);
        int cuts = 0;
        for (int at = 0; at < t.length() - 2; at += step) {
            String cut = t.substring(0, at);
            BudgetFormatException e = refused(cut);
            assertTrue(!e.getMessage().isBlank());
            cuts++;
        }
        assertTrue(cuts > 90);
    }

    @Test
    void anOversizedFileIsRefusedBeforeParsing(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("big.json");
        try (var ch = java.nio.channels.FileChannel.open(f, java.nio.file.StandardOpenOption.CREATE_NEW,
                java.nio.file.StandardOpenOption.WRITE)) {
            ch.write(java.nio.ByteBuffer.wrap(new byte[] {' '}), BudgetJson.MAX_BYTES);
        }
        BudgetFormatException e = assertThrows(BudgetFormatException.class, () -> DocumentJson.read(f));
        assertTrue(e.getMessage().contains("larger than"), e.getMessage());
    }

    @Test
    void tooDeeplyNestedUnknownFieldsAreRefused() throws Exception {
        String deep = "[".repeat(40) + "]".repeat(40);
        String t = valid().replaceFirst("\"document\":", "\"attachments\": " + deep + ",\n\"document\":");
        // the path names the value that opens the 33rd level: the top object is level 1, attachments level 2
        refusedAt(t, "$.attachments" + "[0]".repeat(31), "nested more than 32 levels");
        String ok = valid().replaceFirst("\"document\":", "\"attachments\": " + "[".repeat(20) + "]".repeat(20)
                + ",\n\"document\":");
        DocumentJson.read(ok, Instant.EPOCH);
    }

    @Test
    void wrongTypesAreRefusedWithTheirPath() throws Exception {
        refusedAt(first(valid(), "\"revision\": 2,", "\"revision\": \"two\","), "$.document.revision",
                "expected a number");
        refusedAt(first(valid(), "\"laboratory\": \"Tarrow Vale Flow Laboratory\"", "\"laboratory\": 7"),
                "$.document.laboratory", "expected a string");
        refusedAt(first(valid(), "\"version\": 1,", "\"version\": \"1\","), "$.template.version",
                "expected a number");
        refusedAt(first(valid(), "\"history\": \\[", "\"history\": \"none\", \"x\": ["), "$.history",
                "expected an array");
    }

    @Test
    void missingRequiredFieldsAreRefusedWithTheirPath() throws Exception {
        refusedAt(first(valid(), "\"created\": \"2026-01-12T08:30:00Z\",", ""), "$.document",
                "'created' is missing");
        refusedAt(first(valid(), "\"by\": \"Wren Halloway\",", ""), "$.history[0]", "'by' is missing");
        refusedAt(first(valid(), "\"input\": \"T_tank\",", ""), "$.template.parameters[1]",
                "'input' is missing");
    }

    @Test
    void badValuesAreRefusedWithTheirPath() throws Exception {
        refusedAt(first(valid(), "\"status\": \"approved\",(\\s+)\"by\"", "\"status\": \"finished\",$1\"by\""),
                "$.history[1].status", "must be one of");
        refusedAt(first(valid(), "\"created\": \"2026-01-12T08:30:00Z\"", "\"created\": \"12 Jan 2026\""),
                "$.document.created", "UTC time");
        refusedAt(first(valid(), "\"created\": \"2026-01-12T08:30:00Z\"",
                "\"created\": \"2026-01-12T08:30:00+01:00\""), "$.document.created", "UTC time");
        refusedAt(first(valid(), "\"created\": \"2026-01-12T08:30:00Z\"", "\"created\": \"2027-01-12T08:30:00Z\""),
                "$.document.modified", "before the created time");
        refusedAt(first(valid(), "\"revision\": 2,", "\"revision\": 0,"), "$.document.revision", "from 1");
        refusedAt(first(valid(), "\"revision\": 2,", "\"revision\": 1,"), "$.history[2].revision",
                "beyond the document's revision 1");
        refusedAt(first(valid(), "\"maximum\": 40", "\"maximum\": 4"), "$.template.parameters[1]",
                "must not exceed maximum");
        refusedAt(first(valid(), "\"default\": 20,", "\"default\": 50,"), "$.template.parameters[1]",
                "outside its allowed range");
        refusedAt(first(valid(), "\"field\": \"estimate\",(\\s+)\"default\"", "\"field\": \"colour\",$1\"default\""),
                "$.template.parameters[1]", "colour");
        refusedAt(first(valid(), "\"rho_20\",(\\s+)\"beta_w\"", "\"rho_2O\",$1\"beta_w\""), "$.template",
                "rho_2O");
        refusedAt(first(valid(), "\"laboratory\": \"Tarrow", "\"labratory\": \"Tarrow"),
                "$.document.labratory", "unknown field");
        refusedAt(first(valid(), "\"status\": \"draft\"", "\"status\": \"signed\""), "$.document.status",
                "must be one of");
    }

    @Test
    void anAlteredApprovedContentOrHashIsRefused() throws Exception {
        String t = valid();
        int content = t.indexOf("\"content\"");
        int at = t.indexOf("\"estimate\": 998.2", content);
        String altered = t.substring(0, at) + "\"estimate\": 998.3" + t.substring(at + "\"estimate\": 998.2".length());
        refusedAt(altered, "$.history[1].content", "altered");
        String badHash = t.replaceFirst("\"contentHash\": \"[0-9a-f]{64}\"", "\"contentHash\": \"abc\"");
        refusedAt(badHash, "$.history[1].contentHash", "64 lowercase hex");
    }
}
