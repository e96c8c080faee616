package org.quire.engine.units;

/**
 * Writes the symbols of products, quotients and powers of units so that {@link Units#parse} reads them back.
 *
 * <p>Stateless and thread-safe.
 */
final class Symbols {

    private Symbols() {
    }

    static String product(String a, String b) {
        return wrapIf(a, a.indexOf('/') >= 0) + "·" + wrapIf(b, b.indexOf('/') >= 0);
    }

    static String quotient(String a, String b) {
        String numerator = wrapIf(a, a.indexOf('/') >= 0);
        return numerator + "/" + wrapIf(b, !isSimple(b));
    }

    static String power(String a, String exponent) {
        return wrapIf(a, !isSimple(a) || a.indexOf('^') >= 0) + "^" + exponent;
    }

    /** @return true for a single symbol without operators, e.g. {@code kg}, {@code °C}, {@code m^3} */
    private static boolean isSimple(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '/' || c == '·' || c == '*' || c == ' ' || c == '⋅' || c == '(') {
                return false;
            }
        }
        return true;
    }

    private static String wrapIf(String s, boolean wrap) {
        return wrap ? "(" + s + ")" : s;
    }
}
