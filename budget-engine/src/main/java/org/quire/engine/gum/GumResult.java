package org.quire.engine.gum;

import java.util.List;
import java.util.Map;
import org.quire.engine.budget.EvaluationSettings;

/**
 * The GUM evaluation of a budget: one result per output, and for several outputs their covariance and
 * correlation matrices (JCGM 102:2011 6.2.1.3, U_y = C U_x C^T).
 *
 * @param outputs per output, in declared order
 * @param covariance covariance matrix of the outputs
 * @param correlation correlation matrix of the outputs (NaN where an output has zero uncertainty)
 * @param quantities the estimate of every quantity the model defines, intermediate ones included, in the
 *     units the model computes in (display units are not applied here)
 * @param warnings sentences about the budget as a whole (model warnings, unused inputs)
 * @param settings the settings used
 *
 * <p>Immutable and thread-safe: the matrices are copied in and out.
 */
public record GumResult(List<OutputResult> outputs, double[][] covariance, double[][] correlation,
        Map<String, Double> quantities, List<String> warnings, EvaluationSettings settings) {

    public GumResult {
        outputs = List.copyOf(outputs);
        covariance = Matrices.copy(covariance);
        correlation = Matrices.copy(correlation);
        quantities = Map.copyOf(quantities);
        warnings = List.copyOf(warnings);
    }

    /** @return a copy of the covariance matrix of the outputs: changing it changes nothing here */
    @Override
    public double[][] covariance() {
        return Matrices.copy(covariance);
    }

    /** @return a copy of the correlation matrix of the outputs: changing it changes nothing here */
    @Override
    public double[][] correlation() {
        return Matrices.copy(correlation);
    }

    /** @return the covariance of outputs {@code k} and {@code l} */
    public double covariance(int k, int l) {
        return covariance[k][l];
    }

    /** @return the correlation coefficient of outputs {@code k} and {@code l} (NaN where one has zero uncertainty) */
    public double correlation(int k, int l) {
        return correlation[k][l];
    }

    /** @return the result of the output named, or null */
    public OutputResult output(String name) {
        for (OutputResult o : outputs) {
            if (o.name().equals(name)) {
                return o;
            }
        }
        return null;
    }
}
