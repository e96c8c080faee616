package org.quire.engine.montecarlo;

import java.util.Arrays;

/**
 * In-place selection of order statistics: after {@link #select} every requested rank k holds the value it
 * would hold in the sorted array, and everything before it is no larger and everything after it no smaller.
 * This lets a run put in order only the two tails of the values that the coverage intervals need, instead of
 * sorting all of them.
 *
 * <p>Stateless and thread-safe (the arrays passed in are modified).
 *
 * <p>References: C. A. R. Hoare, Algorithm 65: Find, Comm. ACM 4 (1961) 321 (selection by partitioning);
 * D. R. Musser, Introspective sorting and selection algorithms, Softw. Pract. Exper. 27 (1997) 983-993
 * (falling back to sorting when partitioning goes badly).
 */
final class Selection {
    private static final int SMALL = 48;

    private Selection() {
    }

    /**
     * @param a values, none NaN
     * @param size the number of values used, {@code a[0..size-1]}
     * @param ranks 0-based ranks to put in place, ascending, each in [0, size)
     */
    static void select(double[] a, int size, int[] ranks) {
        if (size <= 1 || ranks.length == 0) {
            return;
        }
        int depth = 2 * (64 - Long.numberOfLeadingZeros(size)) + 8;
        select(a, 0, size - 1, ranks, 0, ranks.length - 1, depth);
    }

    private static void select(double[] a, int lo, int hi, int[] ranks, int rlo, int rhi, int depth) {
        while (true) {
            // drop ranks outside [lo, hi]
            while (rlo <= rhi && ranks[rlo] < lo) {
                rlo++;
            }
            while (rlo <= rhi && ranks[rhi] > hi) {
                rhi--;
            }
            if (rlo > rhi || hi <= lo) {
                return;
            }
            if (hi - lo < SMALL || depth-- == 0) {
                Arrays.sort(a, lo, hi + 1);
                return;
            }
            int mid = (lo + hi) >>> 1;
            double pivot = medianOf3(a[lo], a[mid], a[hi]);
            // Hoare partition: afterwards a[lo..j] <= pivot <= a[i..hi], and a[j+1..i-1] == pivot
            int i = lo;
            int j = hi;
            while (i <= j) {
                while (a[i] < pivot) {
                    i++;
                }
                while (a[j] > pivot) {
                    j--;
                }
                if (i <= j) {
                    double t = a[i];
                    a[i] = a[j];
                    a[j] = t;
                    i++;
                    j--;
                }
            }
            // ranks in the left part [lo, j], then ranks in the right part [i, hi]
            int split = rlo;
            while (split <= rhi && ranks[split] <= j) {
                split++;
            }
            int rightStart = split;
            while (rightStart <= rhi && ranks[rightStart] < i) {
                rightStart++;
            }
            boolean left = split > rlo;
            boolean right = rightStart <= rhi;
            if (left && right) {
                // recurse into the smaller side, loop on the larger
                if (j - lo < hi - i) {
                    select(a, lo, j, ranks, rlo, split - 1, depth);
                    lo = i;
                    rlo = rightStart;
                } else {
                    select(a, i, hi, ranks, rightStart, rhi, depth);
                    hi = j;
                    rhi = split - 1;
                }
            } else if (left) {
                hi = j;
                rhi = split - 1;
            } else if (right) {
                lo = i;
                rlo = rightStart;
            } else {
                return;
            }
        }
    }

    private static double medianOf3(double x, double y, double z) {
        return x < y ? (y < z ? y : Math.max(x, z)) : (x < z ? x : Math.max(y, z));
    }

    /**
     * Sorts in place the smallest {@code lowCount} and the largest {@code highCount} values of
     * {@code a[0..size-1]} at the two ends of the array; the middle is left in no particular order. When the
     * two ends would meet the whole array is sorted.
     */
    static void sortTails(double[] a, int size, int lowCount, int highCount, int[] moreRanks) {
        if (lowCount + highCount >= size - 1) {
            Arrays.sort(a, 0, size);
            return;
        }
        int highRank = size - highCount;
        int[] ranks = Arrays.copyOf(moreRanks, moreRanks.length + 2);
        int extra = moreRanks.length;
        if (lowCount > 0) {
            ranks[extra++] = lowCount - 1;
        }
        if (highCount > 0) {
            ranks[extra++] = highRank;
        }
        ranks = Arrays.copyOf(ranks, extra);
        Arrays.sort(ranks);
        int distinct = 0;
        for (int k = 0; k < ranks.length; k++) {
            if (k == 0 || ranks[k] != ranks[k - 1]) {
                ranks[distinct++] = ranks[k];
            }
        }
        select(a, size, Arrays.copyOf(ranks, distinct));
        if (lowCount > 0) {
            Arrays.sort(a, 0, lowCount);
        }
        if (highCount > 0) {
            Arrays.sort(a, highRank, size);
        }
    }
}
