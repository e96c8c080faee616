package org.quire.engine.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The checking factories of calibration points and data sets: bad data gives errors naming the point. */
class CalibrationDataTest {

    private static List<CalibrationPoint> three() {
        return List.of(CalibrationPoint.of(1, 2, 0.1, 0.1), CalibrationPoint.of(2, 4, 0.1, 0.1),
                CalibrationPoint.of(3, 6, 0.1, 0.1));
    }

    private static String message(Runnable r) {
        return assertThrows(IllegalArgumentException.class, r::run).getMessage();
    }

    @Test
    void fewerThanThreePointsAreRejected() {
        String m = message(() -> CalibrationData.of("two", "L/s", "Hz", three().subList(0, 2)));
        assertEquals("a calibration line needs at least 3 points, got 2", m);
    }

    @Test
    void allXEqualIsRejected() {
        List<CalibrationPoint> pts = List.of(CalibrationPoint.of(5, 1), CalibrationPoint.of(5, 2),
                CalibrationPoint.of(5, 3));
        assertEquals("all 3 points have x = 5.0; the slope cannot be determined",
                message(() -> CalibrationData.of("flat", "L/s", "Hz", pts)));
    }

    @Test
    void notANumberAndNegativeUncertaintyAreRejectedByName() {
        assertEquals("y must be a finite number, not NaN", message(() -> CalibrationPoint.of(1, Double.NaN)));
        assertEquals("u(x) must not be negative, not -0.1", message(() -> CalibrationPoint.of(1, 2, -0.1, 0.1)));
        assertEquals("u(y) must be a finite number, not Infinity",
                message(() -> CalibrationPoint.of(1, 2, 0.1, Double.POSITIVE_INFINITY)));
    }

    @Test
    void missingPointIsNamedByItsNumber() {
        List<CalibrationPoint> pts = new ArrayList<>(three());
        pts.add(1, null);
        assertEquals("point 2: the point is missing", message(() -> CalibrationData.of("gap", "", "", pts)));
    }

    @Test
    void blankNameIsRejected() {
        assertEquals("data set name must not be blank", message(() -> CalibrationData.of(" ", "", "", three())));
    }

    @Test
    void covarianceMatrixIsChecked() {
        CalibrationData d = CalibrationData.of("cov", "", "", three());
        assertTrue(message(() -> d.withCovariance(new double[2][2])).contains("must be 3 x 3"));
        double[][] asym = {{0.01, 0.001, 0}, {0.002, 0.01, 0}, {0, 0, 0.01}};
        assertTrue(message(() -> d.withCovariance(asym)).contains("entry (2, 1)"));
        double[][] zeroVar = {{0.01, 0, 0}, {0, 0, 0}, {0, 0, 0.01}};
        assertTrue(message(() -> d.withCovariance(zeroVar)).contains("variance of y at point 2"));
        double[][] disagree = {{0.01, 0, 0}, {0, 0.01, 0}, {0, 0, 0.04}};
        assertTrue(message(() -> d.withCovariance(disagree)).startsWith("point 3: u(y) = 0.1 disagrees"));
        double[][] nan = {{0.01, 0, 0}, {0, 0.01, Double.NaN}, {0, Double.NaN, 0.01}};
        assertTrue(message(() -> d.withCovariance(nan)).contains("entry (2, 3)"));
        double[][] good = {{0.01, 0.005, 0}, {0.005, 0.01, 0}, {0, 0, 0.01}};
        CalibrationData withCov = d.withCovariance(good);
        assertTrue(withCov.hasCovariance());
        good[0][1] = 99; // copied in
        assertEquals(0.005, withCov.covariance().orElseThrow()[0][1]);
        assertFalse(d.hasCovariance());
    }

    @Test
    void methodsParseFromTheirAbbreviations() {
        assertEquals(LineMethod.GENERALIZED_DISTANCE, LineMethod.parse("gdr"));
        assertEquals(LineMethod.ORDINARY_LEAST_SQUARES, LineMethod.parse("ORDINARY_LEAST_SQUARES"));
        assertTrue(message(() -> LineMethod.parse("ODR")).contains("expected one of OLS, WLS, GDR, GMR"));
    }
}
