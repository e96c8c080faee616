package org.quire.engine.model;

import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;

/**
 * A measurement model ready to evaluate: the equations in an order in which each quantity is computed after
 * the quantities it uses.
 *
 * <p>Immutable and thread-safe; {@link #newSession(int)} gives each Monte Carlo thread its own scratch space.
 */
public final class CompiledModel implements BlockEvaluator {
    private final List<String> inputs;
    private final List<String> quantities;
    private final List<String> equationTexts;
    private final List<String> functionTexts;
    private final Node[] roots;
    private final int[] order;
    private final int[] outputIndex;
    private final List<String> outputs;
    private final int nodeCount;
    private final List<Node> constants;
    private final List<ModelProblem> warnings;
    private final List<Formula.Line> lines;
    /** the trees as numbers for {@link #live}; made on first use */
    private volatile Walk walk;

    CompiledModel(List<String> inputs, List<String> quantities, List<String> equationTexts,
            List<String> functionTexts, Node[] roots, int[] order, int[] outputIndex, List<String> outputs,
            int nodeCount, List<Node> constants, List<ModelProblem> warnings, List<Formula.Line> lines) {
        this.inputs = inputs;
        this.quantities = List.copyOf(quantities);
        this.equationTexts = List.copyOf(equationTexts);
        this.functionTexts = List.copyOf(functionTexts);
        this.roots = roots;
        this.order = order;
        this.outputIndex = outputIndex;
        this.outputs = outputs;
        this.nodeCount = nodeCount;
        this.constants = constants;
        this.warnings = List.copyOf(warnings);
        this.lines = List.copyOf(lines);
    }

    /**
     * @return the model's lines with every name resolved, for typesetting: the model's own functions first, then
     *     the quantities' equations in the order they are written
     */
    public List<Formula.Line> lines() {
        return lines;
    }

    /** @return the input names, in the order the evaluation methods expect their values */
    public List<String> inputNames() {
        return inputs;
    }

    /** @return the names of all quantities the equations define, in the order they are written */
    public List<String> quantityNames() {
        return quantities;
    }

    /** @return each quantity's equation as written, parallel to {@link #quantityNames()} */
    public List<String> equationTexts() {
        return equationTexts;
    }

    /** @return the model's own function definitions as written */
    public List<String> functionTexts() {
        return functionTexts;
    }

    /** @return the output names, in declared order */
    public List<String> outputNames() {
        return outputs;
    }

    /** @return warnings found while compiling (unused inputs, for instance) */
    public List<ModelProblem> warnings() {
        return warnings;
    }

    @Override
    public int inputCount() {
        return inputs.size();
    }

    @Override
    public int outputCount() {
        return outputs.size();
    }

    /**
     * Evaluates every quantity at the given input values, checking each operation's domain.
     *
     * @param x input values in {@link #inputNames()} order
     * @return the value of each quantity, in {@link #quantityNames()} order
     * @throws ModelException naming the operation, its place and the offending value when a value leaves a
     *     function's domain (division by zero, square root of a negative number and so on)
     */
    public double[] evaluateQuantities(double[] x) throws ModelException {
        checkLength(x.length);
        double[] v = new double[roots.length];
        Node.Scalar s = new Node.Scalar(x, v);
        try {
            for (int j : order) {
                v[j] = roots[j].eval(s);
            }
        } catch (Node.DomainError e) {
            throw new ModelException(e.problem);
        }
        return v;
    }

    /**
     * @param x input values
     * @return the outputs at {@code x}
     * @throws ModelException when a value leaves a function's domain
     */
    public double[] evaluate(double[] x) throws ModelException {
        double[] v = evaluateQuantities(x);
        double[] y = new double[outputIndex.length];
        for (int k = 0; k < y.length; k++) {
            y[k] = v[outputIndex[k]];
        }
        return y;
    }

