package org.quire.engine.calibration;

import java.util.ArrayList;
import java.util.List;

/**
 * The laboratory's calibration and measurement capability (CMC) over flow ranges: the smallest expanded
 * uncertainty (coverage probability about 95 %) it may state for a calibration in each range, relative to the
 * reading in percent. A point whose own expanded uncertainty is below the CMC is reported at the CMC, with a
 * note (ILAC P14:2020, the uncertainty stated on a certificate shall not be smaller than the CMC; clause from
 * memory). Ranges are ordered, contiguous (each starts where the previous one ends) and cover every point; a
 * gap or overlap is an error, never filled in.
 *
 * @param flowUnit the unit of the range limits (a unit expression, e.g. "m^3/h")
 * @param ranges the ranges in increasing order of flow; unmodifiable
 * @param source where the CMC comes from (the accreditation schedule); not blank
 */
public record CmcTable(String flowUnit, List<Range> ranges, String source) {

    /**
     * One range: {@code from <= q < to} (the last range includes {@code to}), with its CMC.
     *
     * @param from lowest flow, not negative
     * @param to highest flow, greater than {@code from}
     * @param expandedPercent the CMC as an expanded uncertainty in % of the reading, positive
     */
    public record Range(double from, double to, double expandedPercent) {
        public Range {
            if (!Double.isFinite(from) || from < 0) {
                throw new IllegalArgumentException(CalibrationMessages.cmc("the lower flow must be a finite number, "
                        + "not negative: " + from));
            }
            if (!Double.isFinite(to) || !(to > from)) {
                throw new IllegalArgumentException(CalibrationMessages.cmc("the upper flow " + to
                        + " must be greater than the lower flow " + from));
            }
            if (!Double.isFinite(expandedPercent) || !(expandedPercent > 0)) {
                throw new IllegalArgumentException(CalibrationMessages.cmc("the CMC must be positive, not "
                        + expandedPercent));
            }
        }
    }

    /** Checks the table; prefer {@link #of}. */
    public CmcTable {
        if (flowUnit == null || flowUnit.isBlank()) {
            throw new IllegalArgumentException(CalibrationMessages.blank("flow unit of the CMC table"));
        }
        flowUnit = flowUnit.strip();
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException(CalibrationMessages.blank("source of the CMC table"));
        }
        source = source.strip();
        if (ranges == null || ranges.isEmpty()) {
            throw new IllegalArgumentException(CalibrationMessages.cmc("the table has no range"));
        }
        List<Range> copy = new ArrayList<>();
        for (int i = 0; i < ranges.size(); i++) {
            Range r = ranges.get(i);
            if (r == null) {
                throw new IllegalArgumentException(CalibrationMessages.cmc("range " + (i + 1) + " is missing"));
            }
            if (i > 0) {
                double join = copy.get(i - 1).to();
                double tol = 1e-12 * Math.abs(join);
                if (r.from() > join + tol) {
                    throw new IllegalArgumentException(CalibrationMessages.cmcGap(i, join, i + 1, r.from(), flowUnit));
                }
                if (r.from() < join - tol) {
                    throw new IllegalArgumentException(CalibrationMessages.cmcOverlap(i, join, i + 1, r.from(), flowUnit));
                }
            }
            copy.add(r);
        }
        ranges = List.copyOf(copy);
    }

    public static CmcTable of(String flowUnit, List<Range> ranges, String source) {
        return new CmcTable(flowUnit, ranges, source);
    }

    /**
     * @param flow a flow in {@link #flowUnit()}
     * @return the CMC at that flow, % of reading
     * @throws IllegalArgumentException when the flow lies outside every range
     */
    public double at(double flow) {
        for (int i = 0; i < ranges.size(); i++) {
            Range r = ranges.get(i);
            boolean last = i == ranges.size() - 1;
            if (flow >= r.from() && (flow < r.to() || last && flow == r.to())) {
                return r.expandedPercent();
            }
        }
        throw new IllegalArgumentException(CalibrationMessages.outsideCmc(flow, flowUnit, ranges.get(0).from(),
                ranges.get(ranges.size() - 1).to()));
    }
}
