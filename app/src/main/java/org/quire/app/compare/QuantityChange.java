package org.quire.app.compare;

import java.util.List;
import java.util.Objects;

/**
 * An input or output present in both budgets whose fields differ.
 *
 * @param name the quantity's name
 * @param changes the fields that differ, in a fixed order
 */
public record QuantityChange(String name, List<FieldChange> changes) {
    public QuantityChange {
        Objects.requireNonNull(name, "name");
        changes = List.copyOf(changes);
    }
}