    /**
     * The first-order partial derivatives of every output, by reverse-mode automatic differentiation: one pass
     * computes every node's value, then one backward pass per output carries the adjoint df/d(node) from the
     * output down to the inputs by the chain rule, each node passing it on to its operands multiplied by the
     * operation's own partial derivatives. The cost is linear in the size of the model for each output, however
     * many inputs there are. The partial derivatives of the library's functions are taken from their derivative
     * structures with one free parameter per argument.
     *
     * <p>References: JCGM 100:2008 5.1.3, eq. (10) (sensitivity coefficients c_i = df/dx_i); A. Griewank,
     * A. Walther, Evaluating Derivatives, 2nd ed., SIAM 2008, ch. 3 (the reverse mode).
     *
     * @param x input values (checked first with {@link #evaluate(double[])} by the caller)
     * @param active indices of the inputs whose coefficients are wanted
     * @return {@code c[k][a]}, the partial derivative of output k with respect to input {@code active[a]}
     */
    public double[][] sensitivities(double[] x, int[] active) {
        checkLength(x.length);
        Walk w = walk();
        Node[] nodes = w.nodes;
        double[] val = new double[nodeCount];
        for (int j : order) {
            for (int id : w.postorder[j]) {
                val[id] = localValue(nodes[id], x, val);
            }
        }
        double[][] c = new double[outputIndex.length][active.length];
        double[] adj = new double[nodeCount];
        double[] adjX = new double[x.length];
        for (int k = 0; k < outputIndex.length; k++) {
            java.util.Arrays.fill(adj, 0.0);
            java.util.Arrays.fill(adjX, 0.0);
            adj[roots[outputIndex[k]].id] = 1.0;
            for (int o = order.length - 1; o >= 0; o--) {
                int[] post = w.postorder[order[o]];
                for (int p = post.length - 1; p >= 0; p--) {
                    int id = post[p];
                    double g = adj[id];
                    if (g != 0) {
                        propagate(nodes[id], g, val, adj, adjX);
                    }
                }
            }
            for (int a = 0; a < active.length; a++) {
                c[k][a] = adjX[active[a]];
            }
        }
        return c;
    }

    /** The value of one node from its operands' values (no domain checks: the caller has evaluated the model). */
    private double localValue(Node n, double[] x, double[] val) {
        if (n instanceof Node.Const k) {
            return k.value;
        } else if (n instanceof Node.Input in) {
            return x[in.index];
        } else if (n instanceof Node.Quantity q) {
            return val[roots[q.index].id];
        } else if (n instanceof Node.Neg g) {
            return -val[g.a.id];
        } else if (n instanceof Node.Arith ar) {
            double u = val[ar.a.id];
            double v = val[ar.c.id];
            switch (ar.op) {
                case '+': return u + v;
                case '-': return u - v;
                case '*': return u * v;
                default: return u / v;
            }
        } else if (n instanceof Node.PowInt pw) {
            return Node.PowInt.pow(val[pw.a.id], pw.k);
        } else if (n instanceof Node.Pow pw) {
            return org.apache.commons.math3.util.FastMath.pow(val[pw.a.id], val[pw.c.id]);
        } else if (n instanceof Node.Func1 f) {
            return Node.Func1.scalar(f.fn, val[f.a.id]);
        } else if (n instanceof Node.MinMax mm) {
            return val[mm.args[chosen(mm, val)].id];
        } else if (n instanceof Node.External e) {
            double[] a = new double[e.args.length];
            for (int k = 0; k < a.length; k++) {
                a[k] = val[e.args[k].id];
            }
            return e.fn.value(a);
        } else {
            Node.Convert cv = (Node.Convert) n;
            return val[cv.a.id] * cv.factor + cv.shift;
        }
    }

    /** The argument min or max picks: the first, replaced by each later one that is strictly beyond it. */
    private static int chosen(Node.MinMax mm, double[] val) {
        int r = 0;
        for (int k = 1; k < mm.args.length; k++) {
            double v = val[mm.args[k].id];
            double best = val[mm.args[r].id];
            if (mm.max ? v > best : v < best) {
                r = k;
            }
        }
        return r;
    }

