package org.quire.engine.gum;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;

/**
 * The one rule by which reports, certificates, the command line and the workbench write numbers: working figures
 * to a few significant digits with powers of ten for very small or large magnitudes (1.66 × 10⁻⁵), estimates as
 * entered, degrees of freedom with ∞, shares of a variance to 0.1 %, counts such as the number of Monte Carlo
 * trials in groups of three digits (1 000 000). Integer parts of more than four digits are grouped in threes
 * with a narrow no-break space, decimals are not (SI Brochure, 9th ed., 5.4.4: "numbers may be divided in groups
 * of three ... never commas or points"); the minus sign is U+2212. The rounding of the reported result itself
 * is {@link Rounding}'s (JCGM 100:2008 7.2.6).
 *
 * <p>Stateless and thread-safe.
 */
public final class Figures {
    private static final String SUPERSCRIPTS = "⁰¹²³⁴⁵⁶⁷⁸⁹";
    /** The separator of digit groups: U+202F narrow no-break space, so a number never breaks over two lines. */
    public static final char GROUP = '\u202f';

    /**
     * Significant digits of working figures in tables and charts (u(x_i), c_i, u_i(y), Monte Carlo statistics):
     * one more than the two of a stated result (JCGM 100:2008 7.2.6), so that rounding is not compounded.
     */
    public static final int WORKING_DIGITS = 3;

    /**
     * Significant digits of an expanded uncertainty as a certificate states it, and as the report states the same
     * figure for checking: two (JCGM 100:2008 7.2.6; EA-4/02 M:2022 5.4: at most two).
     */
    public static final int STATED_DIGITS = 2;

    private Figures() {
    }

    /**
     * @param expanded an expanded uncertainty U
     * @return U as a certificate states it: {@link Rounding#uncertainty} to {@link #STATED_DIGITS} significant
     *     digits, e.g. {@code 0.052}, {@code 0.080}
     */
    public static String stated(double expanded) {
        if (!Double.isFinite(expanded)) {
            return sig(expanded, STATED_DIGITS);
        }
        return minus(Rounding.uncertainty(expanded, STATED_DIGITS).toPlainString());
    }

    /**
     * @param value a result, such as an error of indication
     * @param expanded its expanded uncertainty U
     * @return the result as a certificate states it: rounded to the last decimal place of {@link #stated(double)}
     *     (JCGM 100:2008 7.2.6), e.g. {@code 0.397}, {@code −0.002}
     */
    public static String statedValue(double value, double expanded) {
        if (!Double.isFinite(value) || !Double.isFinite(expanded)) {
            return sig(value, 4);
        }
        return minus(Rounding.estimate(value, expanded, STATED_DIGITS).toPlainString());
    }

    /**
     * @param k a coverage factor
     * @return k to three significant digits, the way every report, certificate and screen states it: {@code 2.00},
     *     {@code 2.16}, {@code 3.31} (JCGM 100:2008 7.2.3 asks for k to be stated; three digits, common practice)
     */
    public static String coverageFactor(double k) {
        return sig(k, 3);
    }

    /**
     * @param v an end of a coverage interval (or a Monte Carlo estimate)
     * @param u the standard uncertainty it goes with
     * @param digits the significant digits u is stated to
     * @return {@code v} to the decimal place of {@code u} rounded to {@code digits} significant digits (JCGM 100:2008
     *     7.2.6; JCGM 101:2008 7.9 states the ends of a coverage interval to the decimal place of u(y)), or to 6 significant digits when u is
     *     not a positive finite number
     */
    public static String intervalEnd(double v, double u, int digits) {
        if (!Double.isFinite(v)) {
            return sig(v, 6);
        }
        return Double.isFinite(u) && u > 0 ? minus(Rounding.estimate(v, u, digits).toPlainString()) : compact(v, 6);
    }

    /** @return a working figure to {@link #WORKING_DIGITS} significant digits, e.g. {@code 0.00289}, {@code 2.89 × 10⁻⁵} */
    public static String working(double v) {
        return sig(v, WORKING_DIGITS);
    }

