package org.quire.engine.model;

import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.IntSupplier;
import org.quire.engine.units.Conversion;
import org.quire.engine.units.Unit;
import org.quire.engine.units.UnitException;
import org.quire.engine.units.Units;

/**
 * The dimension check of a compiled model: infers the unit of every node from the units stated for the inputs
 * and reports, with line and column, every operation whose units do not fit. Run by {@link ModelCompiler} when
 * the budget states units ({@link ModelUnits}); it runs once, before evaluation, so the GUM and Monte Carlo
 * evaluations compute on plain doubles.
 *
 * <h2>Rules</h2>
 * <ul>
 *   <li>{@code +}, {@code -}, {@code min} and {@code max} need operands of one dimension (an error shows both
 *       sides). When the scales of both sides are known and differ (mm and m) that is an error too, because the
 *       model computes with the numbers as stated. K and °C on the two sides give a warning: the result is right
 *       only when one side is a temperature difference.</li>
 *   <li>{@code *} and {@code /} combine units; {@code ^} with a constant exponent raises them (a rational
 *       exponent such as 0.5 when the exponents of the result are whole); {@code sqrt} halves them (an error
 *       when some exponent is odd); a variable exponent needs a dimensionless base; exponents are
 *       dimensionless.</li>
 *   <li>{@code exp ln log10 sin cos tan asin acos atan} need a dimensionless argument (the logarithm of a
 *       ratio of like quantities is fine); a ratio whose units do not cancel to 1 (kPa/Pa) gives a warning.</li>
 *   <li>A number written in the model is a pure number. As a whole side of {@code +} or {@code -} next to a
 *       dimensioned quantity it is an error ("cannot add the number 1 to a quantity in m^3/h"); next to a
 *       dimensionless one it is fine ({@code 1 + d_rel}); 0 goes with anything. As a whole argument of a library
 *       function it is taken in the unit the function declares ({@code water_density(20)} is at 20 °C).</li>
 *   <li>Arguments of library functions ({@link ModelFunction#argumentUnits()}) must have the declared dimension
 *       ("water_density: argument t must be a temperature (°C), found kg/m^3"). When the unit differs only in
 *       scale or offset, a conversion is compiled in front of the argument, so the function receives its
 *       declared unit: a temperature point in K into a parameter in °C becomes T − 273.15 (parameters in °C or
 *       °F are temperature points), kPa into Pa is multiplied by 1000, % into 1 by 0.01.</li>
 *   <li>A number written with its unit in brackets ({@code 1000 [mg/g]}, {@code 20 [°C]}) is a quantity in that
 *       unit, of known scale, and follows every rule above like an input: a conversion factor written so is
 *       checked against the units it converts.</li>
 * </ul>
 *
 * <h2>Limitations</h2>
 * A bare number written in the model may be a pure number (the 4 of pi d^2/4) or a conversion factor (the 1000 of
 * I/1000 turning mA into A); the check cannot tell. So a node whose value depends on such a number (other than
 * 1 and pi) has a known dimension but an unknown scale: its scale is not compared with the declared unit of an
 * output, nor with the other side of a sum (it takes that side's unit), and it is passed to a function unchanged
 * (with a warning when its unit as written differs from the declared one). A unit in °C cannot say whether a
 * value is a temperature point or a difference; the check assumes differences in sums of °C values and points
 * in function arguments declared in °C. An input or output with no unit stated disables the checks that depend
 * on it (with a warning).
 *
 * <p>Not thread-safe: one instance checks one model, inside one compilation.
 *
 * <p>References: ISO 80000-1:2009 (quantity calculus: only quantities of the same kind are added; dimensions
 * of products and powers, clause 3.7; units of products and quotients, clause 6.5); NIST SP 811 (2008) clause
 * 4.2.1.1 (Celsius temperature and temperature intervals) and clause 7 (values of quantities); JCGM 200:2012
 * (VIM) 1.7 (quantity dimension). Clause numbers other than those the units package cites are from memory.
 */
