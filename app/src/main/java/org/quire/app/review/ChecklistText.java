package org.quire.app.review;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/** The checklist as plain text for the command line. Stateless and thread-safe. */
public final class ChecklistText {
    private ChecklistText() {
    }

    /** @return one block per item: outcome, title, reference, then the details indented */
    public static String format(String title, String hashAlgorithm, String hash, List<CheckItem> items) {
        StringBuilder s = new StringBuilder();
        s.append("Review checklist: ").append(title.isEmpty() ? "(untitled)" : title).append('\n');
        s.append("content ").append(hashAlgorithm).append(' ').append(hash).append("\n\n");
        Map<Outcome, Integer> counts = new EnumMap<>(Outcome.class);
        for (CheckItem i : items) {
            counts.merge(i.outcome(), 1, Integer::sum);
            s.append(String.format("%-16s %s  [%s]%n", "[" + i.outcome().label() + "]", i.title(), i.reference()));
            for (String d : i.details()) {
                s.append("                   - ").append(d).append('\n');
            }
        }
        s.append('\n');
        StringBuilder sum = new StringBuilder();
        for (Outcome o : Outcome.values()) {
            if (sum.length() > 0) {
                sum.append(", ");
            }
            sum.append(counts.getOrDefault(o, 0)).append(' ').append(o.label());
        }
        s.append(sum).append('\n');
        return s.toString();
    }
}
