package org.quire.engine.model;

import java.util.LinkedHashMap;
import java.util.Map;
import org.quire.engine.units.Dimension;
import org.quire.engine.units.Unit;

/**
 * Every message of the model's dimension check, in one place.
 *
 * <p>Stateless and thread-safe.
 */
final class UnitMessages {
    private static final Map<Dimension, String> NAMES = new LinkedHashMap<>();

    static {
        Dimension l = Dimension.LENGTH;
        Dimension m = Dimension.MASS;
        Dimension t = Dimension.TIME;
        Dimension i = Dimension.ELECTRIC_CURRENT;
        Dimension power = m.multiply(l.pow(2)).divide(t.pow(3));
        NAMES.put(Dimension.NONE, "a pure number");
        NAMES.put(Dimension.TEMPERATURE, "a temperature");
        NAMES.put(Dimension.NONE.divide(Dimension.TEMPERATURE), "a coefficient per degree of temperature");
        NAMES.put(m.divide(l).divide(t.pow(2)), "a pressure");
        NAMES.put(l, "a length");
        NAMES.put(m, "a mass");
        NAMES.put(t, "a time");
        NAMES.put(i, "an electric current");
        NAMES.put(m.divide(l.pow(3)), "a density");
        NAMES.put(l.divide(t), "a velocity");
        NAMES.put(l.pow(3), "a volume");
        NAMES.put(Dimension.NONE.divide(l.pow(3)), "a number per volume");
        NAMES.put(l.pow(3).divide(t), "a volume flow rate");
        NAMES.put(m.divide(t), "a mass flow rate");
        NAMES.put(m.divide(t.pow(2)).divide(i), "a magnetic flux density");
        NAMES.put(power.divide(i), "a voltage");
    }

    private UnitMessages() {
    }

    /** @return e.g. "a temperature (°C)" or "in W/(m·K) (kg·m/(s^3·K))" when the dimension has no common name */
    static String expected(Unit declared) {
        String name = NAMES.get(declared.dimension());
        return name == null ? "in " + declared.describe() + " or another unit of that dimension"
                : name + " (" + declared.symbol() + ")";
    }

    private static String verb(char op) {
        return op == '+' ? "add" : op == '-' ? "subtract" : op == 'n' ? "compare in min" : "compare in max";
    }

    private static String where(String text) {
        return text.length() <= 60 ? " in '" + text + "'" : "";
    }

    static String dimensions(char op, String text, Unit left, Unit right) {
        return "cannot " + verb(op) + " quantities of different dimensions" + where(text) + ": left side "
                + left.describe() + ", right side " + right.describe();
    }

    static String scales(char op, String text, Unit left, Unit right) {
        return "cannot " + verb(op) + " quantities in different units without converting" + where(text)
                + ": left side " + left.symbol() + ", right side " + right.symbol() + " (1 " + right.symbol() + " = "
                + number(right.factor() / left.factor()) + " " + left.symbol()
                + "); state both inputs in the same unit, or write the conversion factor in the model";
    }

    static String temperatureScales(char op, String text, Unit left, Unit right) {
        return "left side " + left.symbol() + ", right side " + right.symbol() + where(text) + ": this is right "
                + "only when one side is a temperature difference; a temperature point in " + right.symbol()
                + " must be converted before it is combined with one in " + left.symbol();
    }

    static String numberWithQuantity(char op, String number, boolean numberFirst, Unit unit) {
        String q = "a quantity in " + unit.describe();
        switch (op) {
            case '+':
                return "cannot add the number " + number + " to " + q
                        + "; make the number an input quantity with its unit (a constant with zero uncertainty)";
            case '-':
                return (numberFirst ? "cannot subtract " + q + " from the number " + number
                        : "cannot subtract the number " + number + " from " + q)
                        + "; make the number an input quantity with its unit (a constant with zero uncertainty)";
            default:
                return "cannot compare the number " + number + " with " + q + " in " + (op == 'n' ? "min" : "max")
                        + "; make the number an input quantity with its unit (a constant with zero uncertainty)";
        }
    }

    static String numberWithScaledRatio(String number, String text, Unit unit) {
        return "cannot combine the number " + number + " with '" + text + "', which is in " + unit.symbol()
                + " (1 " + unit.symbol() + " = " + number(unit.factor()) + "): the model computes with the numbers "
                + "as stated; state it in 1, or divide it by the factor in the model";
    }

    static String notDimensionless(String function, String argument, Unit unit) {
        return "the argument of " + function + " must be dimensionless: '" + argument + "' is in " + unit.describe();
    }

