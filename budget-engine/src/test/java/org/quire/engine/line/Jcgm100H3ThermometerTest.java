package org.quire.engine.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.junit.jupiter.api.Test;

/**
 * JCGM 100:2008 H.3, calibration of a thermometer: ordinary least squares with the scatter estimated from the
 * residuals, b(t) = y1 + y2 (t - t0), t0 = 20 °C. Check values from memory (recomputed; see the project's
 * check values), tolerance half a unit in the last printed digit.
 */
class Jcgm100H3ThermometerTest {

    private static final CalibrationData DATA = LineTestData.load("jcgm100-h3-thermometer.csv", "°C", "°C");
    private static final LineFit FIT =
            LineFitter.of(LineMethod.ORDINARY_LEAST_SQUARES).withReferenceX(20.0).fit(DATA);

    @Test
    void interceptAndSlopeAtT0Of20() {
        assertEquals(-0.1712, FIT.intercept(), 0.00005);           // JCGM 100:2008 H.3, y1, from memory
        assertEquals(0.00218, FIT.slope(), 0.000005);              // JCGM 100:2008 H.3, y2, from memory
    }

    @Test
    void standardUncertaintiesAndCorrelation() {
        assertEquals(0.0029, FIT.interceptUncertainty(), 0.00005);  // JCGM 100:2008 H.3, u(y1), from memory
        assertEquals(0.00067, FIT.slopeUncertainty(), 0.000005);    // JCGM 100:2008 H.3, u(y2), from memory
        assertEquals(-0.930, FIT.correlation(), 0.0005);            // JCGM 100:2008 H.3, r(y1, y2), from memory
    }

    @Test
    void residualScatterAndDegreesOfFreedom() {
        assertEquals(0.0035, FIT.residualStandardDeviation(), 0.00005); // JCGM 100:2008 H.3, s, from memory
        assertEquals(9, FIT.dof());                                     // JCGM 100:2008 H.3, nu = 11 - 2
        assertEquals(9.0, FIT.uncertaintyDof());
        assertEquals(Consistency.NOT_ASSESSED, FIT.consistency());     // no u(y) stated
        assertTrue(Double.isNaN(FIT.chiSquared()));
    }

    @Test
    void predictedCorrectionAt30DegreesWithUncertainty() {
        LineEstimate b30 = FIT.valueAt(30.0);
        assertEquals(-0.1494, b30.value(), 0.00005);               // JCGM 100:2008 H.3, b(30 °C), from memory
        assertEquals(0.0041, b30.standardUncertainty(), 0.00005);  // JCGM 100:2008 H.3, u[b(30 °C)], from memory
        assertEquals(9.0, b30.dof());
    }

    @Test
    void referenceAtMeanTemperatureRemovesTheCorrelation() {
        double tMean = DATA.points().stream().mapToDouble(CalibrationPoint::x).average().orElseThrow();
        assertEquals(24.0085, tMean, 0.00005);                        // JCGM 100:2008 H.3, mean t, from memory
        LineFit centred = LineFitter.of(LineMethod.ORDINARY_LEAST_SQUARES).withReferenceX(tMean).fit(DATA);
        assertEquals(0.0, centred.correlation(), 1e-9);               // JCGM 100:2008 H.3.5
        assertEquals(-0.1625, centred.intercept(), 0.00005);          // JCGM 100:2008 H.3, y1', from memory
        assertEquals(0.0011, centred.interceptUncertainty(), 0.00005); // JCGM 100:2008 H.3, u(y1'), from memory
        // the predicted correction does not depend on the choice of t0
        LineEstimate at30 = centred.valueAt(30.0);
        assertEquals(FIT.valueAt(30.0).value(), at30.value(), 1e-12);
        assertEquals(FIT.valueAt(30.0).standardUncertainty(), at30.standardUncertainty(), 1e-12);
    }

    @Test
    void agreesWithCommonsMathOrdinaryRegression() {
        // independent computation: Commons Math OLS on (t - 20, b)
        int n = DATA.size();
        double[] y = new double[n];
        double[][] x = new double[n][1];
        for (int i = 0; i < n; i++) {
            x[i][0] = DATA.points().get(i).x() - 20.0;
            y[i] = DATA.points().get(i).y();
        }
        OLSMultipleLinearRegression ref = new OLSMultipleLinearRegression();
        ref.newSampleData(y, x);
        double[] beta = ref.estimateRegressionParameters();
        double[] se = ref.estimateRegressionParametersStandardErrors();
        double[][] v = ref.estimateRegressionParametersVariance();
        double s2 = ref.estimateErrorVariance();
        assertEquals(beta[0], FIT.intercept(), 1e-12);
        assertEquals(beta[1], FIT.slope(), 1e-12);
        assertEquals(se[0], FIT.interceptUncertainty(), 1e-12);
        assertEquals(se[1], FIT.slopeUncertainty(), 1e-12);
        assertEquals(s2 * v[0][1], FIT.covariance(), 1e-14);
        double[] r = ref.estimateResiduals();
        double[] mine = FIT.residuals();
        double[] z = FIT.standardizedResiduals();
        for (int i = 0; i < n; i++) {
            assertEquals(r[i], mine[i], 1e-12, "residual " + (i + 1));
            assertEquals(r[i] / Math.sqrt(s2), z[i], 1e-9, "standardized residual " + (i + 1));
        }
    }

    @Test
    void inverseUseGivesBackTheTemperatureWithUncertaintyFromTheLineAndTheIndication() {
        // JCGM 100:2008 H.3 line used backwards: which reading t gives the correction -0.1494 °C?
        LineEstimate b30 = FIT.valueAt(30.0);
        LineEstimate t = FIT.inverse(b30.value(), 0.0);
        assertEquals(30.0, t.value(), 1e-9);
        // with u(y0) = 0 the line alone contributes u[b(30)] / |b|
        assertEquals(b30.standardUncertainty() / Math.abs(FIT.slope()), t.standardUncertainty(), 1e-9);
        assertEquals(9.0, t.dof(), 1e-9);
        // an indication with its own exactly known uncertainty: degrees of freedom rise by Welch-Satterthwaite
        LineEstimate t2 = FIT.inverse(b30.value(), 0.0041, Double.POSITIVE_INFINITY);
        double uLine = b30.standardUncertainty() / FIT.slope();
        double uInd = 0.0041 / FIT.slope();
        double u2 = uLine * uLine + uInd * uInd;
        assertEquals(Math.sqrt(u2), t2.standardUncertainty(), 1e-9);
        assertEquals(u2 * u2 / (Math.pow(uLine, 4) / 9.0), t2.dof(), 1e-6);  // JCGM 100:2008 G.4.1, eq. G.2b
    }
}
