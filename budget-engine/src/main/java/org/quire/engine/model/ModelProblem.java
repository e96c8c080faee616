package org.quire.engine.model;

/**
 * One problem found in a measurement model: where it is and what is wrong.
 *
 * @param line 1-based line of the model text, or 0 when the problem concerns the model as a whole
 * @param column 1-based column, or 0 when not applicable
 * @param length number of characters the problem spans (at least 1 when {@code line > 0})
 * @param severity error or warning
 * @param message one sentence saying what is wrong and, where possible, what was expected
 */
public record ModelProblem(int line, int column, int length, Severity severity, String message) {

    /** How serious a problem is: an error stops evaluation, a warning does not. */
    public enum Severity { ERROR, WARNING }

    public static ModelProblem error(SourcePosition at, String message) {
        return new ModelProblem(at.line(), at.column(), Math.max(1, at.length()), Severity.ERROR, message);
    }

    public static ModelProblem warning(SourcePosition at, String message) {
        return new ModelProblem(at.line(), at.column(), Math.max(1, at.length()), Severity.WARNING, message);
    }

    public boolean isError() {
        return severity == Severity.ERROR;
    }

    /** @return e.g. {@code line 3, column 7: unknown name 'rho_x'} */
    @Override
    public String toString() {
        String where = line > 0 ? "line " + line + ", column " + column + ": " : "";
        return (severity == Severity.WARNING ? "warning: " : "") + where + message;
    }
}
