package org.quire.engine.budget;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * A Type B evaluation: a distribution stated from information other than repeated observations (a
 * certificate, a handbook, a specification, experience), given by the parameters the engineer entered.
 *
 * <p>Distributions and their parameters (the names are those of the budget file):
 * <ul>
 * <li>{@code normal}: {@code estimate} and one of {@code standardUncertainty}; {@code expandedUncertainty}
 *     with {@code coverageFactor}; or {@code expandedUncertainty} with {@code coverageProbability} and
 *     {@code dof}, where k = t_p(nu) (JCGM 100:2008 4.3.4 and 4.3.5; G.3).</li>
 * <li>{@code rectangular}, {@code triangular}, {@code arcsine} (U-shaped): {@code estimate} with
 *     {@code halfWidth}, or {@code lower} and {@code upper} limits (JCGM 100:2008 4.3.7, 4.3.9;
 *     JCGM 101:2008 6.4.2, 6.4.5, 6.4.6).</li>
 * <li>{@code trapezoidal}: as rectangular plus {@code beta}, the ratio of the top to the base
 *     (JCGM 101:2008 6.4.4).</li>
 * <li>{@code curvilinear-trapezoid}: as rectangular plus {@code halfWidthUncertainty} d, when the limits are
 *     themselves known only to +-d (JCGM 101:2008 6.4.3).</li>
 * <li>{@code student-t}: {@code estimate}, {@code scale} and {@code dof} (JCGM 101:2008 6.4.9).</li>
 * <li>{@code exponential}: {@code estimate}, the known expectation of a non-negative quantity
 *     (JCGM 101:2008 6.4.10).</li>
 * <li>{@code constant}: {@code estimate}, known exactly.</li>
 * </ul>
 * Degrees of freedom: infinite unless {@code dof} is given, or {@code relativeUncertaintyOfU}, the relative
 * uncertainty of u(x_i) as a fraction, giving nu = (1/2) (Delta u / u)^-2 (JCGM 100:2008 G.4.2, eq. G.3).
 *
 * <p>Immutable and thread-safe.
 */
public final class TypeB implements Evaluation {

    /** Names of the distributions, as written in budget files. */
    public static final List<String> DISTRIBUTIONS = List.of("normal", "rectangular", "triangular", "arcsine",
            "trapezoidal", "curvilinear-trapezoid", "student-t", "exponential", "constant");

    private static final Set<String> PARAMETERS = Set.of("estimate", "standardUncertainty", "expandedUncertainty",
            "coverageFactor", "coverageProbability", "dof", "halfWidth", "lower", "upper", "beta",
            "halfWidthUncertainty", "scale", "relativeUncertaintyOfU");

    private final String distributionName;
    private final Map<String, Double> given;
    private final Distribution distribution;
    private final double dof;
    /** The basis, written when first asked for ({@link #basis()}): a batch of evaluations never needs it. */
    private volatile String basis;

    private TypeB(String distributionName, Map<String, Double> given, Distribution distribution, double dof,
            String basis) {
        this.distributionName = distributionName;
        this.given = given;
        this.distribution = distribution;
        this.dof = dof;
        this.basis = basis;
    }

    /**
     * The parameters each distribution may carry, in the order a form shows them; the rules are those of
     * {@link #of} (see the class description), which refuses any other.
     *
     * @param distribution one of {@link #DISTRIBUTIONS}
     * @return the parameter names, file names as in {@link #parameterNames()}
     * @throws InvalidParameterException for an unknown distribution
     */
    public static List<String> parametersOf(String distribution) {
        List<String> own = distribution == null ? null : OWN.get(distribution);
        return own != null ? own : listOf(distribution);
    }

    /** {@link #parametersOf} of every distribution, listed once. */
    private static final Map<String, List<String>> OWN = own();

    private static Map<String, List<String>> own() {
        Map<String, List<String>> m = new java.util.HashMap<>();
        for (String d : DISTRIBUTIONS) {
            m.put(d, listOf(d));
        }
        return Map.copyOf(m);
    }

    private static List<String> listOf(String distribution) {
        List<String> limits = List.of("estimate", "halfWidth", "lower", "upper");
        List<String> nu = List.of("dof", "relativeUncertaintyOfU");
        switch (distribution == null ? "" : distribution) {
            case "normal":
                return List.of("estimate", "standardUncertainty", "expandedUncertainty", "coverageFactor",
                        "coverageProbability", "dof", "relativeUncertaintyOfU");
            case "rectangular":
            case "triangular":
            case "arcsine":
                return concat(limits, nu);
            case "trapezoidal":
                return concat(limits, List.of("beta"), nu);
            case "curvilinear-trapezoid":
                return concat(limits, List.of("halfWidthUncertainty"), nu);
            case "student-t":
                return List.of("estimate", "scale", "dof");
            case "exponential":
                return concat(List.of("estimate"), nu);
            case "constant":
                return List.of("estimate");
            default:
                throw new InvalidParameterException("distribution", "unknown distribution '" + distribution
                        + "'; expected one of " + String.join(", ", DISTRIBUTIONS));
        }
    }

