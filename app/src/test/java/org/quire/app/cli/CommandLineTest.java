package org.quire.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The command line as a user meets it: figures on success, clear messages and exit status on bad input. */
class CommandLineTest {
    @TempDir
    Path tmp;

    record Run(int status, String out, String err) { }

    static Path root() {
        Path p = Path.of(System.getProperty("quire.projectRoot", ".."));
        return Files.isDirectory(p.resolve("worked-examples")) ? p : Path.of(".");
    }

    static Path example(String name) {
        return root().resolve("worked-examples").resolve(name);
    }

    static Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int status = CommandLine.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    @Test
    void evaluatePrintsTheBudgetTableOfJcgm100H1() {
        Run r = run("evaluate", example("jcgm100-h1-end-gauge.json").toString());
        assertEquals(0, r.status(), r.err());
        // JCGM 100:2008 H.1: l = 50.000838 mm, k = t_99(16) = 2.92
        assertTrue(r.out().contains("50.000838"), r.out());
        assertTrue(r.out().contains("k = 2.92 (p = 99 %)"), r.out());
        assertTrue(r.out().contains("16.7 (16 used)"), r.out());
        assertTrue(r.out().contains("do not replace"), "the cautions are printed");
    }

    @Test
    void evaluateJsonAndCsvCarryTheSameFigures() {
        Run j = run("evaluate", example("jcgm100-h2-resistance-reactance.json").toString(), "--format", "json");
        assertEquals(0, j.status(), j.err());
        jakarta.json.JsonObject json = jakarta.json.Json.createReader(new java.io.StringReader(j.out())).readObject();
        jakarta.json.JsonArray outputs = json.getJsonArray("outputs");
        // JCGM 100:2008 H.2 (Table H.4): R = 127.732 ohm, X = 219.847 ohm, Z = 254.260 ohm, each to half a unit
        // of the last printed digit
        double[] published = {127.732, 219.847, 254.260};
        assertEquals(3, outputs.size());
        for (int i = 0; i < 3; i++) {
            assertEquals(published[i], outputs.getJsonObject(i).getJsonNumber("estimate").doubleValue(), 0.0005);
        }
        Run c = run("evaluate", example("jcgm100-h2-resistance-reactance.json").toString(), "--format=csv");
        assertEquals(0, c.status(), c.err());
        String[] tables = c.out().strip().split("\n\\s*\n");
        assertEquals(2, tables.length, "the budget rows and the results: " + c.out());
        String[] lines = tables[0].split("\n");
        assertEquals("output,input,type,distribution,estimate,standard_uncertainty,sensitivity,contribution,dof,share",
                lines[0]);
        int rows = 0;
        for (int i = 0; i < outputs.size(); i++) {
            rows += outputs.getJsonObject(i).getJsonArray("contributions").size();
        }
        assertEquals(rows, lines.length - 1, "one CSV row per input of each output, as in the JSON");
        String[] numeric = {"estimate", "standardUncertainty", "sensitivity", "contribution", "dof", "share"};
        for (int k = 1; k < lines.length; k++) {
            String[] f = lines[k].split(",", -1);
            assertEquals(10, f.length, lines[k]);
            jakarta.json.JsonObject row = null;
            for (int i = 0; i < outputs.size(); i++) {
                if (outputs.getJsonObject(i).getString("name").equals(f[0])) {
                    for (jakarta.json.JsonValue v : outputs.getJsonObject(i).getJsonArray("contributions")) {
                        if (v.asJsonObject().getString("input").equals(f[1])) {
                            row = v.asJsonObject();
                        }
                    }
                }
            }
            assertTrue(row != null, "the JSON has no contribution of " + f[1] + " to " + f[0]);
            assertEquals(row.getString("type"), f[2], lines[k]);
            assertEquals(row.getString("distribution"), f[3], lines[k]);
            for (int n = 0; n < numeric.length; n++) {
                double fromJson = row.getJsonNumber(numeric[n]).doubleValue();
                double fromCsv = Double.parseDouble(f[4 + n]);
                // the CSV keeps 10 significant digits
                assertEquals(fromJson, fromCsv, 1e-9 * Math.abs(fromJson) + 1e-300, f[0] + "/" + f[1] + " " + numeric[n]);
            }
        }
        String[] results = tables[1].split("\n");
        assertEquals("output,unit,estimate,standard_uncertainty,effective_dof,coverage_factor,coverage_probability,"
                + "expanded_uncertainty,relative_expanded_uncertainty", results[0]);
        assertEquals(outputs.size() + 1, results.length);
        String[] fields = {"estimate", "standardUncertainty", "effectiveDof", "coverageFactor", "coverageProbability",
            "expandedUncertainty", "relativeExpandedUncertainty"};
        for (int i = 0; i < outputs.size(); i++) {
            jakarta.json.JsonObject o = outputs.getJsonObject(i);
            String[] f = results[i + 1].split(",", -1);
            assertEquals(o.getString("name"), f[0]);
            assertEquals(o.getString("unit"), f[1]);
            for (int n = 0; n < fields.length; n++) {
                double fromJson = o.getJsonNumber(fields[n]).doubleValue();
                assertEquals(fromJson, Double.parseDouble(f[2 + n]), 1e-9 * Math.abs(fromJson) + 1e-300,
                        f[0] + " " + fields[n]);
            }
        }
    }