    /** Adds g times the node's partial derivative to each operand's adjoint (chain rule, reverse mode). */
    private void propagate(Node n, double g, double[] val, double[] adj, double[] adjX) {
        if (n instanceof Node.Const) {
            return;
        } else if (n instanceof Node.Input in) {
            adjX[in.index] += g;
        } else if (n instanceof Node.Quantity q) {
            adj[roots[q.index].id] += g;
        } else if (n instanceof Node.Neg ng) {
            adj[ng.a.id] -= g;
        } else if (n instanceof Node.Arith ar) {
            double u = val[ar.a.id];
            double v = val[ar.c.id];
            switch (ar.op) {
                case '+':
                    adj[ar.a.id] += g;
                    adj[ar.c.id] += g;
                    break;
                case '-':
                    adj[ar.a.id] += g;
                    adj[ar.c.id] -= g;
                    break;
                case '*':
                    adj[ar.a.id] += g * v;
                    adj[ar.c.id] += g * u;
                    break;
                default:
                    adj[ar.a.id] += g / v;
                    adj[ar.c.id] -= g * u / (v * v);
                    break;
            }
        } else if (n instanceof Node.PowInt pw) {
            double u = val[pw.a.id];
            adj[pw.a.id] += g * (pw.k == 0 ? 0.0 : pw.k * Node.PowInt.pow(u, pw.k - 1));
        } else if (n instanceof Node.Pow pw) {
            double u = val[pw.a.id];
            double y = val[pw.c.id];
            adj[pw.a.id] += g * y * org.apache.commons.math3.util.FastMath.pow(u, y - 1);
            if (!(pw.c instanceof Node.Const)) {
                adj[pw.c.id] += g * val[pw.id] * Math.log(u);
            }
        } else if (n instanceof Node.Func1 f) {
            double u = val[f.a.id];
            double r = val[f.id];
            double d;
            switch (f.fn) {
                case SQRT: d = 0.5 / r; break;
                case EXP: d = r; break;
                case LN: d = 1.0 / u; break;
                case LOG10: d = 1.0 / (u * Math.log(10.0)); break;
                case ABS: d = Double.doubleToLongBits(u) < 0 ? -1.0 : 1.0; break;
                case SIN: d = Math.cos(u); break;
                case COS: d = -Math.sin(u); break;
                case TAN: d = 1.0 + r * r; break;
                case ASIN: d = 1.0 / Math.sqrt(1.0 - u * u); break;
                case ACOS: d = -1.0 / Math.sqrt(1.0 - u * u); break;
                default: d = 1.0 / (1.0 + u * u); break;
            }
            adj[f.a.id] += g * d;
        } else if (n instanceof Node.MinMax mm) {
            adj[mm.args[chosen(mm, val)].id] += g;
        } else if (n instanceof Node.External e) {
            int p = e.args.length;
            DerivativeStructure[] a = new DerivativeStructure[p];
            for (int k = 0; k < p; k++) {
                a[k] = new DerivativeStructure(p, 1, k, val[e.args[k].id]);
            }
            DerivativeStructure r = e.fn.value(a);
            int[] orders = new int[p];
            for (int k = 0; k < p; k++) {
                orders[k] = 1;
                adj[e.args[k].id] += g * r.getPartialDerivative(orders);
                orders[k] = 0;
            }
        } else {
            Node.Convert cv = (Node.Convert) n;
            adj[cv.a.id] += g * cv.factor;
        }
    }

    /**
     * Evaluates the outputs with their partial derivatives by forward-mode automatic differentiation.
     *
     * <p>References: Commons Math {@code DerivativeStructure} (Kalman's generalised derivative structures);
     * the sensitivity coefficients of JCGM 100:2008 5.1.3, eq. (10), are the first-order partials.
     *
     * @param x input values (checked first with {@link #evaluate(double[])} by the caller)
     * @param active indices of the inputs that are free variables; the others are held constant
     * @param derivativeOrder 1 for sensitivity coefficients, 3 for the higher-order terms of JCGM 100 5.1.2
     * @return one derivative structure per output, its free parameters in {@code active} order
     */
    public DerivativeStructure[] derivatives(double[] x, int[] active, int derivativeOrder) {
        checkLength(x.length);
        int params = active.length;
        double[] values = new double[roots.length];
        Node.Scalar scalar = new Node.Scalar(x, values);
        for (int j : order) {
            values[j] = roots[j].eval(scalar);
        }
        DerivativeStructure[] xs = new DerivativeStructure[x.length];
        boolean[] free = new boolean[x.length];
        for (int k = 0; k < params; k++) {
            xs[active[k]] = new DerivativeStructure(params, derivativeOrder, k, x[active[k]]);
            free[active[k]] = true;
        }
        boolean[] live = live(free);
        DerivativeStructure[] v = new DerivativeStructure[roots.length];
        Node.Derivs d = new Node.Derivs(xs, v, params, derivativeOrder, live, scalar);
        for (int j : order) {
            v[j] = roots[j].derive(d);
        }
        DerivativeStructure[] y = new DerivativeStructure[outputIndex.length];
        for (int k = 0; k < y.length; k++) {
            y[k] = v[outputIndex[k]];
        }
        return y;
    }

    /**
     * @param free per input, whether it is a free parameter
     * @return per node id, whether the node's value depends on a free input (directly, or through a quantity)
     */
    private boolean[] live(boolean[] free) {
        Walk w = walk();
        boolean[] live = new boolean[nodeCount];
        boolean[] quantity = new boolean[roots.length];
        for (int j : order) {
            for (int id : w.postorder[j]) {
                int ref = w.ref[id];
                boolean l;
                if (ref >= 0) {
                    l = free[ref];
                } else if (ref < -1) {
                    l = quantity[-2 - ref];
                } else {
                    l = false;
                    for (int c : w.children[id]) {
                        if (live[c]) {
                            l = true;
                            break;
                        }
                    }
                }
                live[id] = l;
            }
            quantity[j] = live[roots[j].id];
        }
        return live;
    }