    @SafeVarargs
    private static List<String> concat(List<String>... parts) {
        List<String> out = new java.util.ArrayList<>();
        for (List<String> p : parts) {
            out.addAll(p);
        }
        return List.copyOf(out);
    }

    /**
     * The name of a distribution on screens and in reports (one name per distribution: the file's
     * {@code arcsine} is shown as "U-shaped", as in the evaluation's basis).
     *
     * @param distribution one of {@link #DISTRIBUTIONS}
     * @return the screen name
     */
    public static String screenName(String distribution) {
        switch (distribution) {
            case "arcsine": return "U-shaped";
            case "curvilinear-trapezoid": return "curvilinear trapezoid";
            case "student-t": return "Student t";
            default:
                if (!DISTRIBUTIONS.contains(distribution)) {
                    throw new InvalidParameterException("distribution", "unknown distribution '" + distribution + "'");
                }
                return distribution;
        }
    }

    /**
     * The name of a parameter on screens and in reports, with its symbol.
     *
     * @param parameter one of {@link #parameterNames()}
     * @return the screen name, e.g. "Half-width a" for {@code halfWidth}
     */
    public static String parameterScreenName(String parameter) {
        switch (parameter) {
            case "estimate": return "Estimate";
            case "standardUncertainty": return "Standard uncertainty u";
            case "expandedUncertainty": return "Expanded uncertainty U";
            case "coverageFactor": return "Coverage factor k of U";
            case "coverageProbability": return "Coverage probability of U";
            case "halfWidth": return "Half-width a";
            case "lower": return "Lower limit";
            case "upper": return "Upper limit";
            case "beta": return "Top-to-base ratio \u03b2";
            case "halfWidthUncertainty": return "Inexactness d of limits";
            case "scale": return "Scale";
            case "dof": return "Degrees of freedom \u03bd";
            case "relativeUncertaintyOfU": return "Relative uncertainty of u";
            default: throw new InvalidParameterException(parameter, "'" + parameter
                    + "' is not a parameter of a Type B evaluation");
        }
    }

    /** @return the names of all parameters a Type B evaluation may carry */
    public static Set<String> parameterNames() {
        return PARAMETERS;
    }

    /**
     * @param distribution one of {@link #DISTRIBUTIONS}
     * @param parameters the parameters as entered (see the class description)
     * @return the evaluation
     * @throws InvalidParameterException naming the parameter that is missing, superfluous or out of range
     */
    public static TypeB of(String distribution, Map<String, Double> parameters) {
        return build(distribution, parameters, false);
    }