    /**
     * Reads back a number as {@link Figures} writes it: U+2212 minus, digit groups separated by U+202F, and
     * powers of ten written {@code × 10⁻⁵}; anything else is left as it is.
     *
     * @param shown the text
     * @return the same number in plain computer notation, e.g. {@code -2.89e-5}
     */
    public static String plain(String shown) {
        String t = shown.strip().replace('\u2212', '-').replace(String.valueOf(GROUP), "");
        int times = t.indexOf(" \u00d7 10");
        if (times < 0) {
            return t;
        }
        StringBuilder e = new StringBuilder();
        for (char c : t.substring(times + 5).toCharArray()) {
            int d = SUPERSCRIPTS.indexOf(c);
            if (c == '\u207b') {
                e.append('-');
            } else if (d >= 0) {
                e.append((char) ('0' + d));
            } else {
                return t;
            }
        }
        return t.substring(0, times) + "e" + e;
    }

    /** @return {@code v} to {@code digits} significant digits, e.g. {@code 2.50 × 10⁻⁵}, {@code 0.0316}, {@code 575} */
    public static String sig(double v, int digits) {
        if (Double.isNaN(v)) {
            return "–";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "∞" : "−∞";
        }
        if (v == 0) {
            return "0";
        }
        BigDecimal b = new BigDecimal(v).round(new MathContext(digits, RoundingMode.HALF_EVEN));
        if (b.precision() < digits) {
            b = b.setScale(b.scale() + digits - b.precision());
        }
        int exponent = b.precision() - b.scale() - 1;
        if (exponent >= -3 && exponent < 6) {
            return minus(b.setScale(Math.max(0, b.scale()), RoundingMode.HALF_EVEN).toPlainString());
        }
        BigDecimal mantissa = b.movePointLeft(exponent);
        return minus(mantissa.toPlainString()) + " × 10" + superscript(exponent);
    }

    /** @return {@code v} to at most {@code digits} significant digits, trailing zeros dropped, e.g. {@code 50.000838} */
    public static String compact(double v, int digits) {
        if (!Double.isFinite(v) || v == 0) {
            return sig(v, digits);
        }
        BigDecimal b = new BigDecimal(v).round(new MathContext(digits, RoundingMode.HALF_EVEN)).stripTrailingZeros();
        return estimate(b.doubleValue());
    }

    /**
     * The one form of a stated result "y ± U" (or "y ± u") on screens, in reports and in command-line text: the
     * uncertainty rounded to {@code digits} significant digits and the estimate to its last digit kept (JCGM
     * 100:2008 7.2.6; {@link Rounding#format}), with the minus sign and digit groups of every other figure.
     *
     * @return e.g. "−0.11 ± 0.24"
     */
    public static String statedResult(double estimate, double uncertainty, int digits) {
        if (!Double.isFinite(estimate) || !Double.isFinite(uncertainty)) {
            // nothing to round to: the estimate as it is, an infinite U as ∞ and an undefined one as –
            return estimate(estimate) + " \u00b1 " + (Double.isNaN(uncertainty) ? "\u2013"
                    : Double.isInfinite(uncertainty) ? "\u221e" : minus(Rounding.uncertainty(uncertainty, digits)
                            .toPlainString()));
        }
        return minus(Rounding.estimate(estimate, uncertainty, digits).toPlainString()) + " \u00b1 "
                + minus(Rounding.uncertainty(uncertainty, digits).toPlainString());
    }

    /** @return an estimate as its shortest exact decimal when that is short, else to 10 significant digits */
    public static String estimate(double v) {
        if (!Double.isFinite(v)) {
            return sig(v, 10);
        }
        BigDecimal b = new BigDecimal(Double.toString(v)).stripTrailingZeros();
        int exponent = b.precision() - b.scale() - 1;
        if (exponent >= -4 && exponent < 9 && b.precision() <= 12) {
            return minus(b.scale() < 0 ? b.setScale(0).toPlainString() : b.toPlainString());
        }
        BigDecimal r = b.round(new MathContext(10, RoundingMode.HALF_EVEN)).stripTrailingZeros();
        int e = r.precision() - r.scale() - 1;
        if (e >= -4 && e < 9) {
            return minus(r.scale() < 0 ? r.setScale(0).toPlainString() : r.toPlainString());
        }
        return sig(v, Math.min(10, r.precision()));
    }

