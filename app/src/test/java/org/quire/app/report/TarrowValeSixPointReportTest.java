package org.quire.app.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.quire.app.common.Engine;
import org.quire.app.testing.Examples;
import org.quire.engine.budget.Budget;
import org.quire.engine.document.BudgetDocument;
import org.quire.engine.document.DocumentStore;

/**
 * The report of the Tarrow Vale six-point example (invented data): calibration line, flow range and conformity
 * decisions. Expected figures are those of the example's checks, computed by the independent script the example
 * names (budget-engine/src/test/resources/independent-checks/tarrow_vale_emf_six_point.py), never by Quire; the
 * decision rule is the one the example's notes state: guarded acceptance with w = U (ILAC G8), normal
 * distribution, OIML R 49 class 2 limits, k = 2 from its settings.
 */
class TarrowValeSixPointReportTest {
    private static final String EXAMPLE = "tarrow-vale-emf-six-point.json";
    private static BudgetDocument doc;
    private static String text;
    private static String html;

    @BeforeAll
    static void render() throws Exception {
        doc = DocumentStore.open(Examples.file(EXAMPLE));
        Budget b = doc.budget();
        ReportInput in = ReportInput.of(b, Examples.gum(b), DocumentInfo.of(doc, LocalDate.of(2026, 11, 20)), org.quire.app.common.Engine.standard().library());
        for (ReportSection s : CalibrationSections.of(b, Engine.standard().library())) {
            in = in.withSection(s);
        }
        ReportModel m = ReportBuilder.build(in);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        PdfReport.render(m, out);
        try (PDDocument d = Loader.loadPDF(out.toByteArray())) {
            text = new PDFTextStripper().getText(d).replaceAll("\\s+", " ");
        }
        html = HtmlReport.render(m);
    }

    /** @return half a unit in the last digit of a printed figure */
    private static double halfUnit(String printed) {
        return 0.5 * Math.pow(10, -new BigDecimal(printed).scale());
    }

    private static String figureAfter(String label) {
        Matcher m = Pattern.compile(Pattern.quote(label) + " (−?\\d+\\.\\d+)").matcher(text);
        assertTrue(m.find(), "'" + label + "' followed by a figure is in the report");
        return m.group(1).replace('−', '-');
    }

    @Test
    void meterFactorAndZeroOffsetAreThoseOfTheIndependentFit() {
        // example check "meter factor b (slope)": 0.9984152, tolerance 5e-8
        String b = figureAfter("slope (meter factor) b");
        assertEquals(0.9984152, Double.parseDouble(b), 5e-8 + halfUnit(b));
        // example check "zero offset a (intercept)": 0.0046662, tolerance 5e-8
        String a = figureAfter("intercept (zero offset) a");
        assertEquals(0.0046662, Double.parseDouble(a), 5e-8 + halfUnit(a));
        // example check "r(a, b)": -0.34487
        String r = figureAfter("correlation coefficient of a and b r(a, b)");
        assertEquals(-0.34487, Double.parseDouble(r), 5e-6 + halfUnit(r));
        // example check "chi-squared": 0.026 (tolerance 5e-5); 4 degrees of freedom, below the 95 % quantile
        // 9.488 of chi-squared(4) (ISO/TS 28037:2010 6.3; table value from memory)
        String chi = figureAfter("χ²_obs =");
        assertEquals(0.026, Double.parseDouble(chi), 5e-5 + halfUnit(chi));
        assertTrue(text.contains("verdict of the chi-squared check consistent"), text);
    }

    @Test
    void flowRangeTableHasTheExpandedUncertaintyAtEachPoint() {
        // example checks "U(E) at ..." (tolerance 5e-5); the report prints four significant digits
        String[] flows = {"0.1602", "0.2504", "2.5011", "10.0032", "24.987", "31.241"};
        double[] big = {0.7565, 0.4558, 0.2494, 0.2448, 0.2447, 0.2446};
        for (int i = 0; i < flows.length; i++) {
            Matcher m = Pattern.compile((i + 1) + " " + Pattern.quote(flows[i]) + " (−?[\\d.]+) ([\\d.]+) ∞ 2.00 ([\\d.]+)")
                    .matcher(text);
            assertTrue(m.find(), "row of flow " + flows[i]);
            assertEquals(big[i], Double.parseDouble(m.group(3)), 5e-5 + halfUnit(m.group(3)), "U at " + flows[i]);
        }
        // example checks r(E_3, E_4) = 0.6549 and r(E_1, E_2) = 0.1212: in the correlation table
        Matcher row = Pattern.compile("E3 (\\S+) (\\S+) 1 (\\S+)").matcher(text);
        assertTrue(row.find(), text);
        assertEquals(0.6549, Double.parseDouble(row.group(3)), 5e-5 + halfUnit(row.group(3)));
        assertTrue(html.contains("id=\"flow-range-correlation\""));
    }

    @Test
    void decisionsAndTheRuleSentenceAreStated() {
        // example checks: Q1 conforms; 0.2504 m3/h does not conform with p_c = 0.9136; Q4 conforms; overall: does not
        // conform
        assertTrue(text.contains("0.1602 lower zone 2.784 0.7565 ±5 %"), text);
        Matcher m = Pattern.compile("0\\.2504 upper zone \\S+ \\S+ ±2 % \\S+ … \\S+ (\\d\\.\\d{4}) does not conform")
                .matcher(text);
        assertTrue(m.find(), text);
        assertEquals(0.9136, Double.parseDouble(m.group(1)), 5e-5 + halfUnit(m.group(1)));
        assertTrue(Pattern.compile("31\\.241 upper zone \\S+ \\S+ ±2 % \\S+ … \\S+ 1\\.0000 conforms").matcher(text).find());
        assertTrue(text.contains("Overall decision: does not conform."), text);
        // the rule of the example's notes, as a certificate states it
        assertTrue(text.contains("Decision rule: guarded acceptance") && text.contains("guard band w = U")
                && text.contains("coverage factor k = 2") && text.contains("class 2"), text);
    }

    @Test
    void headerShowsTheDocumentsOwnHashAndThatAVersionOneFileKeepsNoHistory() {
        assertTrue(text.contains(doc.contentHash()), "the full content hash of the document is in the header");
        assertTrue(text.contains(DocumentInfo.NOT_RECORDED_V1), text);
        assertTrue(text.contains("No revision history is recorded: the file is of format version 1"), text);
    }
}
