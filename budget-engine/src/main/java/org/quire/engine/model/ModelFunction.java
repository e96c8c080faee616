package org.quire.engine.model;

import java.util.List;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;

/**
 * A named function that a measurement model may call, such as {@code sqrt} or a water-density formula.
 *
 * <p>Every function is given three ways that must agree: on plain doubles (the estimate), on
 * {@link DerivativeStructure}s (exact sensitivity coefficients by forward-mode automatic differentiation) and
 * over blocks of Monte Carlo trials. Implementations are immutable and thread-safe.
 */
public interface ModelFunction {

    /** @return the name used in model text, e.g. {@code water_density} */
    String name();

    /** @return the parameter names, for messages and help, e.g. {@code [t]} */
    List<String> parameters();

    /** @return the smallest number of arguments accepted (usually {@code parameters().size()}) */
    default int minArity() {
        return parameters().size();
    }

    /** @return the largest number of arguments accepted ({@link Integer#MAX_VALUE} for variadic) */
    default int maxArity() {
        return parameters().size();
    }

    /** @return one sentence for help and the report, citing the publication where there is one */
    String description();

    /**
     * @return the units expected for each argument (a unit expression understood by
     *     {@code org.quire.engine.units}), or an empty list when the function takes any dimensionless numbers
     *     or any unit (as {@code abs} or {@code min} do)
     */
    default List<String> argumentUnits() {
        return List.of();
    }

    /** @return the unit of the result, or {@code null} when it follows the arguments (as for {@code abs}) */
    default String resultUnit() {
        return null;
    }

    /**
     * @param args argument values
     * @return {@code null} when the arguments lie in the function's domain, otherwise a sentence saying which
     *     argument is out of range and why (e.g. "relative humidity 1.2 is outside 0 to 1")
     */
    String domainProblem(double[] args);

    /** @return the value at {@code args}, which the caller has checked with {@link #domainProblem} */
    double value(double[] args);

    /** @return the value and its derivatives, for arguments carrying derivatives */
    DerivativeStructure value(DerivativeStructure[] args);

    /**
     * Evaluates over a block of trials: {@code out[t] = f(args[0][t], args[1][t], ...)}, NaN where a trial
     * leaves the domain.
     */
    default void valueBlock(double[][] args, int n, double[] out) {
        double[] a = new double[args.length];
        for (int t = 0; t < n; t++) {
            for (int i = 0; i < a.length; i++) {
                a[i] = args[i][t];
            }
            out[t] = domainProblem(a) == null ? value(a) : Double.NaN;
        }
    }
}
