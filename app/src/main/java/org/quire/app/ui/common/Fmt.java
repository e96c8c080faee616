package org.quire.app.ui.common;

import java.util.Locale;

/** How the workbench prints numbers it is given: formatting only, never arithmetic on the figures. */
public final class Fmt {
    private Fmt() {
    }

    /**
     * @return {@code v} as entered when it has at most 10 significant digits (1000.212 stays 1000.212), else
     *     with 6 significant digits; "∞" for infinity, "" for NaN
     */
    public static String num(double v) {
        if (Double.isNaN(v)) {
            return "";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "\u221e" : "-\u221e";
        }
        if (v == 0) {
            return "0";
        }
        java.math.BigDecimal b = new java.math.BigDecimal(Double.toString(v)).stripTrailingZeros();
        double a = Math.abs(v);
        if (b.precision() <= 10 && a >= 1e-5 && a < 1e10) {
            return b.toPlainString();
        }
        if (b.precision() <= 10) {
            return Double.toString(v).replace("E", "e");
        }
        if (a >= 1e-4 && a < 1e7) {
            String s = String.format(Locale.ROOT, "%.6g", v);
            if (s.contains(".") && !s.contains("e")) {
                s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
            }
            return s;
        }
        return String.format(Locale.ROOT, "%.4e", v);
    }

    /** @return {@code v} with 4 significant digits, for columns */
    public static String short4(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v) || v == 0) {
            return num(v);
        }
        double a = Math.abs(v);
        return a >= 1e-3 && a < 1e6 ? String.format(Locale.ROOT, "%.4g", v) : String.format(Locale.ROOT, "%.3e", v);
    }

    /** @return degrees of freedom: an integer, one decimal, or ∞ */
    public static String dof(double v) {
        if (Double.isInfinite(v)) {
            return "\u221e";
        }
        if (v == Math.rint(v)) {
            return String.valueOf((long) v);
        }
        return String.format(Locale.ROOT, "%.1f", v);
    }

    /** @return a fraction as a percentage with one decimal */
    public static String percent(double fraction) {
        return Double.isNaN(fraction) ? "" : String.format(Locale.ROOT, "%.1f %%", 100 * fraction);
    }

    /** @return a coverage probability as a percentage with the digits it has, e.g. "95.45 %" */
    public static String probability(double p) {
        String s = String.format(Locale.ROOT, "%.6f", 100 * p).replaceAll("0+$", "").replaceAll("\\.$", "");
        return s + " %";
    }

    /**
     * Parses a number typed by the engineer: decimal point, optional exponent, "inf" or "∞" for infinity.
     *
     * @throws NumberFormatException with a message saying what was expected
     */
    public static double parse(String text) {
        String t = text.trim().replace('\u2212', '-');
        if (t.equalsIgnoreCase("inf") || t.equals("\u221e")) {
            return Double.POSITIVE_INFINITY;
        }
        try {
            double v = Double.parseDouble(t);
            if (Double.isNaN(v) || t.matches("(?i).*[a-df-z].*")) {
                throw new NumberFormatException();
            }
            return v;
        } catch (NumberFormatException e) {
            throw new NumberFormatException("'" + text.trim() + "' is not a number: write e.g. 0.25 or 2.5e-3");
        }
    }
}
