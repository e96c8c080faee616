package org.quire.app.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * A short piece of typeset mathematics: runs of text, each upright or italic, on the baseline, lowered as a
 * subscript or raised as a superscript. The HTML and PDF renderers draw the runs; {@link #plain()} gives the
 * one-line text form for command-line output and CSV, which never holds markup: a quantity's name reads as
 * written in the budget ({@code E_lo}), other subscripts follow an underscore ({@code ν_eff}) and superscripts are
 * superscript characters ({@code u_c²}).
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
    private final String plain;

    private MathText(List<Run> runs, String plain) {
        this.runs = runs;
        this.plain = plain == null ? plainOf(runs) : plain;
    }

    /**
     * @param runs the typeset form
     * @param plain the one-line form, e.g. a quantity's name as written in the budget
     * @return text with both forms
     */
    public static MathText of(List<Run> runs, String plain) {
        return new MathText(merge(runs), java.util.Objects.requireNonNull(plain, "plain"));
    }

    /** @return the pieces one after the other, the plain forms joined likewise */
    public static MathText concat(MathText... parts) {
        List<Run> r = new ArrayList<>();
        StringBuilder p = new StringBuilder();
        for (MathText m : parts) {
            r.addAll(m.runs);
            p.append(m.plain);
        }
        return new MathText(merge(r), p.toString());
    }

    /** @return this text followed by {@code more} upright */
    public MathText then(String more) {
        return concat(this, upright(more));
    }

    /** @return text made of the given runs, neighbouring runs of the same style merged */
    public static MathText of(List<Run> runs) {
        return new MathText(merge(runs), null);
    }

    private static List<Run> merge(List<Run> runs) {
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
        return List.copyOf(merged);
    }

    /** @return upright text on the baseline */
    public static MathText upright(String text) {
        return of(List.of(new Run(text, false, Shift.BASE)));
    }

    /** @return the runs in reading order */
    public List<Run> runs() {
        return runs;
    }

    /** @return the text on one line, without markup (see the class description) */
    public String plain() {
        return plain;
    }

    private static final String SUPER_FROM = "0123456789-+";
    private static final String SUPER_TO = "⁰¹²³⁴⁵⁶⁷⁸⁹⁻⁺";

    private static String plainOf(List<Run> runs) {
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
            if (r.shift() == Shift.SUB) {
                s.append('_').append(g);
            } else {
                String t = g.replace('−', '-');
                if (t.chars().allMatch(c -> SUPER_FROM.indexOf(c) >= 0)) {
                    for (char c : t.toCharArray()) {
                        s.append(SUPER_TO.charAt(SUPER_FROM.indexOf(c)));
                    }
                } else {
                    s.append('^').append(g.codePointCount(0, g.length()) == 1 ? g : "(" + g + ")");
                }
            }
            i = j;
        }
        return s.toString();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof MathText && ((MathText) o).runs.equals(runs) && ((MathText) o).plain.equals(plain);
    }

    @Override
    public int hashCode() {
        return runs.hashCode() * 31 + plain.hashCode();
    }

    @Override
    public String toString() {
        return plain();
    }
}
