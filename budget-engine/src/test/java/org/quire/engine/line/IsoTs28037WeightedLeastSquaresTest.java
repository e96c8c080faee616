package org.quire.engine.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.stat.regression.GLSMultipleLinearRegression;
import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.junit.jupiter.api.Test;

/**
 * ISO/TS 28037:2010 clause 6: weighted least squares with known u(y_i), its chi-squared validation (6.3) and
 * the inverse use of the line (6.6). Checked against the standard's numerical example (from memory), against
 * Commons Math's generalized least-squares regression as an independent computation, and against exact
 * solutions.
 */
class IsoTs28037WeightedLeastSquaresTest {

    private static final CalibrationData EXAMPLE = LineTestData.load("iso28037-clause6-wls.csv", "", "");
    private static final LineFit FIT = LineFitter.of(LineMethod.WEIGHTED_LEAST_SQUARES).fit(EXAMPLE);

    @Test
    void numericalExampleOfClause6() {
        // ISO/TS 28037:2010 clause 6 numerical example, from memory (printed to three decimals)
        assertEquals(0.885, FIT.intercept(), 0.0005);
        assertEquals(0.530, FIT.interceptUncertainty(), 0.0005);
        assertEquals(4.131, FIT.chiSquared(), 0.0005);
        assertEquals(4, FIT.dof());
        // chi-squared 95 % quantile for nu = 4: statistical tables, from memory
        assertEquals(9.488, FIT.chiSquaredQuantile(), 0.0005);
        assertEquals(Consistency.CONSISTENT, FIT.consistency());
    }

    @Test
    void agreesWithCommonsMathGeneralizedLeastSquares() {
        int n = EXAMPLE.size();
        double[] y = new double[n];
        double[][] x = new double[n][1];
        double[][] cov = new double[n][n];
        for (int i = 0; i < n; i++) {
            CalibrationPoint p = EXAMPLE.points().get(i);
            x[i][0] = p.x();
            y[i] = p.y();
            cov[i][i] = p.uy() * p.uy();
        }
        GLSMultipleLinearRegression ref = new GLSMultipleLinearRegression();
        ref.newSampleData(y, x, cov);
        double[] beta = ref.estimateRegressionParameters();
        double[][] v = ref.estimateRegressionParametersVariance(); // (X^T U^-1 X)^-1, not rescaled
        assertEquals(beta[0], FIT.intercept(), 1e-12);
        assertEquals(beta[1], FIT.slope(), 1e-12);
        assertEquals(Math.sqrt(v[0][0]), FIT.interceptUncertainty(), 1e-12);
        assertEquals(Math.sqrt(v[1][1]), FIT.slopeUncertainty(), 1e-12);
        assertEquals(v[0][1], FIT.covariance(), 1e-12);
        assertEquals(Double.POSITIVE_INFINITY, FIT.uncertaintyDof());
        double chi2 = 0;
        double[] r = FIT.residuals();
        double[] z = FIT.standardizedResiduals();
        for (int i = 0; i < n; i++) {
            double ri = y[i] - beta[0] - beta[1] * x[i][0];
            assertEquals(ri, r[i], 1e-12);
            assertEquals(ri / EXAMPLE.points().get(i).uy(), z[i], 1e-12);
            chi2 += z[i] * z[i];
        }
        assertEquals(chi2, FIT.chiSquared(), 1e-12);
    }

    @Test
    void pointsExactlyOnALineGiveZeroResidualsAndTheExactLine() {
        List<CalibrationPoint> pts = new ArrayList<>();
        for (int i = 1; i <= 5; i++) {
            pts.add(CalibrationPoint.of(i, 0.5 + 2.0 * i, 0, 0.1 * i));
        }
        LineFit fit = LineFitter.of(LineMethod.WEIGHTED_LEAST_SQUARES)
                .fit(CalibrationData.of("exact", "", "", pts));
        assertEquals(0.5, fit.intercept(), 1e-13);
        assertEquals(2.0, fit.slope(), 1e-13);
        for (double r : fit.residuals()) {
            assertEquals(0.0, r, 1e-13);
        }
        assertEquals(0.0, fit.chiSquared(), 1e-20);
    }

