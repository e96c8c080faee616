package org.quire.engine.calibration;

import java.util.Map;

/**
 * The method's result for one run: the meter's error and the flow, computed through the method's compiled model
 * from the run's readings. A run has no uncertainty of its own here: the point's budget carries the method's
 * uncertainties once, and the scatter of the runs is what evaluates the repeatability.
 *
 * @param sourceRow the run's row in its source file (0 when entered by hand)
 * @param readings the run's readings by parameter name; unmodifiable
 * @param error the meter's error for the run, % of the reading
 * @param flow the flow of the run, in the flow output's unit
 */
public record RunResult(int sourceRow, Map<String, Double> readings, double error, double flow) {
    public RunResult {
        readings = Map.copyOf(readings);
    }
}
