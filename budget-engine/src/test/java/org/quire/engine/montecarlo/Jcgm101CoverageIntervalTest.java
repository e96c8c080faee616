package org.quire.engine.montecarlo;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * JCGM 101:2008 7.5 to 7.7: coverage intervals from the sorted values, on value sets small enough to work out by
 * hand from the clause's rules (q = pM or the integer part of pM + 1/2; probabilistically symmetric interval
 * [y_(r), y_(r+q)] with r = (M - q)/2 or (M - q + 1)/2; shortest interval the one of least width), and the
 * numerical tolerance of 7.9.2.
 */
class Jcgm101CoverageIntervalTest {

    private static OutputSummary summarize(double[] values, double p) {
        Moments m = Moments.ofBlock(new double[][] {values}, values.length);
        return OutputSummary.summarize(0, values.clone(), values.length, m, p);
    }

    /** 1..n in a shuffled order, so that the summary has to put them in order itself. */
    private static double[] shuffled(double[] sorted, long seed) {
        double[] v = sorted.clone();
        Random r = new Random(seed);
        for (int i = v.length - 1; i > 0; i--) {
            int j = r.nextInt(i + 1);
            double t = v[i];
            v[i] = v[j];
            v[j] = t;
        }
        return v;
    }

    @Test
    void coverageCountIsPmOrTheIntegerPartOfPmPlusOneHalf() {
        // JCGM 101:2008 7.7.1
        assertEquals(90, OutputSummary.coverageCount(100, 0.90));
        assertEquals(96, OutputSummary.coverageCount(101, 0.95)); // pM = 95.95
        assertEquals(950_000, OutputSummary.coverageCount(1_000_000, 0.95));
    }

    @Test
    void evenlySpacedValuesGiveTheHandWorkedIntervals() {
        // values 1..100, p = 0.9: q = 90, M - q = 10, r = 5: symmetric [y_5, y_95] = [5, 95]; every window of
        // q + 1 values has width 90, and the first, [y_1, y_91] = [1, 91], is taken
        double[] v = new double[100];
        for (int i = 0; i < 100; i++) {
            v[i] = i + 1;
        }
        OutputSummary s = summarize(shuffled(v, 1), 0.9);
        assertEquals(5.0, s.symmetricInterval().lower());
        assertEquals(95.0, s.symmetricInterval().upper());
        assertEquals(1.0, s.shortestInterval().lower());
        assertEquals(91.0, s.shortestInterval().upper());
        assertEquals(50.5, s.mean(), 1e-12);
        assertEquals(Math.sqrt(100.0 * 101.0 / 12.0), s.standardUncertainty(), 1e-12); // var of 1..n: n(n+1)/12
        assertEquals(50.5, s.median(), 1e-12);
        assertEquals(1.0, s.minimum());
        assertEquals(100.0, s.maximum());
    }

    @Test
    void oddTailCountUsesRIsMMinusQPlusOneOverTwo() {
        // values 1..101, p = 0.95: q = 96, M - q = 5 (odd), r = 3: symmetric [y_3, y_99] = [3, 99]
        double[] v = new double[101];
        for (int i = 0; i < 101; i++) {
            v[i] = i + 1;
        }
        OutputSummary s = summarize(shuffled(v, 2), 0.95);
        assertEquals(3.0, s.symmetricInterval().lower());
        assertEquals(99.0, s.symmetricInterval().upper());
    }

    @Test
    void skewedValuesGiveAShortestIntervalAtTheDenseEnd() {
        // values k^2, k = 1..200, p = 0.9: q = 180; widths (r + 180)^2 - r^2 grow with r, so the shortest is
        // [y_1, y_181] = [1, 181^2]; symmetric r = 10: [100, 190^2]
        double[] v = new double[200];
        for (int i = 0; i < 200; i++) {
            v[i] = (i + 1.0) * (i + 1.0);
        }
        OutputSummary s = summarize(shuffled(v, 3), 0.9);
        assertEquals(1.0, s.shortestInterval().lower());
        assertEquals(181.0 * 181.0, s.shortestInterval().upper());
        assertEquals(100.0, s.symmetricInterval().lower());
        assertEquals(190.0 * 190.0, s.symmetricInterval().upper());
    }

    @Test
    void largeShuffledSetGivesTheSameIntervalsAsAFullSort() {
        // 7.7 on 300 001 values 0..300000 in random order, p = 0.95: q = 285 001, M - q = 15 000, r = 7 500:
        // symmetric [y_7500, y_292501] = [7499, 292500]
        int m = 300_001;
        double[] v = new double[m];
        for (int i = 0; i < m; i++) {
            v[i] = i;
        }
        OutputSummary s = summarize(shuffled(v, 4), 0.95);
        assertEquals(7499.0, s.symmetricInterval().lower());
        assertEquals(292_500.0, s.symmetricInterval().upper());
        assertEquals(0.0, s.shortestInterval().lower());
        assertEquals(285_001.0, s.shortestInterval().upper());
        // percentiles at P interpolate at h = P (M - 1): P = 0.025 gives 7500 exactly
        Percentiles pc = s.percentiles();
        for (int i = 0; i < pc.size(); i++) {
            assertEquals(pc.probability(i) * (m - 1), pc.value(i), 1e-9);
        }
        assertEquals(m, s.histogram().total());
    }

    @Test
    void numericalToleranceIsHalfAUnitInTheLastSignificantDigit() {
        // JCGM 101:2008 7.9.2: u written as c x 10^l, c with n_dig digits, delta = 10^l / 2 (recomputed)
        assertEquals(0.0005, GumComparison.numericalTolerance(0.0754, 2), 1e-18);
        assertEquals(0.005, GumComparison.numericalTolerance(0.0754, 1), 1e-18);
        assertEquals(0.05, GumComparison.numericalTolerance(2.0, 2), 1e-18);
        assertEquals(0.5, GumComparison.numericalTolerance(10.149, 2), 1e-18);
        assertEquals(5.0, GumComparison.numericalTolerance(10.149, 1), 1e-18);
        // rounding that carries into a new digit: 0.0996 to one digit is 0.1 = 1 x 10^-1
        assertEquals(0.05, GumComparison.numericalTolerance(0.0996, 1), 1e-18);
        assertEquals(0.00005, GumComparison.numericalTolerance(0.0539, 3), 1e-18);
    }
}
