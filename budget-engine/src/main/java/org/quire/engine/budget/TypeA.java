package org.quire.engine.budget;

import java.util.Arrays;

/**
 * A Type A evaluation from n repeated observations: estimate the arithmetic mean, standard uncertainty
 * s / sqrt(n), nu = n - 1; or, when a pooled standard deviation s_p from an earlier study with nu_p degrees of
 * freedom is used, s_p / sqrt(n) with nu = nu_p.
 *
 * <p>References: JCGM 100:2008 4.2.1–4.2.3, eqs. (3)–(5); 4.2.4 (pooled estimate of variance); G.3.3.
 * For the Monte Carlo method the input is a scaled and shifted t distribution (JCGM 101:2008 6.4.9).
 *
 * <p>Immutable and thread-safe.
 */
public final class TypeA implements Evaluation {
    private final double[] readings;
    private final double mean;
    private final double s;
    private final int n;
    private final double pooledS;
    private final double pooledDof;

    private TypeA(double[] readings, double mean, double s, int n, double pooledS, double pooledDof) {
        this.readings = readings;
        this.mean = mean;
        this.s = s;
        this.n = n;
        this.pooledS = pooledS;
        this.pooledDof = pooledDof;
    }

    /**
     * @param readings at least two observations (one when a pooled standard deviation will be given)
     * @return the evaluation of their mean
     */
    public static TypeA ofReadings(double... readings) {
        if (readings == null || readings.length == 0) {
            throw new IllegalArgumentException("a Type A evaluation needs readings; none were given");
        }
        for (int i = 0; i < readings.length; i++) {
            if (!Double.isFinite(readings[i])) {
                throw new IllegalArgumentException("reading " + (i + 1) + " is not a finite number: " + readings[i]);
            }
        }
        int n = readings.length;
        double sum = 0;
        for (double r : readings) {
            sum += r;
        }
        double mean = sum / n;
        double ss = 0;
        for (double r : readings) {
            ss += (r - mean) * (r - mean);
        }
        double s = n > 1 ? Math.sqrt(ss / (n - 1)) : Double.NaN;
        return new TypeA(readings.clone(), mean, s, n, Double.NaN, Double.NaN);
    }

    /**
     * @param mean arithmetic mean of the observations
     * @param s experimental standard deviation of the observations (not of the mean)
     * @param n number of observations, at least 2
     */
    public static TypeA ofSummary(double mean, double s, int n) {
        if (!Double.isFinite(mean)) {
            throw new IllegalArgumentException("mean must be a finite number, not " + mean);
        }
        if (!(s > 0) || !Double.isFinite(s)) {
            throw new IllegalArgumentException("standard deviation s must be positive, not " + s);
        }
        if (n < 2) {
            throw new IllegalArgumentException("number of observations n must be at least 2, not " + n);
        }
        return new TypeA(null, mean, s, n, Double.NaN, Double.NaN);
    }

    /**
     * The mean of n observations whose scatter will be given by {@link #withPooled(double, double)}.
     *
     * @param mean arithmetic mean of the observations
     * @param n number of observations, at least 1
     */
    public static TypeA ofMean(double mean, int n) {
        if (!Double.isFinite(mean)) {
            throw new IllegalArgumentException("mean must be a finite number, not " + mean);
        }
        if (n < 1) {
            throw new IllegalArgumentException("number of observations n must be at least 1, not " + n);
        }
        return new TypeA(null, mean, Double.NaN, n, Double.NaN, Double.NaN);
    }

    /**
     * Uses a pooled standard deviation from an earlier, larger study instead of the readings' own scatter.
     *
     * @param sp pooled standard deviation of a single observation
     * @param dof its degrees of freedom
     */
    public TypeA withPooled(double sp, double dof) {
        if (!(sp > 0) || !Double.isFinite(sp)) {
            throw new IllegalArgumentException("pooled standard deviation must be positive, not " + sp);
        }
        if (!(dof > 0) || Double.isNaN(dof)) {
            throw new IllegalArgumentException("degrees of freedom of the pooled standard deviation must be positive, not " + dof);
        }
        return new TypeA(readings, mean, s, n, sp, dof);
    }

    /** Checks that the evaluation is complete: the readings' own s needs at least two readings. */
    TypeA validated() {
        if (Double.isNaN(pooledS)) {
            if (Double.isNaN(s) && n >= 2 && readings == null) {
                throw new IllegalArgumentException("a Type A evaluation from a mean needs s or a pooled standard deviation");
            }
            if (n < 2) {
                throw new IllegalArgumentException("a Type A evaluation from its own readings needs at least 2 readings, not "
                        + n + " (or give a pooled standard deviation)");
            }
            if (!(s > 0)) {
                throw new IllegalArgumentException("the readings are all equal, so their standard deviation is 0; "
                        + "give the resolution as a Type B input or a pooled standard deviation");
            }
        }
        return this;
    }

    /** @return the readings, or {@code null} when the evaluation was given as a summary */
    public double[] readings() {
        return readings == null ? null : readings.clone();
    }

    /** @return the number of observations n */
    public int count() {
        return n;
    }

    /** @return the experimental standard deviation of the observations s(q_k) (eq. 4) */
    public double standardDeviation() {
        return s;
    }

    /** @return whether a pooled standard deviation is used */
    public boolean isPooled() {
        return !Double.isNaN(pooledS);
    }

    /** @return the pooled standard deviation, NaN when none */
    public double pooledStandardDeviation() {
        return pooledS;
    }

    @Override
    public double estimate() {
        return mean;
    }

    @Override
    public double standardUncertainty() {
        return (isPooled() ? pooledS : s) / Math.sqrt(n);
    }

    @Override
    public double dof() {
        return isPooled() ? pooledDof : n - 1;
    }

    @Override
    public Distribution distribution() {
        return Distribution.StudentT.of(mean, standardUncertainty(), dof());
    }

    @Override
    public String type() {
        return "A";
    }

    @Override
    public String basis() {
        String sigma = isPooled()
                ? "pooled s = " + fmt(pooledS) + " (nu = " + fmt(pooledDof) + ")"
                : "s = " + fmt(s);
        return "mean of " + n + " observations, " + sigma + ", u = s/sqrt(n)";
    }

    /** @return {@code v} with at most 6 significant digits and no trailing zeros, e.g. 7.5E-5 or 3 */
    static String fmt(double v) {
        if (Double.isInfinite(v)) {
            return "inf";
        }
        if (Double.isNaN(v) || v == 0) {
            return Double.isNaN(v) ? "NaN" : "0";
        }
        java.math.BigDecimal b = new java.math.BigDecimal(v).round(new java.math.MathContext(6)).stripTrailingZeros();
        int exponent = b.precision() - b.scale() - 1;
        return exponent < -4 || exponent >= 9 ? b.toString() : b.toPlainString();
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof TypeA)) {
            return false;
        }
        TypeA t = (TypeA) o;
        return Arrays.equals(readings, t.readings) && Double.compare(mean, t.mean) == 0
                && Double.compare(s, t.s) == 0 && n == t.n && Double.compare(pooledS, t.pooledS) == 0
                && Double.compare(pooledDof, t.pooledDof) == 0;
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(readings) * 31 + Double.hashCode(mean) * 7 + n;
    }
}