    @Test
    void coverageAndFixedKOverrideTheFile() {
        Run r = run("evaluate", example("jcgm101-9.2.2-additive-normal.json").toString(), "--k", "2");
        assertEquals(0, r.status(), r.err());
        // JCGM 101:2008 9.2.2: u(y) = 2, so U = 2 x 2, stated to the budget's two significant digits
        assertTrue(r.out().lines().anyMatch(l -> l.strip().equals("expanded uncertainty               U = 4.0")), r.out());
        assertEquals(2, run("evaluate", example("jcgm101-9.2.2-additive-normal.json").toString(), "--coverage", "150").status());
        assertEquals(2, run("evaluate", example("jcgm101-9.2.2-additive-normal.json").toString(), "--k", "2", "--coverage", "0.95").status());
    }

    @Test
    void validateRunsEveryWorkedExampleAndEndsWithTheCount() {
        Run r = run("validate", "--dir", root().resolve("worked-examples").toString());
        assertEquals(0, r.status(), r.out());
        String[] lines = r.out().trim().split("\n");
        assertTrue(lines[lines.length - 1].matches("\\d+ passed, 0 failed"), lines[lines.length - 1]);
    }

    @Test
    void validateFailsWhenAPublishedFigureIsNotMatched() throws IOException {
        String text = Files.readString(example("jcgm101-9.2.2-additive-normal.json"))
                .replace("\"expected\": 3.92,", "\"expected\": 3.99,");
        Files.writeString(tmp.resolve("altered.json"), text);
        Run r = run("validate", "--dir", tmp.toString());
        assertEquals(1, r.status());
        assertTrue(r.out().contains("FAIL"));
        assertTrue(r.out().trim().endsWith("failed") && !r.out().trim().endsWith(" 0 failed"), r.out());
    }

    @Test
    void badInputGetsAClearMessageAndNoStackTrace() throws IOException {
        Run missing = run("evaluate", tmp.resolve("nothing.json").toString());
        assertEquals(2, missing.status());
        assertTrue(missing.err().contains("no such file"), missing.err());

        String good = Files.readString(example("jcgm101-9.3-mass-calibration.json"));
        Files.writeString(tmp.resolve("cut.json"), good.substring(0, good.length() / 2));
        Run cut = run("evaluate", tmp.resolve("cut.json").toString());
        assertEquals(2, cut.status());
        assertTrue(cut.err().contains("JSON"), cut.err());

        Files.writeString(tmp.resolve("neg.json"), good.replace("\"standardUncertainty\": 0.05", "\"standardUncertainty\": -0.05"));
        Run neg = run("evaluate", tmp.resolve("neg.json").toString());
        assertEquals(2, neg.status());
        assertTrue(neg.err().contains("$.inputs[0].evaluation.standardUncertainty"), neg.err());
        assertTrue(neg.err().contains("positive"), neg.err());

        Files.writeString(tmp.resolve("model.json"), good.replace("rho_a - rho_a0", "rho_air - rho_a0"));
        Run model = run("evaluate", tmp.resolve("model.json").toString());
        assertEquals(2, model.status());
        assertTrue(model.err().contains("model line 1, column"), model.err());
        assertTrue(model.err().contains("did you mean 'rho_a"), model.err());

        Run opt = run("evaluate", "x.json", "--colour");
        assertEquals(2, opt.status());
        assertTrue(opt.err().contains("Unknown option: '--colour'"), opt.err());
        for (Run r : new Run[] {missing, cut, neg, model, opt}) {
            assertFalse(r.err().contains("Exception"), r.err());
        }
    }

    @Test
    void divisionByZeroAtTheEstimatesNamesTheDenominator() throws IOException {
        String good = Files.readString(example("jcgm101-9.2.2-additive-normal.json"));
        Files.writeString(tmp.resolve("div.json"), good.replace("\"Y = X1 + X2 + X3 + X4\"", "\"Y = X1 / (X2 + X3) + X4\""));
        Run r = run("evaluate", tmp.resolve("div.json").toString());
        assertEquals(2, r.status());
        assertTrue(r.err().contains("division by zero"), r.err());
        assertTrue(r.err().contains("X2 + X3"), r.err());
    }

    @Test
    void monteCarloSettingsAreChecked() {
        String f = example("jcgm101-9.2.2-additive-normal.json").toString();
        Run zero = run("montecarlo", f, "--trials", "0");
        assertEquals(2, zero.status());
        assertTrue(zero.err().contains("--trials"), zero.err());
        Run seed = run("montecarlo", f, "--seed", "abc");
        assertEquals(2, seed.status());
        assertTrue(seed.err().contains("--seed needs a whole number"), seed.err());
        Run p = run("montecarlo", f, "--coverage", "0");
        assertEquals(2, p.status());
        assertTrue(p.err().contains("coverage probability"), p.err());
    }

    @Test
    void monteCarloIsReproducibleFromItsSeedWhateverTheThreads() {
        String f = example("jcgm101-9.3-mass-calibration.json").toString();
        Run one = run("montecarlo", f, "--trials", "200000", "--seed", "7", "--threads", "1", "--format", "json");
        Run two = run("montecarlo", f, "--trials", "200000", "--seed", "7", "--threads", "2", "--format", "json");
        assertEquals(0, one.status(), one.err());
        assertEquals(one.out().replaceAll("\"engineVersion\".*\n", ""), two.out().replaceAll("\"engineVersion\".*\n", ""));
        Run other = run("montecarlo", f, "--trials", "200000", "--seed", "8", "--threads", "2", "--format", "json");
        assertFalse(one.out().equals(other.out()));
    }

    @Test
    void benchPrintsItsLastLineInTheAgreedForm() {
        Run r = run("bench", "--trials", "100000", "--runs", "1", "--threads", "2");
        assertEquals(0, r.status(), r.err());
        String[] lines = r.out().trim().split("\n");
        assertTrue(lines[lines.length - 1].matches("trials_per_second=\\d+ seconds=[0-9.]+ trials=100000 threads=2"),
                lines[lines.length - 1]);
    }
}
