package org.quire.engine.gum;

import java.util.List;
import org.quire.engine.conformity.ConformityAssessment;

/**
 * The result of a {@link FlowRange} evaluation: one GUM result per flow point for the tabulated output, and
 * the covariance and correlation matrices of the point results. Immutable and thread-safe (matrices are copied
 * out).
 *
 * @param output the tabulated output's name
 * @param unit its unit
 * @param flowUnit the unit of the flows
 * @param points one entry per flow point, in table order
 * @param covariance U_y of the point results (m x m)
 * @param correlation the correlation matrix of the point results (NaN where a result has zero uncertainty)
 * @param conformity the conformity decisions at the points, or null when no limits were given
 */
public record FlowRangeResult(String output, String unit, String flowUnit, List<Point> points, double[][] covariance,
        double[][] correlation, ConformityAssessment conformity) {

    public FlowRangeResult {
        points = List.copyOf(points);
        covariance = Matrices.copy(covariance);
        correlation = Matrices.copy(correlation);
    }

    @Override
    public double[][] covariance() {
        return Matrices.copy(covariance);
    }

    @Override
    public double[][] correlation() {
        return Matrices.copy(correlation);
    }


    /**
     * One row of the table.
     *
     * @param flow the flow of the point
     * @param result the GUM result of the output at the point (estimate, u, nu_eff, k, U and the budget rows)
     */
    public record Point(double flow, OutputResult result) {
        /** @return y at the point */
        public double estimate() {
            return result.estimate();
        }

        /** @return u(y) */
        public double standardUncertainty() {
            return result.standardUncertainty();
        }

        /** @return U = k u(y) */
        public double expandedUncertainty() {
            return result.expandedUncertainty();
        }

        /** @return U / |y|, NaN when y = 0 */
        public double relativeExpandedUncertainty() {
            return result.relativeExpandedUncertainty();
        }
    }
}
