package org.quire.engine.budget;

/**
 * A quantity the budget reports: the measurand Y, or one of several.
 *
 * @param name the name an equation of the model defines
 * @param unit the unit its equation computes it in, as text ("" when not stated)
 * @param description what it is
 * @param displayUnit the unit its results are shown in, as text, of the same dimension as {@code unit}; ""
 *     to show them in {@code unit}. The estimate converts as a value (20 °C is 293.15 K), uncertainties,
 *     contributions and sensitivity coefficients as differences (0.1 °C is 0.1 K).
 */
public record OutputQuantity(String name, String unit, String description, String displayUnit) {
    public OutputQuantity {
        InputQuantity.checkName(name);
        unit = unit == null ? "" : unit;
        description = description == null ? "" : description;
        displayUnit = displayUnit == null ? "" : displayUnit.trim();
    }

    /** An output shown in the unit it is computed in. */
    public OutputQuantity(String name, String unit, String description) {
        this(name, unit, description, "");
    }

    public static OutputQuantity of(String name) {
        return new OutputQuantity(name, "", "", "");
    }

    /** @return a copy shown in {@code v} (null or blank: in {@link #unit()}) */
    public OutputQuantity withDisplayUnit(String v) {
        return new OutputQuantity(name, unit, description, v);
    }

    /** @return the unit results are shown in: the display unit when one is chosen, else the unit */
    public String shownUnit() {
        return displayUnit.isEmpty() ? unit : displayUnit;
    }
}
