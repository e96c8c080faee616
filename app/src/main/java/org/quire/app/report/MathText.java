package org.quire.app.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * A short piece of typeset mathematics: runs of text, each upright or italic, on the baseline, lowered as a
 * subscript or raised as a superscript. The HTML and PDF renderers draw the runs; {@link #plain()} gives a
 * one-line text form for command-line output and CSV.
 *
 * <p>Immutable and thread-safe.
 */
public final class MathText {

    /** Where a run stands relative to the baseline. */
    public enum Shift { BASE, SUB, SUP }

    /**
     * One run of text in one style.
     *
     * @param text the characters
     * @param italic whether the run is set in italic (variables) rather than upright (numbers, operators)
     * @param shift baseline, subscript or superscript
     */
    public record Run(String text, boolean italic, Shift shift) {
        public Run {
            Objects.requireNonNull(text, "text");
            Objects.requireNonNull(shift, "shift");
        }
    }

    private final List<Run> runs;

    private MathText(List<Run> runs) {
        this.runs = runs;
    }

    /** @return text made of the given runs, neighbouring runs of the same style merged */
    public static MathText of(List<Run> runs) {
        List<Run> merged = new ArrayList<>();
        for (Run r : runs) {
            if (r.text().isEmpty()) {
                continue;
            }
            if (!merged.isEmpty()) {
                Run last = merged.get(merged.size() - 1);
                if (last.italic() == r.italic() && last.shift() == r.shift()) {
                    merged.set(merged.size() - 1, new Run(last.text() + r.text(), r.italic(), r.shift()));
                    continue;
                }
            }
            merged.add(r);
        }
        return new MathText(List.copyOf(merged));
    }

    /** @return upright text on the baseline */
    public static MathText upright(String text) {
        return of(List.of(new Run(text, false, Shift.BASE)));
    }

    /** @return the runs in reading order */
    public List<Run> runs() {
        return runs;
    }

    /**
     * @return the text on one line: subscripts after {@code _}, superscripts after {@code ^}, grouped in braces
     *     when longer than one character
     */
    public String plain() {
        StringBuilder s = new StringBuilder();
        int i = 0;
        while (i < runs.size()) {
            Run r = runs.get(i);
            if (r.shift() == Shift.BASE) {
                s.append(r.text());
                i++;
                continue;
            }
            StringBuilder group = new StringBuilder();
            int j = i;
            while (j < runs.size() && runs.get(j).shift() == r.shift()) {
                group.append(runs.get(j).text());
                j++;
            }
            String g = group.toString();
            s.append(r.shift() == Shift.SUB ? '_' : '^');
            s.append(g.codePointCount(0, g.length()) == 1 ? g : "{" + g + "}");
            i = j;
        }
        return s.toString();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof MathText && ((MathText) o).runs.equals(runs);
    }

    @Override
    public int hashCode() {
        return runs.hashCode();
    }

    @Override
    public String toString() {
        return plain();
    }
}
