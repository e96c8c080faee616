package org.quire.engine.gum;

/**
 * Deep copies of matrices, for result values that must not hand out or keep a caller's arrays. Stateless and
 * thread-safe.
 */
public final class Matrices {
    private Matrices() {
    }

    /** @return a deep copy of {@code m} (null for null) */
    public static double[][] copy(double[][] m) {
        if (m == null) {
            return null;
        }
        double[][] c = new double[m.length][];
        for (int i = 0; i < m.length; i++) {
            c[i] = m[i] == null ? null : m[i].clone();
        }
        return c;
    }
}
