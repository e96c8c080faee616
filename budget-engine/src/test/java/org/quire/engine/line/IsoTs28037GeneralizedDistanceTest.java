package org.quire.engine.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.util.Pair;
import org.junit.jupiter.api.Test;

/**
 * ISO/TS 28037:2010 clause 7: generalized distance regression with uncertainties in x and y. Checked against
 * the standard's numerical example (from memory), against a direct minimisation of the full objective over
 * a, b and the footpoints by Commons Math's Levenberg-Marquardt optimizer, and against its limit u(x) -&gt; 0
 * (weighted least squares, clause 6).
 */
class IsoTs28037GeneralizedDistanceTest {

    private static final CalibrationData EXAMPLE = LineTestData.load("iso28037-clause7-gdr.csv", "", "");
    private static final LineFit FIT = LineFitter.of(LineMethod.GENERALIZED_DISTANCE).fit(EXAMPLE);

    @Test
    void numericalExampleOfClause7() {
        // ISO/TS 28037:2010 clause 7 numerical example, from memory (printed to four decimals)
        assertEquals(0.5788, FIT.intercept(), 0.00005);
        assertEquals(2.1597, FIT.slope(), 0.00005);
        assertEquals(0.4764, FIT.interceptUncertainty(), 0.00005);
        assertEquals(0.1355, FIT.slopeUncertainty(), 0.00005);
        assertEquals(-0.0577, FIT.covariance(), 0.00005);
        assertEquals(2.743, FIT.chiSquared(), 0.0005);
        assertEquals(Consistency.CONSISTENT, FIT.consistency());
        assertTrue(FIT.iterations() > 1);
    }

    @Test
    void agreesWithDirectMinimisationOverLineAndFootpoints() {
        int n = EXAMPLE.size();
        double[] x = new double[n];
        double[] y = new double[n];
        double[] ux = new double[n];
        double[] uy = new double[n];
        for (int i = 0; i < n; i++) {
            CalibrationPoint p = EXAMPLE.points().get(i);
            x[i] = p.x();
            y[i] = p.y();
            ux[i] = p.ux();
            uy[i] = p.uy();
        }
        // parameters (a, b, X_1..X_n); residuals (x_i - X_i)/u(x_i) and (y_i - a - b X_i)/u(y_i)
        double[] start = new double[n + 2];
        start[1] = 1.0;
        System.arraycopy(x, 0, start, 2, n);
        LeastSquaresOptimizer.Optimum opt = new LevenbergMarquardtOptimizer()
                .withCostRelativeTolerance(1e-15).withParameterRelativeTolerance(1e-15).withOrthoTolerance(1e-15)
                .optimize(new LeastSquaresBuilder()
                        .model(point -> {
                            double[] q = point.toArray();
                            double[] res = new double[2 * n];
                            double[][] jac = new double[2 * n][n + 2];
                            for (int i = 0; i < n; i++) {
                                double xi = q[i + 2];
                                res[i] = (xi - x[i]) / ux[i];
                                jac[i][i + 2] = 1 / ux[i];
                                res[n + i] = (q[0] + q[1] * xi - y[i]) / uy[i];
                                jac[n + i][0] = 1 / uy[i];
                                jac[n + i][1] = xi / uy[i];
                                jac[n + i][i + 2] = q[1] / uy[i];
                            }
                            return new Pair<>(new ArrayRealVector(res), new Array2DRowRealMatrix(jac));
                        })
                        .target(new double[2 * n])
                        .start(start)
                        .maxEvaluations(10000)
                        .maxIterations(10000)
                        .build());
        double[] q = opt.getPoint().toArray();
        RealMatrix cov = opt.getCovariances(1e-14);
        assertEquals(q[0], FIT.intercept(), 1e-8);
        assertEquals(q[1], FIT.slope(), 1e-8);
        assertEquals(Math.sqrt(cov.getEntry(0, 0)), FIT.interceptUncertainty(), 1e-7);
        assertEquals(Math.sqrt(cov.getEntry(1, 1)), FIT.slopeUncertainty(), 1e-7);
        assertEquals(cov.getEntry(0, 1), FIT.covariance(), 1e-7);
        assertEquals(opt.getCost() * opt.getCost(), FIT.chiSquared(), 1e-8);
    }

