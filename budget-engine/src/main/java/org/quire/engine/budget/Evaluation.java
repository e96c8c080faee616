package org.quire.engine.budget;

/**
 * How an input quantity's estimate and standard uncertainty were obtained: a Type A evaluation from
 * observations or a Type B evaluation from other information (JCGM 100:2008 4.2 and 4.3), or a fitted
 * parameter of a calibration line ({@link FitParameter}, Type A or B according to the fitting method).
 *
 * <p>Implementations are immutable and thread-safe.
 */
public sealed interface Evaluation permits TypeA, TypeB, FitParameter {

    /** @return the estimate x_i */
    double estimate();

    /** @return the standard uncertainty u(x_i); zero for an exactly known constant */
    double standardUncertainty();

    /** @return the degrees of freedom nu_i, {@link Double#POSITIVE_INFINITY} when u(x_i) is taken as exact */
    double dof();

    /** @return the distribution the Monte Carlo method draws the input from */
    Distribution distribution();

    /** @return "A" or "B" */
    String type();

    /** @return one line saying how u(x_i) was obtained, e.g. "U = 0.075 with k = 3" */
    String basis();
}
