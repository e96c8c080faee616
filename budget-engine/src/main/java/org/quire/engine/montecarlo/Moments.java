package org.quire.engine.montecarlo;

/**
 * Counts, means and sums of squared deviations (and cross products) of the output values of one block of
 * trials, combined block by block in block order so that the totals do not depend on the number of threads.
 *
 * <p>Per output, the moments use that output's finite values; the cross products, for the output correlation
 * matrix, use the trials in which every output is finite. Mutable and not thread-safe: each block's moments
 * are built by one worker and combined afterwards by one thread.
 *
 * <p>References: JCGM 101:2008 7.6 (estimate and standard uncertainty from the values); T. F. Chan, G. H.
 * Golub, R. J. LeVeque, Algorithms for computing the sample variance, Amer. Statist. 37 (1983) 242-247,
 * eq. 2.1 (pairwise combination of means and sums of squared deviations).
 */
final class Moments {
    final int outputs;
    final long[] count;
    final double[] mean;
    final double[] m2;
    long jointCount;
    final double[] jointMean;
    /** co-moments over the trials where every output is finite, row-major outputs x outputs */
    final double[] co;

    Moments(int outputs) {
        this.outputs = outputs;
        count = new long[outputs];
        mean = new double[outputs];
        m2 = new double[outputs];
        jointMean = new double[outputs];
        co = new double[outputs > 1 ? outputs * outputs : 0];
    }

    /** The moments of {@code y[k][0..n-1]}, two passes per output (mean, then squared deviations). */
    static Moments ofBlock(double[][] y, int n) {
        int k = y.length;
        Moments m = new Moments(k);
        boolean anyInvalid = false;
        for (int o = 0; o < k; o++) {
            double[] v = y[o];
            double s = 0.0;
            long c = 0;
            for (int t = 0; t < n; t++) {
                double x = v[t];
                if (Double.isFinite(x)) {
                    s += x;
                    c++;
                }
            }
            if (c < n) {
                anyInvalid = true;
            }
            double mu = c > 0 ? s / c : 0.0;
            double d2 = 0.0;
            for (int t = 0; t < n; t++) {
                double x = v[t];
                if (Double.isFinite(x)) {
                    double d = x - mu;
                    d2 += d * d;
                }
            }
            m.count[o] = c;
            m.mean[o] = mu;
            m.m2[o] = d2;
        }
        if (k > 1) {
            if (!anyInvalid) {
                m.jointCount = n;
                System.arraycopy(m.mean, 0, m.jointMean, 0, k);
                for (int a = 0; a < k; a++) {
                    m.co[a * k + a] = m.m2[a];
                    for (int b = a + 1; b < k; b++) {
                        double[] va = y[a];
                        double[] vb = y[b];
                        double ma = m.mean[a];
                        double mb = m.mean[b];
                        double s = 0.0;
                        for (int t = 0; t < n; t++) {
                            s += (va[t] - ma) * (vb[t] - mb);
                        }
                        m.co[a * k + b] = s;
                        m.co[b * k + a] = s;
                    }
                }
            } else {
                m.jointFromValidTrials(y, n);
            }
        }
        return m;
    }

    private void jointFromValidTrials(double[][] y, int n) {
        int k = outputs;
        double[] sum = new double[k];
        long c = 0;
        for (int t = 0; t < n; t++) {
            if (allFinite(y, t)) {
                c++;
                for (int a = 0; a < k; a++) {
                    sum[a] += y[a][t];
                }
            }
        }
        jointCount = c;
        if (c == 0) {
            return;
        }
        for (int a = 0; a < k; a++) {
            jointMean[a] = sum[a] / c;
        }
        for (int t = 0; t < n; t++) {
            if (allFinite(y, t)) {
                for (int a = 0; a < k; a++) {
                    double da = y[a][t] - jointMean[a];
                    for (int b = a; b < k; b++) {
                        co[a * k + b] += da * (y[b][t] - jointMean[b]);
                    }
                }
            }
        }
        for (int a = 0; a < k; a++) {
            for (int b = a + 1; b < k; b++) {
                co[b * k + a] = co[a * k + b];
            }
        }
    }

    private static boolean allFinite(double[][] y, int t) {
        for (double[] v : y) {
            if (!Double.isFinite(v[t])) {
                return false;
            }
        }
        return true;
    }

    /** Adds the moments of the next block (Chan, Golub and LeVeque, eq. 2.1). */
    void add(Moments b) {
        for (int o = 0; o < outputs; o++) {
            long na = count[o];
            long nb = b.count[o];
            long n = na + nb;
            if (nb == 0) {
                continue;
            }
            double delta = b.mean[o] - mean[o];
            mean[o] += delta * nb / n;
            m2[o] += b.m2[o] + delta * delta * ((double) na * nb / n);
            count[o] = n;
        }
        if (outputs > 1 && b.jointCount > 0) {
            long na = jointCount;
            long nb = b.jointCount;
            long n = na + nb;
            double f = (double) na * nb / n;
            int k = outputs;
            double[] delta = new double[k];
            for (int a = 0; a < k; a++) {
                delta[a] = b.jointMean[a] - jointMean[a];
            }
            for (int a = 0; a < k; a++) {
                for (int c = 0; c < k; c++) {
                    co[a * k + c] += b.co[a * k + c] + delta[a] * delta[c] * f;
                }
            }
            for (int a = 0; a < k; a++) {
                jointMean[a] += delta[a] * nb / n;
            }
            jointCount = n;
        }
    }

    /** @return u(y) = sqrt(m2 / (M - 1)), JCGM 101:2008 7.6 eq. (21) */
    double standardUncertainty(int o) {
        return count[o] > 1 ? Math.sqrt(m2[o] / (count[o] - 1)) : 0.0;
    }

    /** @return the correlation matrix of the outputs over the trials where all are finite (NaN when undefined) */
    double[][] correlation() {
        int k = outputs;
        double[][] r = new double[k][k];
        for (int a = 0; a < k; a++) {
            for (int b = 0; b < k; b++) {
                if (a == b) {
                    r[a][b] = 1.0;
                } else if (k > 1 && jointCount > 1) {
                    double den = Math.sqrt(co[a * k + a] * co[b * k + b]);
                    r[a][b] = den > 0 ? Math.max(-1.0, Math.min(1.0, co[a * k + b] / den)) : Double.NaN;
                } else {
                    r[a][b] = Double.NaN;
                }
            }
        }
        return r;
    }
}
