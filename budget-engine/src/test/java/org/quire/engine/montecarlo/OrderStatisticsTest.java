package org.quire.engine.montecarlo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.Random;
import java.util.function.IntToDoubleFunction;
import org.junit.jupiter.api.Test;

/**
 * The tails and ranks of {@link OrderStatistics} (pilot thresholds, three-way partition, counting bins) against
 * an independent reference: a full {@link Arrays#sort} of a copy of the same values. Every order statistic must
 * be exactly the sorted array's, on random data of several shapes and sizes on both sides of the size below
 * which the array is simply sorted, with ties, all-equal values, tiny M, already ordered input, an input that
 * fools the pilot, and (through the summary) trials excluded as NaN. The coverage intervals are then checked
 * against JCGM 101:2008 7.7.1 to 7.7.3 applied to the fully sorted values.
 */
class OrderStatisticsTest {
    private static final double[] PROBABILITIES = {0.5, 0.6827, 0.9, 0.9545, 0.99, 0.999};

    /** Checks every tail rank and the requested ranks of {@code values} against the fully sorted copy. */
    private static void checkAgainstSort(double[] values, int tail, int[] ranks) {
        double[] reference = values.clone();
        Arrays.sort(reference);
        double[] a = values.clone();
        int m = a.length;
        OrderStatistics s = OrderStatistics.of(a, m, tail, ranks);
        for (int i = 0; i < tail; i++) {
            assertEquals(reference[i], a[i], "low tail rank " + i + " of " + m);
            assertEquals(reference[m - 1 - i], a[m - 1 - i], "high tail rank " + (m - 1 - i) + " of " + m);
            assertEquals(reference[i], s.value(i));
        }
        for (int r : ranks) {
            assertEquals(reference[r], s.value(r), "rank " + r + " of " + m);
        }
        double[] rest = a.clone();
        Arrays.sort(rest);
        assertArrayEquals(reference, rest, "the values are only reordered");
    }

    private static int[] ranks(int m, Random rng) {
        int[] standard = Percentiles.ranks(Percentiles.STANDARD, m);
        int[] r = Arrays.copyOf(standard, standard.length + 20);
        for (int i = standard.length; i < r.length; i++) {
            r[i] = rng.nextInt(m);
        }
        return r;
    }

    private static double[] draw(int m, IntToDoubleFunction f) {
        double[] v = new double[m];
        for (int i = 0; i < m; i++) {
            v[i] = f.applyAsDouble(i);
        }
        return v;
    }

    @Test
    void tailsAndRanksEqualAFullSortOnRandomData() {
        Random rng = new Random(16);
        int[] sizes = {2, 3, 10, 1000, OrderStatistics.SMALL, OrderStatistics.SMALL + 1, 100_003, 1_000_000};
        for (int m : sizes) {
            double[][] shapes = {
                draw(m, i -> rng.nextGaussian()),
                draw(m, i -> Math.tan(Math.PI * (rng.nextDouble() - 0.5))), // Cauchy: very heavy tails
                draw(m, i -> -Math.log(rng.nextDouble())), // exponential: skewed
                draw(m, i -> Math.rint(3 * rng.nextGaussian())), // a handful of values, many ties
            };
            for (double[] v : shapes) {
                for (double p : PROBABILITIES) {
                    int tail = m - OutputSummary.coverageCount(m, p);
                    checkAgainstSort(v, Math.max(tail, 1), ranks(m, rng));
                }
            }
        }
    }

    @Test
    void distributionSortEqualsArraysSort() {
        // the tails' distribution sort against Arrays.sort, bit for bit (-0.0 before 0.0 included), on ranges
        // of every shape that can reach it: light and heavy tails, many ties, signed zeros, extreme spreads
        Random rng = new Random(1616);
        int[] sizes = {OrderStatistics.SMALL_SORT - 1, OrderStatistics.SMALL_SORT, 10_007, 250_000};
        for (int m : sizes) {
            double[][] shapes = {
                draw(m, i -> rng.nextGaussian()),
                draw(m, i -> Math.tan(Math.PI * (rng.nextDouble() - 0.5))),
                draw(m, i -> -Math.log(rng.nextDouble())),
                draw(m, i -> Math.rint(3 * rng.nextGaussian())),
                draw(m, i -> rng.nextBoolean() ? 0.0 : -0.0),
                draw(m, i -> rng.nextInt(5) == 0 ? (rng.nextBoolean() ? 0.0 : -0.0) : rng.nextGaussian() * 1e-300),
                draw(m, i -> (rng.nextBoolean() ? -1 : 1) * Double.MAX_VALUE * rng.nextDouble()),
                draw(m, i -> 1000.0 + Math.ulp(1000.0) * rng.nextInt(7)),
                draw(m, i -> i == 0 ? 1e300 : rng.nextGaussian()),
                draw(m, i -> m - i),
            };
            for (double[] v : shapes) {
                double[] reference = v.clone();
                Arrays.sort(reference);
                double[] a = new double[m + 6];
                System.arraycopy(v, 0, a, 3, m);
                OrderStatistics.sort(a, 3, 3 + m);
                assertArrayEquals(reference, Arrays.copyOfRange(a, 3, 3 + m), "sorted " + m + " values");
            }
        }
    }