    /**
     * The one rule for showing degrees of freedom: a whole number as such, otherwise one decimal (nu_eff is
     * truncated for k, JCGM 100:2008 G.4.1 note 1, but shown as computed); infinite as ∞ and not defined (NaN) as
     * –. {@link #dofPlain(double)} is the same rule in ASCII for command-line text.
     *
     * @return degrees of freedom for screens and reports: ∞, –, a whole number, or one decimal
     */
    public static String dof(double nu) {
        if (Double.isInfinite(nu)) {
            return "∞";
        }
        if (Double.isNaN(nu)) {
            return "–";
        }
        return dofNumber(nu);
    }

    /** @return degrees of freedom for plain text, by the rule of {@link #dof(double)}: inf, -, or the number */
    public static String dofPlain(double nu) {
        if (Double.isInfinite(nu)) {
            return "inf";
        }
        if (Double.isNaN(nu)) {
            return "-";
        }
        return dofNumber(nu);
    }

    private static String dofNumber(double nu) {
        return nu == Math.rint(nu) ? String.format(Locale.ROOT, "%.0f", nu) : String.format(Locale.ROOT, "%.1f", nu);
    }

    /** @return a fraction as a percentage with one decimal, e.g. {@code 62.3} */
    public static String percent(double fraction) {
        String s = String.format(Locale.ROOT, "%.1f", 100 * fraction);
        return s.equals("-0.0") ? "0.0" : minus(s);
    }

    /** @return a coverage probability as a percentage without trailing zeros, to four significant digits, e.g. {@code 95.45} or {@code 99} */
    public static String probability(double p) {
        return new BigDecimal(100 * p).round(new MathContext(4)).stripTrailingZeros().toPlainString();
    }

    /** @return the exponent in superscript digits, e.g. ⁻⁵ */
    public static String superscript(int exponent) {
        StringBuilder s = new StringBuilder();
        if (exponent < 0) {
            s.append('⁻');
        }
        for (char c : Integer.toString(Math.abs(exponent)).toCharArray()) {
            s.append(SUPERSCRIPTS.charAt(c - '0'));
        }
        return s.toString();
    }

    private static String minus(String s) {
        return s.startsWith("-") ? "−" + group(s.substring(1)) : group(s);
    }

    /** @return a plain decimal with its integer part grouped in threes when it has more than four digits */
    static String group(String plain) {
        int dot = plain.indexOf('.');
        String whole = dot < 0 ? plain : plain.substring(0, dot);
        if (whole.length() <= 4 || !whole.chars().allMatch(Character::isDigit)) {
            return plain;
        }
        StringBuilder g = new StringBuilder();
        int first = whole.length() % 3 == 0 ? 3 : whole.length() % 3;
        g.append(whole, 0, first);
        for (int i = first; i < whole.length(); i += 3) {
            g.append(GROUP).append(whole, i, i + 3);
        }
        return dot < 0 ? g.toString() : g + plain.substring(dot);
    }

    /**
     * @param n a count, such as the number of Monte Carlo trials
     * @return the count in groups of three digits, e.g. 1 000 000 (SI Brochure, 9th ed., 5.4.4)
     */
    public static String count(long n) {
        String digits = Long.toString(Math.abs(n));
        StringBuilder g = new StringBuilder();
        int first = digits.length() % 3 == 0 ? 3 : digits.length() % 3;
        g.append(digits, 0, first);
        for (int i = first; i < digits.length(); i += 3) {
            g.append(GROUP).append(digits, i, i + 3);
        }
        return (n < 0 ? "−" : "") + g;
    }

    /**
     * @param fraction a share of a combined variance, 0 to 1
     * @return the share in percent rounded to 0.1 % (the reported figure; a budget's shares are read to that
     *     resolution, common practice)
     */
    public static double sharePercent(double fraction) {
        return new BigDecimal(100 * fraction).setScale(1, RoundingMode.HALF_EVEN).doubleValue();
    }

    /**
     * Whether a relative expanded uncertainty U/|y| means something for a result: not when the quantity is itself
     * in percent (an error of a meter in % of the reading, whose U is relative to the reading already), nor when the
     * interval y ± U reaches zero, where U/|y| grows without bound (an error near zero). Common practice.
     *
     * @param unit the result's unit as written
     * @param estimate y
     * @param expanded U
     * @return whether reports should show U/|y|
     */
    public static boolean relativeUncertaintyMeaningful(String unit, double estimate, double expanded) {
        String u = unit == null ? "" : unit.strip();
        return !u.equals("%") && !u.equals("ppm") && Double.isFinite(estimate) && Double.isFinite(expanded)
                && Math.abs(estimate) > expanded;
    }
}
