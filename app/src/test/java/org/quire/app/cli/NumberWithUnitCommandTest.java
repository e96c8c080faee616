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

/**
 * A conversion factor written with its unit is dimension-checked by the commands: the wrong one is a user error
 * (exit 2) naming the file, the model line and column; the right one evaluates. 1 g = 1000 mg exactly (BIPM SI
 * Brochure, 9th edition (2019), Table 7 prefixes). The budget is invented (Tarrow Vale Flow Laboratory).
 */
class NumberWithUnitCommandTest {
    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();

    private int run(String... args) {
        out.reset();
        err.reset();
        return CommandLine.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
    }

    private static Path budget(Path dir, String model) throws Exception {
        return Files.writeString(dir.resolve("mass.json"), "{\"format\": \"quire-budget\", \"formatVersion\": 1,"
                + " \"title\": \"Mass from a balance reading in mg (invented)\","
                + " \"notes\": \"Tarrow Vale Flow Laboratory, invented.\", \"model\": [\"" + model + "\"],"
                + " \"outputs\": [{\"name\": \"m\", \"unit\": \"g\"}], \"inputs\": [{\"name\": \"dm\", \"unit\": \"mg\","
                + " \"source\": \"invented\", \"evaluation\": {\"type\": \"B\", \"distribution\": \"normal\","
                + " \"estimate\": 250, \"standardUncertainty\": 0.5}}]}");
    }

    @Test
    void aWrongConversionFactorIsExitTwoWithLineAndColumn(@TempDir Path dir) throws Exception {
        Path f = budget(dir, "m = 1000 [g/kg] * dm");
        assertEquals(2, run("evaluate", f.toString()));
        String e = err.toString(StandardCharsets.UTF_8);
        assertTrue(e.contains("mass.json: model line 1, column 1: output m is stated in g but its equation computes "
                + "it in"), e);
        assertEquals(2, run("montecarlo", f.toString(), "--trials", "1000"));

        Path ok = budget(Files.createDirectory(dir.resolve("ok")), "m = dm / 1000 [mg/g]");
        assertEquals(0, run("evaluate", ok.toString()), err.toString(StandardCharsets.UTF_8));
        // 250 mg / (1000 mg/g) = 0.25 g
        assertTrue(out.toString(StandardCharsets.UTF_8).lines().anyMatch(l -> l.strip().equals("estimate                           y = 0.25 g")),
                out.toString(StandardCharsets.UTF_8));

        Path typo = budget(Files.createDirectory(dir.resolve("typo")), "m = dm / 1000 [mg/gx]");
        assertEquals(2, run("evaluate", typo.toString()));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("model line 1, column 15: unit [mg/gx] of the "
                + "number 1000"), err.toString(StandardCharsets.UTF_8));
    }

    @Test
    void theModelHelpShowsTheSyntax() {
        assertEquals(0, run("help", "model"));
        String text = out.toString(StandardCharsets.UTF_8);
        assertTrue(text.contains("With a unit  1000 [mg/g]") && text.contains("m = dm / 1000 [mg/g]  is accepted")
                && text.contains("A bare number is a pure number"), text);
    }
}
