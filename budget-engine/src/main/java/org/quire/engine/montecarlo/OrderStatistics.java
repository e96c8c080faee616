package org.quire.engine.montecarlo;

import java.util.Arrays;

/**
 * The order statistics of an output's values that its summary needs: the two tails in order (for the coverage
 * intervals of JCGM 101:2008 7.7, which use only the {@code tail} smallest and the {@code tail} largest values)
 * and a few single ranks in between (the percentiles), found without sorting or repeatedly partitioning the
 * whole array.
 *
 * <p>The method, for M values:
 * <ol>
 * <li>Pilot: a systematic sample of up to {@value #PILOT} values is sorted; its order statistics estimate the
 *     quantiles at tail/M and 1 - tail/M. The thresholds are taken {@value #MARGIN_SIGMAS} binomial standard
 *     deviations (plus two ranks) further out, so that the low threshold has at least {@code tail} values at or
 *     below it, and the high one at least {@code tail} values above it, except with negligible probability.</li>
 * <li>One pass puts every value at or below the low threshold at the front of the array and every value above
 *     the high threshold at the back (a three-way partition); the two ends are then sorted (by distribution into
 *     buckets, {@link #sort}). They hold at least
 *     the {@code tail} extreme values on each side, which are now in order. When the check fails (the pilot
 *     was unlucky, or the thresholds meet because the tails are wide) the whole array is sorted instead, so
 *     the result never depends on the pilot.</li>
 * <li>Ranks that fall between the two ends: the partition's pass counts the middle values in {@value #BINS}
 *     equal bins between the thresholds (the bin of a value never decreases as the value grows, so the bins are in
 *     order), a further pass gathers the values of the bins that hold a requested rank, and those are
 *     sorted.</li>
 * </ol>
 * Every figure is an exact order statistic of the values; none is interpolated from bins. Small arrays (up to
 * {@value #SMALL} values) are simply sorted.
 *
 * <p>Not thread-safe: it works in, and reorders, the caller's array.
 *
 * <p>References: JCGM 101:2008 7.5 (the sorted values as the discrete representation of the distribution
 * function) and 7.7 (coverage intervals from order statistics); R. W. Floyd, R. L. Rivest, Expected time bounds
 * for selection, Comm. ACM 18 (1975) 165-172 (selection from a sample's order statistics, the idea of the pilot);
 * E. W. Dijkstra, A Discipline of Programming, Prentice-Hall 1976, ch. 14 (the three-way partition).
 */
final class OrderStatistics {
    /** Arrays up to this size are sorted whole. */
    static final int SMALL = 1 << 15;
    /** Largest pilot sample. */
    static final int PILOT = 1 << 15;
    /** Distance of the thresholds from the pilot's quantile estimates, in binomial standard deviations. */
    static final double MARGIN_SIGMAS = 6.0;
    /** Bins of the counting pass over the middle values. */
    static final int BINS = 4096;
    /** Ranges shorter than this are sorted by {@link Arrays#sort(double[], int, int)}, longer by distribution. */
    static final int SMALL_SORT = 1 << 12;
    /** Values per bucket, on average, of the distribution sort. */
    static final int PER_BUCKET = 2;
    /** Buckets up to this size are sorted by straight insertion. */
    static final int INSERTION_LIMIT = 32;

    private final double[] a;
    private final int size;
    /** a[0..lowEnd) are the smallest values, sorted */
    private int lowEnd;
    /** a[highStart..size) are the largest values, sorted */
    private int highStart;
    /** requested ranks that fall in the middle, ascending, and their values */
    private int[] middleRanks = new int[0];
    private double[] middleValues = new double[0];
    /** the thresholds of the partition: the front holds the values &lt;= lowT, the back those &gt; highT */
    private double lowT;
    private double highT;
    /** middleCount[b] = the number of middle values in bin b of step 3, counted by the partition */
    private int[] middleCount;

    private OrderStatistics(double[] a, int size) {
        this.a = a;
        this.size = size;
    }

