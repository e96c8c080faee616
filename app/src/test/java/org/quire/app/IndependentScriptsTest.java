package org.quire.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/**
 * Runs every independent recomputation kept in the repository, with python3 and NumPy, in the normal test run:
 * each {@code *.py} in {@code budget-engine/src/test/resources/independent-checks/},
 * {@code app/src/test/resources/templates-check/}, {@code app/src/test/scripts/} and {@code worked-examples/scripts/},
 * from the repository root.
 * A script passes when it exits 0 (a script that compares its figures with a committed file itself, such as the
 * worked-example and template checks, exits 1 on a difference) and, when a file {@code NAME.expected} lies beside
 * {@code NAME.py}, its output agrees with that committed file: the same words, and every number within one unit
 * in the last digit printed (the scripts print rounded figures; a different platform's last-bit rounding must not
 * fail them, a changed figure must). Missing python3 or NumPy fails the test; it is not skipped.
 */
class IndependentScriptsTest {
    private static final Pattern NUMBER = Pattern.compile("[-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?");
    private static final List<String> FOLDERS = List.of("budget-engine/src/test/resources/independent-checks",
            "app/src/test/resources/templates-check", "app/src/test/scripts", "worked-examples/scripts");

    private static Path root() {
        return Path.of(System.getProperty("quire.projectRoot", "..")).toAbsolutePath().normalize();
    }

    private static String[] run(Path dir, String... command) throws IOException, InterruptedException {
        Process p = new ProcessBuilder(command).directory(dir.toFile()).redirectErrorStream(false).start();
        byte[] out = p.getInputStream().readAllBytes();
        byte[] err = p.getErrorStream().readAllBytes();
        if (!p.waitFor(300, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            fail(String.join(" ", command) + " did not finish in 300 s");
        }
        return new String[] {String.valueOf(p.exitValue()), new String(out, StandardCharsets.UTF_8),
                new String(err, StandardCharsets.UTF_8)};
    }

    @Test
    void python3WithNumpyIsThere() throws Exception {
        String[] r;
        try {
            r = run(root(), "python3", "-c", "import numpy; print(numpy.__version__)");
        } catch (IOException e) {
            throw new AssertionError("python3 is needed to run the independent checks: " + e.getMessage(), e);
        }
        assertEquals("0", r[0], "python3 with NumPy is needed to run the independent checks: " + r[2]);
    }

    static List<Path> scripts() throws IOException {
        List<Path> all = new ArrayList<>();
        for (String f : FOLDERS) {
            Path d = root().resolve(f);
            if (Files.isDirectory(d)) {
                try (Stream<Path> s = Files.list(d)) {
                    s.filter(p -> p.toString().endsWith(".py")).sorted().forEach(all::add);
                }
            }
        }
        return all;
    }

    @TestFactory
    Stream<DynamicTest> everyIndependentScriptAgreesWithItsCommittedFigures() throws IOException {
        List<Path> scripts = scripts();
        assertTrue(scripts.size() >= 4, "the independent scripts were found: " + scripts);
        return scripts.stream().map(script -> DynamicTest.dynamicTest(root().relativize(script).toString(), () -> {
            String[] r = run(root(), "python3", script.toString());
            assertEquals("0", r[0], script + " failed:\n" + r[1] + r[2]);
            Path expected = script.resolveSibling(script.getFileName().toString().replaceFirst("\\.py$", ".expected"));
            if (Files.exists(expected)) {
                agree(Files.readString(expected, StandardCharsets.UTF_8), r[1], script.toString());
            }
        }));
    }

    /** Same words; numbers within one unit in the last digit the committed file prints. */
    static void agree(String expected, String actual, String what) {
        List<String> e = tokens(expected);
        List<String> a = tokens(actual);
        assertEquals(e.size(), a.size(), what + ": output has another shape than the committed file:\n" + actual);
        for (int i = 0; i < e.size(); i++) {
            String x = e.get(i);
            String y = a.get(i);
            if (NUMBER.matcher(x).matches() && NUMBER.matcher(y).matches()) {
                double tol = lastDigit(x);
                assertTrue(Math.abs(Double.parseDouble(x) - Double.parseDouble(y)) <= tol * 1.0000001,
                        what + ": " + y + " differs from the committed " + x + " by more than " + tol);
            } else {
                assertEquals(x, y, what + ": token " + i);
            }
        }
    }

    private static List<String> tokens(String s) {
        List<String> t = new ArrayList<>();
        Matcher m = Pattern.compile(NUMBER.pattern() + "|[^\\s\\d.+-]+|[.+-]").matcher(s);
        while (m.find()) {
            t.add(m.group());
        }
        return t;
    }

    /** @return one unit in the last digit of a printed number: 0.0145 gives 1e-4, 1.2e-05 gives 1e-6 */
    static double lastDigit(String number) {
        String mantissa = number.split("[eE]")[0];
        int exponent = number.matches(".*[eE].*") ? Integer.parseInt(number.split("[eE]")[1]) : 0;
        int dot = mantissa.indexOf('.');
        int decimals = dot < 0 ? 0 : mantissa.length() - dot - 1;
        return Math.pow(10, exponent - decimals);
    }

    @Test
    void theComparisonCatchesAChangedFigureButNotLastDigitRounding() {
        agree("a = 0.8850  u(a) = 0.5300\n", "a = 0.8851  u(a) = 0.5300\n", "rounding");
        AssertionError changed = org.junit.jupiter.api.Assertions.assertThrows(AssertionError.class,
                () -> agree("a = 0.8850  u(a) = 0.5300\n", "a = 0.8870  u(a) = 0.5300\n", "changed"));
        assertTrue(changed.getMessage().contains("0.8870"), changed.getMessage());
        org.junit.jupiter.api.Assertions.assertThrows(AssertionError.class,
                () -> agree("chi2 = 4.131\n", "chi2 = 4.131 extra\n", "shape"));
        assertEquals(1e-6, lastDigit("1.2e-05"), 1e-20);
    }
}
