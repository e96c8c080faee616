package org.quire.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The numbers of the CSV tables ({@code evaluate --format csv}, {@code batch}) are written directly, and must be
 * character for character what the JDK's formatter writes for {@code %.10g} (java.util.Formatter, the
 * independent implementation checked against): random doubles over the whole range, and the places where the
 * rounding or the notation changes.
 */
class TenDigitsTest {
    private static void check(double v) {
        if (!Double.isFinite(v)) {
            return; // num writes inf and NaN itself
        }
        assertEquals(String.format(Locale.ROOT, "%.10g", v), EvaluateCommand.tenDigits(v), "for " + v);
    }

    @Test
    void randomDoublesOverTheWholeRangeAreWrittenAsTheFormatterWritesThem() {
        SplittableRandom r = new SplittableRandom(16);
        for (int i = 0; i < 200_000; i++) {
            double v = Double.longBitsToDouble(r.nextLong());
            if (Double.isFinite(v)) {
                check(v);
            }
            check((r.nextDouble() - 0.5) * Math.pow(10, r.nextInt(-30, 30)));
        }
    }

    @Test
    void roundingCarriesAndTheChangeOfNotationAreWrittenAsTheFormatterWritesThem() {
        double[] edges = {0.0, -0.0, 1, -1, 0.5, 9.9999999995, 9.99999999949, 99999.999995, 9999999999.5,
            9999999999.4, 9999999999.0, 1e10, 1e-4, 9.9999999995e-5, 9.99999999949e-5, 0.00012345678905,
            1.23456789045, 1.234567890500001, 2.5e-7, 123456789.05, Double.MIN_VALUE, Double.MAX_VALUE,
            Double.MIN_NORMAL, 1e100, 1e-100, 1e300, -9.9999999995e300, 0.1, 0.2, 0.3, 1.0 / 3, 2.0 / 3,
            1e21, 1e22, 1e23, 123456789012345678.0, 4.35, 0.000999999999951};
        for (double v : edges) {
            check(v);
            check(-v);
            check(Math.nextUp(v));
            check(Math.nextDown(v));
        }
        SplittableRandom r = new SplittableRandom(17);
        for (int i = 0; i < 100_000; i++) {
            // ten digits and a five after them: where half up decides
            long digits = r.nextLong(1_000_000_000L, 10_000_000_000L);
            double v = (digits + 0.5) * Math.pow(10, r.nextInt(-25, 25) - 10);
            check(v);
            check(Math.nextUp(v));
            check(Math.nextDown(v));
        }
    }
}
