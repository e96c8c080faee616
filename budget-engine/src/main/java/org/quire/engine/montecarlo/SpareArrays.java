package org.quire.engine.montecarlo;

import java.lang.ref.SoftReference;
import java.util.ArrayDeque;
import java.util.Iterator;

/**
 * Arrays of output values kept from one Monte Carlo run for the next: a run asks for {@code outputs} arrays of
 * {@code trials} values, and a run of the same size after it (the benchmark's runs, the rows of a batch, the
 * workbench running a budget again) takes them instead of allocating and zeroing them again. An array is given
 * back only when nothing refers to it any more: after the summaries, and never when the run keeps its values.
 * The arrays are softly referenced, so the collector takes them before memory runs short.
 *
 * <p>Thread-safe. The content of a taken array is undefined; every caller overwrites all of it.
 */
final class SpareArrays {
    /** The most arrays kept. */
    static final int MAX_KEPT = 8;

    private static final ArrayDeque<SoftReference<double[]>> SPARE = new ArrayDeque<>();

    private SpareArrays() {
    }

    /** @return an array of exactly {@code length} values, a spare one when there is one, its content undefined */
    static double[] take(int length) {
        synchronized (SPARE) {
            for (Iterator<SoftReference<double[]>> it = SPARE.iterator(); it.hasNext();) {
                double[] a = it.next().get();
                if (a == null) {
                    it.remove();
                } else if (a.length == length) {
                    it.remove();
                    return a;
                }
            }
        }
        return new double[length];
    }

    /** Keeps {@code a} for a later {@link #take}; the caller must not use it afterwards. */
    static void give(double[] a) {
        synchronized (SPARE) {
            SPARE.addFirst(new SoftReference<>(a));
            while (SPARE.size() > MAX_KEPT) {
                SPARE.removeLast();
            }
        }
    }
}
