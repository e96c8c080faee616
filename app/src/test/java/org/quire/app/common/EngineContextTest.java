package org.quire.app.common;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jakarta.json.Json;
import jakarta.json.JsonObject;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.app.cli.CommandLine;
import org.quire.engine.model.FunctionLibrary;
import org.quire.engine.model.ModelFunction;

/**
 * One engine configuration per run, no global one: a function set given to the command line reaches the GUM
 * evaluation, the Monte Carlo method and the report. The expected figures are hand calculations: for Y = 3 X
 * with X normal, x = 2, u(x) = 0.5, y = 6 and u(y) = 3 u(x) = 1.5 (JCGM 100:2008 5.1.2, a linear model;
 * JCGM 101:2008 5.9 for the Monte Carlo estimate, whose tolerance here is about 4 standard errors at 10^5
 * trials).
 */
class EngineContextTest {
    /** A function only this test knows: three times its argument (invented for the test). */
    private static final ModelFunction TRIPLE = new ModelFunction() {
        @Override
        public String name() {
            return "tv_triple";
        }

        @Override
        public List<String> parameters() {
            return List.of("x");
        }

        @Override
        public String description() {
            return "three times x (a test function of the Tarrow Vale Flow Laboratory)";
        }

        @Override
        public String domainProblem(double[] args) {
            return null;
        }

        @Override
        public double value(double[] args) {
            return 3 * args[0];
        }

        @Override
        public DerivativeStructure value(DerivativeStructure[] args) {
            return args[0].multiply(3);
        }
    };

    private static final String BUDGET = "{\"format\": \"quire-budget\", \"formatVersion\": 1,"
            + " \"title\": \"Tripled reading (invented)\", \"notes\": \"Tarrow Vale Flow Laboratory test budget.\","
            + " \"model\": [\"Y = tv_triple(X)\"], \"outputs\": [{\"name\": \"Y\"}],"
            + " \"inputs\": [{\"name\": \"X\", \"source\": \"invented\", \"evaluation\": {\"type\": \"B\","
            + " \"distribution\": \"normal\", \"estimate\": 2, \"standardUncertainty\": 0.5}}]}";

    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();

    private int run(Engine engine, String... args) {
        out.reset();
        err.reset();
        return CommandLine.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), (f, r) -> {
                }, engine);
    }

    private String out() {
        return out.toString(StandardCharsets.UTF_8);
    }

    private static JsonObject json(String text) {
        return Json.createReader(new StringReader(text)).readObject();
    }

    @Test
    void aCustomFunctionSetReachesEvaluationMonteCarloAndReport(@TempDir Path dir) throws Exception {
        Path f = Files.writeString(dir.resolve("tripled.json"), BUDGET);
        Engine custom = Engine.of(Engine.standard().library().with(List.of(TRIPLE)));

        assertEquals(0, run(custom, "evaluate", f.toString(), "--format", "json"), err.toString(StandardCharsets.UTF_8));
        JsonObject y = json(out()).getJsonArray("outputs").getJsonObject(0);
        assertEquals(6.0, y.getJsonNumber("estimate").doubleValue(), 1e-12);
        assertEquals(1.5, y.getJsonNumber("standardUncertainty").doubleValue(), 1e-12);

        assertEquals(0, run(custom, "montecarlo", f.toString(), "--trials", "100000", "--seed", "11", "--format",
                "json"), err.toString(StandardCharsets.UTF_8));
        String mc = out();
        JsonObject my = json(mc).getJsonArray("outputs").getJsonObject(0);
        assertEquals("Y", my.getString("name"));
        assertEquals(6.0, my.getJsonNumber("mean").doubleValue(), 4 * 1.5 / Math.sqrt(1e5));
        assertEquals(1.5, my.getJsonNumber("standardUncertainty").doubleValue(), 0.02);

        Path html = dir.resolve("tripled.html");
        assertEquals(0, run(custom, "report", f.toString(), "-o", html.toString()), err.toString(StandardCharsets.UTF_8));
        String report = Files.readString(html);
        assertTrue(report.contains("tv_triple"), "the report shows the model with the custom function");

        // the function set shipped does not know the function: each command refuses the budget with exit 2
        Engine shipped = Engine.standard();
        assertEquals(2, run(shipped, "evaluate", f.toString()));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("tv_triple"), err.toString(StandardCharsets.UTF_8));
        assertEquals(2, run(shipped, "montecarlo", f.toString(), "--trials", "1000"));
        assertEquals(2, run(shipped, "report", f.toString(), "-o", dir.resolve("x.html").toString()));

        // and quire help functions lists the functions of the configuration it runs with
        assertEquals(0, run(custom, "help", "functions"));
        assertTrue(out().contains("tv_triple(x)"), out());
        assertEquals(0, run(shipped, "help", "functions"));
        assertTrue(!out().contains("tv_triple"), out());
    }
}
