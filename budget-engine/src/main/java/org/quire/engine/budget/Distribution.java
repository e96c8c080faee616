package org.quire.engine.budget;

/**
 * The probability distribution that an input quantity's evaluation assigns to it: what the Monte Carlo
 * method draws from, and what gives the GUM its estimate and standard uncertainty.
 *
 * <p>Every implementation is an immutable value built by a checking factory; all are thread-safe.
 *
 * <p>References: JCGM 101:2008 6.4 and Table 1 (the distributions and their expectations and variances);
 * JCGM 100:2008 4.3 (Type B evaluation).
 */
public sealed interface Distribution
        permits Distribution.Normal, Distribution.Rectangular, Distribution.Triangular, Distribution.Arcsine,
        Distribution.Trapezoidal, Distribution.CurvilinearTrapezoid, Distribution.StudentT,
        Distribution.Exponential, Distribution.Constant {

    /** @return the expectation, the estimate the GUM uses */
    double mean();

    /**
     * @return the standard uncertainty the GUM uses. For every distribution but {@link StudentT} it is the
     *     standard deviation; for a Student t from a Type A evaluation it is the scale s/sqrt(n)
     *     (JCGM 100:2008 4.2.3), while the Monte Carlo method samples the t distribution itself.
     */
    double standardUncertainty();

    /** @return a short name of the distribution's shape for tables and reports */
    String shape();

    private static double finite(String what, double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be a finite number, not " + v);
        }
        return v;
    }

    private static void ordered(double lower, double upper) {
        finite("lower limit", lower);
        finite("upper limit", upper);
        if (!(upper > lower)) {
            throw new IllegalArgumentException(
                    "upper limit (" + upper + ") must be greater than lower limit (" + lower + ")");
        }
    }

    /** Gaussian N(mean, sd^2); JCGM 101:2008 6.4.7. */
    record Normal(double mean, double sd) implements Distribution {
        public Normal {
            finite("mean", mean);
            finite("standard deviation", sd);
            if (!(sd > 0)) {
                throw new IllegalArgumentException("standard deviation must be positive, not " + sd);
            }
        }

        public static Normal of(double mean, double sd) {
            return new Normal(mean, sd);
        }

        @Override public double standardUncertainty() { return sd; }
        @Override public String shape() { return "normal"; }
    }

    /** Rectangular R(a, b); JCGM 101:2008 6.4.2, u = (b - a) / sqrt(12). */
    record Rectangular(double lower, double upper) implements Distribution {
        public Rectangular { ordered(lower, upper); }

        public static Rectangular of(double lower, double upper) { return new Rectangular(lower, upper); }

        @Override public double mean() { return 0.5 * (lower + upper); }
        @Override public double standardUncertainty() { return (upper - lower) / Math.sqrt(12.0); }
        @Override public String shape() { return "rectangular"; }
    }

    /** Symmetric triangular T(a, b); JCGM 101:2008 6.4.5, u = (b - a) / sqrt(24). */
    record Triangular(double lower, double upper) implements Distribution {
        public Triangular { ordered(lower, upper); }

        public static Triangular of(double lower, double upper) { return new Triangular(lower, upper); }

        @Override public double mean() { return 0.5 * (lower + upper); }
        @Override public double standardUncertainty() { return (upper - lower) / Math.sqrt(24.0); }
        @Override public String shape() { return "triangular"; }
    }

    /** Arc sine (U-shaped) U(a, b); JCGM 101:2008 6.4.6, u = (b - a) / sqrt(8). */
    record Arcsine(double lower, double upper) implements Distribution {
        public Arcsine { ordered(lower, upper); }

        public static Arcsine of(double lower, double upper) { return new Arcsine(lower, upper); }

        @Override public double mean() { return 0.5 * (lower + upper); }
        @Override public double standardUncertainty() { return (upper - lower) / Math.sqrt(8.0); }
        @Override public String shape() { return "U-shaped"; }
    }

    /**
     * Symmetric trapezoidal Tr(a, b, beta) with beta the ratio of the top half-width to the base half-width;
     * JCGM 101:2008 6.4.4, u^2 = (b - a)^2 (1 + beta^2) / 24.
     */
    record Trapezoidal(double lower, double upper, double beta) implements Distribution {
        public Trapezoidal {
            ordered(lower, upper);
            finite("beta", beta);
            if (beta < 0 || beta > 1) {
                throw new IllegalArgumentException("beta must lie in [0, 1], not " + beta);
            }
        }

        public static Trapezoidal of(double lower, double upper, double beta) {
            return new Trapezoidal(lower, upper, beta);
        }

        @Override public double mean() { return 0.5 * (lower + upper); }
        @Override public double standardUncertainty() {
            return (upper - lower) * Math.sqrt((1 + beta * beta) / 24.0);
        }
        @Override public String shape() { return "trapezoidal"; }
    }

    /**
     * Curvilinear trapezoid CTrap(a, b, d): a rectangular distribution whose limits are themselves known only
     * to within +-d; JCGM 101:2008 6.4.3, u^2 = (b - a)^2 / 12 + d^2 / 9.
     */
    record CurvilinearTrapezoid(double lower, double upper, double d) implements Distribution {
        public CurvilinearTrapezoid {
            ordered(lower, upper);
            finite("limit inexactness d", d);
            if (!(d > 0) || d > 0.5 * (upper - lower)) {
                throw new IllegalArgumentException(
                        "limit inexactness d must be positive and at most the half-width, not " + d);
            }
        }

        public static CurvilinearTrapezoid of(double lower, double upper, double d) {
            return new CurvilinearTrapezoid(lower, upper, d);
        }

        @Override public double mean() { return 0.5 * (lower + upper); }
        @Override public double standardUncertainty() {
            double w = upper - lower;
            return Math.sqrt(w * w / 12.0 + d * d / 9.0);
        }
        @Override public String shape() { return "curvilinear trapezoid"; }
    }

    /**
     * Scaled and shifted Student t, t_nu(location, scale^2); JCGM 101:2008 6.4.9. From a Type A evaluation of
     * n readings: location = mean, scale = s / sqrt(n), nu = n - 1.
     */
    record StudentT(double location, double scale, double dof) implements Distribution {
        public StudentT {
            finite("location", location);
            finite("scale", scale);
            if (!(scale > 0)) {
                throw new IllegalArgumentException("scale must be positive, not " + scale);
            }
            if (!(dof > 0) || Double.isNaN(dof)) {
                throw new IllegalArgumentException("degrees of freedom must be positive, not " + dof);
            }
        }

        public static StudentT of(double location, double scale, double dof) {
            return new StudentT(location, scale, dof);
        }

        @Override public double mean() { return location; }
        @Override public double standardUncertainty() { return scale; }
        @Override public String shape() { return "Student t"; }
    }

    /** Exponential Ex(mean) for a non-negative quantity with known expectation; JCGM 101:2008 6.4.10. */
    record Exponential(double mean) implements Distribution {
        public Exponential {
            finite("mean", mean);
            if (!(mean > 0)) {
                throw new IllegalArgumentException("mean of an exponential distribution must be positive, not " + mean);
            }
        }

        public static Exponential of(double mean) { return new Exponential(mean); }

        @Override public double standardUncertainty() { return mean; }
        @Override public String shape() { return "exponential"; }
    }

    /** An exactly known value: zero uncertainty, never varied. */
    record Constant(double value) implements Distribution {
        public Constant { finite("value", value); }

        public static Constant of(double value) { return new Constant(value); }

        @Override public double mean() { return value; }
        @Override public double standardUncertainty() { return 0.0; }
        @Override public String shape() { return "constant"; }
    }
}