    /**
     * {@link #of}, with the basis written when {@code text} (and left null otherwise, to be written by
     * {@link #basis()} when first asked for), so that the checks and the figures are those of one method.
     */
    private static TypeB build(String distribution, Map<String, Double> parameters, boolean text) {
        if (distribution == null || !DISTRIBUTIONS.contains(distribution)) {
            throw new InvalidParameterException("distribution", "unknown distribution '" + distribution
                    + "'; expected one of " + String.join(", ", DISTRIBUTIONS));
        }
        Map<String, Double> p = new LinkedHashMap<>(parameters); // this evaluation's own copy, frozen at the end
        for (Map.Entry<String, Double> e : p.entrySet()) {
            if (!PARAMETERS.contains(e.getKey())) {
                throw new InvalidParameterException(e.getKey(), "'" + e.getKey()
                        + "' is not a parameter of a Type B evaluation");
            }
            Double v = e.getValue();
            if (v == null || Double.isNaN(v) || (Double.isInfinite(v) && !e.getKey().equals("dof"))) {
                throw new InvalidParameterException(e.getKey(), e.getKey() + " must be a finite number, not " + v);
            }
        }
        List<String> own = parametersOf(distribution);
        for (String k : p.keySet()) {
            if (!own.contains(k)) {
                throw new InvalidParameterException(k, "'" + k + "' does not belong to a " + distribution
                        + " distribution; it takes " + String.join(", ", own));
            }
        }
        Params r = new Params(distribution, p);
        Distribution d;
        String basis;
        switch (distribution) {
            case "normal": {
                double x = r.need("estimate");
                double u;
                if (p.containsKey("standardUncertainty")) {
                    r.forbid("expandedUncertainty", "coverageFactor", "coverageProbability");
                    u = r.positive("standardUncertainty");
                    basis = !text ? null : "normal, u = " + fmt(u);
                } else if (p.containsKey("coverageFactor")) {
                    r.forbid("coverageProbability");
                    double big = r.positive("expandedUncertainty");
                    double k = r.positive("coverageFactor");
                    u = big / k;
                    basis = !text ? null : "normal, U = " + fmt(big) + " with k = " + fmt(k);
                } else if (p.containsKey("coverageProbability")) {
                    double big = r.positive("expandedUncertainty");
                    double prob = r.need("coverageProbability");
                    if (!(prob > 0 && prob < 1)) {
                        throw new InvalidParameterException("coverageProbability",
                                "coverageProbability must lie strictly between 0 and 1, not " + prob);
                    }
                    double nu = p.containsKey("dof") ? r.positive("dof") : Double.POSITIVE_INFINITY;
                    double k = CoverageFactor.of(prob, nu);
                    u = big / k;
                    basis = !text ? null : "normal, U = " + fmt(big) + " at p = " + fmt(100 * prob) + " %"
                            + (Double.isInfinite(nu) ? "" : " with nu = " + fmt(nu)) + ", k = " + fmt(k);
                    if (!Double.isInfinite(nu)) {
                        r.forbid("relativeUncertaintyOfU");
                        return new TypeB(distribution, freeze(p), Distribution.StudentT.of(x, u, nu), nu, basis);
                    }
                } else {
                    throw new InvalidParameterException("standardUncertainty", "a normal distribution needs "
                            + "standardUncertainty, or expandedUncertainty with coverageFactor, or expandedUncertainty "
                            + "with coverageProbability");
                }
                d = Distribution.Normal.of(x, u);
                break;
            }
            case "rectangular":
            case "triangular":
            case "arcsine":
            case "trapezoidal":
            case "curvilinear-trapezoid": {
                double[] lim = r.limits();
                String what = distribution.equals("arcsine") ? "U-shaped" : distribution;
                basis = !text ? null : what + " within [" + fmt(lim[0]) + ", " + fmt(lim[1]) + "]";
                if (distribution.equals("rectangular")) {
                    r.forbid("beta", "halfWidthUncertainty");
                    d = Distribution.Rectangular.of(lim[0], lim[1]);
                } else if (distribution.equals("triangular")) {
                    r.forbid("beta", "halfWidthUncertainty");
                    d = Distribution.Triangular.of(lim[0], lim[1]);
                } else if (distribution.equals("arcsine")) {
                    r.forbid("beta", "halfWidthUncertainty");
                    d = Distribution.Arcsine.of(lim[0], lim[1]);
                } else if (distribution.equals("trapezoidal")) {
                    r.forbid("halfWidthUncertainty");
                    double beta = r.need("beta");
                    if (beta < 0 || beta > 1) {
                        throw new InvalidParameterException("beta", "beta must lie between 0 and 1, not " + beta);
                    }
                    d = Distribution.Trapezoidal.of(lim[0], lim[1], beta);
                    if (text) {
                        basis += ", beta = " + fmt(beta);
                    }
                } else {
                    r.forbid("beta");
                    double dd = r.positive("halfWidthUncertainty");
                    if (dd > 0.5 * (lim[1] - lim[0])) {
                        throw new InvalidParameterException("halfWidthUncertainty",
                                "halfWidthUncertainty must not exceed the half-width " + fmt(0.5 * (lim[1] - lim[0])));
                    }
                    d = Distribution.CurvilinearTrapezoid.of(lim[0], lim[1], dd);
                    if (text) {
                        basis += ", limits known to +-" + fmt(dd);
                    }
                }
                break;
            }
            case "student-t": {
                double x = r.need("estimate");
                double scale = r.positive("scale");
                double nu = r.positive("dof");
                r.forbid("relativeUncertaintyOfU");
                basis = !text ? null : "Student t, scale " + fmt(scale) + ", nu = " + fmt(nu);
                return new TypeB(distribution, freeze(p), Distribution.StudentT.of(x, scale, nu), nu, basis);
            }
            case "exponential": {
                double x = r.positive("estimate");
                d = Distribution.Exponential.of(x);
                basis = !text ? null : "exponential with mean " + fmt(x);
                break;
            }
            default: {
                double x = r.need("estimate");
                r.forbid("dof", "relativeUncertaintyOfU");
                r.only("estimate");
                return new TypeB(distribution, freeze(p), Distribution.Constant.of(x), Double.POSITIVE_INFINITY,
                        "exactly known");
            }
        }
        double nu = Double.POSITIVE_INFINITY;
        if (p.containsKey("dof") && p.containsKey("relativeUncertaintyOfU")) {
            throw new InvalidParameterException("relativeUncertaintyOfU",
                    "give either dof or relativeUncertaintyOfU, not both");
        }
        if (p.containsKey("dof")) {
            nu = r.positive("dof");
            if (text) {
                basis += ", nu = " + fmt(nu);
            }
        } else if (p.containsKey("relativeUncertaintyOfU")) {
            double rel = r.positive("relativeUncertaintyOfU");
            nu = 0.5 / (rel * rel);
            if (Math.abs(nu - Math.rint(nu)) < 1e-9 * nu) {
                nu = Math.rint(nu);
            }
            if (text) {
                basis += ", u reliable to " + fmt(100 * rel) + " % (nu = " + fmt(nu) + ")";
            }
        }
        return new TypeB(distribution, freeze(p), d, nu, basis);
    }

