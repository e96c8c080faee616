package org.quire.engine.csv;

import java.util.regex.Pattern;

/**
 * The one rule by which a CSV cell becomes a number. A decimal point is always a decimal point; a decimal
 * comma is read only when the decimal mark is comma (stated, or proven by the file: see
 * {@link #provesComma(String)}); a cell that could be a thousands group ({@code 1,002}) is refused unless the
 * decimal mark is comma; thousands separators are never guessed; values a double cannot hold (overflow to
 * infinity, underflow of a non-zero value to 0, NaN, absurd digit or exponent counts) are refused. Stateless
 * and thread-safe.
 */
final class CsvNumbers {
    /** More significant digits than any instrument writes; a double holds 17. */
    static final int MAX_DIGITS = 30;
    /** Exponents beyond five digits are out of the range of a double anyway. */
    static final int MAX_EXPONENT_DIGITS = 5;

    private static final Pattern INTEGER = Pattern.compile("[+-]?\\d+(?:[eE][+-]?\\d+)?");
    private static final Pattern POINT = Pattern.compile("[+-]?(?:\\d+\\.\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?");
    private static final Pattern COMMA = Pattern.compile("[+-]?(?:\\d+,\\d*|,\\d+)(?:[eE][+-]?\\d+)?");
    /** A comma number that may also be one thousands group: 1 to 3 digits (no leading 0), comma, 3 digits. */
    private static final Pattern AMBIGUOUS = Pattern.compile("[+-]?[1-9]\\d{0,2},\\d{3}");
    private static final Pattern THOUSANDS = Pattern.compile(
            "[+-]?\\d{1,3}(?:(?:,\\d{3}){2,}(?:\\.\\d*)?|(?:,\\d{3})+\\.\\d*|(?:\\.\\d{3}){2,}(?:,\\d*)?"
                    + "|(?:\\.\\d{3})+,\\d*|(?:[ \u00a0\u202f'’]\\d{3})+(?:[.,]\\d*)?)");

    private CsvNumbers() {
    }

    /** @return whether the cell is a number written with a decimal point */
    static boolean hasDecimalPoint(String cell) {
        return POINT.matcher(cell).matches();
    }

    /**
     * @return whether the cell is a number with a decimal comma that cannot be a thousands group ({@code 1,5},
     *     {@code 0,0025}, {@code 1234,5}), which proves a decimal comma in a file separated by {@code ;} or tab
     */
    static boolean provesComma(String cell) {
        return COMMA.matcher(cell).matches() && !AMBIGUOUS.matcher(cell).matches();
    }

    /**
     * @param cell the trimmed cell
     * @param mark the file's decimal mark
     * @param commaSeparated whether cells are separated by commas and no decimal mark was stated
     * @param proof a note naming a cell that proves the decimal point, e.g. {@code  (e.g. "1.5" on line 4)}
     * @return the value
     * @throws IllegalArgumentException with the reason (no location) when the cell is not a number by the rule
     */
    static double parse(String cell, CsvOptions.DecimalMark mark, boolean commaSeparated, String proof) {
        if (cell.isEmpty()) {
            throw new IllegalArgumentException(CsvMessages.emptyCell());
        }
        String number;
        if (INTEGER.matcher(cell).matches()) {
            number = cell;
        } else if (mark == CsvOptions.DecimalMark.POINT) {
            if (POINT.matcher(cell).matches()) {
                number = cell;
            } else if (AMBIGUOUS.matcher(cell).matches()) {
                throw new IllegalArgumentException(CsvMessages.ambiguous(cell));
            } else if (COMMA.matcher(cell).matches()) {
                throw new IllegalArgumentException(commaSeparated || proof.isEmpty()
                        ? CsvMessages.commaNotStated(cell) : CsvMessages.commaInPointFile(cell, proof));
            } else if (THOUSANDS.matcher(cell).matches()) {
                throw new IllegalArgumentException(CsvMessages.thousands(cell));
            } else {
                throw new IllegalArgumentException(CsvMessages.notANumber(cell));
            }
        } else {
            if (COMMA.matcher(cell).matches()) {
                number = cell.replace(',', '.');
            } else if (POINT.matcher(cell).matches()) {
                throw new IllegalArgumentException(CsvMessages.pointInCommaFile(cell));
            } else if (THOUSANDS.matcher(cell).matches()) {
                throw new IllegalArgumentException(CsvMessages.thousands(cell));
            } else {
                throw new IllegalArgumentException(CsvMessages.notANumber(cell));
            }
        }
        return checked(cell, number);
    }

    private static double checked(String cell, String number) {
        int e = Math.max(number.indexOf('e'), number.indexOf('E'));
        String mantissa = e < 0 ? number : number.substring(0, e);
        int digits = 0;
        boolean nonZero = false;
        boolean leading = true;
        for (int i = 0; i < mantissa.length(); i++) {
            char c = mantissa.charAt(i);
            if (c >= '0' && c <= '9') {
                if (c != '0') {
                    nonZero = true;
                    leading = false;
                }
                if (!leading) {
                    digits++;
                }
            }
        }
        if (digits > MAX_DIGITS || mantissa.length() > 2 * MAX_DIGITS) {
            throw new IllegalArgumentException(CsvMessages.tooManyDigits(cell, MAX_DIGITS));
        }
        if (e >= 0) {
            String exp = number.substring(e + 1).replaceFirst("^[+-]", "").replaceFirst("^0+(?=\\d)", "");
            if (exp.length() > MAX_EXPONENT_DIGITS) {
                throw new IllegalArgumentException(CsvMessages.exponentTooLong(cell));
            }
        }
        double v = Double.parseDouble(number);
        if (Double.isInfinite(v)) {
            throw new IllegalArgumentException(CsvMessages.overflow(cell));
        }
        if (v == 0.0 && nonZero) {
            throw new IllegalArgumentException(CsvMessages.underflow(cell));
        }
        return v;
    }
}
