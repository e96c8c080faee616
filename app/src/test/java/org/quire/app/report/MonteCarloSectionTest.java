package org.quire.app.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.quire.app.common.Engine;
import org.quire.app.testing.Examples;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumResult;
import org.quire.engine.montecarlo.BudgetSimulation;
import org.quire.engine.montecarlo.MonteCarloOutcome;
import org.quire.engine.montecarlo.ProgressListener;

/**
 * The Monte Carlo part of the report from a real run of JCGM 101:2008 9.2.3 (Y = X_1 + X_2 + X_3 + X_4, each
 * rectangular with u = 1), compared with the published figures: u(y) = 2.00, probabilistically symmetric 95 %
 * interval [-3.88, 3.88], GUM interval [-3.92, 3.92] validated (JCGM 101:2008 9.2.3, from memory).
 */
class MonteCarloSectionTest {
    private static final long M = 1_000_000L;

    private static String pdfText(ReportModel m) throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        PdfReport.render(m, out);
        try (PDDocument d = Loader.loadPDF(out.toByteArray())) {
            return new PDFTextStripper().getText(d).replaceAll("\\s+", " ").replace('\u2212', '-');
        }
    }

    /**
     * The density of the sum of four rectangular variables on [-sqrt 3, sqrt 3] at y: with S = y/(2 sqrt 3) + 2 the
     * sum of four U(0, 1), the Irwin-Hall density f(s) = sum_k (-1)^k C(4, k) (s - k)^3 / 3! over k <= s
     * (J. O. Irwin, Biometrika 19 (1927) 225-239), divided by 2 sqrt 3.
     */
    static double sumDensity(double y) {
        double a = Math.sqrt(3);
        double s = y / (2 * a) + 2;
        int[] c = {1, 4, 6, 4, 1};
        double f = 0;
        for (int k = 0; k <= Math.floor(s) && k <= 4; k++) {
            f += (k % 2 == 0 ? 1 : -1) * c[k] * Math.pow(s - k, 3) / 6;
        }
        return f / (2 * a);
    }

    @Test
    void reportShowsTheEnginesOutcomeOfThePublishedExample() throws Exception {
        Budget b = Examples.budget("jcgm101-9.2.3-additive-rectangular.json");
        b = b.withSettings(b.settings().withTrials(M).withSeed(20_261_202L));
        GumResult gum = Examples.gum(b);
        MonteCarloOutcome mc = BudgetSimulation.run(b, b.compile(Engine.standard().library()), gum,
                BudgetSimulation.settings(b.settings(), gum).withThreads(2), ProgressListener.NONE);
        ReportModel m = ReportBuilder.build(ReportInput.of(b, gum,
                DocumentInfo.forPlainBudget(b, CanonicalSha256.INSTANCE, java.time.LocalDate.of(2026, 3, 2)), org.quire.app.common.Engine.standard().library())
                .withMonteCarlo(mc));
        String html = HtmlReport.render(m);
        assertTrue(html.contains("<svg"), "the histogram is drawn");
        String text = pdfText(m);
        Matcher row = Pattern.compile("Y (-?\\d\\.\\d+) (\\d\\.\\d+) (-?\\d\\.\\d+) (-?\\d\\.\\d+) "
                + "(-?\\d\\.\\d+) (-?\\d\\.\\d+) 95").matcher(text);
        assertTrue(row.find(), text);
        // u(y) = 2.00: half a unit plus 3 standard errors u sqrt((kurtosis - 1)/(4M)), kurtosis 2.7 (recomputed:
        // four rectangulars have excess kurtosis -1.2/4 = -0.3)
        assertEquals(2.00, Double.parseDouble(row.group(2)), 0.005 + 3 * 2.0 * Math.sqrt(1.7 / (4 * M)));
        // symmetric interval ends +-3.88: half a unit plus 3 standard errors of a 2.5 % quantile,
        // sqrt(p(1-p)/M)/g with g the density of the sum there (the Irwin-Hall density, computed below)
        double endTol = 0.005 + 3 * Math.sqrt(0.025 * 0.975 / M) / sumDensity(3.88);
        assertEquals(-3.88, Double.parseDouble(row.group(3)), endTol);
        assertEquals(3.88, Double.parseDouble(row.group(4)), endTol);
        // the comparison: GUM [-3.92, 3.92], delta = 0.05 (u = 2.0 at n_dig = 2), validated
        Matcher cmp = Pattern.compile("Y (-?\\d\\.\\d+) (\\d\\.\\d+) 0\\.05 \\S+ \\S+ (\\S+)").matcher(text);
        assertTrue(cmp.find(), text);
        assertEquals(-3.92, Double.parseDouble(cmp.group(1)), 0.005);
        assertEquals(3.92, Double.parseDouble(cmp.group(2)), 0.005);
        assertEquals("validated", cmp.group(3));
        assertTrue(text.contains("the GUM result is validated"), text);
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
