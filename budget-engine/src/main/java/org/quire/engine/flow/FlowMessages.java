package org.quire.engine.flow;

import java.math.BigDecimal;

/**
 * Every domain and argument message of the flow functions, in one place.
 *
 * <p>Stateless and thread-safe.
 */
final class FlowMessages {

    private FlowMessages() {
    }

    /** @return a number written without trailing zeros, e.g. 45, 0.5, 1.2e-05 */
    static String number(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        double a = Math.abs(v);
        if (a >= 1e-4 && a < 1e15) {
            return new BigDecimal(Double.toString(v)).stripTrailingZeros().toPlainString();
        }
        return Double.toString(v);
    }

    private static String quantity(String what, String parameter, double value, String unit) {
        return what + " " + parameter + " = " + number(value) + (unit.isEmpty() ? "" : " " + unit);
    }

    static String arity(String function, int min, int max, int given) {
        String expected = min == max ? Integer.toString(min) : min + " to " + max;
        return function + " takes " + expected + " arguments, not " + given;
    }

    static String notFinite(String function, String parameter, double value) {
        return "argument " + parameter + " of " + function + " is " + value + ", not a finite number";
    }

    static String belowAbsoluteZero(String what, String parameter, double celsius) {
        return quantity(what, parameter, celsius, "°C")
                + " is a negative absolute temperature (below -273.15 °C)";
    }

    static String outsideValidity(String what, String parameter, double value, String unit, double low,
            double high, String formula) {
        return quantity(what, parameter, value, unit) + " is outside " + number(low) + " " + unit + " to "
                + number(high) + " " + unit + ", the range of validity of " + formula;
    }

    static String notPositive(String what, String parameter, double value, String unit, String note) {
        return quantity(what, parameter, value, unit) + " must be positive" + note;
    }

    static String negative(String what, String parameter, double value, String unit) {
        return quantity(what, parameter, value, unit) + " must not be negative";
    }

    static String fractionOutside(String what, String parameter, double value, double high, String hint) {
        return quantity(what, parameter, value, "") + " is outside 0 to " + number(high) + hint;
    }

    static String notLessThan(String what, String parameter, double value, String otherWhat,
            String otherParameter, double other, String unit) {
        return quantity(what, parameter, value, unit) + " must be less than the " + otherWhat + " "
                + otherParameter + " = " + number(other) + " " + unit;
    }

    static String mustExceed(String what, String parameter, double value, String otherWhat, double other,
            String unit) {
        return quantity(what, parameter, value, unit) + " must exceed the " + otherWhat + " " + number(other) + " "
                + unit;
    }

    static String expansionNotPositive(double factor) {
        return "the linear expansion factor 1 + alpha (t - t_ref) = " + number(factor)
                + " is not positive; alpha or the temperatures are far out of range";
    }
}