    static String scaledArgument(String function, String argument, Unit unit) {
        return "the argument of " + function + ", '" + argument + "', is a ratio in " + unit.symbol() + " (1 "
                + unit.symbol() + " = " + number(unit.factor()) + "); " + function
                + " receives the number as computed, not the ratio in SI";
    }

    static String noSquareRoot(String argument, Unit unit) {
        return "the square root of '" + argument + "' has no unit: it is in " + unit.describe()
                + ", and some exponent is odd";
    }

    static String noPower(String base, Unit unit, String exponent, String why) {
        return "'" + base + "' is in " + unit.describe() + " and cannot be raised to the power " + exponent + ": "
                + why;
    }

    static String variablePower(String base, Unit unit, String exponent) {
        return "'" + base + "' is in " + unit.describe() + "; only a dimensionless quantity may be raised to the "
                + "power '" + exponent + "', which is not a number written in the model";
    }

    static String exponentNotDimensionless(String exponent, Unit unit) {
        return "an exponent must be dimensionless: '" + exponent + "' is in " + unit.describe();
    }

    static String argument(String function, String parameter, Unit declared, Unit found) {
        return function + ": argument " + parameter + " must be " + expected(declared) + ", found "
                + found.describe();
    }

    static String unconvertibleArgument(String function, String parameter, String argument, Unit declared,
            Unit found) {
        return function + ": argument " + parameter + " = '" + argument + "' is computed from " + found.symbol()
                + " with a number in it that may or may not be a conversion factor; it is passed unchanged, as "
                + declared.symbol() + ". If it is not in " + declared.symbol() + ", state its inputs in "
                + declared.symbol();
    }

    static String temperatureArgument(String function, String parameter, String argument, Unit declared,
            Unit found) {
        return function + ": argument " + parameter + " = '" + argument + "' is in " + found.symbol()
                + ", a product or quotient, which cannot say whether it is a temperature point or a difference; "
                + "it is passed unchanged, as " + declared.symbol();
    }

    static String declaredUnit(String function, String parameter, String unit, String why) {
        return "function " + function + " declares the unit \"" + unit + "\" for " + parameter
                + ", which cannot be read: " + why;
    }

    static String inputUnit(String input, String why) {
        return "input '" + input + "': " + why;
    }

    static String inputWithoutUnit(String input) {
        return "input '" + input + "' has no unit: the dimension checks that involve it are skipped";
    }

    static String outputUnit(String output, String why) {
        return "output '" + output + "': " + why;
    }

    static String outputDisplayUnit(String output, String why) {
        return "output '" + output + "': display unit: " + why;
    }

    static String outputWithoutUnit(String output, Unit found) {
        return "output '" + output + "' has no unit; its equation gives " + found.describe();
    }

    static String displayWithoutUnit(String output, String display) {
        return "output '" + output + "' has the display unit " + display + " but no unit: state the unit its "
                + "equation computes in";
    }

    static String outputDimension(String output, Unit declared, Unit found) {
        return "output " + output + ": left side " + declared.describe() + ", right side " + found.describe()
                + " (the unit stated for " + output + " and the dimension its equation gives differ)";
    }

    static String outputScale(String output, Unit declared, Unit found) {
        return "output " + output + " is stated in " + declared.symbol() + " but its equation computes it in "
                + found.symbol() + " (1 " + found.symbol() + " = " + number(found.factor() / declared.factor()) + " "
                + declared.symbol() + "); state " + found.symbol() + " as its unit and choose " + declared.symbol()
                + " as its display unit, or write the conversion factor in the model with its unit, as in 1000 [g/kg]";
    }

    static String outputTemperature(String output, Unit declared, Unit found) {
        return "output " + output + " is stated in " + declared.symbol() + " but its equation computes it in "
                + found.symbol() + ": this is right only for a temperature difference; for a temperature point "
                + "state " + found.symbol() + " as its unit and " + declared.symbol() + " as its display unit";
    }

    static String displayDimension(String output, Unit unit, Unit display) {
        return "output " + output + " is in " + unit.describe() + " and cannot be shown in " + display.describe()
                + ": they measure different dimensions";
    }

    private static String number(double v) {
        double r = Math.abs(v - Math.rint(v)) < 1e-9 * Math.max(1, Math.abs(v)) ? Math.rint(v) : v;
        if (r == Math.rint(r) && Math.abs(r) < 1e15) {
            return Long.toString((long) r);
        }
        return String.format(java.util.Locale.ROOT, "%.10g", r).replaceFirst("\\.?0+(e|$)", "$1");
    }
}
