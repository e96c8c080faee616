package org.quire.engine.units;

/**
 * A unit expression that cannot be read: an unknown symbol, a missing exponent, a stray operator. The message
 * names the character position (counted from 1) and what was expected there; for an unknown symbol it suggests
 * the nearest known unit.
 *
 * <p>Immutable and thread-safe.
 */
public final class UnitFormatException extends UnitException {

    private static final long serialVersionUID = 1L;

    private final String input;
    private final int position;
    private final String expected;

    UnitFormatException(String input, int position, String expected, String message) {
        super(message);
        this.input = input;
        this.position = position;
        this.expected = expected;
    }

    /** @return the unit expression as given */
    public String input() {
        return input;
    }

    /** @return the index (from 0) of the character where reading failed; the length of the input at its end */
    public int position() {
        return position;
    }

    /** @return a short phrase saying what was expected at {@link #position()}, e.g. "an exponent" */
    public String expected() {
        return expected;
    }
}
