package org.quire.engine.montecarlo;

import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.special.Erf;
import org.quire.engine.budget.Distribution;

/**
 * One input's probability distribution as the Monte Carlo method uses it: a sampler that fills a whole column of
 * trials at once, and the distribution function and its inverse (used by the Gaussian copula for correlated
 * inputs that are not all normal, and by the workbench to draw the input's density).
 *
 * <p>Immutable and thread-safe: the random stream is passed to {@link #fill} by the caller, which must not share
 * it between threads.
 *
 * <p>References: JCGM 101:2008 6.4 (the sampling procedures of each distribution, cited per type below) and
 * 6.4.3.2, 6.4.4.2, 6.4.6.2 (the densities from which the distribution functions here are integrated).
 */
public abstract class Marginal {
    private static final double SQRT2 = Math.sqrt(2.0);

    private final Distribution distribution;

    private Marginal(Distribution distribution) {
        this.distribution = distribution;
    }

    /**
     * @param distribution the input's distribution
     * @return its sampler and distribution function
     */
    public static Marginal of(Distribution distribution) {
        if (distribution == null) {
            throw new IllegalArgumentException(Messages.nullArgument("distribution"));
        }
        if (distribution instanceof Distribution.Normal d) {
            return new NormalMarginal(d);
        } else if (distribution instanceof Distribution.Rectangular d) {
            return new RectangularMarginal(d);
        } else if (distribution instanceof Distribution.Triangular d) {
            return new TriangularMarginal(d);
        } else if (distribution instanceof Distribution.Arcsine d) {
            return new ArcsineMarginal(d);
        } else if (distribution instanceof Distribution.Trapezoidal d) {
            return new TrapezoidalMarginal(d);
        } else if (distribution instanceof Distribution.CurvilinearTrapezoid d) {
            return new CurvilinearTrapezoidMarginal(d);
        } else if (distribution instanceof Distribution.StudentT d) {
            return new StudentTMarginal(d);
        } else if (distribution instanceof Distribution.Exponential d) {
            return new ExponentialMarginal(d);
        } else {
            return new ConstantMarginal((Distribution.Constant) distribution);
        }
    }

    /** @return the distribution sampled */
    public Distribution distribution() {
        return distribution;
    }

    /**
     * Draws {@code n} independent values into {@code out[from .. from+n-1]}.
     *
     * @param rng the random stream, used by this call only
     */
    public abstract void fill(BlockStream rng, double[] out, int from, int n);

    /** @return the distribution function G(x) = Pr(X &lt;= x) */
    public abstract double cdf(double x);

    /**
     * The mean probability density over {@code [x - width/2, x + width/2]}: (G(x + width/2) - G(x - width/2)) /
     * width, which tends to the density g(x) as the width shrinks (JCGM 101:2008 3.2, the density as the derivative
     * of G) and stays finite where g has a jump or a pole (a rectangular edge, the arcsine's ends), as a picture of
     * the shape needs. Zero where nothing is below or it is not finite.
     *
     * @param width the width of the interval, &gt; 0
     */
    public final double meanDensity(double x, double width) {
        double p = (cdf(x + 0.5 * width) - cdf(x - 0.5 * width)) / width;
        return Double.isFinite(p) && p > 0 ? p : 0.0;
    }

    /**
     * @param p a probability in [0, 1]
     * @return the inverse distribution function, the smallest x with G(x) &gt;= p
     */
    public final double quantile(double p) {
        if (!(p >= 0.0 && p <= 1.0)) {
            throw new IllegalArgumentException(Messages.probabilityOutside("probability", p));
        }
        return inverse(p);
    }

    /** Inverse distribution function for p already checked to lie in [0, 1]. */
    abstract double inverse(double p);

    /** @return the variance of the distribution (infinite for a Student t with at most 2 degrees of freedom) */
    public abstract double variance();

    /** @return true for the normal distribution, which correlated sampling treats without a copula */
    boolean isNormal() {
        return false;
    }

    /** Standard normal distribution function Phi(z). References: JCGM 101:2008 6.4.7 (Gaussian). */
    static double phi(double z) {
        return 0.5 * Erf.erfc(-z / SQRT2);
    }

    /** Inverse standard normal distribution function. References: JCGM 101:2008 6.4.7 (Gaussian). */
    static double phiInverse(double p) {
        if (p <= 0.0) {
            return Double.NEGATIVE_INFINITY;
        }
        if (p >= 1.0) {
            return Double.POSITIVE_INFINITY;
        }
        return -SQRT2 * Erf.erfcInv(2.0 * p);
    }

