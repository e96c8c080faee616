package org.quire.engine.model;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.quire.engine.units.Unit;
import org.quire.engine.units.Units;

/**
 * The reference of the model language as plain text, generated from the engine's own tables: the operators and
 * rules the {@link Parser} follows, the standard functions ({@link Node.Fn}, {@code min max pi}) and the added
 * ones of a {@link FunctionLibrary}, and the unit table of {@link Units}. The command line's {@code quire help
 * model|units|functions} and the workbench's Help menu show this text, so the two never differ from each other
 * or from what the engine accepts.
 *
 * <p>Stateless and thread-safe.
 *
 * <p>References: ISO 80000-1:2009 clauses 6.5 and 7 (unit symbols, products and quotients); BIPM SI Brochure,
 * 9th edition (2019), Tables 4, 7 and 8; NIST SP 811 (2008) Appendix B (conversion factors).
 */
public final class LanguageReference {
    private LanguageReference() {
    }

    /** @return how a model is written: equations, numbers, operators, functions, comments, checks */
    public static String model() {
        StringBuilder s = new StringBuilder();
        s.append("THE MODEL LANGUAGE\n\n");
        s.append("One equation a line:  name = expression\n");
        s.append("  Equations may come in any order; each may use the inputs and the quantities other equations\n");
        s.append("  define (intermediate quantities); circular definitions are refused.\n");
        s.append("  A line  name(p1, p2) = expression  defines a function of the model's own, used like a\n");
        s.append("  built-in one.\n\n");
        s.append("Numbers      12   0.5   1.5e-3   (a point is the decimal separator)\n");
        s.append("With a unit  1000 [mg/g]   20 [\u00b0C]   1e-3 [m^3/L]   (the unit in brackets right after the number)\n");
        s.append("Operators    + - * /   ^ (power, right-associative: 2^3^2 is 2^9; -x^2 is -(x^2))\n");
        s.append("             unary minus, parentheses; \u00d7 \u00b7 \u00f7 \u2212 are read as * * / -\n");
        s.append("Functions    ");
        List<String> names = FunctionLibrary.standard().allNames();
        s.append(String.join(" ", names)).append("\n");
        s.append("             and the flow-metrology functions: see 'functions'\n");
        s.append("Comments     # to the end of the line\n");
        s.append("Lines        a line break inside parentheses or after an operator continues the equation\n\n");
        s.append("Units: the unit of every input and output is a unit expression (see 'units'). The equations are\n");
        s.append("dimension-checked: adding quantities of different dimensions, a function argument of the wrong\n");
        s.append("dimension, or an output whose equation gives another dimension is an error with the model line\n");
        s.append("and column. A bare number is a pure number: it may be a conversion factor, so its scale is not\n");
        s.append("checked. Write a conversion factor or a reference value with its unit in brackets and the check\n");
        s.append("covers it: with dm in mg and m in g,  m = dm / 1000 [mg/g]  is accepted and  m = 1000 [g/kg] * dm\n");
        s.append("is refused (it computes m in 10^-9 kg, not g);  t_w - 20 [\u00b0C]  needs t_w in \u00b0C. The check covers\n");
        s.append("the unit, not the digits: 100 [mg/g] is a quantity of its own, not 1 g in mg. The number is used\n");
        s.append("as written; without units stated in the budget the brackets are read but not checked.\n\n");
        s.append("Errors name the model line and column: syntax, unknown names (with the nearest known name),\n");
        s.append("duplicate definitions, cycles, wrong numbers of arguments, and values that leave a function's\n");
        s.append("domain at the estimates (division by zero, square root of a negative number ...).\n\n");
        s.append("Example (the fictional Tarrow Vale Flow Laboratory; invented values):\n");
        s.append("  V = m / (rho_w * (1 - gamma * (t_w - t_ref)))\n");
        s.append("  E = 100 * (V_meter - V) / V\n");
        return s.toString();
    }