    /**
     * Puts in order the {@code tail} smallest and the {@code tail} largest of {@code a[0..size-1]} at the two
     * ends of the array and finds the values at the other {@code ranks}.
     *
     * @param a the values, all finite; reordered
     * @param size the number of values used
     * @param tail how many values at each end must be in order, 0 .. size
     * @param ranks further 0-based ranks whose values {@link #value} must give, in any order
     */
    static OrderStatistics of(double[] a, int size, int tail, int[] ranks) {
        if (size < 0 || size > a.length || tail < 0 || tail > size) {
            throw new IllegalArgumentException("order statistics of " + size + " values with tails of " + tail
                    + " in an array of " + a.length);
        }
        OrderStatistics s = new OrderStatistics(a, size);
        if (size <= SMALL || 2L * tail >= size || !s.partitionTails(tail)) {
            Arrays.sort(a, 0, size);
            s.lowEnd = size;
            s.highStart = 0;
            return s;
        }
        s.findMiddle(ranks);
        return s;
    }

    /** @return the value of 0-based rank {@code r}: a tail rank, or one of the ranks given to {@link #of} */
    double value(int r) {
        if (r < 0 || r >= size) {
            throw new IllegalArgumentException("rank " + r + " outside 0 .. " + (size - 1));
        }
        if (r < lowEnd || r >= highStart) {
            return a[r];
        }
        int i = Arrays.binarySearch(middleRanks, r);
        if (i < 0) {
            throw new IllegalArgumentException("rank " + r + " was not asked for");
        }
        return middleValues[i];
    }

    /** Steps 1 and 2 of the class description; false when the whole array must be sorted instead. */
    private boolean partitionTails(int tail) {
        int n = size;
        int pilotSize = Math.min(PILOT, n);
        double[] pilot = new double[pilotSize];
        long stride = n / pilotSize;
        for (int i = 0; i < pilotSize; i++) {
            pilot[i] = a[(int) (i * stride)];
        }
        sort(pilot, 0, pilotSize);
        double f = (double) tail / n;
        double sigma = Math.sqrt(pilotSize * f * (1.0 - f));
        int k = (int) Math.ceil(f * pilotSize + MARGIN_SIGMAS * sigma) + 2;
        if (k >= pilotSize / 2) {
            return false;
        }
        double lowT = pilot[k];
        double highT = pilot[pilotSize - 1 - k];
        if (!(lowT < highT)) {
            return false;
        }
        // three-way partition: [0, lt) <= lowT < [lt, gt) <= highT < [gt, n); the middle values are counted in
        // the bins of step 3 on the way
        double[] v = a;
        double scale = BINS / (highT - lowT);
        int last = BINS - 1;
        int[] count = new int[BINS];
        int lt = 0;
        int i = 0;
        int gt = n;
        while (i < gt) {
            double x = v[i];
            if (x <= lowT) {
                v[i++] = v[lt];
                v[lt++] = x;
            } else if (x > highT) {
                v[i] = v[--gt];
                v[gt] = x;
            } else {
                int b = (int) ((x - lowT) * scale);
                count[b > last ? last : b]++;
                i++;
            }
        }
        if (lt < tail || n - gt < tail) {
            return false;
        }
        sort(v, 0, lt);
        sort(v, gt, n);
        lowEnd = lt;
        highStart = gt;
        this.lowT = lowT;
        this.highT = highT;
        this.middleCount = count;
        return true;
    }

