package org.quire.app.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.app.testing.Examples;

/** The report, review and diff commands: exit status, messages, and no half-written files (common practice). */
class ReportReviewDiffCommandsTest {
    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();

    private int run(String... args) {
        return CommandLine.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
    }

    private String err() {
        return err.toString(StandardCharsets.UTF_8);
    }

    private static String h1() {
        return Examples.file("jcgm100-h1-end-gauge.json").toString();
    }

    private static long files(Path dir) throws Exception {
        try (Stream<Path> s = Files.list(dir)) {
            return s.count();
        }
    }

    @Test
    void reportWritesPdfHtmlAndCsvTables(@TempDir Path dir) throws Exception {
        assertEquals(0, run("report", h1(), "-o", dir.resolve("h1.pdf").toString(), "--date", "2026-03-02"));
        byte[] pdf = Files.readAllBytes(dir.resolve("h1.pdf"));
        assertEquals("%PDF-", new String(pdf, 0, 5, StandardCharsets.US_ASCII));
        assertEquals(0, run("report", h1(), "-o", dir.resolve("h1.html").toString()));
        assertTrue(Files.readString(dir.resolve("h1.html")).startsWith("<!DOCTYPE html>"));
        Path csv = Files.createDirectory(dir.resolve("csv"));
        assertEquals(0, run("report", h1(), "--csv", csv.toString()));
        assertTrue(Files.exists(csv.resolve("budget-l.csv")));
        assertEquals(3, files(dir), "no temporary files are left behind");
    }

    @Test
    void aReportOfATemplateAsItIsSaysOnEveryPageThatItsFiguresAreExamples(@TempDir Path dir) throws Exception {
        String template = Path.of("..", "templates", "gravimetric-emf-flow-point.json").toString();
        assertEquals(0, run("report", template, "-o", dir.resolve("t.html").toString()));
        String html = Files.readString(dir.resolve("t.html"));
        String text = html.replace("&#39;", "'");
        assertTrue(text.contains("TEMPLATE EXAMPLE: not a measurement's figures; draft: not approved, not for issue"),
                "the band says both: a template's example, and a draft");
        assertTrue(text.contains("<th>Figures</th><td>This file is template tvfl-gravimetric-emf-point version 2: its "
                + "figures are those of the template's example values, not of a measurement"), "a header row says why");
        assertEquals(0, run("report", h1(), "-o", dir.resolve("h1.html").toString()));
        assertTrue(!Files.readString(dir.resolve("h1.html")).contains("TEMPLATE EXAMPLE"), "not for a plain budget");
    }

    @Test
    void reportAgainstAnEarlierBudgetHasTheChanges(@TempDir Path dir) throws Exception {
        // JCGM 101:2008 9.2.3 to 9.2.4: X4 widened from u = 1 to u = 10
        assertEquals(0, run("report", Examples.file("jcgm101-9.2.4-additive-dominant.json").toString(), "-o",
                dir.resolve("r.html").toString(), "--against",
                Examples.file("jcgm101-9.2.3-additive-rectangular.json").toString()));
        String html = Files.readString(dir.resolve("r.html"));
        assertTrue(html.contains("id=\"changes\"") && html.contains("id=\"change-effect\""), "comparison tables");
        assertTrue(html.contains("standard uncertainty"));
    }

    @Test
    void missingBudgetFileIsAClearErrorAndWritesNothing(@TempDir Path dir) throws Exception {
        assertEquals(2, run("report", dir.resolve("absent.json").toString(), "-o", dir.resolve("r.pdf").toString()));
        assertTrue(err().contains("no such file"), err());
        assertEquals(0, files(dir));
    }

    @Test
    void unwritableOutputFolderIsAClearError(@TempDir Path dir) throws Exception {
        Path target = dir.resolve("no-such-folder").resolve("r.pdf");
        assertEquals(2, run("report", h1(), "-o", target.toString()));
        assertTrue(err().contains("cannot save r.pdf") && err().contains("does not exist"), err());
        assertFalse(Files.exists(target));
    }

    @Test
    void budgetWithErrorsIsRefusedAndAnExistingReportIsLeftWhole(@TempDir Path dir) throws Exception {
        String text = Files.readString(Examples.file("jcgm100-h1-end-gauge.json"))
                .replace("\"d = d_mean + d_random + d_systematic\"", "\"d = d_mean + d_random + d_sistematic\"");
        Path bad = Files.writeString(dir.resolve("bad.json"), text);
        Path target = dir.resolve("r.pdf");
        byte[] before = "an earlier report".getBytes(StandardCharsets.UTF_8);
        Files.write(target, before);
        assertEquals(2, run("report", bad.toString(), "-o", target.toString()));
        assertTrue(err().contains("bad.json") && err().contains("d_sistematic"), err());
        assertArrayEquals(before, Files.readAllBytes(target));
        assertEquals(2, files(dir));
    }

    @Test
    void reportNeedsAKnownFormat(@TempDir Path dir) {
        assertEquals(2, run("report", h1(), "-o", dir.resolve("r.docx").toString()));
        assertTrue(err().contains(".pdf or .html"), err());
        assertEquals(2, run("report", h1()));
        assertEquals(2, run("report", h1(), "-o", dir.resolve("r.pdf").toString(), "--date", "2 March"));
    }

    @Test
    void reviewExitsOneWhenAnItemIsNotMet() {
        // JCGM 100:2008 H.1: l_s (25 nm of 32 nm) and delta_theta (16.6 nm) dominate; the example's notes do not
        // explain them
        assertEquals(1, run("review", h1()));
        String s = out.toString(StandardCharsets.UTF_8);
        assertTrue(s.contains("[not met]") && s.contains("l_s: 62.4 %"), s);
    }

    @Test
    void reviewExitsZeroWhenNothingFails() {
        // JCGM 100:2008 H.2: every input has a source and every correlation a justification
        assertEquals(0, run("review", Examples.file("jcgm100-h2-resistance-reactance.json").toString()));
    }

    @Test
    void diffExitCodes(@TempDir Path dir) {
        assertEquals(0, run("diff", h1(), h1()));
        assertTrue(out.toString(StandardCharsets.UTF_8).contains("same content"));
        assertEquals(1, run("diff", Examples.file("jcgm101-9.2.3-additive-rectangular.json").toString(),
                Examples.file("jcgm101-9.2.4-additive-dominant.json").toString()));
        assertEquals(2, run("diff", h1(), dir.resolve("absent.json").toString()));
        assertEquals(2, run("diff", h1()));
    }
}
