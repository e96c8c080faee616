package org.quire.engine.csv;

import java.util.Objects;

/**
 * How to read a CSV text: the separator and the decimal mark (each stated or detected), whether the first row
 * is a header, and the largest text accepted. Immutable and thread-safe; change with the {@code with...}
 * methods.
 */
public final class CsvOptions {
    /** The largest CSV file read by default, in bytes (64 MiB). */
    public static final long DEFAULT_MAX_BYTES = 64L * 1024 * 1024;

    /** The cell separator. */
    public enum Separator {
        COMMA(','), SEMICOLON(';'), TAB('\t');

        private final char character;

        Separator(char c) {
            this.character = c;
        }

        /** @return the separating character */
        public char character() {
            return character;
        }

        /** @return the character as a user reads it: {@code ','}, {@code ';'} or {@code tab} */
        public String label() {
            return this == TAB ? "tab" : "'" + character + "'";
        }
    }

    /** The decimal mark of numbers. */
    public enum DecimalMark {
        POINT('.'), COMMA(',');

        private final char character;

        DecimalMark(char c) {
            this.character = c;
        }

        /** @return the mark */
        public char character() {
            return character;
        }
    }

    private static final CsvOptions DEFAULTS = new CsvOptions(null, null, true, DEFAULT_MAX_BYTES);

    private final Separator separator;
    private final DecimalMark decimalMark;
    private final boolean header;
    private final long maxBytes;

    private CsvOptions(Separator separator, DecimalMark decimalMark, boolean header, long maxBytes) {
        this.separator = separator;
        this.decimalMark = decimalMark;
        this.header = header;
        this.maxBytes = maxBytes;
    }

    /**
     * @return separator detected from {@code ,} {@code ;} tab; a header row expected; decimal mark detected (a
     *     decimal comma only when the file proves it); at most {@link #DEFAULT_MAX_BYTES}
     */
    public static CsvOptions defaults() {
        return DEFAULTS;
    }

    /** @return these options with the separator stated (not detected) */
    public CsvOptions withSeparator(Separator s) {
        return new CsvOptions(Objects.requireNonNull(s, "separator"), decimalMark, header, maxBytes);
    }

    /** @return these options with the decimal mark stated (not detected) */
    public CsvOptions withDecimalMark(DecimalMark m) {
        return new CsvOptions(separator, Objects.requireNonNull(m, "decimalMark"), header, maxBytes);
    }

    /** @return these options with or without a header row */
    public CsvOptions withHeader(boolean on) {
        return new CsvOptions(separator, decimalMark, on, maxBytes);
    }

    /**
     * @param bytes the largest file (and the most characters of a text) accepted, positive
     * @return these options with that limit
     */
    public CsvOptions withMaxBytes(long bytes) {
        if (bytes <= 0) {
            throw new IllegalArgumentException("maxBytes must be positive, not " + bytes);
        }
        return new CsvOptions(separator, decimalMark, header, bytes);
    }

    /** @return the stated separator, or {@code null} when it is detected */
    public Separator separator() {
        return separator;
    }

    /** @return the stated decimal mark, or {@code null} when it is detected */
    public DecimalMark decimalMark() {
        return decimalMark;
    }

    /** @return whether the first row is a header */
    public boolean header() {
        return header;
    }

    /** @return the largest file accepted, in bytes */
    public long maxBytes() {
        return maxBytes;
    }

    @Override
    public String toString() {
        return "CsvOptions[separator=" + (separator == null ? "detected" : separator) + ", decimalMark="
                + (decimalMark == null ? "detected" : decimalMark) + ", header=" + header + ", maxBytes=" + maxBytes
                + "]";
    }
}
