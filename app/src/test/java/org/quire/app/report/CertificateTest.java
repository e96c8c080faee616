package org.quire.app.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import jakarta.json.JsonObject;
import java.io.ByteArrayOutputStream;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.quire.app.common.Engine;
import org.quire.engine.calibration.Calibration;
import org.quire.engine.calibration.CalibrationEvaluator;
import org.quire.engine.calibration.CalibrationResult;
import org.quire.engine.calibration.CertificateDetails;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.calibration.CalibrationJson;
import org.quire.engine.io.ReferenceRegisterJson;
import org.quire.engine.reference.ReferenceRegister;

/**
 * The calibration certificate of the worked DN 80 calibration, read back from the PDF as a reader's text extractor
 * sees it. The expected figures are the worked example's own, computed independently by
 * {@code worked-examples/scripts/tarrow_vale_dn80_calibration.py} and stored in
 * {@code worked-examples/tarrow-vale-dn80-calibration.json}; they are rounded here to two significant digits for U
 * and the error to the same decimal place (JCGM 100:2008 7.2.6, EA-4/02 M:2022 5.4), three for k.
 */
class CertificateTest {
    private static final Path ROOT = Path.of(System.getProperty("quire.projectRoot", ".."));
    private static final Path CAL = ROOT.resolve("worked-examples/calibration/tarrow-vale-dn80-calibration.json");
    private static final Path REG = ROOT.resolve("worked-examples/registers/tarrow-vale-reference-register.json");
    private static final CertificateIssue ISSUE = new CertificateIssue(LocalDate.of(2026, 11, 25),
            "M. Fenwick (invented)", "technical manager", "", false);

    private static Calibration calibration() throws Exception {
        return CalibrationJson.read(CAL).calibration();
    }

    private static CalibrationResult evaluate(Calibration c) throws Exception {
        CalibrationJson.Loaded loaded = CalibrationJson.read(CAL);
        return CalibrationEvaluator.of(CalibrationJson.method(CAL, loaded), Engine.standard().library()).evaluate(c);
    }

    private static ReferenceRegister register() throws Exception {
        return ReferenceRegisterJson.read(REG);
    }

    /** @return the independent expected figures of the worked example, by path */
    private static Map<String, Object> expected() throws Exception {
        JsonObject root = BudgetJson.parseObject(BudgetJson.readText(ROOT.resolve(
                "worked-examples/tarrow-vale-dn80-calibration.json")));
        Map<String, Object> m = new HashMap<>();
        for (var v : root.getJsonArray("checks")) {
            JsonObject c = v.asJsonObject();
            if (c.getJsonObject("arguments").containsKey("asLeft")) {
                continue; // the figures of the predicted as-left series; the calibration file measured its as-left runs
            }
            var e = c.get("expected");
            m.put(c.getString("path"), e.getValueType() == jakarta.json.JsonValue.ValueType.NUMBER
                    ? (Object) c.getJsonNumber("expected").doubleValue() : c.getString("expected"));
        }
        return m;
    }