    @Test
    void allEqualValuesAndOrderedInput() {
        Random rng = new Random(7);
        int m = 200_000;
        checkAgainstSort(draw(m, i -> 1.5), 9100, ranks(m, rng));
        checkAgainstSort(draw(m, i -> i * 1e-3), 9100, ranks(m, rng));
        checkAgainstSort(draw(m, i -> -i * 1e-3), 9100, ranks(m, rng));
        // two values only: the thresholds fall on ties
        checkAgainstSort(draw(m, i -> rng.nextDouble() < 0.97 ? 0.0 : 1.0), 9100, ranks(m, rng));
    }

    @Test
    void anInputThatFoolsThePilotIsStillRight() {
        // the pilot takes every third value here; make exactly those the largest, so that its thresholds are
        // far too high and the check after the partition must send the array to the full sort
        int m = 100_000;
        int stride = m / Math.min(OrderStatistics.PILOT, m);
        double[] v = draw(m, i -> i % stride == 0 ? 1e9 + i : (i * 7919L) % m);
        checkAgainstSort(v, 4550, ranks(m, new Random(3)));
    }

    @Test
    void tinyAndWholeTails() {
        checkAgainstSort(new double[] {4.0}, 1, new int[] {0});
        checkAgainstSort(new double[] {2.0, 1.0}, 1, new int[] {0, 1});
        checkAgainstSort(draw(50_000, i -> (i * 31) % 977), 25_000, new int[] {12_345});
    }

    /**
     * JCGM 101:2008 7.7.1 to 7.7.3 applied directly to the fully sorted finite values: q, the symmetric
     * interval [y_(r), y_(r+q)] and the shortest one, with trials that gave NaN excluded first (7.5 counts only
     * the model values that exist).
     */
    @Test
    void summaryIntervalsMatchTheClauseOnSortedValuesWithExcludedTrials() {
        Random rng = new Random(101);
        for (int m : new int[] {5_000, 300_000}) {
            double[] v = draw(m, i -> i % 97 == 0 ? Double.NaN : Math.exp(0.3 * rng.nextGaussian()));
            double[] finite = Arrays.stream(v).filter(Double::isFinite).sorted().toArray();
            int n = finite.length;
            for (double p : PROBABILITIES) {
                Moments moments = Moments.ofBlock(new double[][] {v}, m);
                OutputSummary s = OutputSummary.summarize(0, v.clone(), m, moments, p);
                int q = (int) Math.floor(p * n + 0.5); // 7.7.1: pM, or the integer part of pM + 1/2
                int tail = n - q;
                int r = tail % 2 == 0 ? tail / 2 : (tail + 1) / 2; // 7.7.2, 1-based
                assertEquals(finite[r - 1], s.symmetricInterval().lower(), "p = " + p);
                assertEquals(finite[r - 1 + q], s.symmetricInterval().upper(), "p = " + p);
                int best = 0; // 7.7.3, 0-based; the first of equal widths
                for (int i = 1; i < tail; i++) {
                    if (finite[i + q] - finite[i] < finite[best + q] - finite[best]) {
                        best = i;
                    }
                }
                assertEquals(finite[best], s.shortestInterval().lower(), "p = " + p);
                assertEquals(finite[best + q], s.shortestInterval().upper(), "p = " + p);
                assertEquals(m - n, s.excludedTrials());
                assertEquals(finite[0], s.minimum());
                assertEquals(finite[n - 1], s.maximum());
                // Hyndman and Fan definition 7 at P = 0.5: the median
                double h = 0.5 * (n - 1);
                double median = finite[(int) h] + (h - Math.floor(h)) * (finite[(int) Math.ceil(h)] - finite[(int) h]);
                assertEquals(median, s.median(), 1e-15 * Math.abs(median));
            }
        }
    }
}
