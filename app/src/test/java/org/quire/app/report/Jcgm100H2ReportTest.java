package org.quire.app.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.quire.app.testing.Examples;

/** The report of JCGM 100:2008 H.2 (three outputs from correlated inputs): correlation terms and output correlation. */
class Jcgm100H2ReportTest {

    @Test
    void reportShowsCorrelationTermsAndThePublishedOutputCorrelations() throws Exception {
        ReportModel m = Examples.report("jcgm100-h2-resistance-reactance.json");
        assertTrue(m.tables().stream().anyMatch(t -> t.key().equals("correlation-terms-r")));
        assertTrue(m.tables().stream().anyMatch(t -> t.key().equals("correlations")));
        Table r = m.tables().stream().filter(t -> t.key().equals("output-correlation")).findFirst().orElseThrow();
        // JCGM 100:2008 H.2: r(R, X) = -0.588, r(R, Z) = -0.485, r(X, Z) = 0.993
        assertEquals(-0.588, r.rows().get(0).get(2).value(), 0.0005);
        assertEquals(-0.485, r.rows().get(0).get(3).value(), 0.0005);
        assertEquals(0.993, r.rows().get(1).get(3).value(), 0.0005);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        PdfReport.render(m, out);
        String text;
        try (PDDocument d = Loader.loadPDF(out.toByteArray())) {
            text = new PDFTextStripper().getText(d).replaceAll("\\s+", " ");
        }
        assertTrue(text.contains("−0.588"), "r(R, X) printed");
        assertTrue(text.contains("observed simultaneously"), "the correlations' justification is printed");
        // JCGM 100:2008 H.2: R = 127.732 ohm with u = 0.071 ohm; k = 2 fixed, so U = 0.142 ohm, 0.14 to two digits
        // k is stated to three significant digits by the one rule (Figures.coverageFactor)
        assertTrue(text.contains("R = (127.73 ± 0.14) ohm, k = 2.00,"), text);
    }
}
