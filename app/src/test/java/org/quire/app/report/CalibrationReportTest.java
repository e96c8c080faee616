package org.quire.app.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jakarta.json.JsonObject;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.quire.app.cli.CommandLine;
import org.quire.engine.io.BudgetJson;

/**
 * {@code quire report} of the worked DN 80 calibration, read back from the PDF, the HTML and the CSV tables as a
 * reader's tools see them. The expected figures are the worked example's own, computed independently by
 * {@code worked-examples/scripts/tarrow_vale_dn80_calibration.py} and stored in
 * {@code worked-examples/tarrow-vale-dn80-calibration.json}; they are rounded here, by this test's own BigDecimal
 * code, to two significant digits for U and the error to the same decimal place (JCGM 100:2008 7.2.6, EA-4/02 M:2022
 * 5.4), three for k. The certificate's results table must appear, row by row and figure by figure, in the report.
 */
class CalibrationReportTest {
    private static final Path ROOT = Path.of(System.getProperty("quire.projectRoot", ".."));
    private static final String CAL = ROOT.resolve("worked-examples/calibration/tarrow-vale-dn80-calibration.json")
            .toString();
    private static final String REG = ROOT.resolve("worked-examples/registers/tarrow-vale-reference-register.json")
            .toString();
    private static final List<String> POINTS = List.of("P1", "P2", "P3", "P4", "P5");

    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();

    private int run(String... args) {
        return CommandLine.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
    }

    /** @return the independent expected figures of the worked example (measured as-left series), by path */
    private static Map<String, Object> expected() throws Exception {
        JsonObject root = BudgetJson.parseObject(BudgetJson.readText(ROOT.resolve(
                "worked-examples/tarrow-vale-dn80-calibration.json")));
        Map<String, Object> m = new HashMap<>();
        for (var v : root.getJsonArray("checks")) {
            JsonObject c = v.asJsonObject();
            if (c.getJsonObject("arguments").containsKey("asLeft")) {
                continue; // the predicted as-left series; the calibration file measured its as-left runs
            }
            var e = c.get("expected");
            m.put(c.getString("path"), e.getValueType() == jakarta.json.JsonValue.ValueType.NUMBER
                    ? (Object) c.getJsonNumber("expected").doubleValue() : c.getString("expected"));
        }
        return m;
    }

    private static String pdfText(Path pdf) throws Exception {
        try (PDDocument d = Loader.loadPDF(Files.readAllBytes(pdf))) {
            return new PDFTextStripper().getText(d);
        }
    }

    private static String u2(double u) {
        return new BigDecimal(u).round(new MathContext(2, RoundingMode.HALF_UP)).toPlainString();
    }

    private static String sameDecimals(double v, String u) {
        String s = new BigDecimal(v).setScale(new BigDecimal(u).scale(), RoundingMode.HALF_UP).toPlainString();
        return s.startsWith("-") ? "−" + s.substring(1) : s;
    }

    private static String k3(double k) {
        return new BigDecimal(k).round(new MathContext(3, RoundingMode.HALF_EVEN)).toPlainString();
    }

    /** @return the lines of the results table (10 figures, first the point) of a text */
    private static List<String> resultRows(String text) {
        List<String> rows = new ArrayList<>();
        for (String line : text.split("\\R")) {
            // an asterisk marks a U reported at the CMC
            String[] t = line.strip().replace(" *", "").split("\\s+");
            if (t.length == 10 && POINTS.contains(t[0])) {
                rows.add(String.join(" ", t));
            }
        }
        return rows;
    }

    private Path report(Path dir, String name, String... more) {
        Path target = dir.resolve(name);
        List<String> args = new ArrayList<>(List.of("report", CAL, "-o", target.toString(), "--date", "2026-11-25"));
        args.addAll(List.of(more));
        assertEquals(0, run(args.toArray(new String[0])), err.toString(StandardCharsets.UTF_8));
        return target;
    }

    @Test
    void everyPointHasItsBudgetAndItsOwnStatedResult(@TempDir Path dir) throws Exception {
        Map<String, Object> x = expected();
        String t = pdfText(report(dir, "cal.pdf")).replaceAll("[ \\t]+", " ");
        for (String series : List.of("asFound", "asLeft")) {
            String phase = series.equals("asFound") ? "as found" : "as left (measured)";
            for (String p : POINTS) {
                double e = (Double) x.get(series + ".points." + p + ".error");
                String u = u2((Double) x.get(series + ".points." + p + ".reportedExpandedUncertainty"));
                String k = k3((Double) x.get(series + ".points." + p + ".coverageFactor"));
                String statement = p + ", " + phase + ": E = (" + sameDecimals(e, u) + " ± " + u + ") %, k = " + k
                        + ", p = 95.45 %";
                assertTrue(t.contains(statement), "missing '" + statement + "'");
                // the point's budget, labelled by its point, in its own part
                assertTrue(Pattern.compile("Uncertainty budget of E at " + p + " at [0-9.]+ m³/h, " + Pattern.quote(phase))
                        .matcher(t).find(), p + " " + phase + " budget");
            }
        }
    }