    /** @return {@code p}, which is the evaluation's own copy, unmodifiable */
    private static Map<String, Double> freeze(Map<String, Double> p) {
        return Collections.unmodifiableMap(p);
    }

    static String fmt(double v) {
        return TypeA.fmt(v);
    }

    /** Reads and checks the parameters of one distribution. */
    private static final class Params {
        private final String distribution;
        private final Map<String, Double> p;

        Params(String distribution, Map<String, Double> p) {
            this.distribution = distribution;
            this.p = p;
        }

        double need(String name) {
            Double v = p.get(name);
            if (v == null) {
                throw new InvalidParameterException(name, "a " + distribution + " distribution needs '" + name + "'");
            }
            return v;
        }

        double positive(String name) {
            double v = need(name);
            if (!(v > 0)) {
                throw new InvalidParameterException(name, name + " must be positive, not " + v);
            }
            return v;
        }

        void forbid(String... names) {
            for (String n : names) {
                if (p.containsKey(n)) {
                    throw new InvalidParameterException(n, "'" + n + "' does not belong to a " + distribution
                            + " distribution given this way");
                }
            }
        }

        void only(String... names) {
            List<String> allowed = List.of(names);
            for (String k : p.keySet()) {
                if (!allowed.contains(k)) {
                    throw new InvalidParameterException(k, "'" + k + "' does not belong to a " + distribution
                            + " value");
                }
            }
        }

        double[] limits() {
            forbid("standardUncertainty", "expandedUncertainty", "coverageFactor", "coverageProbability", "scale");
            if (p.containsKey("halfWidth")) {
                forbid("lower", "upper");
                double x = need("estimate");
                double a = positive("halfWidth");
                return new double[] {x - a, x + a};
            }
            if (p.containsKey("lower") || p.containsKey("upper")) {
                double lo = need("lower");
                double hi = need("upper");
                if (!(hi > lo)) {
                    throw new InvalidParameterException("upper", "upper limit " + hi
                            + " must be greater than lower limit " + lo);
                }
                Double x = p.get("estimate");
                double mid = 0.5 * (lo + hi);
                if (x != null && Math.abs(x - mid) > 1e-12 * Math.max(Math.abs(mid), hi - lo)) {
                    throw new InvalidParameterException("estimate", "estimate " + x
                            + " is not the midpoint " + mid + " of the limits; a symmetric " + distribution
                            + " distribution has its estimate at the midpoint");
                }
                return new double[] {lo, hi};
            }
            throw new InvalidParameterException("halfWidth", "a " + distribution
                    + " distribution needs 'estimate' with 'halfWidth', or 'lower' and 'upper'");
        }
    }

    /** @return the distribution's name as written in budget files, e.g. {@code rectangular} */
    public String distributionName() {
        return distributionName;
    }

    /** @return the parameters as entered, in entry order */
    public Map<String, Double> parameters() {
        return given;
    }

    /**
     * @return a copy with one parameter set (or removed, when {@code value} is null)
     * @throws InvalidParameterException when the result is not a valid evaluation
     */
    public TypeB with(String parameter, Double value) {
        Map<String, Double> p = new LinkedHashMap<>(given);
        if (value == null) {
            p.remove(parameter);
        } else {
            p.put(parameter, value);
        }
        return of(distributionName, p);
    }

    @Override public double estimate() { return distribution.mean(); }
    @Override public double standardUncertainty() { return distribution.standardUncertainty(); }
    @Override public double dof() { return dof; }
    @Override public Distribution distribution() { return distribution; }
    @Override public String type() { return "B"; }
    @Override
    public String basis() {
        String b = basis;
        if (b == null) {
            b = build(distributionName, given, true).basis;
            basis = b;
        }
        return b;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TypeB && ((TypeB) o).distributionName.equals(distributionName)
                && ((TypeB) o).given.equals(given);
    }

    @Override
    public int hashCode() {
        return distributionName.hashCode() * 31 + given.hashCode();
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "Type B %s %s", distributionName, given);
    }
}
