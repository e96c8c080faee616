package org.quire.engine.units;

/**
 * A unit or dimension problem: quantities of different dimensions added or converted, a fractional power of a
 * dimension that has no such root, a unit with an offset used where only a factor makes sense.
 *
 * <p>Immutable and thread-safe.
 */
public class UnitException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    /** @param message a complete sentence saying what is wrong */
    public UnitException(String message) {
        super(message);
    }
}
