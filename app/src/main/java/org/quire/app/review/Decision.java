package org.quire.app.review;

import org.quire.engine.document.Verdict;
import java.time.LocalDate;
import java.util.Objects;

/**
 * The assessor's decision, signed with a name and a date.
 *
 * @param verdict endorsed or sent back
 * @param assessor the assessor's name
 * @param date the date of the decision
 * @param reason a sentence explaining the decision (required when sending back)
 */
public record Decision(Verdict verdict, String assessor, LocalDate date, String reason) {
    public Decision {
        Objects.requireNonNull(verdict, "verdict");
        if (assessor == null || assessor.isBlank()) {
            throw new IllegalArgumentException("a decision needs the assessor's name");
        }
        assessor = assessor.strip();
        Objects.requireNonNull(date, "date");
        reason = reason == null ? "" : reason.strip();
    }
}
