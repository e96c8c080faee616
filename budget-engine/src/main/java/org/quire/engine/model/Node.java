package org.quire.engine.model;

import java.util.List;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;
import org.apache.commons.math3.util.FastMath;

/**
 * A node of the compiled model. Every node can be evaluated three ways: on doubles with domain checks (the
 * estimate), on derivative structures (sensitivity coefficients), and over a block of trials (Monte Carlo).
 * Nodes are immutable and thread-safe; the per-thread scratch lives in {@link Block}.
 */
abstract class Node {
    final int id;
    final SourcePosition at;
    /** The expression as written, for messages. */
    final String text;

    Node(int id, SourcePosition at, String text) {
        this.id = id;
        this.at = at;
        this.text = text;
    }

    abstract double eval(Scalar s);

    abstract DerivativeStructure ds(Derivs d);

    /**
     * This node's derivative structure: {@link #ds} when the node depends on a free parameter of the pass, else
     * a constant of its scalar value (no derivative structure is carried through a subtree that has none).
     */
    final DerivativeStructure derive(Derivs d) {
        return d.live[id] ? ds(d) : d.constant(eval(d.scalar));
    }

    /** @return an array whose first {@code n} entries hold this node's value for each trial (read only) */
    abstract double[] block(Block b, int n);

    /** @return the children, for walks over the tree */
    abstract List<Node> children();

    /** Scalar evaluation state: inputs and the values of the quantities computed so far. */
    static final class Scalar {
        final double[] x;
        final double[] v;

        Scalar(double[] x, double[] v) {
            this.x = x;
            this.v = v;
        }
    }

    /**
     * Derivative evaluation state: the free inputs' derivative structures, the quantities' so far, which nodes
     * depend on a free input ({@code live}, by node id) and the scalar values for the nodes that do not.
     */
    static final class Derivs {
        final DerivativeStructure[] x;
        final DerivativeStructure[] v;
        final int params;
        final int order;
        final boolean[] live;
        final Scalar scalar;

        Derivs(DerivativeStructure[] x, DerivativeStructure[] v, int params, int order, boolean[] live,
                Scalar scalar) {
            this.x = x;
            this.v = v;
            this.params = params;
            this.order = order;
            this.live = live;
            this.scalar = scalar;
        }

        DerivativeStructure constant(double c) {
            return new DerivativeStructure(params, order, c);
        }
    }

    /** Block evaluation state for one thread. */
    static final class Block {
        final double[][] buf;
        double[][] in;
        final double[][] vars;

        Block(int nodes, int quantities, int maxBlock) {
            buf = new double[nodes][];
            for (int k = 0; k < nodes; k++) {
                buf[k] = new double[maxBlock];
            }
            vars = new double[quantities][];
        }
    }

    /** Thrown by scalar evaluation when a value leaves a function's domain at the estimates. */
    static final class DomainError extends RuntimeException {
        private static final long serialVersionUID = 1L;
        final transient ModelProblem problem;

        DomainError(SourcePosition at, String message) {
            super(message, null, false, false);
            this.problem = ModelProblem.error(at, message);
        }
    }

    static double checked(Node n, double value) {
        if (!Double.isFinite(value)) {
            throw new DomainError(n.at, "'" + n.text + "' is not a finite number at the estimates (" + value + ")");
        }
        return value;
    }

    // ----------------------------------------------------------------------------------------------------
    static final class Const extends Node {
        final double value;
        /** The unit written with the number ({@code 1000 [g/kg]}), or null for a pure number. */
        final org.quire.engine.units.Unit unit;

        Const(int id, SourcePosition at, String text, double value, org.quire.engine.units.Unit unit) {
            super(id, at, text);
            this.value = value;
            this.unit = unit;
        }

        @Override double eval(Scalar s) { return value; }
        @Override DerivativeStructure ds(Derivs d) { return d.constant(value); }
        /** The session fills this node's buffer with the value once, when it is created. */
        @Override double[] block(Block b, int n) { return b.buf[id]; }
        @Override List<Node> children() { return List.of(); }
    }

    static final class Input extends Node {
        final int index;

        Input(int id, SourcePosition at, String text, int index) {
            super(id, at, text);
            this.index = index;
        }

        @Override double eval(Scalar s) { return s.x[index]; }
        @Override DerivativeStructure ds(Derivs d) { return d.x[index]; }
        @Override double[] block(Block b, int n) { return b.in[index]; }
        @Override List<Node> children() { return List.of(); }
    }

