package org.quire.engine.calibration;

import java.util.Map;

/**
 * The method's result for one run: the meter's error and the flow, computed through the method's compiled model
 * from the run's readings.
 *
 * @param sourceRow the run's row in its source file (0 when entered by hand)
 * @param readings the run's readings by parameter name; unmodifiable
 * @param error the meter's error for the run, % of the reading
 * @param standardUncertainty the standard uncertainty of that error from the method's budget for one run
 *     (without any repeatability term: the scatter of the runs is what evaluates it)
 * @param flow the flow of the run, in the flow output's unit
 */
public record RunResult(int sourceRow, Map<String, Double> readings, double error, double standardUncertainty,
        double flow) {
    public RunResult {
        readings = Map.copyOf(readings);
    }
}
