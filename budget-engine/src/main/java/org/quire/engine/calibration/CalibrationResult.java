package org.quire.engine.calibration;

import java.util.List;

/**
 * The evaluation of a {@link Calibration}: the as-found series, the adjustment, the as-left series, and the
 * findings a reviewer must see.
 *
 * @param calibration the calibration evaluated
 * @param methodTitle the method template's title
 * @param errorUnit the unit of the errors ("%")
 * @param flowUnit the unit of the flows
 * @param asFound the as-found results
 * @param adjustment the adjustment, or null when the constant is not adjusted
 * @param asLeft the as-left results (measured or predicted), or null when the constant is not adjusted and no
 *     as-left runs were made (the as-found results then stand as left)
 * @param findings sentences a reviewer must see: points reported at the CMC, failed uncertainty-ratio checks,
 *     non-conforming points, a predicted rather than measured as-left, Monte Carlo comparisons not confirmed
 */
public record CalibrationResult(Calibration calibration, String methodTitle, String errorUnit, String flowUnit,
        SeriesResult asFound, AdjustmentResult adjustment, SeriesResult asLeft, List<String> findings) {
    public CalibrationResult {
        findings = List.copyOf(findings);
    }

    /** @return the series that states the meter as it leaves the laboratory: as left when there is one */
    public SeriesResult asReturned() {
        return asLeft != null ? asLeft : asFound;
    }
}
