package org.quire.app.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Axis ticks: steps of 1, 2 or 5 times a power of ten (P. S. Heckbert, "Nice numbers for graph labels", Graphics
 * Gems, 1990), with at least three ticks inside the axis's range, so that a narrow axis never shows one tick
 * alone (the Monte Carlo histogram of the demo's E, about -0.19 % to 0.05 %, showed only "0.0").
 */
class ChartLayoutTicksTest {
    private static int inside(double[] t, double lo, double hi) {
        int n = 0;
        for (double v : t) {
            n += v >= lo && v <= hi ? 1 : 0;
        }
        return n;
    }

    @Test
    void aNarrowAxisGetsAtLeastThreeTicksInside() {
        double lo = -0.19;
        double hi = 0.045;
        // Heckbert's loose labelling for 3 ticks: range 0.5, step 0.2: -0.2, 0, 0.2, of which only 0 is inside
        assertArrayEquals(new double[] {-0.2, 0.0, 0.2}, ChartLayout.ticks(lo, hi, 3), 1e-12);
        double[] t = ChartLayout.inside(lo, hi, 3);
        assertTrue(inside(t, lo, hi) >= 3, java.util.Arrays.toString(t));
        for (int i = 1; i < t.length; i++) {
            double step = t[i] - t[i - 1];
            double mantissa = step / Math.pow(10, Math.floor(Math.log10(step) + 1e-9));
            assertTrue(Math.abs(mantissa - 1) < 1e-6 || Math.abs(mantissa - 2) < 1e-6 || Math.abs(mantissa - 5) < 1e-6,
                    "a step of 1, 2 or 5 times a power of ten: " + step);
        }
    }
}
