package org.quire.engine.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.stat.regression.GLSMultipleLinearRegression;
import org.junit.jupiter.api.Test;

/**
 * ISO/TS 28037:2010 clause 8: Gauss-Markov regression for y values with a covariance matrix (x exact).
 * Checked against Commons Math's generalized least-squares regression (an independent computation) for a
 * covariance with a common correlated component, the typical case of a flow rig whose reference contributes
 * the same systematic effect to every point; against clause 6 when the matrix is diagonal; and against exact
 * solutions.
 */
class IsoTs28037GaussMarkovTest {

    /** Tarrow Vale Flow Laboratory, electromagnetic meter TV-EM-07: reference flow (L/s) and signal (mV). */
    private static final double[] FLOW = {2.0, 5.0, 10.0, 20.0, 35.0, 50.0};
    private static final double[] SIGNAL = {0.1213, 0.3048, 0.6071, 1.2166, 2.1242, 3.0347};
    private static final double U_RANDOM = 0.0010;
    private static final double U_COMMON = 0.0008;

    private static CalibrationData dataSet() {
        List<CalibrationPoint> pts = new ArrayList<>();
        for (int i = 0; i < FLOW.length; i++) {
            pts.add(CalibrationPoint.of(FLOW[i], SIGNAL[i], 0, Math.hypot(U_RANDOM, U_COMMON)));
        }
        return CalibrationData.of("TV-EM-07 electrode signal", "L/s", "mV", pts);
    }

    private static double[][] covariance() {
        int n = FLOW.length;
        double[][] v = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                v[i][j] = U_COMMON * U_COMMON + (i == j ? U_RANDOM * U_RANDOM : 0);
            }
        }
        return v;
    }

    @Test
    void agreesWithCommonsMathGeneralizedLeastSquares() {
        CalibrationData d = dataSet().withCovariance(covariance());
        LineFit fit = LineFitter.of(LineMethod.GAUSS_MARKOV).fit(d);
        GLSMultipleLinearRegression ref = new GLSMultipleLinearRegression();
        double[][] x = new double[FLOW.length][];
        for (int i = 0; i < FLOW.length; i++) {
            x[i] = new double[] {FLOW[i]};
        }
        ref.newSampleData(SIGNAL.clone(), x, covariance());
        double[] beta = ref.estimateRegressionParameters();
        double[][] v = ref.estimateRegressionParametersVariance();
        assertEquals(beta[0], fit.intercept(), 1e-12);
        assertEquals(beta[1], fit.slope(), 1e-12);
        assertEquals(Math.sqrt(v[0][0]), fit.interceptUncertainty(), 1e-10);
        assertEquals(Math.sqrt(v[1][1]), fit.slopeUncertainty(), 1e-10);
        assertEquals(v[0][1], fit.covariance(), 1e-12);
        // chi-squared = r^T U^-1 r, computed here with the inverse from Commons Math
        double[][] inv = new org.apache.commons.math3.linear.LUDecomposition(
                new org.apache.commons.math3.linear.Array2DRowRealMatrix(covariance())).getSolver().getInverse()
                .getData();
        double[] r = fit.residuals();
        double chi2 = 0;
        for (int i = 0; i < r.length; i++) {
            for (int j = 0; j < r.length; j++) {
                chi2 += r[i] * inv[i][j] * r[j];
            }
        }
        assertEquals(chi2, fit.chiSquared(), 1e-9 * chi2);
        // a common component shifts every point alike: it goes into u(a), not into u(b)
        LineFit independent = LineFitter.of(LineMethod.WEIGHTED_LEAST_SQUARES)
                .fit(CalibrationData.of("random only", "L/s", "mV",
                        d.points().stream().map(p -> CalibrationPoint.of(p.x(), p.y(), 0, U_RANDOM)).toList()));
        assertEquals(independent.slopeUncertainty(), fit.slopeUncertainty(), 1e-12);
        assertEquals(Math.hypot(independent.interceptUncertainty(), U_COMMON), fit.interceptUncertainty(), 1e-12);
    }

    @Test
    void diagonalCovarianceGivesWeightedLeastSquares() {
        CalibrationData wlsData = LineTestData.load("iso28037-clause6-wls.csv", "", "");
        int n = wlsData.size();
        double[][] v = new double[n][n];
        for (int i = 0; i < n; i++) {
            v[i][i] = wlsData.points().get(i).uy() * wlsData.points().get(i).uy();
        }
        LineFit gmr = LineFitter.of(LineMethod.GAUSS_MARKOV).fit(wlsData.withCovariance(v));
        LineFit wls = LineFitter.of(LineMethod.WEIGHTED_LEAST_SQUARES).fit(wlsData);
        assertEquals(wls.intercept(), gmr.intercept(), 1e-12);
        assertEquals(wls.slope(), gmr.slope(), 1e-12);
        assertEquals(wls.interceptUncertainty(), gmr.interceptUncertainty(), 1e-12);
        assertEquals(wls.slopeUncertainty(), gmr.slopeUncertainty(), 1e-12);
        assertEquals(wls.covariance(), gmr.covariance(), 1e-12);
        assertEquals(wls.chiSquared(), gmr.chiSquared(), 1e-12);
        double[] zw = wls.standardizedResiduals();
        double[] zg = gmr.standardizedResiduals();
        for (int i = 0; i < n; i++) {
            assertEquals(zw[i], zg[i], 1e-12);
        }
    }

    @Test
    void pointsExactlyOnALineGiveTheExactLine() {
        List<CalibrationPoint> pts = new ArrayList<>();
        for (int i = 0; i < FLOW.length; i++) {
            pts.add(CalibrationPoint.of(FLOW[i], 0.25 + 0.0625 * FLOW[i]));
        }
        LineFit fit = LineFitter.of(LineMethod.GAUSS_MARKOV)
                .fit(CalibrationData.of("exact", "L/s", "mV", pts).withCovariance(covariance()));
        assertEquals(0.25, fit.intercept(), 1e-12);
        assertEquals(0.0625, fit.slope(), 1e-13);
        assertEquals(0.0, fit.chiSquared(), 1e-18);
    }

    @Test
    void missingCovarianceIsReported() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LineFitter.of(LineMethod.GAUSS_MARKOV).fit(dataSet()));
        assertTrue(e.getMessage().contains("covariance matrix"), e.getMessage());
    }

    @Test
    void singularCovarianceIsReportedWithThePoint() {
        double[][] v = covariance();
        // points 2 and 3 fully correlated: the matrix is singular
        double s = Math.hypot(U_RANDOM, U_COMMON);
        v[1][2] = s * s;
        v[2][1] = s * s;
        CalibrationData d = dataSet().withCovariance(v);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LineFitter.of(LineMethod.GAUSS_MARKOV).fit(d));
        assertTrue(e.getMessage().contains("not positive definite"), e.getMessage());
        assertTrue(e.getMessage().contains("point 3"), e.getMessage());
    }
}
