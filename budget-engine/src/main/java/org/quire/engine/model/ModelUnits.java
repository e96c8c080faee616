package org.quire.engine.model;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * The units a budget states for a model's inputs and outputs, as text (read with
 * {@code org.quire.engine.units.Units.parse}), and the display unit chosen for each output. An empty text means
 * "not stated": the dimension checks that depend on that quantity are skipped (with a warning when other
 * quantities do state units).
 *
 * <p>Immutable and thread-safe; build with {@link #none()} and the {@code with...} methods.
 */
public final class ModelUnits {
    private static final ModelUnits NONE = new ModelUnits(Map.of(), Map.of(), Map.of());

    private final Map<String, String> inputs;
    private final Map<String, String> outputs;
    private final Map<String, String> displays;

    private ModelUnits(Map<String, String> inputs, Map<String, String> outputs, Map<String, String> displays) {
        this.inputs = inputs;
        this.outputs = outputs;
        this.displays = displays;
    }

    /** @return no units stated: the model is compiled without dimension checks */
    public static ModelUnits none() {
        return NONE;
    }

    /**
     * All units at once, in time linear in their number (the {@code with...} methods copy the maps each time).
     *
     * @param inputUnits unit text by input name; null or blank values for "not stated"
     * @param outputUnits unit text by output name, the unit each equation computes in
     * @param displayUnits display unit text by output name; null or blank to show an output in its unit
     * @return the units
     */
    public static ModelUnits of(Map<String, String> inputUnits, Map<String, String> outputUnits,
            Map<String, String> displayUnits) {
        return new ModelUnits(texts(inputUnits, "input"), texts(outputUnits, "output"),
                texts(displayUnits, "output"));
    }

    private static Map<String, String> texts(Map<String, String> m, String what) {
        Map<String, String> r = new LinkedHashMap<>();
        for (Map.Entry<String, String> e : Objects.requireNonNull(m, what + " units").entrySet()) {
            r.put(Objects.requireNonNull(e.getKey(), what + " name"), text(e.getValue()));
        }
        return java.util.Collections.unmodifiableMap(r);
    }

    /**
     * @param name an input's name
     * @param unit its unit as text; null or blank for "not stated"
     * @return a copy with the input's unit set
     */
    public ModelUnits withInput(String name, String unit) {
        Map<String, String> m = new LinkedHashMap<>(inputs);
        m.put(Objects.requireNonNull(name, "input name"), text(unit));
        return new ModelUnits(Map.copyOf(m), outputs, displays);
    }

    /**
     * @param name an output's name
     * @param unit the unit its equation is computed in, as text; null or blank for "not stated"
     * @param displayUnit the unit its results are shown in; null or blank to show them in {@code unit}
     * @return a copy with the output's units set
     */
    public ModelUnits withOutput(String name, String unit, String displayUnit) {
        Objects.requireNonNull(name, "output name");
        Map<String, String> o = new LinkedHashMap<>(outputs);
        o.put(name, text(unit));
        Map<String, String> d = new LinkedHashMap<>(displays);
        d.put(name, text(displayUnit));
        return new ModelUnits(inputs, Map.copyOf(o), Map.copyOf(d));
    }

    private static String text(String s) {
        return s == null ? "" : s.trim();
    }

    /** @return the unit stated for the input, or "" when none is */
    public String input(String name) {
        return inputs.getOrDefault(name, "");
    }

    /** @return the unit stated for the output, or "" when none is */
    public String output(String name) {
        return outputs.getOrDefault(name, "");
    }

    /** @return the display unit chosen for the output, or "" when none is */
    public String displayUnit(String name) {
        return displays.getOrDefault(name, "");
    }

    /** @return true when no input or output states a unit and no display unit is chosen */
    public boolean isEmpty() {
        return inputs.values().stream().allMatch(String::isEmpty)
                && outputs.values().stream().allMatch(String::isEmpty)
                && displays.values().stream().allMatch(String::isEmpty);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ModelUnits u && inputs.equals(u.inputs) && outputs.equals(u.outputs)
                && displays.equals(u.displays);
    }

    @Override
    public int hashCode() {
        return Objects.hash(inputs, outputs, displays);
    }
}