final class UnitCheck {

    private enum Kind { UNKNOWN, NUMBER, QUANTITY }

    /**
     * What the check knows of a node's value: unknown (an input without unit), a pure number written in the
     * model, or a quantity in {@code unit}. {@code scaleKnown} says that the value is in {@code unit} exactly;
     * for a number it says that it cannot be a conversion factor (1, pi).
     */
    private record Q(Kind kind, Unit unit, boolean scaleKnown) {
        static final Q UNKNOWN = new Q(Kind.UNKNOWN, Unit.ONE, false);

        static Q number(boolean neutral) {
            return new Q(Kind.NUMBER, Unit.ONE, neutral);
        }

        static Q of(Unit unit, boolean scaleKnown) {
            return new Q(Kind.QUANTITY, unit, scaleKnown);
        }

        boolean isNumber() {
            return kind == Kind.NUMBER;
        }

        boolean isQuantity() {
            return kind == Kind.QUANTITY;
        }
    }

    private final Node[] roots;
    private final int[] order;
    private final List<String> quantityNames;
    private final List<SourcePosition> quantityAt;
    private final List<String> inputNames;
    private final List<String> outputNames;
    private final ModelUnits units;
    private final IntSupplier ids;
    private final Q[] inputQ;
    private final Q[] quantityQ;
    private final Map<Node, Q> seen = new IdentityHashMap<>();
    private final List<ModelProblem> problems = new ArrayList<>();
    private final Set<String> reported = new LinkedHashSet<>();

    private UnitCheck(Node[] roots, int[] order, List<String> quantityNames, List<SourcePosition> quantityAt,
            List<String> inputNames, List<String> outputNames, ModelUnits units, IntSupplier ids) {
        this.roots = roots;
        this.order = order;
        this.quantityNames = quantityNames;
        this.quantityAt = quantityAt;
        this.inputNames = inputNames;
        this.outputNames = outputNames;
        this.units = units;
        this.ids = ids;
        this.inputQ = new Q[inputNames.size()];
        this.quantityQ = new Q[roots.length];
    }

    /**
     * Checks the model and compiles the conversions of function arguments into the tree (replacing arguments
     * of {@link Node.External} nodes, which must not yet be shared with a published model).
     *
     * @param ids supplies the id of each conversion node
     * @return the errors and warnings found; none when no unit is stated anywhere
     */
    static List<ModelProblem> run(Node[] roots, int[] order, List<String> quantityNames,
            List<SourcePosition> quantityAt, List<String> inputNames, List<String> outputNames, ModelUnits units,
            IntSupplier ids) {
        UnitCheck c = new UnitCheck(roots, order, quantityNames, quantityAt, inputNames, outputNames, units, ids);
        if (!units.isEmpty()) {
            c.check();
        }
        return c.problems;
    }

    private void error(SourcePosition at, String message) {
        if (reported.add(at.line() + ":" + at.column() + ":" + message)) {
            problems.add(ModelProblem.error(at, message));
        }
    }

    private void warning(SourcePosition at, String message) {
        if (reported.add(at.line() + ":" + at.column() + ":" + message)) {
            problems.add(ModelProblem.warning(at, message));
        }
    }

    private void check() {
        for (int i = 0; i < inputQ.length; i++) {
            String name = inputNames.get(i);
            String text = units.input(name);
            if (text.isEmpty()) {
                inputQ[i] = Q.UNKNOWN;
                warning(SourcePosition.NONE, UnitMessages.inputWithoutUnit(name));
                continue;
            }
            try {
                inputQ[i] = Q.of(Units.parse(text), true);
            } catch (UnitException e) {
                inputQ[i] = Q.UNKNOWN;
                error(SourcePosition.NONE, UnitMessages.inputUnit(name, e.getMessage()));
            }
        }
        for (int j : order) {
            quantityQ[j] = infer(roots[j]);
        }
        for (String out : outputNames) {
            checkOutput(out);
        }
    }