    /** N(mu, sigma^2) by the Ziggurat method ({@link BlockStream}); JCGM 101:2008 6.4.7.4 and C.4. */
    private static final class NormalMarginal extends Marginal {
        private final double mu;
        private final double sd;

        NormalMarginal(Distribution.Normal d) {
            super(d);
            mu = d.mean();
            sd = d.sd();
        }

        @Override
        public void fill(BlockStream rng, double[] out, int from, int n) {
            rng.normals(out, from, n);
            for (int t = from, end = from + n; t < end; t++) {
                out[t] = mu + sd * out[t];
            }
        }

        @Override public double cdf(double x) { return phi((x - mu) / sd); }
        @Override double inverse(double p) { return mu + sd * phiInverse(p); }
        @Override public double variance() { return sd * sd; }
        @Override boolean isNormal() { return true; }
    }

    /** R(a, b): xi = a + (b - a) r; JCGM 101:2008 6.4.2.4. */
    private static final class RectangularMarginal extends Marginal {
        private final double a;
        private final double w;

        RectangularMarginal(Distribution.Rectangular d) {
            super(d);
            a = d.lower();
            w = d.upper() - d.lower();
        }

        @Override
        public void fill(BlockStream rng, double[] out, int from, int n) {
            rng.uniforms(out, from, n, a, w);
        }

        @Override public double cdf(double x) { return x <= a ? 0.0 : x >= a + w ? 1.0 : (x - a) / w; }
        @Override double inverse(double p) { return a + w * p; }
        @Override public double variance() { return w * w / 12.0; }
    }

    /** Symmetric T(a, b): xi = a + (b - a)(r1 + r2)/2; JCGM 101:2008 6.4.5.4. */
    private static final class TriangularMarginal extends Marginal {
        private final double a;
        private final double b;
        private final double w;

        TriangularMarginal(Distribution.Triangular d) {
            super(d);
            a = d.lower();
            b = d.upper();
            w = b - a;
        }

        @Override
        public void fill(BlockStream rng, double[] out, int from, int n) {
            double h = 0.5 * w;
            double[] r2 = rng.second(n);
            rng.uniformPairs(out, r2, from, n);
            for (int t = from, end = from + n; t < end; t++) {
                out[t] = a + h * (out[t] + r2[t - from]);
            }
        }

        @Override
        public double cdf(double x) {
            if (x <= a) {
                return 0.0;
            }
            if (x >= b) {
                return 1.0;
            }
            double s = (x - a) / w;
            return s <= 0.5 ? 2.0 * s * s : 1.0 - 2.0 * (1.0 - s) * (1.0 - s);
        }

        @Override
        double inverse(double p) {
            return p <= 0.5 ? a + w * Math.sqrt(0.5 * p) : b - w * Math.sqrt(0.5 * (1.0 - p));
        }

        @Override public double variance() { return w * w / 24.0; }
    }

    /** U(a, b): xi = (a + b)/2 + (b - a)/2 sin(2 pi r); JCGM 101:2008 6.4.6.4. */
    private static final class ArcsineMarginal extends Marginal {
        private final double a;
        private final double b;
        private final double c;
        private final double h;

        ArcsineMarginal(Distribution.Arcsine d) {
            super(d);
            a = d.lower();
            b = d.upper();
            c = 0.5 * (a + b);
            h = 0.5 * (b - a);
        }

        @Override
        public void fill(BlockStream rng, double[] out, int from, int n) {
            double twoPi = 2.0 * Math.PI;
            rng.uniforms(out, from, n);
            for (int t = from, end = from + n; t < end; t++) {
                out[t] = c + h * Math.sin(twoPi * out[t]);
            }
        }

        /** G(x) = 1/2 + arcsin((x - c)/h)/pi, from the density 1/(pi sqrt(h^2 - (x - c)^2)) of 6.4.6.2. */
        @Override
        public double cdf(double x) {
            if (x <= a) {
                return 0.0;
            }
            if (x >= b) {
                return 1.0;
            }
            return 0.5 + Math.asin((x - c) / h) / Math.PI;
        }

        @Override double inverse(double p) { return c - h * Math.cos(Math.PI * p); }
        @Override public double variance() { return 0.5 * h * h; }
    }

    /** Tr(a, b, beta): xi = a + (b - a)/2 [(1 + beta) r1 + (1 - beta) r2]; JCGM 101:2008 6.4.4.4. */
    private static final class TrapezoidalMarginal extends Marginal {
        private final double a;
        private final double b;
        private final double beta;
        /** density on the flat top: 1 / (w (1 + beta)), w the half-width */
        private final double top;
        /** length of each sloping side: w (1 - beta) */
        private final double slope;
        /** probability below the flat top: (1 - beta) / (2 (1 + beta)) */
        private final double tail;