    /**
     * The trees as numbers, for {@link #live}: per equation its node ids with every child before its parent;
     * per node id its children's ids and what it refers to (the input index i as i, quantity q as -2 - q, else
     * -1).
     */
    private static final class Walk {
        final int[][] postorder;
        final int[][] children;
        final int[] ref;
        final Node[] nodes;

        /** A node in several trees is listed in the first one of {@code order} only, which is computed first. */
        Walk(Node[] roots, int[] order, int nodeCount) {
            postorder = new int[roots.length][];
            children = new int[nodeCount][];
            ref = new int[nodeCount];
            nodes = new Node[nodeCount];
            boolean[] seen = new boolean[nodeCount];
            for (int j : order) {
                int[] list = new int[16];
                int[] size = {0};
                list = add(roots[j], list, size, seen);
                postorder[j] = java.util.Arrays.copyOf(list, size[0]);
            }
        }

        private int[] add(Node n, int[] list, int[] size, boolean[] seen) {
            if (seen[n.id]) {
                return list;
            }
            seen[n.id] = true;
            nodes[n.id] = n;
            List<Node> kids = n.children();
            int[] ids = new int[kids.size()];
            for (int k = 0; k < ids.length; k++) {
                Node c = kids.get(k);
                ids[k] = c.id;
                list = add(c, list, size, seen);
            }
            children[n.id] = ids;
            ref[n.id] = n instanceof Node.Input in ? in.index : n instanceof Node.Quantity q ? -2 - q.index : -1;
            if (size[0] == list.length) {
                list = java.util.Arrays.copyOf(list, 2 * list.length);
            }
            list[size[0]++] = n.id;
            return list;
        }
    }

    /** @return the trees as numbers (made on first use; a race makes equal copies) */
    private Walk walk() {
        Walk w = walk;
        if (w == null) {
            w = new Walk(roots, order, nodeCount);
            walk = w;
        }
        return w;
    }

    private void checkLength(int n) {
        if (n != inputs.size()) {
            throw new IllegalArgumentException("expected " + inputs.size() + " input values, got " + n);
        }
    }

    /**
     * The most scratch memory one session may hold, in bytes. A session keeps one array of block length per
     * compiled operation; a model with very many operations (user functions written out in full) works through
     * a block in shorter pieces instead of allocating gigabytes.
     */
    static final long SESSION_SCRATCH_BYTES = 64L << 20;

    /**
     * The block length a session uses inside: {@code maxBlock}, or fewer trials at a time when the model's
     * operations would need more than {@link #SESSION_SCRATCH_BYTES} of scratch space.
     */
    static int innerBlock(int nodes, int maxBlock) {
        long fit = SESSION_SCRATCH_BYTES / (8L * Math.max(1, nodes));
        return (int) Math.max(1, Math.min(maxBlock, fit));
    }

    @Override
    public Session newSession(int maxBlock) {
        if (maxBlock < 1) {
            throw new IllegalArgumentException("maxBlock must be at least 1, not " + maxBlock);
        }
        int inner = innerBlock(nodeCount, maxBlock);
        Node.Block b = new Node.Block(nodeCount, roots.length, inner);
        for (Node c : constants) {
            Arrays.fill(b.buf[c.id], ((Node.Const) c).value);
        }
        if (inner == maxBlock) {
            return (in, n, out) -> {
                if (n > maxBlock) {
                    throw new IllegalArgumentException("block of " + n + " trials exceeds the session's " + maxBlock);
                }
                evaluateBlock(b, in, n, out, 0);
            };
        }
        double[][] pieceIn = new double[inputs.size()][inner];
        double[][] pieceOut = new double[outputIndex.length][inner];
        return (in, n, out) -> {
            if (n > maxBlock) {
                throw new IllegalArgumentException("block of " + n + " trials exceeds the session's " + maxBlock);
            }
            for (int from = 0; from < n; from += inner) {
                int m = Math.min(inner, n - from);
                for (int i = 0; i < pieceIn.length; i++) {
                    System.arraycopy(in[i], from, pieceIn[i], 0, m);
                }
                evaluateBlock(b, pieceIn, m, pieceOut, 0);
                for (int k = 0; k < pieceOut.length; k++) {
                    System.arraycopy(pieceOut[k], 0, out[k], from, m);
                }
            }
        };
    }

    private void evaluateBlock(Node.Block b, double[][] in, int n, double[][] out, int offset) {
        b.in = in;
        try {
            for (int j : order) {
                b.vars[j] = roots[j].block(b, n);
            }
            for (int k = 0; k < outputIndex.length; k++) {
                System.arraycopy(b.vars[outputIndex[k]], 0, out[k], offset, n);
            }
        } finally {
            b.in = null;
        }
    }
}