    private void checkOutput(String out) {
        int j = quantityNames.indexOf(out);
        Q q = quantityQ[j];
        SourcePosition at = quantityAt.get(j);
        String text = units.output(out);
        String display = units.displayUnit(out);
        if (text.isEmpty()) {
            if (!display.isEmpty()) {
                error(SourcePosition.NONE, UnitMessages.displayWithoutUnit(out, display));
            } else if (q.isQuantity() && q.scaleKnown()) {
                warning(at, UnitMessages.outputWithoutUnit(out, q.unit()));
            }
            return;
        }
        Unit declared;
        try {
            declared = Units.parse(text);
        } catch (UnitException e) {
            error(SourcePosition.NONE, UnitMessages.outputUnit(out, e.getMessage()));
            return;
        }
        if (!display.isEmpty()) {
            try {
                Unit d = Units.parse(display);
                if (!d.sameDimension(declared)) {
                    error(SourcePosition.NONE, UnitMessages.displayDimension(out, declared, d));
                }
            } catch (UnitException e) {
                error(SourcePosition.NONE, UnitMessages.outputDisplayUnit(out, e.getMessage()));
            }
        }
        if (!q.isQuantity()) {
            return;
        }
        if (!q.unit().sameDimension(declared)) {
            error(at, UnitMessages.outputDimension(out, declared, q.unit()));
        } else if (q.scaleKnown() && !sameFactor(q.unit(), declared)) {
            error(at, UnitMessages.outputScale(out, declared, q.unit()));
        } else if (q.scaleKnown() && pointsMayMix(q.unit(), declared)) {
            warning(at, UnitMessages.outputTemperature(out, declared, q.unit()));
        }
    }

    /**
     * @return true when the units have different offsets (K and °C) and neither is a product or quotient built
     *     from °C or °F, which measures differences only (°C·m/m, for instance)
     */
    private static boolean pointsMayMix(Unit a, Unit b) {
        return a.offset() != b.offset() && !derivedDifference(a) && !derivedDifference(b);
    }

    private static boolean derivedDifference(Unit u) {
        return !u.isAffine() && u.symbol().contains("°");
    }

    private static boolean sameFactor(Unit a, Unit b) {
        return a.sameScale(b);
    }

    private static boolean sameFactor(double a, double b) {
        return Unit.sameFactor(a, b);
    }

    // ---- inference -----------------------------------------------------------------------------------------

    private Q infer(Node n) {
        Q q = seen.get(n);
        if (q == null) {
            q = compute(n);
            seen.put(n, q);
        }
        return q;
    }

    private Q compute(Node n) {
        if (n instanceof Node.Const k) {
            if (k.unit != null) {
                return Q.of(k.unit, true);
            }
            return Q.number(k.value == 1 || k.value == -1 || k.value == Math.PI || k.value == -Math.PI);
        }
        if (n instanceof Node.Input in) {
            return inputQ[in.index];
        }
        if (n instanceof Node.Quantity q) {
            Q r = quantityQ[q.index];
            return r == null ? Q.UNKNOWN : r;
        }
        if (n instanceof Node.Neg neg) {
            return infer(neg.a);
        }
        if (n instanceof Node.Arith a) {
            if (a.op == '+' || a.op == '-') {
                return sum(a, a.op, a.a, a.c);
            }
            return product(a.op, infer(a.a), infer(a.c));
        }
        if (n instanceof Node.PowInt p) {
            Q a = infer(p.a);
            return a.isQuantity() ? Q.of(a.unit().pow(p.k), a.scaleKnown()) : a;
        }
        if (n instanceof Node.Pow p) {
            return power(p);
        }
        if (n instanceof Node.Func1 f) {
            return function(f);
        }
        if (n instanceof Node.MinMax mm) {
            Q r = infer(mm.args[0]);
            Node left = mm.args[0];
            for (int k = 1; k < mm.args.length; k++) {
                r = combine(mm, mm.max ? 'x' : 'n', left, r, mm.args[k], infer(mm.args[k]));
            }
            return r;
        }
        if (n instanceof Node.External e) {
            return external(e);
        }
        return Q.UNKNOWN;
    }

