package org.quire.engine.model;

/**
 * A compiled measurement model evaluated over blocks of Monte Carlo trials held in primitive arrays.
 *
 * <p>The evaluator itself is immutable and thread-safe; each thread asks it for its own {@link Session},
 * which owns the scratch arrays and is not thread-safe.
 */
public interface BlockEvaluator {

    /** @return the number of input quantities, in the order of the model's inputs */
    int inputCount();

    /** @return the number of outputs, in the order the model declares them */
    int outputCount();

    /**
     * @param maxBlock the largest number of trials one call of {@link Session#evaluate} will be given
     * @return a new session with scratch space for blocks of up to {@code maxBlock} trials
     */
    Session newSession(int maxBlock);

    /** Per-thread evaluation state. */
    interface Session {
        /**
         * Evaluates the model for trials {@code 0..n-1}.
         *
         * @param inputs {@code inputs[i][t]} is the value of input {@code i} in trial {@code t}
         * @param n the number of trials in this block
         * @param outputs receives {@code outputs[k][t]}, output {@code k} in trial {@code t}; a trial that
         *     leaves the domain of a function (a negative square root, a temperature below absolute zero)
         *     yields NaN there
         */
        void evaluate(double[][] inputs, int n, double[][] outputs);
    }
}
