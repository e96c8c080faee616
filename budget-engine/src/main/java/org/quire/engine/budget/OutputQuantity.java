package org.quire.engine.budget;

/**
 * A quantity the budget reports: the measurand Y, or one of several.
 *
 * @param name the name an equation of the model defines
 * @param unit its unit as text
 * @param description what it is
 */
public record OutputQuantity(String name, String unit, String description) {
    public OutputQuantity {
        InputQuantity.checkName(name);
        unit = unit == null ? "" : unit;
        description = description == null ? "" : description;
    }

    public static OutputQuantity of(String name) {
        return new OutputQuantity(name, "", "");
    }
}
