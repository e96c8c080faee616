package org.quire.app.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;

/**
 * How reports write numbers: working figures to a few significant digits with powers of ten for very small
 * or large magnitudes (1.66 × 10⁻⁵), estimates as entered, degrees of freedom with ∞. The rounding of the
 * reported result itself is {@link org.quire.engine.gum.Rounding}'s (JCGM 100:2008 7.2.6).
 *
 * <p>Stateless and thread-safe.
 */
public final class Figures {
    private static final String SUPERSCRIPTS = "⁰¹²³⁴⁵⁶⁷⁸⁹";

    private Figures() {
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

    /** @return degrees of freedom: ∞, a whole number, or one decimal */
    public static String dof(double nu) {
        if (Double.isInfinite(nu)) {
            return "∞";
        }
        if (Double.isNaN(nu)) {
            return "–";
        }
        return nu == Math.rint(nu) ? String.format(Locale.ROOT, "%.0f", nu) : String.format(Locale.ROOT, "%.1f", nu);
    }

    /** @return a fraction as a percentage with one decimal, e.g. {@code 62.3} */
    public static String percent(double fraction) {
        return String.format(Locale.ROOT, "%.1f", 100 * fraction);
    }

    /** @return a coverage probability as a percentage without trailing zeros, to four significant digits, e.g. {@code 95.45} or {@code 99} */
    public static String probability(double p) {
        return new BigDecimal(100 * p).round(new MathContext(4)).stripTrailingZeros().toPlainString();
    }

    static String superscript(int exponent) {
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
        return s.startsWith("-") ? "−" + s.substring(1) : s;
    }
}
