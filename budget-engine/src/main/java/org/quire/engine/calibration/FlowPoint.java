package org.quire.engine.calibration;

import java.util.List;

/**
 * One flow point of a calibration: its label (as the rig's log names it), its runs, and optionally a stated
 * repeatability (required when the point has a single run).
 *
 * @param label the point's label, e.g. "P1" or "25 m3/h"; not blank
 * @param runs the runs, at least one; unmodifiable
 * @param statedRepeatability a pooled repeatability to use instead of the runs' own scatter, or null
 */
public record FlowPoint(String label, List<Run> runs, StatedRepeatability statedRepeatability) {

    /** Checks and copies; prefer {@link #of}. */
    public FlowPoint {
        if (label == null || label.isBlank()) {
            throw new IllegalArgumentException(CalibrationMessages.blank("flow point label"));
        }
        label = label.strip();
        if (runs == null || runs.isEmpty()) {
            throw new IllegalArgumentException(CalibrationMessages.noRuns(label));
        }
        for (Run r : runs) {
            if (r == null) {
                throw new IllegalArgumentException(CalibrationMessages.missing("run of point " + label));
            }
        }
        runs = List.copyOf(runs);
    }

    /** @return a point whose repeatability comes from its own runs */
    public static FlowPoint of(String label, List<Run> runs) {
        return new FlowPoint(label, runs, null);
    }

    /** @return a copy with a stated repeatability (null for none) */
    public FlowPoint withStatedRepeatability(StatedRepeatability s) {
        return new FlowPoint(label, runs, s);
    }
}