    /** @return every function a model may call, with its parameters, units and description */
    public static String functions(FunctionLibrary library) {
        StringBuilder s = new StringBuilder();
        s.append("FUNCTIONS A MODEL MAY CALL\n\nStandard functions (one argument; angles in radians):\n");
        for (Node.Fn f : Node.Fn.values()) {
            s.append(String.format(Locale.ROOT, "  %-28s %s%n", f.symbol + "(x)", f.description));
        }
        s.append(String.format(Locale.ROOT, "  %-28s %s%n", "min(a, b, ...)", "the smallest of two or more values"));
        s.append(String.format(Locale.ROOT, "  %-28s %s%n", "max(a, b, ...)", "the largest of two or more values"));
        s.append(String.format(Locale.ROOT, "  %-28s %s%n", "pi", "the constant \u03c0"));
        if (!library.functions().isEmpty()) {
            s.append("\nFlow-metrology functions (optional arguments in brackets):\n");
        }
        for (ModelFunction f : library.functions()) {
            s.append("  ").append(signature(f)).append('\n');
            s.append(wrap(f.description(), "      ", 100));
            List<String> units = f.argumentUnits();
            if (!units.isEmpty()) {
                StringBuilder u = new StringBuilder("units: ");
                for (int i = 0; i < f.parameters().size() && i < units.size(); i++) {
                    if (i > 0) {
                        u.append(", ");
                    }
                    u.append(f.parameters().get(i)).append(" in ").append(units.get(i));
                }
                if (f.resultUnit() != null) {
                    u.append("; result in ").append(f.resultUnit());
                }
                s.append(wrap(u.toString(), "      ", 100));
            } else if (f.resultUnit() != null) {
                s.append("      result in ").append(f.resultUnit()).append('\n');
            }
        }
        s.append("\nArguments are converted to the units a function declares (a temperature in K into a function\n");
        s.append("that takes \u00b0C, for instance).\n");
        return s.toString();
    }

    private static String signature(ModelFunction f) {
        StringBuilder s = new StringBuilder(f.name()).append('(');
        List<String> p = f.parameters();
        int required = f.minArity();
        for (int i = 0; i < p.size(); i++) {
            if (i == required) {
                s.append('[');
            }
            if (i > 0) {
                s.append(", ");
            }
            s.append(p.get(i));
        }
        if (p.size() > required) {
            s.append(']');
        }
        return s.append(')').toString();
    }

    /** @return the unit table: symbol, dimension in SI base units, factor to SI, prefixes; then the aliases */
    public static String units() {
        StringBuilder s = new StringBuilder();
        s.append("UNITS\n\n");
        s.append("A unit expression is a product of units with whole (or, in parentheses, fractional) powers and\n");
        s.append("at most one unit after a solidus (ISO 80000-1:2009 7.1.3): m^3/h  kg/m^3  kg m^-3  m\u00b3/h  m3/h\n");
        s.append("L/min  US gal/min  \u00b5V  uV  \u00b0C  degC  1/\u00b0C  %  ppm  1  W/(m\u00b7K)  Hz^(1/2)\n\n");
        s.append(String.format(Locale.ROOT, "%-8s %-22s %-26s %s%n", "symbol", "dimension (SI base)", "1 symbol = ... SI",
                "prefixes"));
        for (String symbol : Units.symbols()) {
            Unit u = Units.parse(symbol);
            String factor = String.format(Locale.ROOT, "%.12g", u.factor()).replaceAll("\\.?0+(e|$)", "$1");
            if (u.isAffine()) {
                factor += String.format(Locale.ROOT, " (point: + %s)", trim(u.offset()));
            }
            s.append(String.format(Locale.ROOT, "%-8s %-22s %-26s %s%n", symbol, u.dimension().toString(), factor,
                    Units.prefixable(symbol) ? "yes" : "no"));
        }
        s.append("\nSI prefixes: ");
        StringBuilder p = new StringBuilder();
        for (Map.Entry<String, Integer> e : Units.prefixes().entrySet()) {
            if (p.length() > 0) {
                p.append("  ");
            }
            p.append(e.getKey()).append(" 10^").append(e.getValue());
        }
        s.append(p).append('\n');
        s.append("\nOther spellings read as:\n");
        for (Map.Entry<String, String> e : Units.aliases().entrySet()) {
            s.append(String.format(Locale.ROOT, "  %-8s %s%n", e.getKey(), e.getValue()));
        }
        s.append("\nTemperatures in \u00b0C and \u00b0F are points on a scale (an offset from K) for estimates and\n");
        s.append("differences for uncertainties. Exact factors: NIST SP 811 (2008) Appendix B.\n");
        return s.toString();
    }

    private static String trim(double v) {
        return String.format(Locale.ROOT, "%.6f", v).replaceAll("\\.?0+$", "");
    }

    private static String wrap(String text, String indent, int width) {
        StringBuilder out = new StringBuilder();
        StringBuilder line = new StringBuilder(indent);
        for (String w : text.split("\\s+")) {
            if (line.length() > indent.length() && line.length() + 1 + w.length() > width) {
                out.append(line).append('\n');
                line = new StringBuilder(indent);
            }
            if (line.length() > indent.length()) {
                line.append(' ');
            }
            line.append(w);
        }
        if (line.length() > indent.length()) {
            out.append(line).append('\n');
        }
        return out.toString();
    }
}