    static final class Quantity extends Node {
        final int index;

        Quantity(int id, SourcePosition at, String text, int index) {
            super(id, at, text);
            this.index = index;
        }

        @Override double eval(Scalar s) { return s.v[index]; }
        @Override DerivativeStructure ds(Derivs d) { return d.v[index]; }
        @Override double[] block(Block b, int n) { return b.vars[index]; }
        @Override List<Node> children() { return List.of(); }
    }

    static final class Neg extends Node {
        final Node a;

        Neg(int id, SourcePosition at, String text, Node a) {
            super(id, at, text);
            this.a = a;
        }

        @Override double eval(Scalar s) { return -a.eval(s); }
        @Override DerivativeStructure ds(Derivs d) { return a.derive(d).negate(); }
        @Override double[] block(Block b, int n) {
            double[] x = a.block(b, n);
            double[] r = b.buf[id];
            for (int t = 0; t < n; t++) {
                r[t] = -x[t];
            }
            return r;
        }
        @Override List<Node> children() { return List.of(a); }
    }

    static final class Arith extends Node {
        final char op;
        final Node a;
        final Node c;

        Arith(int id, SourcePosition at, String text, char op, Node a, Node c) {
            super(id, at, text);
            this.op = op;
            this.a = a;
            this.c = c;
        }

        @Override double eval(Scalar s) {
            double x = a.eval(s);
            double y = c.eval(s);
            switch (op) {
                case '+': return checked(this, x + y);
                case '-': return checked(this, x - y);
                case '*': return checked(this, x * y);
                default:
                    if (y == 0) {
                        throw new DomainError(at, "division by zero: the denominator '" + c.text
                                + "' is 0 at the estimates");
                    }
                    return checked(this, x / y);
            }
        }

        @Override DerivativeStructure ds(Derivs d) {
            DerivativeStructure x = a.derive(d);
            DerivativeStructure y = c.derive(d);
            switch (op) {
                case '+': return x.add(y);
                case '-': return x.subtract(y);
                case '*': return x.multiply(y);
                default: return x.divide(y);
            }
        }

        @Override double[] block(Block b, int n) {
            double[] x = a.block(b, n);
            double[] y = c.block(b, n);
            double[] r = b.buf[id];
            switch (op) {
                case '+': for (int t = 0; t < n; t++) { r[t] = x[t] + y[t]; } break;
                case '-': for (int t = 0; t < n; t++) { r[t] = x[t] - y[t]; } break;
                case '*': for (int t = 0; t < n; t++) { r[t] = x[t] * y[t]; } break;
                default: for (int t = 0; t < n; t++) { r[t] = x[t] / y[t]; } break;
            }
            return r;
        }
        @Override List<Node> children() { return List.of(a, c); }
    }

    /** x^k for a constant integer k. */
    static final class PowInt extends Node {
        final Node a;
        final int k;

        PowInt(int id, SourcePosition at, String text, Node a, int k) {
            super(id, at, text);
            this.a = a;
            this.k = k;
        }

        @Override double eval(Scalar s) {
            double x = a.eval(s);
            if (x == 0 && k < 0) {
                throw new DomainError(at, "'" + a.text + "' is 0 and is raised to the negative power " + k);
            }
            return checked(this, pow(x, k));
        }

        static double pow(double x, int k) {
            switch (k) {
                case 0: return 1;
                case 1: return x;
                case 2: return x * x;
                case 3: return x * x * x;
                case -1: return 1 / x;
                case -2: return 1 / (x * x);
                default: return FastMath.pow(x, k);
            }
        }

        @Override DerivativeStructure ds(Derivs d) { return a.derive(d).pow(k); }

        @Override double[] block(Block b, int n) {
            double[] x = a.block(b, n);
            double[] r = b.buf[id];
            switch (k) {
                case 2: for (int t = 0; t < n; t++) { r[t] = x[t] * x[t]; } break;
                case 3: for (int t = 0; t < n; t++) { r[t] = x[t] * x[t] * x[t]; } break;
                case -1: for (int t = 0; t < n; t++) { r[t] = 1 / x[t]; } break;
                default: for (int t = 0; t < n; t++) { r[t] = pow(x[t], k); } break;
            }
            return r;
        }
        @Override List<Node> children() { return List.of(a); }
    }

