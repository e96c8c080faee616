package org.quire.app.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
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
import org.quire.engine.gum.GumResult;
import org.quire.engine.montecarlo.BudgetSimulation;
import org.quire.engine.montecarlo.GumComparison;
import org.quire.engine.montecarlo.MonteCarloOutcome;
import org.quire.engine.montecarlo.ProgressListener;

/**
 * The Monte Carlo section of the report of JCGM 101:2008 9.3 (mass calibration), run with M = 10⁶ trials, against
 * the published figures (JCGM 101:2008 9.3 and its Table 9, from memory; the density recomputed here): Monte Carlo δm = 1.2341 mg, u = 0.0754 mg,
 * shortest 95 % interval [1.0834, 1.3825] mg; first-order GUM interval [1.1285, 1.3395] mg, not validated by the
 * comparison of JCGM 101:2008 8.2 with n_dig = 2.
 */
class Jcgm101MassCalibrationReportTest {
    private static final long M = 1_000_000L;
    private static MonteCarloOutcome mc;
    private static String text;

    @BeforeAll
    static void run() throws Exception {
        BudgetDocument doc = DocumentStore.open(Examples.file("jcgm101-9.3-mass-calibration.json"));
        Budget b = doc.budget();
        b = b.withSettings(b.settings().withTrials(M));
        var model = b.compile(Engine.standard().library());
        GumResult gum = Examples.gum(b);
        mc = BudgetSimulation.run(b, model, gum, BudgetSimulation.settings(b.settings(), gum).withThreads(2),
                ProgressListener.NONE);
        ReportModel m = ReportBuilder.build(ReportInput.of(b, gum, DocumentInfo.of(doc, LocalDate.of(2026, 11, 20)), org.quire.app.common.Engine.standard().library())
                .withMonteCarlo(mc));
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        PdfReport.render(m, out);
        try (PDDocument d = Loader.loadPDF(out.toByteArray())) {
            text = new PDFTextStripper().getText(d).replaceAll("\\s+", " ");
        }
    }

    /**
     * The density of δm at {@code y}, computed here by numerical integration, independently of Quire: δm is
     * (m_Rc + δm_Rc)(1 + (ρa − ρa0)(1/ρW − 1/ρR)) − m_nom with normal m_Rc, δm_Rc (together N(100001.234, 0.0539²)
     * mg) and rectangular ρa, ρW, ρR; the density is the mean over the rectangular inputs (midpoint rule) of the
     * normal density of what m_Rc + δm_Rc must be.
     */
    private static double density(double y) {
        double sigma = Math.hypot(0.05, 0.02);
        int na = 200;
        int nw = 200;
        int nr = 10;
        double sum = 0;
        for (int i = 0; i < na; i++) {
            double ra = 1.1 + 0.2 * (i + 0.5) / na;
            for (int j = 0; j < nw; j++) {
                double rw = 7000 + 2000 * (j + 0.5) / nw;
                for (int k = 0; k < nr; k++) {
                    double rr = 7950 + 100 * (k + 0.5) / nr;
                    double f = 1 + (ra - 1.2) * (1 / rw - 1 / rr);
                    double m = (y + 100000) / f; // m_Rc + δm_Rc that gives δm = y
                    double z = (m - 100001.234) / sigma;
                    sum += Math.exp(-0.5 * z * z) / (sigma * Math.sqrt(2 * Math.PI)) / f;
                }
            }
        }
        return sum / ((double) na * nw * nr);
    }

    /**
     * Tolerance of an end of the shortest 95 % interval: half a unit in the published fourth decimal, plus the
     * 0.0006 by which the published fourth decimal is itself a Monte Carlo estimate from 10^6 trials (JCGM 101:2008
     * 9.3; the standard error of such an end is about 0.0002 mg, and our own reruns with 4e6 trials moved it by up to
     * 0.0006 mg), plus three standard errors of a quantile estimated from M trials,
     * sqrt(p (1 − p) / M) / g(η) with p = 0.025 and g the density at the end (asymptotic variance of a sample
     * quantile; JCGM 101:2008 7.7 forms the interval from such order statistics).
     */
    private static double endTolerance(double end) {
        double p = 0.025;
        return 0.00005 + 0.0006 + 3 * Math.sqrt(p * (1 - p) / M) / density(end);
    }

