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

    /** Free parameters per pass of {@link #sensitivities}. */
    static final int SENSITIVITY_CHUNK = 32;

    /**
     * The first-order partial derivatives of every output, by forward-mode automatic differentiation in passes
     * of at most {@value #SENSITIVITY_CHUNK} free inputs each. In first order the derivative with respect to
     * one input is carried through the model independently of the others (each operation combines at most two
     * terms per component), so the passes give the same numbers as one pass over all inputs, while the cost stays
     * linear in the number of inputs for a model of a given size: a derivative structure of N free parameters
     * would need a table of all N at once, whose construction grows faster than N^2.
     *
     * <p>References: JCGM 100:2008 5.1.3, eq. (10) (sensitivity coefficients c_i = df/dx_i); Commons Math
     * {@code DerivativeStructure}.
     *
     * @param x input values (checked first with {@link #evaluate(double[])} by the caller)
     * @param active indices of the inputs that are free variables; the others are held constant
     * @return {@code c[k][a]}, the partial derivative of output k with respect to input {@code active[a]}
     */
    public double[][] sensitivities(double[] x, int[] active) {
        checkLength(x.length);
        double[][] c = new double[outputIndex.length][active.length];
        for (int from = 0; from < active.length; from += SENSITIVITY_CHUNK) {
            int[] chunk = java.util.Arrays.copyOfRange(active, from, Math.min(active.length, from + SENSITIVITY_CHUNK));
            DerivativeStructure[] y = derivatives(x, chunk, 1);
            int[] orders = new int[chunk.length];
            for (int a = 0; a < chunk.length; a++) {
                orders[a] = 1;
                for (int k = 0; k < y.length; k++) {
                    c[k][from + a] = y[k].getPartialDerivative(orders);
                }
                orders[a] = 0;
            }
        }
        return c;
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
        DerivativeStructure[] xs = new DerivativeStructure[x.length];
        for (int i = 0; i < x.length; i++) {
            xs[i] = new DerivativeStructure(params, derivativeOrder, x[i]);
        }
        for (int k = 0; k < params; k++) {
            xs[active[k]] = new DerivativeStructure(params, derivativeOrder, k, x[active[k]]);
        }
        DerivativeStructure[] v = new DerivativeStructure[roots.length];
        Node.Derivs d = new Node.Derivs(xs, v, params, derivativeOrder);
        for (int j : order) {
            v[j] = roots[j].ds(d);
        }
        DerivativeStructure[] y = new DerivativeStructure[outputIndex.length];
        for (int k = 0; k < y.length; k++) {
            y[k] = v[outputIndex[k]];
        }
        return y;
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