    /** x^y in general. */
    static final class Pow extends Node {
        final Node a;
        final Node c;

        Pow(int id, SourcePosition at, String text, Node a, Node c) {
            super(id, at, text);
            this.a = a;
            this.c = c;
        }

        @Override double eval(Scalar s) {
            double x = a.eval(s);
            double y = c.eval(s);
            if (x < 0) {
                throw new DomainError(at, "'" + a.text + "' is negative (" + x + ") and is raised to the power '"
                        + c.text + "', which is not a whole number written as such");
            }
            if (x == 0 && y <= 0) {
                throw new DomainError(at, "'" + a.text + "' is 0 and is raised to a power that is not positive");
            }
            return checked(this, FastMath.pow(x, y));
        }

        @Override DerivativeStructure ds(Derivs d) {
            DerivativeStructure x = a.derive(d);
            if (c instanceof Const) {
                return x.pow(((Const) c).value);
            }
            return x.pow(c.derive(d));
        }

        @Override double[] block(Block b, int n) {
            double[] x = a.block(b, n);
            double[] y = c.block(b, n);
            double[] r = b.buf[id];
            for (int t = 0; t < n; t++) {
                r[t] = x[t] < 0 ? Double.NaN : Math.pow(x[t], y[t]);
            }
            return r;
        }
        @Override List<Node> children() { return List.of(a, c); }
    }

    /** The standard one-argument functions. */
    enum Fn {
        SQRT("sqrt", "square root"), EXP("exp", "exponential"), LN("ln", "natural logarithm"),
        LOG10("log10", "base-10 logarithm"), ABS("abs", "absolute value"), SIN("sin", "sine (radians)"),
        COS("cos", "cosine (radians)"), TAN("tan", "tangent (radians)"), ASIN("asin", "inverse sine"),
        ACOS("acos", "inverse cosine"), ATAN("atan", "inverse tangent");

        final String symbol;
        final String description;

        Fn(String symbol, String description) {
            this.symbol = symbol;
            this.description = description;
        }

        static Fn bySymbol(String s) {
            for (Fn f : values()) {
                if (f.symbol.equals(s)) {
                    return f;
                }
            }
            return null;
        }
    }

    static final class Func1 extends Node {
        final Fn fn;
        final Node a;

        Func1(int id, SourcePosition at, String text, Fn fn, Node a) {
            super(id, at, text);
            this.fn = fn;
            this.a = a;
        }

        @Override double eval(Scalar s) {
            double x = a.eval(s);
            switch (fn) {
                case SQRT:
                    if (x < 0) {
                        throw new DomainError(at, "square root of a negative number: '" + a.text + "' is " + x);
                    }
                    return Math.sqrt(x);
                case LN:
                case LOG10:
                    if (x <= 0) {
                        throw new DomainError(at, "logarithm of a number that is not positive: '" + a.text + "' is " + x);
                    }
                    return fn == Fn.LN ? Math.log(x) : Math.log10(x);
                case ASIN:
                case ACOS:
                    if (x < -1 || x > 1) {
                        throw new DomainError(at, fn.symbol + " needs an argument in [-1, 1]: '" + a.text + "' is " + x);
                    }
                    return fn == Fn.ASIN ? Math.asin(x) : Math.acos(x);
                default:
                    return checked(this, scalar(fn, x));
            }
        }

        static double scalar(Fn fn, double x) {
            switch (fn) {
                case SQRT: return Math.sqrt(x);
                case EXP: return Math.exp(x);
                case LN: return Math.log(x);
                case LOG10: return Math.log10(x);
                case ABS: return Math.abs(x);
                case SIN: return Math.sin(x);
                case COS: return Math.cos(x);
                case TAN: return Math.tan(x);
                case ASIN: return Math.asin(x);
                case ACOS: return Math.acos(x);
                default: return Math.atan(x);
            }
        }

        @Override DerivativeStructure ds(Derivs d) {
            DerivativeStructure x = a.derive(d);
            switch (fn) {
                case SQRT: return x.sqrt();
                case EXP: return x.exp();
                case LN: return x.log();
                case LOG10: return x.log10();
                case ABS: return x.abs();
                case SIN: return x.sin();
                case COS: return x.cos();
                case TAN: return x.tan();
                case ASIN: return x.asin();
                case ACOS: return x.acos();
                default: return x.atan();
            }
        }

