package org.quire.engine.montecarlo;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * The comparison of a GUM uncertainty evaluation with the Monte Carlo method for one output: are the ends of
 * the GUM coverage interval [y - U_p, y + U_p] within the numerical tolerance of the Monte Carlo interval?
 *
 * <p>The numerical tolerance delta is that of the GUM standard uncertainty u(y) at n_dig significant decimal
 * digits: u(y) written as c x 10^l with c an n_dig-digit integer gives delta = 10^l / 2. With
 * d_low = |y - U_p - y_low| and d_high = |y + U_p - y_high|, the GUM result is {@link Verdict#VALIDATED} when
 * both are at most delta, otherwise {@link Verdict#NOT_VALIDATED}. {@link #reason()} says why in a sentence.
 *
 * <p>When the GUM standard uncertainty is zero although the inputs are uncertain (every first-order sensitivity
 * coefficient vanishes at the estimates, as for a model like Y = X^2 with the estimate of X at zero), the GUM
 * interval collapses to the point y: there is nothing to compare and no tolerance, the verdict is
 * {@link Verdict#NOT_VALIDATED} and the reason says that the first-order law of propagation gave zero. This is
 * the case for which JCGM 101:2008 clause 9 shows the Monte Carlo method matters most (from memory: 9.4, the
 * comparison loss in microwave power meter calibration, Y = X_1^2 + X_2^2, where with the estimates of X_1 and
 * X_2 at zero the first-order law gives u(y) = 0 although Y certainly varies).
 *
 * <p>Immutable and thread-safe.
 *
 * <p>References: JCGM 101:2008 7.9.2 (numerical tolerance associated with a numerical value), 8.2 (comparison
 * procedure, d_low and d_high).
 */
public final class GumComparison {
    /** The outcome of the comparison. */
    public enum Verdict {
        /**
         * Both interval ends agree within the numerical tolerance: the use of the GUM uncertainty framework is
         * validated in this instance (JCGM 101:2008 8.2 c).
         */
        VALIDATED,
        /** An interval end differs by more than the tolerance, or there is no GUM interval: use Monte Carlo. */
        NOT_VALIDATED;

        /** @return the word used in JSON and tables: {@code validated} or {@code not-validated} */
        public String word() {
            return this == VALIDATED ? "validated" : "not-validated";
        }

        /**
         * @return the verdict as screens, reports and the command line state it: {@code GUM result validated} or
         *     {@code GUM result NOT validated} (JCGM 101:2008 8.2 c)
         */
        public String statement() {
            return "GUM result " + outcome();
        }

        /** @return the verdict in a table column headed "GUM result": {@code validated} or {@code NOT validated} */
        public String outcome() {
            return this == VALIDATED ? "validated" : "NOT validated";
        }
    }

    private final double gumEstimate;
    private final double gumStandardUncertainty;
    private final double gumExpandedUncertainty;
    private final CoverageInterval monteCarloInterval;
    private final int significantDigits;
    private final double tolerance;
    private final double lowerDifference;
    private final double upperDifference;

    private GumComparison(double y, double u, double expanded, CoverageInterval mc, int digits) {
        this.gumEstimate = y;
        this.gumStandardUncertainty = u;
        this.gumExpandedUncertainty = expanded;
        this.monteCarloInterval = mc;
        this.significantDigits = digits;
        this.tolerance = u > 0 ? numericalTolerance(u, digits) : Double.NaN;
        this.lowerDifference = Math.abs(y - expanded - mc.lower());
        this.upperDifference = Math.abs(y + expanded - mc.upper());
    }

    /**
     * Compares with the Monte Carlo probabilistically symmetric coverage interval of {@code monteCarlo}: the GUM
     * interval y +- U_p leaves probability (1 - p)/2 in each tail of the distribution the GUM assigns to Y, so
     * like is compared with like. (For an output whose distribution is symmetric the shortest interval has the
     * same expected ends, but its position is poorly determined, since its width hardly changes as it slides,
     * and its ends scatter over several standard errors of a quantile.) Use
     * {@link #of(CoverageInterval, double, double, double, int)} to compare with another interval.
     *
     * @param monteCarlo the output's Monte Carlo summary
     * @param gumEstimate the GUM estimate y
     * @param gumStandardUncertainty the GUM standard uncertainty u(y), positive, or zero when the first-order law
     *     of propagation gives zero (the verdict is then {@link Verdict#NOT_VALIDATED})
     * @param gumExpandedUncertainty the GUM expanded uncertainty U_p for the run's coverage probability (zero
     *     with u(y))
     * @param significantDigits n_dig, 1 .. 15
     */
    public static GumComparison of(OutputSummary monteCarlo, double gumEstimate, double gumStandardUncertainty,
            double gumExpandedUncertainty, int significantDigits) {
        if (monteCarlo == null) {
            throw new IllegalArgumentException(Messages.nullArgument("Monte Carlo summary"));
        }
        return of(monteCarlo.symmetricInterval(), gumEstimate, gumStandardUncertainty, gumExpandedUncertainty,
                significantDigits);
    }

    /**
     * Compares with a given Monte Carlo coverage interval (for instance the shortest one).
     */
    public static GumComparison of(CoverageInterval monteCarloInterval, double gumEstimate,
            double gumStandardUncertainty, double gumExpandedUncertainty, int significantDigits) {
        if (monteCarloInterval == null) {
            throw new IllegalArgumentException(Messages.nullArgument("Monte Carlo coverage interval"));
        }
        if (!Double.isFinite(gumEstimate)) {
            throw new IllegalArgumentException(Messages.notFinite("GUM estimate", gumEstimate));
        }
        if (!(gumStandardUncertainty >= 0) || !Double.isFinite(gumStandardUncertainty)) {
            throw new IllegalArgumentException(
                    Messages.uncertaintyNegative("GUM standard uncertainty", gumStandardUncertainty));
        }
        if (!(gumExpandedUncertainty >= 0) || !Double.isFinite(gumExpandedUncertainty)
                || (gumExpandedUncertainty > 0) != (gumStandardUncertainty > 0)) {
            throw new IllegalArgumentException(
                    Messages.uncertaintyNegative("GUM expanded uncertainty", gumExpandedUncertainty));
        }
        if (significantDigits < 1 || significantDigits > 15) {
            throw new IllegalArgumentException(Messages.significantDigitsOutside(significantDigits));
        }
        return new GumComparison(gumEstimate, gumStandardUncertainty, gumExpandedUncertainty, monteCarloInterval,
                significantDigits);
    }

    /**
     * The numerical tolerance of a positive value at n_dig significant decimal digits: with the value rounded to
     * c x 10^l, c an n_dig-digit integer, delta = 10^l / 2. For example u = 0.0754 mg with n_dig = 2 gives
     * 75 x 10^-3 and delta = 0.0005 mg; u = 2.0 with n_dig = 2 gives 20 x 10^-1 and delta = 0.05.
     *
     * <p>References: JCGM 101:2008 7.9.2.
     */
    public static double numericalTolerance(double value, int significantDigits) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(Messages.uncertaintyNotPositive("value for the numerical tolerance",
                    value));
        }
        if (significantDigits < 1 || significantDigits > 15) {
            throw new IllegalArgumentException(Messages.significantDigitsOutside(significantDigits));
        }
        BigDecimal rounded = BigDecimal.valueOf(value).round(new MathContext(significantDigits, RoundingMode.HALF_UP));
        int leading = rounded.precision() - rounded.scale() - 1; // exponent of the leading digit
        int l = leading - (significantDigits - 1);
        return 0.5 * Math.pow(10.0, l);
    }

    /** @return the verdict */
    public Verdict verdict() {
        return lowerDifference <= tolerance && upperDifference <= tolerance ? Verdict.VALIDATED
                : Verdict.NOT_VALIDATED;
    }

    /** @return true when the verdict is {@link Verdict#VALIDATED} */
    public boolean validated() {
        return verdict() == Verdict.VALIDATED;
    }

    /** @return true when the GUM standard uncertainty is zero: the first-order law of propagation gave zero */
    public boolean firstOrderZero() {
        return !(gumStandardUncertainty > 0);
    }

    /** @return one sentence saying why the verdict is what it is, with the figures compared */
    public String reason() {
        return Phrase.plain(reasonPhrases());
    }

    /**
     * @return the sentence of {@link #reason()} in pieces: words, the symbols d_low, d_high and delta by their
     *     names, and the numbers, so that a report can typeset the symbols and write the numbers by its own rule
     */
    public java.util.List<Phrase> reasonPhrases() {
        if (firstOrderZero()) {
            return java.util.List.of(Phrase.words(Messages.comparisonFirstOrderZero()));
        }
        return validated() ? Messages.comparisonValidated(lowerDifference, upperDifference, tolerance)
                : Messages.comparisonNotValidated(lowerDifference, upperDifference, tolerance);
    }

    /**
     * Says in plain words, in one sentence, why the GUM interval was not validated: the Monte Carlo interval
     * y_low .. y_high is narrower than y +- U_p at both ends (the output's distribution has shorter tails than the
     * scaled and shifted t distribution the GUM assigns to it, as when a bounded input such as a rectangular one
     * dominates: JCGM 101:2008 9.2.4), wider at both ends (longer tails), or shifted to one side (an asymmetric
     * distribution, as a model that is not linear over the spread of its inputs gives: JCGM 101:2008 9.4). The
     * "as when" cases are common practice.
     *
     * @return the sentence, or an empty string when the GUM result is validated or its u(y) is zero (then
     *     {@link #reason()} says it all)
     */
    public String explanation() {
        if (validated() || firstOrderZero()) {
            return "";
        }
        double gumLow = gumEstimate - gumExpandedUncertainty;
        double gumHigh = gumEstimate + gumExpandedUncertainty;
        boolean lowInside = monteCarloInterval.lower() > gumLow;
        boolean highInside = monteCarloInterval.upper() < gumHigh;
        if (lowInside && highInside) {
            return Messages.comparisonNarrower();
        }
        if (!lowInside && !highInside) {
            return Messages.comparisonWider();
        }
        return Messages.comparisonShifted(highInside);
    }

    /** @return the numerical tolerance delta, NaN when the GUM standard uncertainty is zero */
    public double tolerance() {
        return tolerance;
    }

    /** @return d_low = |y - U_p - y_low| */
    public double lowerDifference() {
        return lowerDifference;
    }

    /** @return d_high = |y + U_p - y_high| */
    public double upperDifference() {
        return upperDifference;
    }

    /** @return the GUM coverage interval [y - U_p, y + U_p] */
    public double[] gumInterval() {
        return new double[] {gumEstimate - gumExpandedUncertainty, gumEstimate + gumExpandedUncertainty};
    }

    /** @return the GUM estimate y */
    public double gumEstimate() {
        return gumEstimate;
    }

    /** @return the GUM standard uncertainty u(y) */
    public double gumStandardUncertainty() {
        return gumStandardUncertainty;
    }

    /** @return the GUM expanded uncertainty U_p */
    public double gumExpandedUncertainty() {
        return gumExpandedUncertainty;
    }

    /** @return the Monte Carlo coverage interval compared with */
    public CoverageInterval monteCarloInterval() {
        return monteCarloInterval;
    }

    /** @return n_dig */
    public int significantDigits() {
        return significantDigits;
    }

    @Override
    public String toString() {
        return "GumComparison[" + verdict() + ": d_low=" + lowerDifference + ", d_high=" + upperDifference
                + ", delta=" + tolerance + " (n_dig=" + significantDigits + ")]";
    }
}
