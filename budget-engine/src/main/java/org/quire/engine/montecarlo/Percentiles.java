package org.quire.engine.montecarlo;

import java.util.Arrays;

/**
 * Selected percentiles of an output's values, for plotting its distribution function and for tables.
 *
 * <p>The percentile at probability P is interpolated linearly between the order statistics at positions
 * floor(h) and ceil(h), h = P (M - 1) counted from 0 (the continuous definition numbered 7 by Hyndman and
 * Fan), so that P = 0 gives the smallest and P = 1 the largest value.
 *
 * <p>Immutable and thread-safe.
 *
 * <p>References: JCGM 101:2008 7.5.1 (the distribution function from the sorted values); R. J. Hyndman,
 * Y. Fan, Sample quantiles in statistical packages, Amer. Statist. 50 (1996) 361-365, definition 7.
 */
public final class Percentiles {
    /** The probabilities at which every run reports percentiles: 0, 0.1 %, 0.5 %, 1 %, 2.5 %, 5 %, 10 % ... 1. */
    static final double[] STANDARD = {0.0, 0.001, 0.005, 0.01, 0.025, 0.05, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7,
        0.8, 0.9, 0.95, 0.975, 0.99, 0.995, 0.999, 1.0};

    private final double[] probabilities;
    private final double[] values;

    private Percentiles(double[] probabilities, double[] values) {
        this.probabilities = probabilities;
        this.values = values;
    }

    /**
     * @param probabilities ascending probabilities in [0, 1]; copied
     * @param values the percentile at each, non-decreasing; copied
     */
    public static Percentiles of(double[] probabilities, double[] values) {
        if (probabilities == null || values == null || probabilities.length != values.length) {
            throw new IllegalArgumentException("percentiles need as many values as probabilities");
        }
        for (int i = 0; i < probabilities.length; i++) {
            double p = probabilities[i];
            if (!(p >= 0 && p <= 1) || (i > 0 && !(p > probabilities[i - 1]))) {
                throw new IllegalArgumentException(Messages.probabilityOutside("percentile probability " + i, p)
                        + " and the probabilities must increase");
            }
            if (Double.isNaN(values[i]) || (i > 0 && values[i] < values[i - 1])) {
                throw new IllegalArgumentException("percentile values must not decrease, value " + i + " is "
                        + values[i]);
            }
        }
        return new Percentiles(probabilities.clone(), values.clone());
    }

    /** 0-based ranks needed to interpolate the percentiles at {@code probabilities} among {@code size} values. */
    static int[] ranks(double[] probabilities, int size) {
        int[] r = new int[2 * probabilities.length];
        for (int i = 0; i < probabilities.length; i++) {
            double h = probabilities[i] * (size - 1);
            r[2 * i] = (int) Math.floor(h);
            r[2 * i + 1] = (int) Math.ceil(h);
        }
        return r;
    }

    /** The percentiles of {@code size} values whose order statistics at {@link #ranks} {@code s} gives. */
    static Percentiles fromOrderStatistics(OrderStatistics s, int size, double[] probabilities) {
        double[] v = new double[probabilities.length];
        for (int i = 0; i < probabilities.length; i++) {
            double h = probabilities[i] * (size - 1);
            int lo = (int) Math.floor(h);
            int hi = (int) Math.ceil(h);
            double low = s.value(lo);
            v[i] = low + (h - lo) * (s.value(hi) - low);
            if (i > 0 && v[i] < v[i - 1]) {
                v[i] = v[i - 1]; // guard against rounding in the interpolation
            }
        }
        return new Percentiles(probabilities.clone(), v);
    }

    /** @return the number of percentiles */
    public int size() {
        return values.length;
    }

    /** @return a copy of the probabilities */
    public double[] probabilities() {
        return probabilities.clone();
    }

    /** @return a copy of the percentile values */
    public double[] values() {
        return values.clone();
    }

    /** @return the i-th probability */
    public double probability(int i) {
        return probabilities[i];
    }

    /** @return the i-th percentile value */
    public double value(int i) {
        return values[i];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Percentiles p && Arrays.equals(probabilities, p.probabilities)
                && Arrays.equals(values, p.values);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(probabilities) + Arrays.hashCode(values);
    }

    @Override
    public String toString() {
        return "Percentiles" + Arrays.toString(values);
    }
}