        TrapezoidalMarginal(Distribution.Trapezoidal d) {
            super(d);
            a = d.lower();
            b = d.upper();
            beta = d.beta();
            double w = 0.5 * (b - a);
            top = 1.0 / (w * (1.0 + beta));
            slope = w * (1.0 - beta);
            tail = (1.0 - beta) / (2.0 * (1.0 + beta));
        }

        @Override
        public void fill(BlockStream rng, double[] out, int from, int n) {
            double h = 0.5 * (b - a);
            double c1 = h * (1.0 + beta);
            double c2 = h * (1.0 - beta);
            double[] r2 = rng.second(n);
            rng.uniformPairs(out, r2, from, n);
            for (int t = from, end = from + n; t < end; t++) {
                out[t] = a + c1 * out[t] + c2 * r2[t - from];
            }
        }

        @Override
        public double cdf(double x) {
            if (x <= a) {
                return 0.0;
            }
            if (x >= b) {
                return 1.0;
            }
            double lowerTop = a + slope;
            double upperTop = b - slope;
            if (x < lowerTop) {
                double s = x - a;
                return top * s * s / (2.0 * slope);
            }
            if (x <= upperTop) {
                return tail + top * (x - lowerTop);
            }
            double s = b - x;
            return 1.0 - top * s * s / (2.0 * slope);
        }

        @Override
        double inverse(double p) {
            if (p < tail) {
                return a + Math.sqrt(2.0 * slope * p / top);
            }
            if (p <= 1.0 - tail) {
                return a + slope + (p - tail) / top;
            }
            return b - Math.sqrt(2.0 * slope * (1.0 - p) / top);
        }

        @Override
        public double variance() {
            double w = b - a;
            return w * w * (1.0 + beta * beta) / 24.0;
        }
    }

    /**
     * CTrap(a, b, d): a_s = (a - d) + 2 d r1, b_s = (a + b) - a_s, xi = a_s + (b_s - a_s) r2; JCGM 101:2008
     * 6.4.3.4. The distribution function is the mixture over the uniformly distributed half-width H of the
     * rectangular distribution functions: with c the midpoint, W the half-width and t = |x - c|,
     * Pr(|X - c| &lt;= t) = E[min(1, t / H)], H uniform on [W - d, W + d] (6.4.3.2).
     */
    private static final class CurvilinearTrapezoidMarginal extends Marginal {
        private final double a;
        private final double b;
        private final double d;
        private final double c;
        private final double halfWidth;

        CurvilinearTrapezoidMarginal(Distribution.CurvilinearTrapezoid dist) {
            super(dist);
            a = dist.lower();
            b = dist.upper();
            d = dist.d();
            c = 0.5 * (a + b);
            halfWidth = 0.5 * (b - a);
        }

        @Override
        public void fill(BlockStream rng, double[] out, int from, int n) {
            double lo = a - d;
            double twoD = 2.0 * d;
            double sum = a + b;
            double[] r2 = rng.second(n);
            rng.uniformPairs(out, r2, from, n);
            for (int t = from, end = from + n; t < end; t++) {
                double as = lo + twoD * out[t];
                double bs = sum - as;
                out[t] = as + (bs - as) * r2[t - from];
            }
        }

        /** Pr(|X - c| &lt;= t). */
        private double central(double t) {
            double hMin = halfWidth - d;
            double hMax = halfWidth + d;
            if (t <= 0.0) {
                return 0.0;
            }
            if (t >= hMax) {
                return 1.0;
            }
            if (t <= hMin) {
                return t / (2.0 * d) * Math.log(hMax / hMin);
            }
            return ((t - hMin) + t * Math.log(hMax / t)) / (2.0 * d);
        }

        /** Density of |X - c| at t: the derivative of {@link #central}. */
        private double centralDensity(double t) {
            double hMin = halfWidth - d;
            double hMax = halfWidth + d;
            if (t >= hMax) {
                return 0.0;
            }
            double ref = Math.max(t, hMin);
            return Math.log(hMax / ref) / (2.0 * d);
        }

        @Override
        public double cdf(double x) {
            double s = x - c;
            double g = 0.5 * central(Math.abs(s));
            return s < 0 ? 0.5 - g : 0.5 + g;
        }

