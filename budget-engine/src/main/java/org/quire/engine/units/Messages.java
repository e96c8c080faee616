package org.quire.engine.units;

import java.util.Locale;

/**
 * Every error message of the units package, in one place.
 *
 * <p>Stateless and thread-safe.
 */
final class Messages {

    private Messages() {
    }

    static String quote(String s) {
        return s == null ? "null" : "\"" + s + "\"";
    }

    static String zeroDenominator(int numerator) {
        return "cannot raise a unit to the power " + numerator + "/0: the denominator of an exponent must not be 0";
    }

    static String noRoot(String dimension, int numerator, int denominator, String base, long product, int den) {
        return String.format(Locale.ROOT,
                "cannot raise %s to the power %d/%d: the exponent of %s would be %d/%d, not a whole number",
                dimension, numerator, denominator, base, product, den);
    }

    static String cannotConvert(Unit from, Unit to) {
        return "cannot convert " + from.describe() + " to " + to.describe() + ": they measure different dimensions";
    }

    static String notAddable(Unit left, Unit right) {
        return "cannot add or subtract quantities of different dimensions: left side " + left.describe()
                + ", right side " + right.describe();
    }

    static String notDimensionless(String context, Unit unit) {
        return context + " must be dimensionless, not " + unit.describe();
    }

    // ---- parsing -------------------------------------------------------------------------------------------

    static String parse(String input, int position, String problem) {
        String where = position >= input.length()
                ? "at the end (character " + (position + 1) + ")"
                : "at character " + (position + 1) + " ('" + input.charAt(position) + "')";
        return "cannot read unit " + quote(input) + ": " + problem + " " + where;
    }

    static String expected(String what) {
        return "expected " + what;
    }

    static String unknownSymbol(String symbol, String suggestion) {
        String s = "unknown unit " + quote(symbol);
        return suggestion == null ? s : s + " (did you mean " + suggestion + "?)";
    }

    static String ambiguousGallon() {
        return "the gallon is ambiguous: write \"US gal\" (3.785411784 L) or \"imp gal\" (4.54609 L)";
    }

    static String notPrefixable(String prefix, String symbol) {
        return "the unit " + quote(symbol) + " does not take the SI prefix " + quote(prefix);
    }

    static String numberNotUnit(String number) {
        return "the number " + number + " is not a unit (only 1 stands for a dimensionless unit)";
    }

    static String secondSolidus() {
        return "a second '/' is ambiguous; write kg/(m·s) or kg·m^-1·s^-1";
    }

    static String afterSolidus() {
        return "only one unit may follow '/'; put a product in parentheses, e.g. W/(m·K)";
    }

    static String blank() {
        return "a unit must not be blank; write 1 for a dimensionless quantity";
    }
}
