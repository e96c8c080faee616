package org.quire.engine.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.quire.engine.budget.Budget;

/** Reading and writing budget files (budget-engine/doc/budget-format.md): strict, bounded, round-tripping. */
class BudgetFileTest {

    static List<Path> budgets() throws IOException {
        Path dir = Files.isDirectory(Path.of("..", "worked-examples")) ? Path.of("..", "worked-examples") : Path.of("worked-examples");
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(p -> p.toString().endsWith(".json")).sorted().collect(Collectors.toList());
        }
    }

    static String minimal(String inputs) {
        return "{\"format\": \"quire-budget\", \"formatVersion\": 1, \"model\": \"y = a + b\", \"outputs\": [\"y\"],"
                + " \"inputs\": " + inputs + "}";
    }

    static final String AB = "[{\"name\": \"a\", \"evaluation\": {\"type\": \"B\", \"distribution\": \"normal\", "
            + "\"estimate\": 1, \"standardUncertainty\": 0.1}}, {\"name\": \"b\", \"evaluation\": {\"type\": \"A\", "
            + "\"readings\": [1, 2, 3]}}]";

    @Test
    void everyBudgetFileRoundTrips() throws Exception {
        for (Path p : budgets()) {
            String text = Files.readString(p);
            if (!text.contains("\"quire-budget\"")) {
                continue;
            }
            Budget b = BudgetJson.read(text);
            Budget again = BudgetJson.read(BudgetJson.write(b));
            assertEquals(b, again, p.toString());
            assertEquals(BudgetJson.write(b), BudgetJson.write(again), p.toString());
        }
    }

    @Test
    void malformedAndTruncatedJsonGiveLineAndColumn() {
        String good = minimal(AB);
        for (int cut : new int[] {1, 20, good.length() / 2, good.length() - 1}) {
            BudgetFormatException e = assertThrows(BudgetFormatException.class, () -> BudgetJson.read(good.substring(0, cut)));
            assertTrue(e.getMessage().contains("JSON"), e.getMessage());
        }
        BudgetFormatException e = assertThrows(BudgetFormatException.class,
                () -> BudgetJson.read("{\n  \"format\": \"quire-budget\",\n  \"formatVersion\": 1,,\n}"));
        assertTrue(e.path().startsWith("line 3"), e.path());
        assertTrue(assertThrows(BudgetFormatException.class, () -> BudgetJson.read("")).getMessage().contains("empty"));
        assertTrue(assertThrows(BudgetFormatException.class, () -> BudgetJson.read("[1, 2]")).getMessage().contains("one JSON object"));
    }

    @Test
    void wrongTypesMissingFieldsAndBadValuesGiveTheJsonPath() {
        assertEquals("$.inputs[1].evaluation.readings[1]", assertThrows(BudgetFormatException.class,
                () -> BudgetJson.read(minimal(AB.replace("[1, 2, 3]", "[1, \"two\", 3]")))).path());
        assertEquals("$.inputs[0].evaluation.standardUncertainty", assertThrows(BudgetFormatException.class,
                () -> BudgetJson.read(minimal(AB.replace("0.1", "-0.1")))).path());
        assertEquals("$.inputs[0].evaluation", assertThrows(BudgetFormatException.class,
                () -> BudgetJson.read(minimal(AB.replace("\"distribution\": \"normal\", ", "")))).path());
        assertEquals("$.inputs[0].evaluation.standardUncertaintty", assertThrows(BudgetFormatException.class,
                () -> BudgetJson.read(minimal(AB.replace("standardUncertainty", "standardUncertaintty")))).path());
        assertEquals("$", assertThrows(BudgetFormatException.class,
                () -> BudgetJson.read("{\"format\": \"quire-budget\", \"formatVersion\": 1, \"outputs\": [], \"inputs\": []}")).path());
        BudgetFormatException dup = assertThrows(BudgetFormatException.class,
                () -> BudgetJson.read(minimal(AB.replace("\"name\": \"b\"", "\"name\": \"a\""))));
        assertTrue(dup.getMessage().contains("listed twice"), dup.getMessage());
        BudgetFormatException name = assertThrows(BudgetFormatException.class,
                () -> BudgetJson.read(minimal(AB.replace("\"name\": \"b\"", "\"name\": \"2b\""))));
        assertEquals("$.inputs[1].name", name.path());
    }

    @Test
    void newerFormatVersionsAreRefusedAndUnknownTopLevelFieldsKept() throws Exception {
        BudgetFormatException e = assertThrows(BudgetFormatException.class,
                () -> BudgetJson.read(minimal(AB).replace("\"formatVersion\": 1", "\"formatVersion\": 99")));
        assertTrue(e.getMessage().contains("newer"), e.getMessage());
        Budget b = BudgetJson.read(minimal(AB).replace("{\"format\"", "{\"laboratoryCode\": \"TV-7\", \"format\""));
        assertTrue(BudgetJson.write(b).contains("\"laboratoryCode\": \"TV-7\""));
    }

    @Test
    void deepNestingAndOversizedTextAreRefused() {
        String deep = "{\"format\": \"quire-budget\", \"x\": " + "[".repeat(100) + "]".repeat(100) + "}";
        assertTrue(assertThrows(BudgetFormatException.class, () -> BudgetJson.read(deep)).getMessage().contains("nested"));
    }
}
