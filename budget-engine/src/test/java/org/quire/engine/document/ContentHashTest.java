package org.quire.engine.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jakarta.json.Json;
import jakarta.json.JsonArray;
import jakarta.json.JsonNumber;
import jakarta.json.JsonObject;
import jakarta.json.JsonString;
import jakarta.json.JsonValue;
import java.io.StringReader;
import java.math.BigDecimal;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.TypeB;

/** BudgetDocument.contentHash: what the hash covers and what it ignores. */
class ContentHashTest {

    /** Writes JSON by hand with members in reverse order, odd spacing, and numbers in exponent form. */
    private static void scramble(JsonValue v, StringBuilder s, int depth) {
        String pad = "\n" + "   ".repeat(depth);
        switch (v.getValueType()) {
            case OBJECT: {
                List<Map.Entry<String, JsonValue>> es = new ArrayList<>(v.asJsonObject().entrySet());
                Collections.reverse(es);
                s.append("{");
                for (int i = 0; i < es.size(); i++) {
                    s.append(i == 0 ? "" : " ,").append(pad).append(Json.createValue(es.get(i).getKey()))
                            .append("\t:  ");
                    scramble(es.get(i).getValue(), s, depth + 1);
                }
                s.append(pad).append("}");
                break;
            }
            case ARRAY: {
                JsonArray a = v.asJsonArray();
                s.append("[ ");
                for (int i = 0; i < a.size(); i++) {
                    s.append(i == 0 ? "" : ",\n ");
                    scramble(a.get(i), s, depth + 1);
                }
                s.append(" ]");
                break;
            }
            case NUMBER: {
                BigDecimal b = ((JsonNumber) v).bigDecimalValue();
                // the same value written as digits times a power of ten, e.g. 20.4 -> 2040E-2
                s.append(b.unscaledValue().multiply(java.math.BigInteger.TEN)).append("E").append(-b.scale() - 1);
                break;
            }
            case STRING:
                s.append(Json.createValue(((JsonString) v).getString()));
                break;
            default:
                s.append(v);
        }
    }

    @Test
    void reorderingKeysAndReformattingTheFileKeepTheHash() throws Exception {
        String original = Fixtures.text("tvfl-gravimetric-water-v1.json");
        BudgetDocument a = DocumentJson.read(original, Fixtures.T0);
        JsonObject parsed = Json.createReader(new StringReader(original)).readObject();
        StringBuilder s = new StringBuilder();
        scramble(parsed, s, 0);
        String scrambled = s.toString();
        assertNotEquals(original, scrambled);
        assertTrue(scrambled.contains("E-"), "numbers are rewritten");
        BudgetDocument b = DocumentJson.read(scrambled, Fixtures.T0);
        assertEquals(a.contentHash(), b.contentHash());
        assertEquals(a.canonicalText(), b.canonicalText());
        assertEquals(64, a.contentHash().length());
        assertTrue(a.contentHash().matches("[0-9a-f]{64}"));
    }

    @Test
    void changingAnEstimateChangesTheHash() throws Exception {
        BudgetDocument a = Fixtures.doc("tvfl-gravimetric-water-v1.json");
        Budget b = a.budget();
        TypeB t = (TypeB) b.input("rho_20").evaluation();
        BudgetDocument changed = a.withBudget(b.withInput("rho_20", b.input("rho_20")
                .withEvaluation(t.with("estimate", 998.21))), "Wren Halloway", Fixtures.T0);
        assertNotEquals(a.contentHash(), changed.contentHash());
        String edited = Fixtures.text("tvfl-gravimetric-water-v1.json").replace("\"estimate\": 998.2,",
                "\"estimate\": 998.21,");
        assertEquals(changed.contentHash(), DocumentJson.read(edited, Fixtures.T0).contentHash());
    }

    @Test
    void statusRevisionModificationTimeResultsAndHistoryAreOutsideTheHash() throws Exception {
        BudgetDocument a = Fixtures.doc("tvfl-gravimetric-water-v1.json");
        BudgetDocument reviewed = a.moveTo(DocumentStatus.IN_REVIEW, "Ash Penrose", Instant.parse(
                "2026-04-01T12:00:00Z"), "please check");
        BudgetDocument withResults = reviewed.withResults(ResultSnapshot.of(Json.createObjectBuilder()
                .add("format", "quire-result").build(), Instant.parse("2026-04-01T12:05:00Z")));
        assertEquals(a.contentHash(), withResults.contentHash());
        assertNotEquals(a, withResults);
    }

    @Test
    void laboratoryNotesAndUnknownFieldsAreInsideTheHash() throws Exception {
        BudgetDocument a = Fixtures.doc("tvfl-gravimetric-water-v1.json");
        assertNotEquals(a.contentHash(), a.withDetails("Tarrow Vale Flow Laboratory, hall B", "", a.author(),
                "Wren Halloway", Fixtures.T0).contentHash());
        assertNotEquals(a.contentHash(), a.withBudget(a.budget().withNotes("another purpose"), "Wren Halloway",
                Fixtures.T0).contentHash());
        String other = Fixtures.text("tvfl-gravimetric-water-v1.json").replace("TVFL-QM-7.2", "TVFL-QM-7.3");
        assertNotEquals(a.contentHash(), DocumentJson.read(other, Fixtures.T0).contentHash());
    }
}