        @Override double[] block(Block b, int n) {
            double[] x = a.block(b, n);
            double[] r = b.buf[id];
            switch (fn) {
                case SQRT: for (int t = 0; t < n; t++) { r[t] = Math.sqrt(x[t]); } break;
                case EXP: for (int t = 0; t < n; t++) { r[t] = Math.exp(x[t]); } break;
                case LN: for (int t = 0; t < n; t++) { r[t] = Math.log(x[t]); } break;
                case ABS: for (int t = 0; t < n; t++) { r[t] = Math.abs(x[t]); } break;
                default: for (int t = 0; t < n; t++) { r[t] = scalar(fn, x[t]); } break;
            }
            return r;
        }
        @Override List<Node> children() { return List.of(a); }
    }

    /** min or max of two or more arguments. */
    static final class MinMax extends Node {
        final boolean max;
        final Node[] args;

        MinMax(int id, SourcePosition at, String text, boolean max, Node[] args) {
            super(id, at, text);
            this.max = max;
            this.args = args;
        }

        @Override double eval(Scalar s) {
            double r = args[0].eval(s);
            for (int k = 1; k < args.length; k++) {
                double v = args[k].eval(s);
                r = max ? Math.max(r, v) : Math.min(r, v);
            }
            return r;
        }

        @Override DerivativeStructure ds(Derivs d) {
            DerivativeStructure r = args[0].derive(d);
            for (int k = 1; k < args.length; k++) {
                DerivativeStructure v = args[k].derive(d);
                if (max ? v.getValue() > r.getValue() : v.getValue() < r.getValue()) {
                    r = v;
                }
            }
            return r;
        }

        @Override double[] block(Block b, int n) {
            double[] r = b.buf[id];
            double[] first = args[0].block(b, n);
            System.arraycopy(first, 0, r, 0, n);
            for (int k = 1; k < args.length; k++) {
                double[] v = args[k].block(b, n);
                for (int t = 0; t < n; t++) {
                    r[t] = max ? Math.max(r[t], v[t]) : Math.min(r[t], v[t]);
                }
            }
            return r;
        }
        @Override List<Node> children() { return List.of(args); }
    }

    /** A call of a {@link ModelFunction} from the function library. */
    static final class External extends Node {
        final ModelFunction fn;
        final Node[] args;

        External(int id, SourcePosition at, String text, ModelFunction fn, Node[] args) {
            super(id, at, text);
            this.fn = fn;
            this.args = args;
        }

        @Override double eval(Scalar s) {
            double[] a = new double[args.length];
            for (int k = 0; k < a.length; k++) {
                a[k] = args[k].eval(s);
            }
            String problem = fn.domainProblem(a);
            if (problem != null) {
                throw new DomainError(at, fn.name() + ": " + problem);
            }
            return checked(this, fn.value(a));
        }

        @Override DerivativeStructure ds(Derivs d) {
            DerivativeStructure[] a = new DerivativeStructure[args.length];
            for (int k = 0; k < a.length; k++) {
                a[k] = args[k].derive(d);
            }
            return fn.value(a);
        }

        @Override double[] block(Block b, int n) {
            double[][] a = new double[args.length][];
            for (int k = 0; k < a.length; k++) {
                a[k] = args[k].block(b, n);
            }
            double[] r = b.buf[id];
            fn.valueBlock(a, n, r);
            return r;
        }
        @Override List<Node> children() { return List.of(args); }
    }

    /**
     * A unit conversion the dimension checker inserts in front of a library function's argument:
     * {@code a × factor + shift} (a temperature point in K into a parameter in °C: factor 1, shift −273.15;
     * kPa into Pa: factor 1000, shift 0).
     */
    static final class Convert extends Node {
        final Node a;
        final double factor;
        final double shift;

        Convert(int id, SourcePosition at, String text, Node a, double factor, double shift) {
            super(id, at, text);
            this.a = a;
            this.factor = factor;
            this.shift = shift;
        }

        @Override double eval(Scalar s) { return checked(this, a.eval(s) * factor + shift); }
        @Override DerivativeStructure ds(Derivs d) { return a.derive(d).multiply(factor).add(shift); }
        @Override double[] block(Block b, int n) {
            double[] x = a.block(b, n);
            double[] r = b.buf[id];
            for (int t = 0; t < n; t++) {
                r[t] = x[t] * factor + shift;
            }
            return r;
        }
        @Override List<Node> children() { return List.of(a); }
    }
}