    @Test
    void theCertificatesFiguresAppearIdenticallyInTheReport(@TempDir Path dir) throws Exception {
        Path cert = dir.resolve("cert.pdf");
        assertEquals(0, run("certificate", CAL, "--register", REG, "--approver", "M. Fenwick (invented)", "--role",
                "technical manager", "--issued", "2026-11-25", "-o", cert.toString()), err.toString());
        String c = pdfText(cert);
        String r = pdfText(report(dir, "cal.pdf"));
        List<String> certRows = resultRows(c);
        assertEquals(5, certRows.size(), c);
        List<String> reportRows = resultRows(r);
        for (String row : certRows) {
            assertTrue(reportRows.contains(row), "the certificate's row '" + row + "' is in the report");
        }
        // and they are the worked example's figures: U and E as found, k as found and as left
        Map<String, Object> x = expected();
        for (String row : certRows) {
            String[] f = row.split(" ");
            String p = f[0];
            String uF = u2((Double) x.get("asFound.points." + p + ".reportedExpandedUncertainty"));
            assertEquals(sameDecimals((Double) x.get("asFound.points." + p + ".error"), uF), f[3], p);
            assertEquals(uF, f[4], p);
            assertEquals(k3((Double) x.get("asFound.points." + p + ".coverageFactor")), f[5], p);
            assertEquals(k3((Double) x.get("asLeft.points." + p + ".coverageFactor")), f[8], p);
        }
        // the constants, as the certificate states them
        String flat = r.replaceAll("\\s+", " ");
        assertTrue(flat.contains("calibration constant as found 1.2345"), "old constant");
        Matcher m = Pattern.compile("set in the meter\\) (\\d\\.\\d+)").matcher(flat);
        assertTrue(m.find(), "new constant");
        assertEquals((Double) x.get("adjustment.newConstant"), Double.parseDouble(m.group(1)), 5e-9);
        Matcher mc = Pattern.compile("set in the meter\\) (\\d\\.\\d+)").matcher(c.replaceAll("\\s+", " "));
        assertTrue(mc.find());
        assertEquals(mc.group(1), m.group(1), "the same new constant on the certificate and in the report");
    }

    @Test
    void correlationOfThePointErrorsAndDecisionsWithTheRule(@TempDir Path dir) throws Exception {
        Map<String, Object> x = expected();
        String t = pdfText(report(dir, "cal.pdf"));
        String flat = t.replaceAll("\\s+", " ");
        // JCGM 102:2011 6.2.1.3: r(E_1, E_5) of the as-found points, from the script's covariance
        String r15 = new BigDecimal((Double) x.get("asFound.correlation.0.4")).round(new MathContext(3))
                .stripTrailingZeros().toPlainString();
        Matcher m = Pattern.compile("(?m)^P1 1 (\\S+) (\\S+) (\\S+) (\\S+)$").matcher(t.replaceAll("[ \\t]+", " "));
        assertTrue(m.find(), "the as-found correlation row of P1");
        assertEquals(r15, m.group(4));
        assertTrue(flat.contains("Correlation of the point errors"));
        // the decisions per point, as found and as left, with the rule
        for (String series : List.of("asFound", "asLeft")) {
            String phase = series.equals("asFound") ? "as found" : "as left (measured)";
            int at = flat.indexOf("Conformity " + phase + " against");
            assertTrue(at >= 0, phase);
            String table = flat.substring(at);
            for (String p : POINTS) {
                String decision = (String) x.get(series + ".conformity.points." + p + ".decision");
                String ratio = Boolean.parseBoolean(String.valueOf(x.get(series + ".conformity.points." + p
                        + ".ratioMet"))) ? "yes" : "no";
                Matcher d = Pattern.compile(p + " [0-9.]+ [−0-9.]+ [0-9.]+ [0-9.]+ \\S+ … \\S+ [0-9.]+ " + ratio + " "
                        + Pattern.quote(decision)).matcher(table);
                assertTrue(d.find(), p + " " + phase + ": " + decision);
            }
        }
        assertTrue(flat.contains("Decision rule: simple acceptance"), "the rule applied");
        assertTrue(flat.contains("as found: " + x.get("asFound.conformity.overall")), "overall as found");
    }