    @Test
    void vanishingUncertaintyOfXReducesToWeightedLeastSquares() {
        List<CalibrationPoint> pts = new ArrayList<>();
        for (CalibrationPoint p : EXAMPLE.points()) {
            pts.add(CalibrationPoint.of(p.x(), p.y(), 1e-9, p.uy()));
        }
        CalibrationData d = CalibrationData.of("u(x) small", "", "", pts);
        LineFit gdr = LineFitter.of(LineMethod.GENERALIZED_DISTANCE).fit(d);
        LineFit wls = LineFitter.of(LineMethod.WEIGHTED_LEAST_SQUARES).fit(d);
        assertEquals(wls.intercept(), gdr.intercept(), 1e-9);
        assertEquals(wls.slope(), gdr.slope(), 1e-9);
        assertEquals(wls.interceptUncertainty(), gdr.interceptUncertainty(), 1e-9);
        assertEquals(wls.slopeUncertainty(), gdr.slopeUncertainty(), 1e-9);
        assertEquals(wls.covariance(), gdr.covariance(), 1e-9);
        assertEquals(wls.chiSquared(), gdr.chiSquared(), 1e-9);
    }

    @Test
    void pointsExactlyOnALineGiveZeroResidualsAndTheExactLine() {
        List<CalibrationPoint> pts = new ArrayList<>();
        for (int i = 1; i <= 6; i++) {
            pts.add(CalibrationPoint.of(i, 0.5 + 2.0 * i, 0.1, 0.2));
        }
        LineFit fit = LineFitter.of(LineMethod.GENERALIZED_DISTANCE).fit(CalibrationData.of("exact", "", "", pts));
        assertEquals(0.5, fit.intercept(), 1e-12);
        assertEquals(2.0, fit.slope(), 1e-12);
        for (double r : fit.residuals()) {
            assertEquals(0.0, r, 1e-12);
        }
    }

    @Test
    void standardizedResidualsCombineBothUncertainties() {
        double[] r = FIT.residuals();
        double[] z = FIT.standardizedResiduals();
        double b = FIT.slope();
        double chi2 = 0;
        for (int i = 0; i < r.length; i++) {
            CalibrationPoint p = EXAMPLE.points().get(i);
            assertEquals(p.y() - FIT.intercept() - b * p.x(), r[i], 1e-12);
            assertEquals(r[i] / Math.hypot(p.uy(), b * p.ux()), z[i], 1e-12);
            chi2 += z[i] * z[i];
        }
        assertEquals(chi2, FIT.chiSquared(), 1e-12);
    }

    @Test
    void referenceShiftMovesTheInterceptOnly() {
        LineFit shifted = LineFitter.of(LineMethod.GENERALIZED_DISTANCE).withReferenceX(3.0).fit(EXAMPLE);
        assertEquals(FIT.slope(), shifted.slope(), 1e-9);
        assertEquals(FIT.intercept() + 3.0 * FIT.slope(), shifted.intercept(), 1e-9);
        assertEquals(FIT.valueAt(5.0).standardUncertainty(), shifted.valueAt(5.0).standardUncertainty(), 1e-9);
    }

    @Test
    void iterationLimitReachedIsReported() {
        ArithmeticException e = assertThrows(ArithmeticException.class,
                () -> LineFitter.of(LineMethod.GENERALIZED_DISTANCE).withIterationLimit(1).fit(EXAMPLE));
        assertTrue(e.getMessage().contains("did not converge within the limit of 1 iterations"), e.getMessage());
    }
}
