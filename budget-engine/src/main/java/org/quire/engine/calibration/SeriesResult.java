package org.quire.engine.calibration;

import java.util.List;
import org.quire.engine.gum.Matrices;

/**
 * One series of point results: as found, as left (measured), or as left (predicted from the as-found results and
 * the adjustment), with the covariance of the point errors and the conformity decisions.
 *
 * @param phase the series
 * @param points the point results, in point order
 * @param covariance the covariance matrix of the point errors, (% of reading)^2 (JCGM 102:2011 6.2.1.3)
 * @param correlation the correlation matrix of the point errors
 * @param conformity the conformity decisions, or null when no specification is given
 */
public record SeriesResult(Phase phase, List<PointResult> points, double[][] covariance, double[][] correlation,
        ConformityResult conformity) {

    /** The series of a calibration. */
    public enum Phase {
        AS_FOUND("as found"), AS_LEFT_MEASURED("as left (measured)"), AS_LEFT_PREDICTED("as left (predicted)");

        private final String label;

        Phase(String label) {
            this.label = label;
        }

        /** @return the words for reports */
        public String label() {
            return label;
        }
    }

    public SeriesResult {
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

}
