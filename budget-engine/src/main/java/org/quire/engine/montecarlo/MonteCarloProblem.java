package org.quire.engine.montecarlo;

/**
 * A Monte Carlo run that cannot give a result for reasons of the budget, not of the program: e.g. an output
 * that left the domain of a model function in every trial. The message says what and why; a command reports it
 * as a user error. A subclass of {@link IllegalStateException} for the callers that caught that before.
 */
public final class MonteCarloProblem extends IllegalStateException {
    private static final long serialVersionUID = 1L;

    MonteCarloProblem(String message) {
        super(message);
    }
}
