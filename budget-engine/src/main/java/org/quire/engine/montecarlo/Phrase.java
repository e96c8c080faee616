package org.quire.engine.montecarlo;

import java.util.List;
import java.util.Objects;

/**
 * One piece of a sentence the engine says about a result, so that each reader can set it in its own way: words,
 * the name of a symbol as the standards write it ({@code d_low}, {@code delta}), which a report typesets (d with
 * subscript low, δ), or a number, which a report writes by its figures rule and plain text in computer notation.
 *
 * @param kind what the piece is
 * @param text the words, or the symbol's name, or the number as plain text
 * @param value the number (NaN for words and symbols)
 *
 * <p>Immutable and thread-safe.
 */
public record Phrase(Kind kind, String text, double value) {
    /** What a piece of a sentence is. */
    public enum Kind { WORDS, SYMBOL, NUMBER }

    public Phrase {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(text, "text");
    }

    static Phrase words(String w) {
        return new Phrase(Kind.WORDS, w, Double.NaN);
    }

    static Phrase symbol(String name) {
        return new Phrase(Kind.SYMBOL, name, Double.NaN);
    }

    static Phrase number(String plain, double v) {
        return new Phrase(Kind.NUMBER, plain, v);
    }

    /** @return the sentence as plain text: the pieces' texts joined */
    public static String plain(List<Phrase> phrases) {
        StringBuilder s = new StringBuilder();
        for (Phrase p : phrases) {
            s.append(p.text());
        }
        return s.toString();
    }
}