    private static String text(Certificate c) throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        CertificatePdf.render(c, out);
        try (PDDocument d = Loader.loadPDF(out.toByteArray())) {
            return new PDFTextStripper().getText(d);
        }
    }

    private static int pages(Certificate c) throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        CertificatePdf.render(c, out);
        try (PDDocument d = Loader.loadPDF(out.toByteArray())) {
            return d.getNumberOfPages();
        }
    }

    private static String u2(double u) {
        BigDecimal b = new BigDecimal(u).round(new MathContext(2, RoundingMode.HALF_UP));
        return b.toPlainString();
    }

    private static String sameDecimals(double v, String u) {
        int scale = new BigDecimal(u).scale();
        String s = new BigDecimal(v).setScale(scale, RoundingMode.HALF_UP).toPlainString();
        return s.startsWith("-") ? "−" + s.substring(1) : s;
    }

    private static String[] row(String text, String label) {
        for (String line : text.split("\\R")) {
            String[] t = line.strip().replace(" *", "").split("\\s+");
            if (t.length == 10 && t[0].equals(label)) {
                return t;
            }
        }
        throw new AssertionError("no results row " + label + " in\n" + text);
    }

    @Test
    void everyPointCarriesItsOwnRoundedUAndK() throws Exception {
        Map<String, Object> x = expected();
        String t = text(CertificateBuilder.build(evaluate(calibration()), register(), ISSUE));
        for (String p : List.of("P1", "P2", "P3", "P4", "P5")) {
            String[] r = row(t, p);
            String uFound = u2((Double) x.get("asFound.points." + p + ".reportedExpandedUncertainty"));
            String uLeft = u2((Double) x.get("asLeft.points." + p + ".reportedExpandedUncertainty"));
            assertEquals(sameDecimals((Double) x.get("asFound.points." + p + ".error"), uFound), r[3], p + " E as found");
            assertEquals(uFound, r[4], p + " U as found");
            assertEquals(new BigDecimal((Double) x.get("asFound.points." + p + ".coverageFactor"))
                    .round(new MathContext(3)).toPlainString(), r[5], p + " k as found");
            assertEquals(sameDecimals((Double) x.get("asLeft.points." + p + ".error"), uLeft), r[6], p + " E as left");
            assertEquals(uLeft, r[7], p + " U as left");
            assertEquals(new BigDecimal((Double) x.get("asLeft.points." + p + ".coverageFactor"))
                    .round(new MathContext(3)).toPlainString(), r[8], p + " k as left");
        }
        // P4 and P5 are reported at the CMC of 0.08 % (ILAC P14): never below it
        assertEquals("0.080", row(t, "P4")[4]);
        assertTrue(t.contains("the CMC is stated instead"), t);
    }

    @Test
    void constantsAndDecisionsAreThoseOfTheWorkedExample() throws Exception {
        Map<String, Object> x = expected();
        String t = text(CertificateBuilder.build(evaluate(calibration()), register(), ISSUE));
        assertTrue(t.contains("calibration constant as found 1.2345"), t);
        double newConstant = (Double) x.get("adjustment.newConstant");
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("set in the meter\\) (\\d\\.\\d+)").matcher(t);
        assertTrue(m.find(), t);
        assertEquals(newConstant, Double.parseDouble(m.group(1)), 5e-9);
        for (String p : List.of("P1", "P2", "P3", "P4", "P5")) {
            String found = (String) x.get("asFound.conformity.points." + p + ".decision");
            String left = (String) x.get("asLeft.conformity.points." + p + ".decision");
            java.util.regex.Matcher d = java.util.regex.Pattern.compile("(?m)^" + p + " ±[0-9.]+ (.+)$").matcher(t);
            assertTrue(d.find(), p + "\n" + t);
            assertEquals(found + " " + left, d.group(1).strip(), p);
        }
        assertTrue(t.contains("as found: " + x.get("asFound.conformity.overall")), t);
    }

    @Test
    void certificateStatesWhatIso17025AsksAndNoMarkup() throws Exception {
        Certificate c = CertificateBuilder.build(evaluate(calibration()), register(), ISSUE);
        String t = text(c);
        int pages = pages(c);
        for (String must : List.of("Calibration certificate " + c.number(), "TVAS calibration laboratory no. 0417",
                "Tarrow Vale Water Services", "TV-EM-080-112", "Date of calibration 2026-11-24",
                "Date of issue 2026-11-25", "tvfl-emf-gravimetric-run, version 2", "EA-4/02",
                "TVFL-BAL-02", "HRC-M-26-0412", "authorised by M. Fenwick (invented)", "role technical manager",
                "page 1 of " + pages, "page " + pages + " of " + pages, c.hash(), "do not replace")) {
            assertTrue(t.replaceAll("-\\s+", "-").replaceAll("\\s+", " ").contains(must), "missing '" + must + "' in\n" + t);
        }
        // ISO/IEC 17025:2017 7.8.2.1 b): the certificate's identification on every page
        // (head and foot of each page, and the title)
        assertEquals(2 * pages + 1, t.split(java.util.regex.Pattern.quote(c.number()), -1).length - 1);
        for (String markup : List.of("_{", "^3", "^2", "+-", "m3/h")) {
            assertFalse(t.contains(markup), "raw markup '" + markup + "' in the certificate");
        }
    }

    @Test
    void anExpiredReferenceRefusesTheCertificateUnlessAcceptedAndThenItIsStated() throws Exception {
        Calibration c = calibration();
        CertificateDetails d = c.details();
        // TVFL-PT-03 is due on 2027-01-31 in the register; a calibration dated 2027-02-10 used it 10 days late
        Calibration late = c.withDetails(new CertificateDetails(d.laboratory(), d.customer(), d.item(),
                LocalDate.of(2027, 2, 10), d.environment(), d.referenceStandards(), d.author()));
        CalibrationResult r = evaluate(late);
        CertificateIssue issue = new CertificateIssue(LocalDate.of(2027, 2, 11), "M. Fenwick (invented)",
                "technical manager", "", false);
        CertificateRefusedException e = assertThrows(CertificateRefusedException.class,
                () -> CertificateBuilder.build(r, register(), issue));
        assertTrue(e.getMessage().contains("TVFL-PT-03") && e.getMessage().contains("2027-01-31")
                && e.getMessage().contains("2027-02-10") && e.getMessage().contains("10 day(s)"), e.getMessage());
        Certificate accepted = CertificateBuilder.build(r, register(), new CertificateIssue(LocalDate.of(2027, 2, 11),
                "M. Fenwick (invented)", "technical manager", "", true));
        String t = text(accepted).replaceAll("\\s+", " ");
        assertTrue(t.contains("NOT every reference was within its calibration interval"), t);
        assertTrue(t.contains("Reference finding: reference 'TVFL-PT-03'"), t);
    }

    @Test
    void theAuthorMayNotAuthoriseTheCertificate() throws Exception {
        CalibrationResult r = evaluate(calibration());
        CertificateRefusedException e = assertThrows(CertificateRefusedException.class,
                () -> CertificateBuilder.build(r, register(), new CertificateIssue(LocalDate.of(2026, 11, 25),
                        "  r. okonedo  (invented) ", "technical manager", "", false)));
        assertTrue(e.getMessage().contains("separation of duties"), e.getMessage());
    }

    @Test
    void theFixtureCalibrationMatchesTheIndependentScript() throws Exception {
        // app/src/test/scripts/certificate_expected.py: P3 has nu_eff = 4.09, so k = t_95.45(4) = 2.8693, and its
        // U = 0.050417 % is below the CMC 0.052 %, reported at the CMC; P1 does not conform as found (E = 0.886 %
        // against MPE 0.7826 %) and conforms as left (E = 0.680 %); new meter factor 1.022405863.
        ReferenceRegister reg = register();
        Certificate c = CertificateBuilder.build(CertificateFixture.worked(), reg, new CertificateIssue(
                LocalDate.of(2026, 11, 13), "M. Fenwick (invented)", "technical manager", "", false));
        String t = text(c);
        String[] p3 = row(t, "P3");
        assertEquals("2.87", p3[5]);
        assertEquals("2.87", p3[8]);
        assertEquals("0.052", p3[4]);
        assertEquals("0.139", p3[3]);
        String[] p1 = row(t, "P1");
        assertEquals("0.89", p1[3]);
        assertEquals("0.12", p1[4]);
        assertEquals("0.68", p1[6]);
        assertTrue(t.contains("P1 ±0.78 does not conform conforms"), t);
        assertTrue(t.contains("set in the meter) 1.022405863"), t);
    }
}
