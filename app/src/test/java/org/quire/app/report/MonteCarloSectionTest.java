package org.quire.app.report;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.util.List;
import java.util.SplittableRandom;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.quire.app.testing.Examples;
import org.quire.engine.budget.Budget;

/**
 * The Monte Carlo seam of the report: a summary as the Monte Carlo engine will hand it over, with the figures
 * JCGM 101:2008 9.2.3 publishes (u(y) = 2.00, shortest 95 % interval [-3.88, 3.88], GUM validated), and a
 * histogram drawn from trials of the same model.
 */
class MonteCarloSectionTest {

    private static Chart.Histogram histogram() {
        SplittableRandom rnd = new SplittableRandom(20_261_202L);
        double a = Math.sqrt(3);
        int bins = 40;
        double lo = -4 * a;
        double width = 8 * a / bins;
        long[] counts = new long[bins];
        for (int t = 0; t < 100_000; t++) {
            double y = 0;
            for (int i = 0; i < 4; i++) {
                y += rnd.nextDouble(-a, a);
            }
            counts[(int) Math.min(bins - 1, Math.floor((y - lo) / width))]++;
        }
        double[] edges = new double[bins + 1];
        for (int i = 0; i <= bins; i++) {
            edges[i] = lo + i * width;
        }
        return new Chart.Histogram("Distribution of Y from the trials", "Y", edges, counts, new double[] {-3.88, 3.88},
                "shortest 95 % interval");
    }

    @Test
    void reportShowsTheSummaryAndItsHistogram() throws Exception {
        Budget b = Examples.budget("jcgm101-9.2.3-additive-rectangular.json");
        MonteCarloSummary mc = new MonteCarloSummary(100_000, 20_261_202L, false, List.of(new MonteCarloSummary.Output(
                "Y", "", 0.0, 2.00, -3.88, 3.88, 0.95, true, true, "JCGM 101:2008 8.2, delta = 0.05", histogram())));
        ReportModel m = ReportBuilder.build(ReportInput.of(b, Examples.gum(b),
                DocumentInfo.forPlainBudget(b, CanonicalSha256.INSTANCE, java.time.LocalDate.of(2026, 3, 2)))
                .withMonteCarlo(mc));
        String html = HtmlReport.render(m);
        assertTrue(html.contains("<svg") && html.contains("shortest 95 % interval"));
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        PdfReport.render(m, out);
        try (PDDocument d = Loader.loadPDF(out.toByteArray())) {
            String text = new PDFTextStripper().getText(d).replaceAll("\\s+", " ");
            // JCGM 101:2008 9.2.3: shortest 95 % coverage interval [-3.88, 3.88]
            assertTrue(text.contains("−3.88") && text.contains("3.88"), text);
            assertTrue(text.contains("yes: JCGM 101:2008 8.2"), text);
            assertTrue(text.contains("Distribution of Y from the trials"), text);
        }
    }

    @Test
    void histogramRefusesInconsistentBins() {
        assertThrows(IllegalArgumentException.class, () -> new Chart.Histogram("h", "x", new double[] {0, 1},
                new long[] {1, 2}, null, ""));
        assertThrows(IllegalArgumentException.class, () -> new Chart.Histogram("h", "x", new double[] {0, 1, 1},
                new long[] {1, 2}, null, ""));
        assertThrows(IllegalArgumentException.class, () -> new Chart.Histogram("h", "x", new double[] {0, 1, 2},
                new long[] {1, 2}, new double[] {3}, ""));
    }
}
