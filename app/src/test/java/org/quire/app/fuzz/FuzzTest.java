package org.quire.app.fuzz;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The fuzz harness (issue 11): no mutated budget file, random model or mutated CSV table may end in exit status 3
 * (an internal error), an uncaught throwable or a hang. In CI it runs a small count; for a long run give
 * {@code -Dquire.fuzz.runs=100000} (mutated budget files, one command each, and as many random models) and
 * optionally {@code -Dquire.fuzz.seed=S}, {@code -Dquire.fuzz.timeout=MILLIS} (see DEVELOPERS.md).
 */
class FuzzTest {
    private static final Path ROOT = Path.of(System.getProperty("quire.projectRoot", ".."));

    @Test
    void noInputEndsInAnInternalErrorOrAHang(@TempDir Path work) throws Exception {
        int runs = Integer.getInteger("quire.fuzz.runs", 24);
        long seed = Long.getLong("quire.fuzz.seed", 20261202L);
        long timeout = Long.getLong("quire.fuzz.timeout", 20_000L);
        boolean big = runs > 1000;
        Fuzzer f = new Fuzzer(ROOT, work, timeout);
        SplittableRandom rnd = new SplittableRandom(seed);
        Path template = ROOT.resolve("templates").resolve("gravimetric-emf-flow-point.json");
        try {
            for (int i = 0; i < runs; i++) {
                f.budgetCase(rnd, i, !big);
                f.modelCase(rnd, i);
                if (i % (big ? 20 : 3) == 0) {
                    f.csvCase(rnd, i, template);
                }
                if (big && i % 1000 == 0) {
                    System.err.println("fuzz " + i + ": " + f.summary());
                }
            }
        } finally {
            f.shutdown();
        }
        System.err.println("fuzz: " + f.summary());
        f.findings.forEach((k, v) -> System.err.println("FINDING " + k + "\n" + v + "\n"));
        assertEquals(0, f.exits.get(3), () -> f.summary() + "\n" + String.join("\n\n", f.findings.values()));
        assertEquals(0, f.hangs.get(), () -> f.summary() + "\n" + String.join("\n\n", f.findings.keySet()));
        assertTrue(f.files.get() >= runs && f.models.get() >= runs, f.summary());
    }

    @Test
    void everyShippedTemplateAndWorkedExampleStaysBelowExit3(@TempDir Path work) throws Exception {
        Fuzzer f = new Fuzzer(ROOT, work, 60_000L);
        try {
            for (Path p : f.seeds()) {
                String file = p.toString();
                for (String[] args : new String[][] {{"evaluate", file}, {"montecarlo", file, "--trials", "1000",
                    "--seed", "3", "--quiet"}, {"review", file}, {"range", file}, {"template", "check", file},
                    {"report", file, "-o", work.resolve(p.getFileName() + ".html").toString()}}) {
                    int status = f.run(p.getFileName().toString(), "", args);
                    assertTrue(status >= 0 && status < 3, () -> String.join(" ", args) + " ended with " + status
                            + "\n" + String.join("\n", f.findings.values()));
                }
            }
        } finally {
            f.shutdown();
        }
    }

    @Test
    void aCoverageFactorThatWouldMakeUOverflowIsAUserError(@TempDir Path work) throws Exception {
        // fuzz finding (seed 11, case 40547): the six-point example with coverageFactor 1.8e308 gave U = infinity,
        // and its report ended in an internal error while drawing the chart's ticks
        Path file = Path.of("src", "test", "resources", "org", "quire", "app", "fuzz",
                "six-point-coverage-factor-1.8e308.json");
        {
            for (String[] args : new String[][] {{"evaluate", file.toString()},
                {"report", file.toString(), "-o", work.resolve("r.html").toString()}}) {
                java.io.ByteArrayOutputStream err = new java.io.ByteArrayOutputStream();
                int status = org.quire.app.cli.CommandLine.run(args, new java.io.PrintStream(
                        java.io.OutputStream.nullOutputStream()), new java.io.PrintStream(err, true,
                        java.nio.charset.StandardCharsets.UTF_8));
                String msg = err.toString(java.nio.charset.StandardCharsets.UTF_8);
                assertEquals(2, status, String.join(" ", args) + ": " + msg);
                assertTrue(msg.contains("coverageFactor") && msg.contains("at most 1000"), msg);
            }
        }
    }
}
