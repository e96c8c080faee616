package org.quire.engine.calibration;

import org.quire.engine.conformity.PointDecision;

/**
 * The conformity decision at one point, with the test-uncertainty-ratio check.
 *
 * @param label the point's label
 * @param decision the decision rule's decision with the limits, guard band and probability of conformity
 * @param mpe the smaller magnitude of the two limits at the point, % of the reading
 * @param uncertaintyRatio the ratio the specification asks for
 * @param ratioMet whether the reported U is at most mpe / ratio
 * @param finding the sentence stating a failed ratio check, empty when it is met
 */
public record PointConformity(String label, PointDecision decision, double mpe, double uncertaintyRatio,
        boolean ratioMet, String finding) {
}