        @Override
        double inverse(double p) {
            double target = Math.abs(2.0 * p - 1.0);
            double lo = 0.0;
            double hi = halfWidth + d;
            double t = target * halfWidth;
            // safeguarded Newton iteration on the increasing function central(t) - target
            for (int it = 0; it < 100; it++) {
                double f = central(t) - target;
                if (f > 0) {
                    hi = t;
                } else {
                    lo = t;
                }
                double g = centralDensity(t);
                double next = g > 0 ? t - f / g : 0.5 * (lo + hi);
                if (!(next > lo && next < hi)) {
                    next = 0.5 * (lo + hi);
                }
                if (Math.abs(next - t) <= 1e-15 * (halfWidth + d)) {
                    t = next;
                    break;
                }
                t = next;
            }
            return p < 0.5 ? c - t : c + t;
        }

        @Override
        public double variance() {
            double w = b - a;
            return w * w / 12.0 + d * d / 9.0;
        }
    }

    /**
     * t_nu(mu, s^2): xi = mu + s t, t a variate of the standard t distribution with nu degrees of freedom
     * (JCGM 101:2008 6.4.9), drawn by Bailey's polar method ({@link BlockStream#studentT}), which gives the same
     * distribution as the procedure t = z / sqrt(w / nu) of JCGM 101:2008 6.4.9.5 (z standard normal, w
     * chi-squared) at the cost of about 2.5 uniforms and two square roots per value; for nu without bound, the
     * normal.
     *
     * <p>References: JCGM 101:2008 6.4.9; R. W. Bailey, Polar generation of random variates with the
     * t-distribution, Math. Comp. 62 (1994) 779-781.
     */
    private static final class StudentTMarginal extends Marginal {
        private final double mu;
        private final double s;
        private final double nu;
        private final TDistribution t;

        StudentTMarginal(Distribution.StudentT d) {
            super(d);
            mu = d.location();
            s = d.scale();
            nu = d.dof();
            t = new TDistribution(null, nu, 1e-14);
        }

        @Override
        public void fill(BlockStream rng, double[] out, int from, int n) {
            if (Double.isInfinite(nu)) {
                rng.normals(out, from, n); // the limit of t as nu grows: the standard normal
            } else {
                rng.studentT(out, from, n, nu);
            }
            for (int i = from, end = from + n; i < end; i++) {
                out[i] = mu + s * out[i];
            }
        }

        @Override public double cdf(double x) { return t.cumulativeProbability((x - mu) / s); }

        /** Closed forms for nu = 1 (Cauchy) and nu = 2; otherwise the inverse of the regularized beta function. */
        @Override
        double inverse(double p) {
            if (p <= 0.0) {
                return Double.NEGATIVE_INFINITY;
            }
            if (p >= 1.0) {
                return Double.POSITIVE_INFINITY;
            }
            double z;
            if (nu == 1.0) {
                z = Math.tan(Math.PI * (p - 0.5));
            } else if (nu == 2.0) {
                z = (2.0 * p - 1.0) / Math.sqrt(2.0 * p * (1.0 - p));
            } else {
                z = t.inverseCumulativeProbability(p);
            }
            return mu + s * z;
        }

        /** s^2 nu / (nu - 2), JCGM 101:2008 6.4.9.3; infinite for nu &lt;= 2. */
        @Override
        public double variance() {
            return nu > 2 ? s * s * nu / (nu - 2.0) : Double.POSITIVE_INFINITY;
        }
    }

    /** Ex(x): xi = -x ln r, r uniform on (0, 1); JCGM 101:2008 6.4.10.4. */
    private static final class ExponentialMarginal extends Marginal {
        private final double mean;

        ExponentialMarginal(Distribution.Exponential d) {
            super(d);
            mean = d.mean();
        }

        @Override
        public void fill(BlockStream rng, double[] out, int from, int n) {
            rng.openUniforms(out, from, n);
            for (int t = from, end = from + n; t < end; t++) {
                out[t] = -mean * Math.log(out[t]);
            }
        }

        @Override public double cdf(double x) { return x <= 0 ? 0.0 : -Math.expm1(-x / mean); }
        @Override double inverse(double p) { return -mean * Math.log1p(-p); }
        @Override public double variance() { return mean * mean; }
    }

    /** An exactly known value, the same in every trial. */
    private static final class ConstantMarginal extends Marginal {
        private final double value;

        ConstantMarginal(Distribution.Constant d) {
            super(d);
            value = d.value();
        }

        @Override
        public void fill(BlockStream rng, double[] out, int from, int n) {
            java.util.Arrays.fill(out, from, from + n, value);
        }

        @Override public double cdf(double x) { return x < value ? 0.0 : 1.0; }
        @Override double inverse(double p) { return value; }
        @Override public double variance() { return 0.0; }
    }
}
