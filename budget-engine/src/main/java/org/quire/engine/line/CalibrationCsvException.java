package org.quire.engine.line;

/**
 * A calibration CSV text that cannot be read: the message names the line (from 1) and, where one cell is at
 * fault, the column (the field number from 1 and the column's name).
 */
public final class CalibrationCsvException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final int line;
    private final int column;

    CalibrationCsvException(int line, int column, String message) {
        super(message);
        this.line = line;
        this.column = column;
    }

    /** @return the line of the text at fault, from 1; 0 when the problem is with the text as a whole */
    public int line() {
        return line;
    }

    /** @return the field number at fault, from 1; 0 when the problem concerns a whole line */
    public int column() {
        return column;
    }
}
