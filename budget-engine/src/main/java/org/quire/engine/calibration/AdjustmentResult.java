package org.quire.engine.calibration;

import java.util.List;
import org.quire.engine.line.LineFit;

/**
 * The adjustment of the meter's calibration constant, with the old and the new constant side by side.
 *
 * @param kind how the new constant was found
 * @param constantName what the meter calls the constant
 * @param constantUnit its unit
 * @param oldConstant the constant as found
 * @param newConstant the constant dialled in
 * @param newConstantUncertainty the standard uncertainty of the new constant as an estimate of the constant
 *     that makes the meter read without error (0 for a chosen constant, which is simply the number chosen)
 * @param scale C_new / C_old, the factor every indication changes by; exact, as dialled
 * @param errorRemoved the error the adjustment removes, % of the reading: the weighted mean error, or
 *     100 (b - 1) for a fitted slope b, or 100 (C_old / C_new - 1) for a chosen constant
 * @param errorRemovedUncertainty its standard uncertainty (NaN for a chosen constant)
 * @param weights the normalized weights w_p / sum w of the points (weighted mean only; empty otherwise)
 * @param fit the fitted line of indicated against reference flow (fitted slope only; null otherwise)
 * @param notes sentences on the treatment
 */
public record AdjustmentResult(Adjustment.Kind kind, String constantName, String constantUnit, double oldConstant,
        double newConstant, double newConstantUncertainty, double scale, double errorRemoved,
        double errorRemovedUncertainty, List<Double> weights, LineFit fit, List<String> notes) {
    public AdjustmentResult {
        weights = List.copyOf(weights);
        notes = List.copyOf(notes);
    }
}