    private Q sum(Node at, char op, Node left, Node right) {
        return combine(at, op, left, infer(left), right, infer(right));
    }

    /** The rules of +, - (op '+' or '-'), min ('n') and max ('x'). */
    private Q combine(Node at, char op, Node ln, Q a, Node rn, Q b) {
        if (a.kind() == Kind.UNKNOWN || b.kind() == Kind.UNKNOWN) {
            return Q.UNKNOWN;
        }
        if (a.isNumber() && b.isNumber()) {
            return Q.number(a.scaleKnown() && b.scaleKnown());
        }
        if (a.isNumber() || b.isNumber()) {
            Node num = a.isNumber() ? ln : rn;
            Node other = a.isNumber() ? rn : ln;
            Q q = a.isNumber() ? b : a;
            if (num instanceof Node.Const k && k.value == 0) {
                return q;
            }
            if (!q.unit().isDimensionless()) {
                error(at.at, UnitMessages.numberWithQuantity(op, num.text, a.isNumber(), q.unit()));
            } else if (q.scaleKnown() && !sameFactor(q.unit().factor(), 1.0)) {
                error(at.at, UnitMessages.numberWithScaledRatio(num.text, other.text, q.unit()));
            }
            return q;
        }
        if (!a.unit().sameDimension(b.unit())) {
            error(at.at, UnitMessages.dimensions(op, at.text, a.unit(), b.unit()));
            return a;
        }
        if (a.scaleKnown() && b.scaleKnown()) {
            if (!sameFactor(a.unit(), b.unit())) {
                error(at.at, UnitMessages.scales(op, at.text, a.unit(), b.unit()));
            } else if (pointsMayMix(a.unit(), b.unit())) {
                warning(at.at, UnitMessages.temperatureScales(op, at.text, a.unit(), b.unit()));
            }
            return a;
        }
        return a.scaleKnown() ? a : b;
    }

    private static Q product(char op, Q a, Q b) {
        if (a.kind() == Kind.UNKNOWN || b.kind() == Kind.UNKNOWN) {
            return Q.UNKNOWN;
        }
        if (a.isNumber() && b.isNumber()) {
            return Q.number(a.scaleKnown() && b.scaleKnown());
        }
        Unit u;
        if (a.isNumber()) {
            u = op == '*' ? b.unit() : Unit.ONE.divide(b.unit());
        } else if (b.isNumber() || isPlainOne(b.unit())) {
            u = a.unit();
        } else if (op == '*' && isPlainOne(a.unit())) {
            u = b.unit();
        } else {
            u = op == '*' ? a.unit().multiply(b.unit()) : a.unit().divide(b.unit());
        }
        return Q.of(u, a.scaleKnown() && b.scaleKnown());
    }

    /** A dimensionless unit of factor 1: multiplying by it keeps the other unit, offset of °C included. */
    private static boolean isPlainOne(Unit u) {
        return u.isDimensionless() && sameFactor(u.factor(), 1.0);
    }

    private Q power(Node.Pow p) {
        Q a = infer(p.a);
        Q c = infer(p.c);
        if (c.isQuantity() && !c.unit().isDimensionless()) {
            error(p.at, UnitMessages.exponentNotDimensionless(p.c.text, c.unit()));
        }
        if (a.kind() == Kind.UNKNOWN) {
            return Q.UNKNOWN;
        }
        if (a.isNumber()) {
            return c.isNumber() ? Q.number(false) : Q.of(Unit.ONE, true);
        }
        if (a.unit().isDimensionless()) {
            return Q.of(Unit.ONE, a.scaleKnown() && sameFactor(a.unit().factor(), 1.0));
        }
        if (!c.isNumber()) {
            if (c.isQuantity()) {
                error(p.at, UnitMessages.variablePower(p.a.text, a.unit(), p.c.text));
            }
            return Q.UNKNOWN;
        }
        double k;
        try {
            k = p.c.eval(new Node.Scalar(new double[0], new double[0]));
        } catch (Node.DomainError e) {
            return Q.UNKNOWN;
        }
        for (int den = 1; den <= 4; den++) {
            double num = k * den;
            if (Math.abs(num - Math.rint(num)) < 1e-9 && Math.abs(num) <= 1000) {
                try {
                    return Q.of(a.unit().pow((int) Math.rint(num), den), a.scaleKnown());
                } catch (UnitException e) {
                    error(p.at, UnitMessages.noPower(p.a.text, a.unit(), p.c.text, e.getMessage()));
                    return Q.UNKNOWN;
                }
            }
        }
        error(p.at, UnitMessages.noPower(p.a.text, a.unit(), p.c.text,
                "the exponents of its unit would not be whole numbers"));
        return Q.UNKNOWN;
    }

