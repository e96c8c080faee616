package org.quire.engine.calibration;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * One run of the rig at one flow point: the raw readings as logged, one per per-run quantity of the method
 * (the method template's parameters), and where the run came from.
 *
 * @param sourceRow the row of the run in its source file (the CSV line, 1-based), 0 when entered by hand
 * @param readings the readings by parameter name, in the order read; unmodifiable
 */
public record Run(int sourceRow, Map<String, Double> readings) {

    /** Checks and copies; prefer {@link #of}. */
    public Run {
        if (sourceRow < 0) {
            throw new IllegalArgumentException(CalibrationMessages.negative("source row", sourceRow));
        }
        if (readings == null || readings.isEmpty()) {
            throw new IllegalArgumentException(CalibrationMessages.noReadings(sourceRow));
        }
        Map<String, Double> copy = new LinkedHashMap<>();
        for (Map.Entry<String, Double> e : readings.entrySet()) {
            Double v = e.getValue();
            if (e.getKey() == null || e.getKey().isBlank()) {
                throw new IllegalArgumentException(CalibrationMessages.blank("reading name"));
            }
            if (v == null || !Double.isFinite(v)) {
                throw new IllegalArgumentException(CalibrationMessages.readingNotFinite(e.getKey(), v, sourceRow));
            }
            copy.put(e.getKey(), v);
        }
        readings = Collections.unmodifiableMap(copy);
    }

    /** @return the run with its readings */
    public static Run of(int sourceRow, Map<String, Double> readings) {
        return new Run(sourceRow, readings);
    }

    /** @return the reading of that name, or null */
    public Double reading(String name) {
        return readings.get(name);
    }
}
