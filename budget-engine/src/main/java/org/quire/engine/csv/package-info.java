/**
 * The one CSV reader of Quire: readings, calibration data, rig runs and batch tables all go through
 * {@link org.quire.engine.csv.CsvReader}, built on Apache Commons CSV (RFC 4180 quoting).
 *
 * <p>The reader detects or takes the separator ({@code ,} {@code ;} tab) and the decimal mark, checks that
 * every row has as many cells as the header, and reads numbers by one rule ({@link org.quire.engine.csv.CsvRow#number(int)}):
 * a decimal comma only when it is stated or proven by the file, never a guessed thousands separator, never a
 * value that a double cannot hold. Every error is a {@link org.quire.engine.csv.CsvException} naming the
 * source, the line, and the column by number and header name.
 */
package org.quire.engine.csv;
