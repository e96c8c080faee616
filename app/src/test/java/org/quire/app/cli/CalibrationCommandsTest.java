package org.quire.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code quire fit} and {@code quire range}: results on the ISO/TS 28037:2010 clause 6 data (from memory) and
 * on the Tarrow Vale demo, and clear errors (exit status 2, the row or field named) for bad data.
 */
class CalibrationCommandsTest {
    @TempDir
    Path dir;

    private record Run(int status, String out, String err) {
    }

    private static Run run(String... args) {
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        ByteArrayOutputStream e = new ByteArrayOutputStream();
        int s = CommandLine.run(args, new PrintStream(o, true, StandardCharsets.UTF_8),
                new PrintStream(e, true, StandardCharsets.UTF_8));
        return new Run(s, o.toString(StandardCharsets.UTF_8), e.toString(StandardCharsets.UTF_8));
    }

    private String csv(String name, String text) throws Exception {
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        return p.toString();
    }

    @Test
    void fitPrintsTheLineTheChiSquaredVerdictAndTheStandardizedResiduals() throws Exception {
        String f = csv("wls.csv", "x,y,u_y\n1,3.2,0.5\n2,4.3,0.5\n3,7.6,0.5\n4,8.6,1\n5,11.7,1\n6,12.8,1\n");
        Run r = run("fit", f, "--method", "WLS", "--predict", "10", "--u-predict", "0.5");
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("a = 0.885"), r.out()); // ISO/TS 28037:2010 clause 6, a = 0.885, from memory
        assertTrue(r.out().contains("chi2 = 4.13"), r.out()); // ISO/TS 28037:2010 clause 6, chi2 = 4.131, from memory
        // chi2 = 4.131 below the 95 % quantile of chi2(4), 9.488 (common statistical tables): the verdict is
        // "consistent"; the line must not say "inconsistent", which contains the word
        assertTrue(r.out().contains("quantile of chi2(4) = 9.48773: consistent\n"), r.out());
        assertFalse(r.out().contains("inconsistent"), r.out());
        assertTrue(r.out().contains("standardized"), r.out());
        assertTrue(r.out().contains("x = 4.431"), r.out()); // independent closed-form computation, 4.4312
    }

    @Test
    void badDataGetErrorsNamingTheRowOrField() throws Exception {
        Run r = run("fit", csv("two.csv", "x,y\n1,2\n2,3\n"));
        assertEquals(2, r.status());
        assertTrue(r.err().contains("at least 3 points, got 2"), r.err());
        r = run("fit", csv("equal.csv", "x,y\n1,2\n1,3\n1,4\n"));
        assertEquals(2, r.status());
        assertTrue(r.err().contains("all 3 points have x = 1.0"), r.err());
        r = run("fit", csv("text.csv", "x,y\n1,2\n2,abc\n3,4\n"));
        assertEquals(2, r.status());
        assertTrue(r.err().contains("text.csv, line 3, column 2 (y): \"abc\" is not a number"), r.err());
        r = run("fit", csv("neg.csv", "x,y,u_y\n1,2,0.1\n2,3,0.1\n3,4,-0.1\n"));
        assertEquals(2, r.status());
        assertTrue(r.err().contains("line 4"), r.err());
        r = run("fit", csv("zero.csv", "x,y,u_y\n1,2,0.1\n2,3,0\n3,4,0.1\n"), "--method", "WLS");
        assertEquals(2, r.status());
        assertTrue(r.err().contains("point 2"), r.err());
        r = run("fit", csv("ok.csv", "x,y\n1,2\n2,3\n3,4.1\n"), "--method", "XYZ");
        assertEquals(2, r.status());
        assertTrue(r.err().contains("OLS, WLS, GDR, GMR"), r.err());
    }

    @Test
    void rangePrintsTheTableTheCorrelationsAndTheDecisions() {
        Path demo = Path.of("..", "worked-examples", "tarrow-vale-emf-six-point.json");
        Run r = run("range", demo.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("correlation of the point results"), r.out());
        assertTrue(r.out().contains("does not conform"), r.out());
        r = run("range", demo.toString(), "--format", "csv");
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().startsWith("flow,estimate,standard_uncertainty"), r.out());
    }

    @Test
    void rangeWithoutFlowPointsSaysWhatIsMissing() {
        Run r = run("range", Path.of("..", "worked-examples", "jcgm100-h1-end-gauge.json").toString());
        assertEquals(2, r.status());
        assertTrue(r.err().contains("no flow points"), r.err());
    }
}