    /**
     * Sorts {@code v[from..to)} by distribution into about one bucket per {@value #PER_BUCKET} values of equal
     * width between the least and the greatest value, then sorting each bucket (by insertion when small). The
     * bucket of a value, floor((x - min) * scale), never decreases as x grows, so the buckets are in order; a
     * bucket that receives many values (a heavy tail) is sorted by {@link Arrays#sort(double[], int, int)}, so
     * the result is always the sorted range. Ranges of fewer than {@value #SMALL_SORT} values are sorted
     * directly.
     *
     * <p>References: D. E. Knuth, The Art of Computer Programming 3, 2nd ed., Addison-Wesley 1998, 5.2.5
     * (distribution sorting) and 5.2.1 (straight insertion).
     */
    static void sort(double[] v, int from, int to) {
        int n = to - from;
        if (n < SMALL_SORT) {
            Arrays.sort(v, from, to);
            return;
        }
        double min = v[from];
        double max = min;
        for (int t = from + 1; t < to; t++) {
            double x = v[t];
            min = Math.min(min, x);
            max = Math.max(max, x);
        }
        int buckets = n / PER_BUCKET;
        double scale = buckets / (max - min);
        if (!(max > min) || !(scale > 0) || Double.isInfinite(scale)) {
            Arrays.sort(v, from, to);
            return;
        }
        int last = buckets - 1;
        int[] start = new int[buckets + 1];
        for (int t = from; t < to; t++) {
            int b = (int) ((v[t] - min) * scale);
            start[(b > last ? last : b) + 1]++;
        }
        for (int b = 0; b < buckets; b++) {
            start[b + 1] += start[b];
        }
        double[] sorted = new double[n];
        int[] fill = Arrays.copyOf(start, buckets);
        for (int t = from; t < to; t++) {
            double x = v[t];
            int b = (int) ((x - min) * scale);
            sorted[fill[b > last ? last : b]++] = x;
        }
        // insertion keeps -0.0 and 0.0 in the order met; Arrays.sort puts -0.0 first, so zero's bucket goes there
        int zero = min <= 0.0 && max >= 0.0 ? Math.min(last, (int) ((0.0 - min) * scale)) : -1;
        for (int b = 0; b < buckets; b++) {
            int lo = start[b];
            int hi = start[b + 1];
            if (hi - lo > INSERTION_LIMIT || b == zero) {
                Arrays.sort(sorted, lo, hi);
            } else {
                for (int i = lo + 1; i < hi; i++) {
                    double x = sorted[i];
                    int j = i - 1;
                    while (j >= lo && sorted[j] > x) {
                        sorted[j + 1] = sorted[j];
                        j--;
                    }
                    sorted[j + 1] = x;
                }
            }
        }
        System.arraycopy(sorted, 0, v, from, n);
    }

    /** Step 3 of the class description. */
    private void findMiddle(int[] ranks) {
        int[] wanted = Arrays.stream(ranks).filter(r -> r >= lowEnd && r < highStart).sorted().distinct().toArray();
        middleRanks = wanted;
        middleValues = new double[wanted.length];
        if (wanted.length == 0) {
            return;
        }
        double[] v = a;
        int from = lowEnd;
        int to = highStart;
        double lo = lowT;
        double scale = BINS / (highT - lowT);
        int last = BINS - 1;
        int[] count = middleCount;
        // the bin of each wanted rank, and where each needed bin's values go in the gathered array
        int[] binOf = new int[wanted.length];
        int[] before = new int[BINS + 1];
        for (int b = 0; b < BINS; b++) {
            before[b + 1] = before[b] + count[b];
        }
        int[] slot = new int[BINS];
        Arrays.fill(slot, -1);
        int gathered = 0;
        for (int w = 0; w < wanted.length; w++) {
            int r = wanted[w] - from;
            int b = upperBin(before, r);
            binOf[w] = b;
            if (slot[b] < 0) {
                slot[b] = gathered;
                gathered += count[b];
            }
        }
        double[] g = new double[gathered];
        int[] fill = slot.clone();
        for (int t = from; t < to; t++) {
            double x = v[t];
            int b = (int) ((x - lo) * scale);
            b = b > last ? last : b;
            if (slot[b] >= 0) {
                g[fill[b]++] = x;
            }
        }
        for (int b = 0; b < BINS; b++) {
            if (slot[b] >= 0) {
                Arrays.sort(g, slot[b], slot[b] + count[b]);
            }
        }
        for (int w = 0; w < wanted.length; w++) {
            int b = binOf[w];
            middleValues[w] = g[slot[b] + (wanted[w] - from - before[b])];
        }
    }

    /** @return the bin b with before[b] &lt;= r &lt; before[b + 1] */
    private static int upperBin(int[] before, int r) {
        int lo = 0;
        int hi = before.length - 2;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (before[mid] <= r) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }
}
