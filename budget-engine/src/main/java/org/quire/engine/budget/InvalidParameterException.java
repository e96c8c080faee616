package org.quire.engine.budget;

/** A bad value of a named parameter of an input's evaluation, such as a negative half-width. */
public final class InvalidParameterException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;
    private final String parameter;

    public InvalidParameterException(String parameter, String message) {
        super(message);
        this.parameter = parameter;
    }

    /** @return the parameter's name as used in budget files, e.g. {@code halfWidth}; may be empty */
    public String parameter() {
        return parameter;
    }
}