    @Test
    void noRawMarkupInPdfHtmlOrCsv(@TempDir Path dir) throws Exception {
        String pdf = pdfText(report(dir, "cal.pdf"));
        String html = Files.readString(report(dir, "cal.html"));
        Path csv = Files.createDirectory(dir.resolve("csv"));
        assertEquals(0, run("report", CAL, "--csv", csv.toString(), "--date", "2026-11-25"), err.toString());
        StringBuilder cells = new StringBuilder();
        try (var files = Files.list(csv)) {
            for (Path f : files.toList()) {
                List<String> lines = Files.readAllLines(f);
                cells.append(String.join("\n", lines.subList(1, lines.size()))).append('\n'); // headers are CSV names
            }
        }
        String htmlText = html.replaceAll("<[^>]+>", "");
        for (var doc : Map.of("PDF", pdf, "HTML", htmlText, "CSV", cells.toString()).entrySet()) {
            for (String markup : List.of("_{", "^3", "^2", "+-", "m3/h")) {
                assertFalse(doc.getValue().contains(markup), "raw '" + markup + "' in the " + doc.getKey());
            }
        }
        // a symbol's plain form (u_c) is what a CSV cell holds; what a reader sees has it typeset
        for (var doc : Map.of("PDF", pdf, "HTML", htmlText).entrySet()) {
            for (String markup : List.of("u_c", "E_w", "C_new", "q_ref", "d_low", "drho")) {
                assertFalse(doc.getValue().contains(markup), "raw '" + markup + "' in the " + doc.getKey());
            }
        }
        // no quantity written with an underscore anywhere in the PDF's text; functions of the engine's library
        // (water_density_air_saturated(...)) are words set upright as written
        String quantities = pdf.replaceAll("[a-z_]+\\(", "(");
        Matcher m = Pattern.compile("\\p{L}_\\p{L}").matcher(quantities);
        assertFalse(m.find(), () -> "raw name near '" + quantities.substring(Math.max(0, m.start() - 30), m.end() + 30) + "'");
        assertTrue(html.contains("<sub>"), "names are typeset in the HTML");
        assertTrue(pdf.contains("m³/h"), "units with real superscripts");
    }

    @Test
    void guidanceIsAnAppendixOnlyOnRequest(@TempDir Path dir) throws Exception {
        // the method template's guidance for the author ("Enter estimate 0 and halfWidth ...")
        String plain = pdfText(report(dir, "plain.pdf")).replaceAll("\\s+", " ");
        String with = pdfText(report(dir, "with.pdf", "--with-guidance")).replaceAll("\\s+", " ");
        assertFalse(plain.contains("Appendix: notes on the inputs"), "no appendix unless asked for");
        assertFalse(plain.contains("Enter estimate"), "no template guidance in the body");
        assertTrue(with.contains("Appendix: notes on the inputs"), "the appendix on request");
        assertTrue(with.indexOf("Appendix: notes on the inputs") > with.indexOf("Findings"), "at the end");
        // the same option for a budget template's report
        String template = ROOT.resolve("templates/gravimetric-emf-flow-point.json").toString();
        Path a = dir.resolve("t.pdf");
        Path b = dir.resolve("t-guidance.pdf");
        assertEquals(0, run("report", template, "-o", a.toString(), "--date", "2026-11-25"), err.toString());
        assertEquals(0, run("report", template, "-o", b.toString(), "--date", "2026-11-25", "--with-guidance"),
                err.toString());
        String ta = pdfText(a).replaceAll("\\s+", " ");
        String tb = pdfText(b).replaceAll("\\s+", " ");
        assertFalse(ta.contains("Enter estimate 0 and halfWidth"), "guidance kept out of the body");
        assertTrue(tb.contains("Enter estimate 0 and halfWidth"), "guidance in the appendix on request");
        assertTrue(tb.contains("Appendix: notes on the inputs"));
    }

    @Test
    void budgetOnlyOptionsAreRefusedForACalibration(@TempDir Path dir) {
        assertEquals(2, run("report", CAL, "-o", dir.resolve("x.pdf").toString(), "--mc"));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("calibration file"), err.toString());
        assertFalse(Files.exists(dir.resolve("x.pdf")));
    }

    @Test
    void theCertificateNumberRuleIsTheEnginesOne() throws Exception {
        // ISO/IEC 17025:2017 7.8.2.1 b): the number the certificate prints is derived by the engine's one rule
        var loaded = org.quire.engine.calibration.CalibrationJson.read(Path.of(CAL));
        var r = org.quire.engine.calibration.CalibrationEvaluator.of(org.quire.engine.calibration.CalibrationJson
                .method(Path.of(CAL), loaded), org.quire.app.common.Engine.standard().library()).evaluate(loaded.calibration());
        Certificate c = CertificateBuilder.build(r, org.quire.engine.io.ReferenceRegisterJson.read(Path.of(REG)),
                new CertificateIssue(LocalDate.of(2026, 11, 25), "M. Fenwick (invented)", "technical manager", "",
                        false));
        assertEquals(org.quire.engine.calibration.CertificateNumber.derive("Tarrow Vale Flow Laboratory",
                LocalDate.of(2026, 11, 24), c.hash()), c.number());
        assertTrue(c.number().startsWith("TVFL-20261124-"));
    }
}