    private static double[] row() {
        Matcher m = Pattern.compile("δm (\\d\\.\\d+) (\\d\\.\\d+) (\\d\\.\\d+) (\\d\\.\\d+) (\\d\\.\\d+) (\\d\\.\\d+) 95 mg")
                .matcher(text);
        assertTrue(m.find(), text);
        double[] v = new double[6];
        for (int i = 0; i < 6; i++) {
            v[i] = Double.parseDouble(m.group(i + 1));
        }
        return v;
    }

    @Test
    void monteCarloEstimateAndUncertaintyAgreeWithThePublishedOnes() {
        double[] v = row();
        // JCGM 101:2008 9.3: 1.2341 mg; half a unit in the last digit + 3 u/sqrt(M)
        assertEquals(1.2341, v[0], 0.00005 + 3 * 0.0754 / Math.sqrt(M));
        // JCGM 101:2008 9.3: u = 0.0754 mg; half a unit + 3 standard errors of a standard deviation,
        // u sqrt((kurtosis - 1) / (4 M)) with kurtosis below 4 for this output (the mixture of a normal and a product
        // of rectangular terms has lighter tails than that; common practice to bound it so)
        assertEquals(0.0754, v[1], 0.00005 + 3 * 0.0754 * Math.sqrt(3.0 / (4 * M)));
    }

    @Test
    void shortestIntervalAgreesWithThePublishedOneWithinTheTrialsTolerance() {
        double[] v = row();
        // JCGM 101:2008 9.3: shortest 95 % coverage interval [1.0834, 1.3825] mg
        assertEquals(1.0834, v[4], endTolerance(1.0834));
        assertEquals(1.3825, v[5], endTolerance(1.3825));
        assertTrue(endTolerance(1.0834) < 0.003, "the tolerance stays meaningful: " + endTolerance(1.0834));
        // the probabilistically symmetric interval lies close to the shortest one for this nearly symmetric output
        assertTrue(v[2] > 1.07 && v[2] < 1.10 && v[3] > 1.37 && v[3] < 1.40);
    }

    @Test
    void firstOrderGumIsNotValidated() {
        // JCGM 101:2008 9.3: GUM first order [1.1285, 1.3395] mg; the comparison of 8.2 fails at n_dig = 2
        Matcher m = Pattern.compile("δm (\\d\\.\\d+) (\\d\\.\\d+) 0\\.0005 (\\S+) (\\S+) NOT validated").matcher(text);
        assertTrue(m.find(), text);
        assertEquals(1.1285, Double.parseDouble(m.group(1)), 0.00005 + 0.000005);
        assertEquals(1.3395, Double.parseDouble(m.group(2)), 0.00005 + 0.000005);
        assertTrue(text.contains("the GUM result is not validated"), text);
        assertTrue(text.contains("report the Monte Carlo result"), text);
        // the reason's symbols are typeset (d with subscript low, δ), never their plain names
        assertFalse(text.contains("d_low") || text.contains("d_high") || text.contains("tolerance delta"), text);
        assertTrue(text.contains("numerical tolerance δ = "), text);
        assertEquals(GumComparison.Verdict.NOT_VALIDATED, mc.output(0).comparison().verdict());
        // d_low = |1.1285 - 1.0834| is about 0.045 mg against the published figures, far beyond delta = 0.0005 mg
        assertTrue(mc.output(0).comparison().lowerDifference() > 0.03);
    }

    @Test
    void histogramCarriesTheGumCurveAndBothIntervals() {
        Chart.Histogram h = MonteCarloReport.histogram(mc.output(0));
        assertEquals(3, h.intervals().size());
        assertTrue(h.curveLegend().contains("normal"), "infinite ν_eff: the GUM assigns a normal distribution");
        assertTrue(text.contains("Monte Carlo 95 %, shortest") && text.contains("GUM y ± U"), text);
        // the curve is the GUM's N(1.2340, 0.0539^2) mg (JCGM 101:2008 9.3, first order) as trials expected per
        // bin: at the bin holding y, M x width x the normal density there, computed here from the textbook density
        double[] x = h.curveX();
        double[] y = h.curveY();
        double[] e = h.edges();
        int mid = 0;
        while (e[mid + 1] < 1.2340) {
            mid++;
        }
        double width = e[mid + 1] - e[mid];
        double z = (x[mid] - 1.2340) / 0.0539;
        double expected = M * width * Math.exp(-0.5 * z * z) / (0.0539 * Math.sqrt(2 * Math.PI));
        // half a unit in the published u (0.00005 of 0.0539) moves the peak by 0.1 %; the density's curvature over
        // a bin less than that
        assertEquals(expected, y[mid], 0.003 * expected);
    }
}