    private Q function(Node.Func1 f) {
        Q a = infer(f.a);
        switch (f.fn) {
            case ABS:
                return a;
            case SQRT:
                if (!a.isQuantity()) {
                    return a.isNumber() ? Q.number(false) : a;
                }
                try {
                    return Q.of(a.unit().sqrt(), a.scaleKnown());
                } catch (UnitException e) {
                    error(f.at, UnitMessages.noSquareRoot(f.a.text, a.unit()));
                    return Q.UNKNOWN;
                }
            default:
                if (a.isNumber()) {
                    return Q.number(false);
                }
                if (a.isQuantity()) {
                    if (!a.unit().isDimensionless()) {
                        error(f.at, UnitMessages.notDimensionless(f.fn.symbol, f.a.text, a.unit()));
                    } else if (a.scaleKnown() && !sameFactor(a.unit().factor(), 1.0)) {
                        warning(f.at, UnitMessages.scaledArgument(f.fn.symbol, f.a.text, a.unit()));
                    }
                }
                return Q.of(Unit.ONE, true);
        }
    }

    private Q external(Node.External e) {
        ModelFunction fn = e.fn;
        List<String> declared = fn.argumentUnits();
        for (int k = 0; k < e.args.length; k++) {
            Node arg = e.args[k];
            Q a = infer(arg);
            if (k >= declared.size()) {
                continue;
            }
            String parameter = k < fn.parameters().size() ? fn.parameters().get(k) : "#" + (k + 1);
            Unit d;
            try {
                d = Units.parse(declared.get(k));
            } catch (UnitException ex) {
                error(e.at, UnitMessages.declaredUnit(fn.name(), parameter, declared.get(k), ex.getMessage()));
                continue;
            }
            if (!a.isQuantity()) {
                continue;
            }
            if (!a.unit().sameDimension(d)) {
                error(arg.at, UnitMessages.argument(fn.name(), parameter, d, a.unit()));
                continue;
            }
            boolean same = sameFactor(a.unit(), d) && a.unit().offset() == d.offset();
            if (same) {
                continue;
            }
            boolean shifts = d.isAffine() || a.unit().isAffine();
            if (!a.scaleKnown()) {
                warning(arg.at, UnitMessages.unconvertibleArgument(fn.name(), parameter, arg.text, d, a.unit()));
                continue;
            }
            if (shifts && derivedDifference(a.unit())) {
                warning(arg.at, UnitMessages.temperatureArgument(fn.name(), parameter, arg.text, d, a.unit()));
                continue;
            }
            Conversion c = Conversion.of(a.unit(), d);
            Node converted = new Node.Convert(ids.getAsInt(), arg.at, arg.text, arg, c.factor(), c.shift());
            seen.put(converted, Q.of(d, true));
            e.args[k] = converted;
        }
        String result = fn.resultUnit();
        if (result == null) {
            return Q.UNKNOWN;
        }
        try {
            return Q.of(Units.parse(result), true);
        } catch (UnitException ex) {
            error(e.at, UnitMessages.declaredUnit(fn.name(), "its result", result, ex.getMessage()));
            return Q.UNKNOWN;
        }
    }
}
