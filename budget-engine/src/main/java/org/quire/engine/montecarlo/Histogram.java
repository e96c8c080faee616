package org.quire.engine.montecarlo;

import java.util.Arrays;

/**
 * Counts of an output's values in equal bins, for plotting its probability density.
 *
 * <p>The bins cover the range of the values unless a few extreme values would stretch it to more than twice
 * the range of the central 99.9 % of the values (heavy tails, as of a Student t with few degrees of freedom):
 * then they cover that central range and the values outside are counted in {@link #countBelow()} and
 * {@link #countAbove()}. The number of bins follows the Freedman–Diaconis rule (bin width 2 IQR M^(-1/3)),
 * kept between 10 and 200.
 *
 * <p>Immutable and thread-safe.
 *
 * <p>References: JCGM 101:2008 7.5 (the discrete representation of the distribution function and the
 * histogram as an approximation to the density); D. Freedman, P. Diaconis, On the histogram as a density
 * estimator: L2 theory, Z. Wahrscheinlichkeitstheorie verw. Gebiete 57 (1981) 453-476.
 */
public final class Histogram {
    private final double[] edges;
    private final long[] counts;
    private final long below;
    private final long above;

    private Histogram(double[] edges, long[] counts, long below, long above) {
        this.edges = edges;
        this.counts = counts;
        this.below = below;
        this.above = above;
    }

    /**
     * @param edges ascending bin edges, one more than the counts; copied
     * @param counts the count of each bin [edges[i], edges[i+1]) (the last bin closed); copied
     * @param below values below the first edge
     * @param above values above the last edge
     */
    public static Histogram of(double[] edges, long[] counts, long below, long above) {
        if (edges == null || counts == null) {
            throw new IllegalArgumentException(Messages.nullArgument(edges == null ? "edges" : "counts"));
        }
        if (counts.length < 1 || edges.length != counts.length + 1) {
            throw new IllegalArgumentException("a histogram needs at least one bin and one edge more than bins, not "
                    + edges.length + " edges for " + counts.length + " bins");
        }
        for (int i = 0; i < edges.length; i++) {
            if (!Double.isFinite(edges[i]) || (i > 0 && edges[i] < edges[i - 1])) {
                throw new IllegalArgumentException("histogram edge " + i + " (" + edges[i]
                        + ") must be finite and not below the previous edge");
            }
        }
        for (long c : counts) {
            if (c < 0) {
                throw new IllegalArgumentException("histogram count must not be negative, not " + c);
            }
        }
        if (below < 0 || above < 0) {
            throw new IllegalArgumentException("counts outside the histogram must not be negative, not "
                    + below + " and " + above);
        }
        return new Histogram(edges.clone(), counts.clone(), below, above);
    }

    /** Builds the histogram of a[0..size-1] over [lo, hi] with the given number of bins. */
    static Histogram build(double[] a, int size, double lo, double hi, int bins) {
        long[] counts = new long[bins];
        double[] edges = new double[bins + 1];
        long below = 0;
        long above = 0;
        if (!(hi > lo)) {
            edges = new double[] {lo, hi};
            counts = new long[] {0};
            for (int t = 0; t < size; t++) {
                double v = a[t];
                if (v < lo) {
                    below++;
                } else if (v > hi) {
                    above++;
                } else {
                    counts[0]++;
                }
            }
            return new Histogram(edges, counts, below, above);
        }
        double width = (hi - lo) / bins;
        for (int i = 0; i <= bins; i++) {
            edges[i] = lo + width * i;
        }
        edges[bins] = hi;
        double scale = bins / (hi - lo);
        for (int t = 0; t < size; t++) {
            double v = a[t];
            if (v < lo) {
                below++;
            } else if (v > hi) {
                above++;
            } else {
                int b = (int) ((v - lo) * scale);
                counts[b >= bins ? bins - 1 : b]++;
            }
        }
        return new Histogram(edges, counts, below, above);
    }

    /** @return the number of bins */
    public int binCount() {
        return counts.length;
    }

    /** @return a copy of the bin edges, {@link #binCount()} + 1 of them */
    public double[] edges() {
        return edges.clone();
    }

    /** @return a copy of the counts */
    public long[] counts() {
        return counts.clone();
    }

    /** @return the count of bin i */
    public long count(int i) {
        return counts[i];
    }

    /** @return the values below the first edge */
    public long countBelow() {
        return below;
    }

    /** @return the values above the last edge */
    public long countAbove() {
        return above;
    }

    /** @return every value counted, inside and outside the bins */
    public long total() {
        long s = below + above;
        for (long c : counts) {
            s += c;
        }
        return s;
    }

    /**
     * @return the estimated probability density in bin i: count / (total x bin width); zero-width histograms
     *     (an output that does not vary) give infinity for a non-empty bin
     */
    public double density(int i) {
        return counts[i] / (total() * (edges[i + 1] - edges[i]));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Histogram h && Arrays.equals(edges, h.edges) && Arrays.equals(counts, h.counts)
                && below == h.below && above == h.above;
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(edges) + Arrays.hashCode(counts);
    }

    @Override
    public String toString() {
        return "Histogram[" + counts.length + " bins over [" + edges[0] + ", " + edges[edges.length - 1]
                + "], below " + below + ", above " + above + "]";
    }
}
