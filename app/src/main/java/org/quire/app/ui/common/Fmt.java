package org.quire.app.ui.common;

import org.quire.engine.csv.CsvException;
import org.quire.engine.csv.CsvOptions;
import org.quire.engine.csv.CsvReader;
import org.quire.engine.gum.Figures;

/**
 * How the workbench prints and reads numbers: the engine's one rule ({@link Figures} for working figures,
 * estimates, degrees of freedom and shares; {@link org.quire.engine.gum.Rounding} for stated results) and its one
 * number reader ({@link org.quire.engine.csv.CsvRow#number(int)}: a decimal comma only where unambiguous).
 * Formatting only, never arithmetic on the figures.
 */
public final class Fmt {
    private Fmt() {
    }

    /** @return an engine message as a sentence on screen: its first letter a capital */
    public static String sentence(String message) {
        return message.isEmpty() ? message : Character.toUpperCase(message.charAt(0)) + message.substring(1);
    }

    /** @return an entered value (an estimate, a parameter) as its shortest exact decimal, "" for NaN */
    public static String num(double v) {
        return Double.isNaN(v) ? "" : Figures.estimate(v);
    }

    /** @return a working figure (u, c, u_i(y), a statistic) to {@link Figures#WORKING_DIGITS} significant digits */
    public static String working(double v) {
        return Double.isNaN(v) ? "" : Figures.working(v);
    }

    /** @return degrees of freedom: an integer, one decimal, or ∞ */
    public static String dof(double v) {
        return Figures.dof(v);
    }

    /** @return a fraction as a percentage with one decimal, e.g. "62.3 %" */
    public static String percent(double fraction) {
        return Double.isNaN(fraction) ? "" : Figures.percent(fraction) + " %";
    }

    /** @return a coverage probability as a percentage with the digits it has, e.g. "95.45 %" */
    public static String probability(double p) {
        return Figures.probability(p) + " %";
    }

    /** @return a count in groups of three digits, e.g. "200 000" */
    public static String count(long n) {
        return Figures.count(n);
    }

    /**
     * Parses a number typed by the engineer, by the engine's number rule: a decimal point, or a decimal comma
     * where it cannot be a thousands group ({@code 0,25}; {@code 1,002} is refused as ambiguous); an exponent;
     * the forms the workbench shows (U+2212 minus, {@code × 10⁻⁵}); "inf" or "∞" for infinity.
     *
     * @throws NumberFormatException with a message saying what was wrong
     */
    public static double parse(String text) {
        String t = Figures.plain(text);
        if (t.equalsIgnoreCase("inf") || t.equals("\u221e")) {
            return Double.POSITIVE_INFINITY;
        }
        if (t.isEmpty()) {
            throw new NumberFormatException("a number is needed here: write e.g. 0.25 or 2.5e-3");
        }
        try {
            return CsvReader.parse("typed value", t, CsvOptions.defaults().withHeader(false)
                    .withSeparator(CsvOptions.Separator.TAB)).rows().get(0).number(0);
        } catch (CsvException | RuntimeException e) {
            String why = e instanceof CsvException ? ((CsvException) e).reason() : e.getMessage();
            throw new NumberFormatException("'" + text.trim() + "': " + why);
        }
    }
}
