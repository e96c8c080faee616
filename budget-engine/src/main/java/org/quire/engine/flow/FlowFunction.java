package org.quire.engine.flow;

import java.util.List;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;
import org.quire.engine.model.ModelFunction;

/**
 * Common part of the built-in flow functions: name, parameters, units, arity and the finiteness check.
 *
 * <p>Subclasses are immutable and thread-safe.
 */
abstract class FlowFunction implements ModelFunction {

    private final String name;
    private final List<String> parameters;
    private final int minArity;
    private final List<String> argumentUnits;
    private final String resultUnit;
    private final String description;

    FlowFunction(String name, List<String> parameters, int minArity, List<String> argumentUnits,
            String resultUnit, String description) {
        if (argumentUnits.size() != parameters.size()) {
            throw new IllegalArgumentException("one unit per parameter of " + name);
        }
        this.name = name;
        this.parameters = List.copyOf(parameters);
        this.minArity = minArity;
        this.argumentUnits = List.copyOf(argumentUnits);
        this.resultUnit = resultUnit;
        this.description = description;
    }

    @Override
    public final String name() {
        return name;
    }

    @Override
    public final List<String> parameters() {
        return parameters;
    }

    @Override
    public final int minArity() {
        return minArity;
    }

    @Override
    public final int maxArity() {
        return parameters.size();
    }

    @Override
    public final String description() {
        return description;
    }

    @Override
    public final List<String> argumentUnits() {
        return argumentUnits;
    }

    @Override
    public final String resultUnit() {
        return resultUnit;
    }

    @Override
    public final String domainProblem(double[] args) {
        checkArity(args.length);
        for (int i = 0; i < args.length; i++) {
            if (!Double.isFinite(args[i])) {
                return FlowMessages.notFinite(name, parameters.get(i), args[i]);
            }
        }
        return problem(args);
    }

    /** @return null when the finite arguments lie in the domain, else a sentence naming argument and reason */
    abstract String problem(double[] args);

    @Override
    public final double value(double[] args) {
        checkArity(args.length);
        return compute(args);
    }

    @Override
    public final DerivativeStructure value(DerivativeStructure[] args) {
        checkArity(args.length);
        return compute(args);
    }

    abstract double compute(double[] args);

    /**
     * Over a block of Monte Carlo trials: the arity is checked once, not per trial; a trial whose arguments are
     * not finite or leave the domain gives NaN.
     */
    @Override
    public final void valueBlock(double[][] args, int n, double[] out) {
        checkArity(args.length);
        if (computeBlock(args, n, out)) {
            return;
        }
        double[] a = new double[args.length];
        for (int t = 0; t < n; t++) {
            boolean finite = true;
            for (int i = 0; i < a.length; i++) {
                a[i] = args[i][t];
                finite &= Double.isFinite(a[i]);
            }
            out[t] = finite && problem(a) == null ? compute(a) : Double.NaN;
        }
    }

    abstract DerivativeStructure compute(DerivativeStructure[] args);

    /**
     * A block implementation, for the functions that have one: {@code out[t]} = the value for the arguments of
     * trial t, or NaN where they are not finite or leave the domain, exactly as the per-trial path of
     * {@link #valueBlock} gives, but with the domain tested by comparisons over the block and without copying
     * each trial's arguments.
     *
     * @param args the arguments, arity already checked
     * @return false when this function has no block implementation (the per-trial path is then used)
     */
    boolean computeBlock(double[][] args, int n, double[] out) {
        return false;
    }

    /** @return whether x is finite and x &gt; 0 */
    static boolean positiveFinite(double x) {
        return x > 0.0 && x <= Double.MAX_VALUE;
    }

    final void checkArity(int n) {
        if (n < minArity || n > parameters.size()) {
            throw new IllegalArgumentException(FlowMessages.arity(name, minArity, parameters.size(), n));
        }
    }

    /** @return a constant carrying no derivatives, shaped like {@code like} */
    static DerivativeStructure constant(DerivativeStructure like, double value) {
        return new DerivativeStructure(like.getFreeParameters(), like.getOrder(), value);
    }

    @Override
    public String toString() {
        return name + String.join(", ", parameters).transform(s -> "(" + s + ")");
    }
}
