package org.quire.engine.conformity;

import java.util.Locale;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * A decision rule for stating conformity of a measured error with a maximum permissible error, and the
 * certificate sentence that states it with its risk.
 *
 * <p>The rules, with tolerance interval [T_L, T_U], measured error y, standard uncertainty u, expanded
 * uncertainty U = k u and guard band w:
 * <ul>
 *   <li>{@link Kind#SIMPLE_ACCEPTANCE}: w = 0; conforms when T_L &le; y &le; T_U, otherwise does not conform.</li>
 *   <li>{@link Kind#GUARDED_ACCEPTANCE}: w = r U; conforms when T_L + w &le; y &le; T_U - w, otherwise does
 *   not conform (binary).</li>
 *   <li>{@link Kind#GUARDED_NON_BINARY}: w = r U; conforms when T_L + w &le; y &le; T_U - w, does not conform
 *   when y &lt; T_L - w or y &gt; T_U + w, undecided in between.</li>
 *   <li>{@link Kind#PROBABILITY_OF_CONFORMITY}: conforms when p_c &ge; p_min, does not conform when
 *   p_c &le; 1 - p_min, undecided in between.</li>
 * </ul>
 * Acceptance limits are inclusive. The largest specific risk of false acceptance is 1 - F(0) = 50 % for simple
 * acceptance, 1 - F(r k) for the guarded rules (for a result at the acceptance limit, neglecting the far
 * tolerance limit) and 1 - p_min for the probability rule, F being the standard normal or Student t
 * distribution function.
 *
 * <p>Options are changed by {@link #withDistribution}; immutable and thread-safe.
 *
 * <p>References: ILAC G8:2019 section 4 (simple acceptance, guarded acceptance with w = r U, binary and
 * non-binary statements; clause numbers from memory); JCGM 106:2012 clause 7 (probability of conformity,
 * equation for p_c with a normal PDF), clause 8 (acceptance intervals and guard bands) and clause 9 (specific
 * risks); ISO/IEC 17025:2017 7.8.6 (statements of conformity name the decision rule).
 */
public final class DecisionRule {

    /** The kinds of rule. */
    public enum Kind {
        /** Simple acceptance, w = 0 (ILAC G8 "shared risk"). */
        SIMPLE_ACCEPTANCE("simple acceptance"),
        /** Guarded acceptance with w = r U, binary statement. */
        GUARDED_ACCEPTANCE("guarded acceptance"),
        /** Guarded acceptance and rejection with w = r U, undecided between. */
        GUARDED_NON_BINARY("guarded acceptance and rejection"),
        /** Decision by the probability of conformity. */
        PROBABILITY_OF_CONFORMITY("probability of conformity");

        private final String title;

        Kind(String title) {
            this.title = title;
        }

        /** @return the rule's name for reports */
        public String title() {
            return title;
        }
    }

    private final Kind kind;
    private final double guardFactor;
    private final double minimumProbability;
    private final ResultDistribution distribution;

    private DecisionRule(Kind kind, double guardFactor, double minimumProbability,
            ResultDistribution distribution) {
        this.kind = kind;
        this.guardFactor = guardFactor;
        this.minimumProbability = minimumProbability;
        this.distribution = distribution;
    }

    /** @return simple acceptance (w = 0) with a normal distribution */
    public static DecisionRule simpleAcceptance() {
        return new DecisionRule(Kind.SIMPLE_ACCEPTANCE, 0.0, Double.NaN, ResultDistribution.NORMAL);
    }

    /** @return guarded acceptance with w = U (r = 1) */
    public static DecisionRule guardedAcceptance() {
        return guardedAcceptance(1.0);
    }

    /**
     * @param r the guard-band factor, w = r U; positive and finite
     * @return guarded acceptance, binary statement
     */
    public static DecisionRule guardedAcceptance(double r) {
        return new DecisionRule(Kind.GUARDED_ACCEPTANCE, checkGuard(r), Double.NaN, ResultDistribution.NORMAL);
    }

    /**
     * @param r the guard-band factor, w = r U; positive and finite
     * @return guarded acceptance and rejection, with results between the guard bands undecided
     */
    public static DecisionRule guardedNonBinary(double r) {
        return new DecisionRule(Kind.GUARDED_NON_BINARY, checkGuard(r), Double.NaN, ResultDistribution.NORMAL);
    }

    /**
     * @param pMin the smallest probability of conformity for "conforms", 0.5 &lt; pMin &lt; 1 (e.g. 0.95)
     * @return the decision by probability of conformity
     */
    public static DecisionRule probabilityOfConformity(double pMin) {
        if (!(pMin > 0.5 && pMin < 1)) {
            throw new IllegalArgumentException(ConformityMessages.probability("minimum probability of conformity", pMin));
        }
        return new DecisionRule(Kind.PROBABILITY_OF_CONFORMITY, 0.0, pMin, ResultDistribution.NORMAL);
    }

    private static double checkGuard(double r) {
        if (!Double.isFinite(r) || !(r > 0)) {
            throw new IllegalArgumentException(ConformityMessages.notPositive("guard-band factor r", r));
        }
        return r;
    }

    /** @return a copy of this rule that assigns the given distribution to the measurand */
    public DecisionRule withDistribution(ResultDistribution d) {
        if (d == null) {
            throw new IllegalArgumentException(ConformityMessages.missing("distribution"));
        }
        return new DecisionRule(kind, guardFactor, minimumProbability, d);
    }

    /** @return the kind of rule */
    public Kind kind() {
        return kind;
    }

    /** @return the guard-band factor r (0 for simple acceptance and the probability rule) */
    public double guardFactor() {
        return guardFactor;
    }

    /** @return p_min of the probability rule, NaN for the other rules */
    public double minimumProbability() {
        return minimumProbability;
    }

    /** @return the distribution assigned to the measurand */
    public ResultDistribution distribution() {
        return distribution;
    }

    private double dofFor(double dof) {
        return distribution == ResultDistribution.NORMAL ? Double.POSITIVE_INFINITY : dof;
    }

    /**
     * Decides for one measured error against given limits.
     *
     * @param point the measured error
     * @param limits the maximum permissible error at the point
     * @return the decision, with an empty zone name
     */
    public PointDecision decide(MeasuredError point, MpeLimits limits) {
        return decide(point, "", limits);
    }

    /**
     * Decides for one measured error against an envelope (using the point's flow and temperature).
     *
     * @throws IllegalArgumentException when the point lies outside the envelope or lacks a needed temperature
     */
    public PointDecision decide(MeasuredError point, MpeEnvelope envelope) {
        if (point == null || envelope == null) {
            throw new IllegalArgumentException(ConformityMessages.missing(point == null ? "measured error" : "envelope"));
        }
        MpeZone zone = envelope.zoneAt(point.flow());
        return decide(point, zone.name(), zone.limitsAt(point.temperature()));
    }

    PointDecision decide(MeasuredError point, String zone, MpeLimits limits) {
        if (point == null || limits == null) {
            throw new IllegalArgumentException(ConformityMessages.missing(point == null ? "measured error" : "limits"));
        }
        double y = point.errorPercent();
        double u = point.standardUncertainty();
        double tl = limits.lowerTolerance();
        double tu = limits.upperTolerance();
        double bigU = point.expandedUncertainty();
        double w = guardFactor * bigU;
        double dof = dofFor(point.dof());
        double pc = ConformityProbability.scaledT(y, u, dof, tl, tu);
        double al;
        double au;
        Decision d;
        switch (kind) {
            case SIMPLE_ACCEPTANCE:
                al = tl;
                au = tu;
                d = y >= tl && y <= tu ? Decision.CONFORMS : Decision.DOES_NOT_CONFORM;
                break;
            case GUARDED_ACCEPTANCE:
            case GUARDED_NON_BINARY:
                al = tl + w;
                au = tu - w;
                if (y >= al && y <= au) {
                    d = Decision.CONFORMS;
                } else if (kind == Kind.GUARDED_ACCEPTANCE || y < tl - w || y > tu + w) {
                    d = Decision.DOES_NOT_CONFORM;
                } else {
                    d = Decision.UNDECIDED;
                }
                if (al > au) {
                    al = Double.NaN;
                    au = Double.NaN;
                }
                break;
            case PROBABILITY_OF_CONFORMITY:
                double[] acc = acceptanceByProbability(u, dof, tl, tu);
                al = acc[0];
                au = acc[1];
                if (pc >= minimumProbability) {
                    d = Decision.CONFORMS;
                } else if (pc <= 1 - minimumProbability) {
                    d = Decision.DOES_NOT_CONFORM;
                } else {
                    d = Decision.UNDECIDED;
                }
                break;
            default:
                throw new IllegalStateException(kind.name());
        }
        double risk = d == Decision.CONFORMS ? 1 - pc : d == Decision.DOES_NOT_CONFORM ? pc : Double.NaN;
        return new PointDecision(point, zone, limits, bigU, w, al, au, pc, d, risk);
    }

    /** The measured values at which p_c = p_min, by Brent's method; NaN when p_c never reaches p_min. */
    private double[] acceptanceByProbability(double u, double dof, double tl, double tu) {
        double mid = 0.5 * (tl + tu);
        if (ConformityProbability.scaledT(mid, u, dof, tl, tu) < minimumProbability) {
            return new double[] {Double.NaN, Double.NaN};
        }
        BrentSolver solver = new BrentSolver(1e-12 * Math.max(u, Math.max(Math.abs(tl), Math.abs(tu))));
        double lower = solver.solve(200,
                y -> ConformityProbability.scaledT(y, u, dof, tl, tu) - minimumProbability, tl, mid);
        double upper = solver.solve(200,
                y -> ConformityProbability.scaledT(y, u, dof, tl, tu) - minimumProbability, mid, tu);
        return new double[] {lower, upper};
    }

    /**
     * @param coverageFactor k of the expanded uncertainty U = k u (used by the guarded rules)
     * @param dof effective degrees of freedom (used with {@link ResultDistribution#SCALED_T})
     * @return the largest specific risk of false acceptance under this rule: 0.5 for simple acceptance,
     *     1 - F(r k) for the guarded rules, 1 - p_min for the probability rule
     */
    public double maximumRiskOfFalseAcceptance(double coverageFactor, double dof) {
        if (!Double.isFinite(coverageFactor) || !(coverageFactor > 0)) {
            throw new IllegalArgumentException(ConformityMessages.notPositive("coverage factor", coverageFactor));
        }
        if (!(dof > 0)) {
            throw new IllegalArgumentException(ConformityMessages.notPositive("degrees of freedom", dof));
        }
        double nu = dofFor(dof);
        switch (kind) {
            case SIMPLE_ACCEPTANCE:
                return 1 - ConformityProbability.cdf(nu, 0.0);
            case GUARDED_ACCEPTANCE:
            case GUARDED_NON_BINARY:
                return 1 - ConformityProbability.cdf(nu, guardFactor * coverageFactor);
            case PROBABILITY_OF_CONFORMITY:
                return 1 - minimumProbability;
            default:
                throw new IllegalStateException(kind.name());
        }
    }

    /**
     * A sentence for a certificate stating the rule and its risk, for results reported with coverage factor k
     * and (for the t distribution) the given effective degrees of freedom.
     */
    public String statement(double coverageFactor, double dof) {
        return statement("coverage factor k = " + num(coverageFactor), maximumRiskOfFalseAcceptance(coverageFactor, dof),
                dof);
    }

    /**
     * A sentence for a certificate stating the rule and its risk for results that each carry their own coverage
     * factor: when every point has the same k and degrees of freedom this is {@link #statement(double, double)};
     * otherwise the sentence refers to the k stated with each point's U, gives their range, and states the largest
     * specific risk over the points.
     *
     * @param coverageFactors k of each point
     * @param dofs effective degrees of freedom of each point, parallel to {@code coverageFactors}
     */
    public String statement(double[] coverageFactors, double[] dofs) {
        if (coverageFactors.length == 0 || coverageFactors.length != dofs.length) {
            throw new IllegalArgumentException("coverageFactors and dofs must be of the same, non-zero length, not "
                    + coverageFactors.length + " and " + dofs.length);
        }
        double kMin = Double.POSITIVE_INFINITY;
        double kMax = Double.NEGATIVE_INFINITY;
        double dofMin = Double.POSITIVE_INFINITY;
        double risk = 0;
        boolean same = true;
        for (int i = 0; i < coverageFactors.length; i++) {
            kMin = Math.min(kMin, coverageFactors[i]);
            kMax = Math.max(kMax, coverageFactors[i]);
            dofMin = Math.min(dofMin, dofs[i]);
            same &= num(coverageFactors[i]).equals(num(coverageFactors[0])) && dofs[i] == dofs[0];
            risk = Math.max(risk, maximumRiskOfFalseAcceptance(coverageFactors[i], dofs[i]));
        }
        if (same) {
            return statement(coverageFactors[0], dofs[0]);
        }
        String kText = num(kMin).equals(num(kMax)) ? "coverage factor k = " + num(kMin)
                : "the coverage factor k stated with each point's U (k = " + num(kMin) + " to " + num(kMax) + ")";
        return statement(kText, risk, dofMin);
    }

    private String statement(String kText, double risk, double dof) {
        String dist = distribution == ResultDistribution.NORMAL || Double.isInfinite(dof)
                ? "a normal distribution"
                : "a scaled and shifted t distribution with " + num(dof) + " effective degrees of freedom";
        String riskText = pct(risk);
        switch (kind) {
            case SIMPLE_ACCEPTANCE:
                return "Decision rule: simple acceptance (ILAC G8:2019, guard band w = 0). A result is stated to"
                        + " conform when the measured error lies within the maximum permissible error, and not to"
                        + " conform otherwise. For a result at a limit the specific risk of false acceptance is up"
                        + " to " + riskText + " %.";
            case GUARDED_ACCEPTANCE:
                return "Decision rule: guarded acceptance (ILAC G8:2019; JCGM 106:2012) with guard band w = "
                        + guardText() + ", where U is the expanded uncertainty with " + kText + ". A result is stated to conform when the measured error lies"
                        + " within the maximum permissible error narrowed by w at each limit, and not to conform"
                        + " otherwise. Assuming " + dist + " for the error, the specific risk of false acceptance"
                        + " is at most about " + riskText + " %.";
            case GUARDED_NON_BINARY:
                return "Decision rule: guarded acceptance and rejection (ILAC G8:2019; JCGM 106:2012) with guard"
                        + " band w = " + guardText() + ", where U is the expanded uncertainty with " + kText
                        + ". A result is stated to conform when the"
                        + " measured error lies within the maximum permissible error narrowed by w at each limit,"
                        + " not to conform when it lies outside the maximum permissible error widened by w, and"
                        + " no statement is made in between. Assuming " + dist + " for the error, the specific"
                        + " risks of false acceptance and of false rejection are each at most about " + riskText
                        + " %.";
            case PROBABILITY_OF_CONFORMITY:
                return "Decision rule: probability of conformity (JCGM 106:2012 clause 7). A result is stated to"
                        + " conform when the probability that the error lies within the maximum permissible"
                        + " error is at least " + pct(minimumProbability) + " %, not to conform when it is at most "
                        + pct(1 - minimumProbability) + " %, and no statement is made in between; the"
                        + " probability is computed assuming " + dist + " for the error. The specific risk of"
                        + " false acceptance is at most " + riskText + " %.";
            default:
                throw new IllegalStateException(kind.name());
        }
    }

    private String guardText() {
        return guardFactor == 1.0 ? "U" : num(guardFactor) + " U";
    }

    /** @return the statement for a normal distribution */
    public String statement(double coverageFactor) {
        return statement(coverageFactor, Double.POSITIVE_INFINITY);
    }

    /** Two significant digits for a probability in percent, e.g. 2.275 % as "2.3", 50 % as "50". */
    static String pct(double p) {
        double v = 100 * p;
        if (v >= 10) {
            return String.format(Locale.ROOT, "%.0f", v);
        }
        return new java.math.BigDecimal(v).round(new java.math.MathContext(2)).toPlainString();
    }

    private static String num(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e9) {
            return Long.toString((long) v);
        }
        return new java.math.BigDecimal(v).round(new java.math.MathContext(3)).stripTrailingZeros().toPlainString();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof DecisionRule r && kind == r.kind && Double.compare(guardFactor, r.guardFactor) == 0
                && Double.compare(minimumProbability, r.minimumProbability) == 0 && distribution == r.distribution;
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(kind, guardFactor, minimumProbability, distribution);
    }

    @Override
    public String toString() {
        return "DecisionRule[" + kind.title() + (kind == Kind.PROBABILITY_OF_CONFORMITY
                ? ", p_min = " + minimumProbability : kind == Kind.SIMPLE_ACCEPTANCE ? "" : ", r = " + guardFactor)
                + ", " + distribution.name().toLowerCase(Locale.ROOT) + "]";
    }
}
