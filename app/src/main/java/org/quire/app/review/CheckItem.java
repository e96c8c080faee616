package org.quire.app.review;

import java.util.List;
import java.util.Objects;

/**
 * One item of the assessor's checklist with its automatic outcome.
 *
 * @param id a short stable identifier, e.g. {@code sources}
 * @param title what the item asks, one sentence
 * @param reference the clause the item rests on, e.g. "JCGM 100:2008 7.2.6"
 * @param outcome the automatic outcome
 * @param details one line per finding or per figure looked at
 * @param inputs the names of the inputs the details concern (for attaching comments), possibly empty
 */
public record CheckItem(String id, String title, String reference, Outcome outcome, List<String> details,
        List<String> inputs) {
    public CheckItem {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(reference, "reference");
        Objects.requireNonNull(outcome, "outcome");
        details = List.copyOf(details);
        inputs = List.copyOf(inputs);
    }
}
