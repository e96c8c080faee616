package org.quire.engine.document;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * What the user gives for a new budget from a template: a number for each numeric parameter, the readings for
 * each readings parameter ({@link TemplateParameter#isReadings()}), and the new budget's laboratory and device
 * under test. The template's own laboratory and device are never carried into the new budget: when not given,
 * they are left empty.
 *
 * <p>Immutable and thread-safe.
 */
public final class TemplateValues {
    private final Map<String, Double> numbers;
    private final Map<String, double[]> readings;
    private final String laboratory;
    private final String deviceUnderTest;

    private TemplateValues(Map<String, Double> numbers, Map<String, double[]> readings, String laboratory,
            String deviceUnderTest) {
        this.numbers = Collections.unmodifiableMap(new LinkedHashMap<>(numbers));
        Map<String, double[]> r = new LinkedHashMap<>();
        readings.forEach((k, v) -> r.put(Objects.requireNonNull(k, "name"), v.clone()));
        this.readings = Collections.unmodifiableMap(r);
        this.laboratory = laboratory == null ? "" : laboratory.strip();
        this.deviceUnderTest = deviceUnderTest == null ? "" : deviceUnderTest.strip();
    }

    /** @return the numeric parameter values, nothing else */
    public static TemplateValues of(Map<String, Double> numbers) {
        return new TemplateValues(Objects.requireNonNull(numbers, "numbers"), Map.of(), "", "");
    }

    /** @return these values with the readings of the parameter {@code name} (replacing any given before) */
    public TemplateValues withReadings(String name, double[] values) {
        Map<String, double[]> r = new LinkedHashMap<>(readings);
        r.put(name, Objects.requireNonNull(values, "readings"));
        return new TemplateValues(numbers, r, laboratory, deviceUnderTest);
    }

    /** @param v the laboratory that makes the new measurement */
    public TemplateValues withLaboratory(String v) {
        return new TemplateValues(numbers, readings, v, deviceUnderTest);
    }

    /** @param v the device under test of the new measurement */
    public TemplateValues withDeviceUnderTest(String v) {
        return new TemplateValues(numbers, readings, laboratory, v);
    }

    public Map<String, Double> numbers() { return numbers; }

    /** @return the readings per parameter name; each array is a copy */
    public Map<String, double[]> readings() {
        Map<String, double[]> r = new LinkedHashMap<>();
        readings.forEach((k, v) -> r.put(k, v.clone()));
        return r;
    }

    public String laboratory() { return laboratory; }
    public String deviceUnderTest() { return deviceUnderTest; }
}