    @Test
    void equalWeightsGiveTheOrdinaryLeastSquaresEstimates() {
        List<CalibrationPoint> pts = new ArrayList<>();
        for (CalibrationPoint p : EXAMPLE.points()) {
            pts.add(CalibrationPoint.of(p.x(), p.y(), 0, 0.7));
        }
        CalibrationData equal = CalibrationData.of("equal weights", "", "", pts);
        LineFit wls = LineFitter.of(LineMethod.WEIGHTED_LEAST_SQUARES).fit(equal);
        LineFit ols = LineFitter.of(LineMethod.ORDINARY_LEAST_SQUARES).fit(equal);
        OLSMultipleLinearRegression ref = new OLSMultipleLinearRegression();
        double[] y = pts.stream().mapToDouble(CalibrationPoint::y).toArray();
        double[][] x = pts.stream().map(p -> new double[] {p.x()}).toArray(double[][]::new);
        ref.newSampleData(y, x);
        double[] beta = ref.estimateRegressionParameters();
        assertEquals(beta[0], wls.intercept(), 1e-12);
        assertEquals(beta[1], wls.slope(), 1e-12);
        assertEquals(ols.intercept(), wls.intercept(), 1e-12);
        assertEquals(ols.slope(), wls.slope(), 1e-12);
        // the uncertainties differ in kind: u = 0.7 stated versus s from the residuals, scaled as s / 0.7
        double scale = ols.residualStandardDeviation() / 0.7;
        assertEquals(ols.slopeUncertainty(), wls.slopeUncertainty() * scale, 1e-12);
        // ordinary least squares with stated u(y) also reports the chi-squared check
        assertEquals(wls.chiSquared(), ols.chiSquared(), 1e-12);
    }

    @Test
    void inverseUseMatchesAnIndependentPropagationOfTheCovarianceMatrix() {
        // ISO/TS 28037:2010 6.6: x for a new indication y0 with u(y0); checked by J V J^T with a numerical
        // Jacobian of x = (y0 - a) / b over (a, b, y0)
        double y0 = 10.0;
        double uy0 = 0.4;
        LineEstimate x = FIT.inverse(y0, uy0);
        double a = FIT.intercept();
        double b = FIT.slope();
        assertEquals((y0 - a) / b, x.value(), 1e-12);
        double[] p = {a, b, y0};
        double[] jac = new double[3];
        for (int k = 0; k < 3; k++) {
            double h = 1e-6 * Math.max(1.0, Math.abs(p[k]));
            double[] up = p.clone();
            double[] dn = p.clone();
            up[k] += h;
            dn[k] -= h;
            jac[k] = ((up[2] - up[0]) / up[1] - (dn[2] - dn[0]) / dn[1]) / (2 * h);
        }
        RealMatrix v = new Array2DRowRealMatrix(new double[][] {
                {FIT.interceptUncertainty() * FIT.interceptUncertainty(), FIT.covariance(), 0},
                {FIT.covariance(), FIT.slopeUncertainty() * FIT.slopeUncertainty(), 0},
                {0, 0, uy0 * uy0}});
        RealMatrix j = new Array2DRowRealMatrix(new double[][] {jac});
        double u2 = j.multiply(v).multiply(j.transpose()).getEntry(0, 0);
        assertEquals(Math.sqrt(u2), x.standardUncertainty(), 1e-8);
        assertEquals(Double.POSITIVE_INFINITY, x.dof());
    }

    @Test
    void inconsistentDataAreFlagged() {
        // uncertainties ten times too small for the example's scatter: chi-squared = 100 x 4.131
        List<CalibrationPoint> pts = new ArrayList<>();
        for (CalibrationPoint p : EXAMPLE.points()) {
            pts.add(CalibrationPoint.of(p.x(), p.y(), 0, p.uy() / 10));
        }
        LineFit fit = LineFitter.of(LineMethod.WEIGHTED_LEAST_SQUARES).fit(CalibrationData.of("tight", "", "", pts));
        assertEquals(100 * FIT.chiSquared(), fit.chiSquared(), 1e-9);
        assertEquals(Consistency.INCONSISTENT, fit.consistency());
    }

    @Test
    void aPointWithoutUncertaintyOfYIsRejectedByName() {
        List<CalibrationPoint> pts = new ArrayList<>(EXAMPLE.points());
        pts.set(2, CalibrationPoint.of(3, 7.6));
        CalibrationData d = CalibrationData.of("missing u(y)", "", "", pts);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LineFitter.of(LineMethod.WEIGHTED_LEAST_SQUARES).fit(d));
        assertTrue(e.getMessage().startsWith("point 3:"), e.getMessage());
        assertTrue(e.getMessage().contains("u(y)"), e.getMessage());
    }

    @Test
    void statedUncertaintyOfXIsReportedAsUnused() {
        LineFit fit = LineFitter.of(LineMethod.WEIGHTED_LEAST_SQUARES)
                .fit(LineTestData.load("iso28037-clause7-gdr.csv", "", ""));
        assertEquals(1, fit.notes().size());
        assertTrue(fit.notes().get(0).contains("u(x)"));
    }
}
