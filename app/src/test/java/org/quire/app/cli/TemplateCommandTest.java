package org.quire.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStore;

/** {@code quire template}: list the library, make a budget from a template, publish, check for a newer version. */
class TemplateCommandTest {
    static final Path RESOURCES = Path.of(System.getProperty("quire.projectRoot", ".."), "budget-engine", "src",
            "test", "resources", "org", "quire", "engine", "document");

    record Run(int status, String out, String err) { }

    static Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int s = CommandLine.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(s, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    @Test
    void aBudgetMadeFromATemplateRecordsItAndLearnsOfANewerVersion(@TempDir Path dir) throws Exception {
        Path personal = Files.createDirectory(dir.resolve("personal"));
        Path team = Files.createDirectory(dir.resolve("team"));
        Files.copy(RESOURCES.resolve("tvfl-gravimetric-water-v1.json"), personal.resolve("v1.json"));
        Run list = run("template", "list", "--personal", personal.toString());
        assertEquals(0, list.status(), list.err());
        assertTrue(list.out().contains("tvfl-gravimetric-water") && list.out().contains("parameter T_tank"), list.out());

        Path b = dir.resolve("b.json");
        Run made = run("template", "new", "tvfl-gravimetric-water", "-o", b.toString(), "--personal",
                personal.toString(), "--set", "m_net=1000.1", "--set", "T_tank=21", "--set", "V_meter=1002",
                "--author", "Wren Halloway");
        assertEquals(0, made.status(), made.err());
        BudgetDocument d = DocumentStore.open(b);
        assertEquals("tvfl-gravimetric-water", d.templateOrigin().id());
        assertEquals(1, d.templateOrigin().version());
        assertEquals(21, d.budget().input("T_tank").evaluation().estimate(), 0);

        Run outside = run("template", "new", "tvfl-gravimetric-water", "-o", dir.resolve("c.json").toString(),
                "--personal", personal.toString(), "--set", "T_tank=99", "--set", "m_net=1", "--set", "V_meter=1");
        assertEquals(2, outside.status());
        assertTrue(outside.err().contains("T_tank") && outside.err().contains("outside"), outside.err());

        assertEquals(0, run("template", "check", b.toString(), "--personal", personal.toString()).status());
        Files.copy(RESOURCES.resolve("tvfl-gravimetric-water-v2.json"), personal.resolve("v2.json"));
        Run check = run("template", "check", b.toString(), "--personal", personal.toString());
        assertEquals(1, check.status());
        assertTrue(check.out().contains("INPUT_ADDED delta_evap"), check.out());

        Run incomplete = run("template", "publish", b.toString(), "--team", team.toString(), "--author", "Ash Penrose");
        assertEquals(2, incomplete.status());
        assertTrue(incomplete.err().contains("no template section"), incomplete.err());
        Run published = run("template", "publish", personal.resolve("v2.json").toString(), "--team", team.toString(),
                "--author", "Ash Penrose");
        assertEquals(0, published.status(), published.err());
        assertTrue(Files.exists(team.resolve("tvfl-gravimetric-water-v2.json")));
        Run again = run("template", "publish", personal.resolve("v2.json").toString(), "--team", team.toString(),
                "--author", "Ash Penrose");
        assertEquals(2, again.status());
        assertTrue(again.err().contains("raise the version"), again.err());
    }
}
