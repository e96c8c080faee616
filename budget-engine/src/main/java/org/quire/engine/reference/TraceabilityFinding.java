package org.quire.engine.reference;

import java.util.Objects;

/**
 * One problem with the references a calibration uses: a reference not in the register, one whose calibration
 * had expired on the calibration date, or one calibrated only after it.
 *
 * @param referenceId the reference concerned
 * @param kind what is wrong
 * @param message the sentence a user or a certificate reads, naming the reference and the dates
 *
 * <p>Immutable and thread-safe.
 */
public record TraceabilityFinding(String referenceId, Kind kind, String message) {

    /** What is wrong with a reference. */
    public enum Kind {
        /** The register has no reference of this id. */
        UNKNOWN,
        /** The reference's calibration was past its due date on the calibration date. */
        EXPIRED,
        /** The reference's calibration is dated after the calibration date. */
        NOT_YET_CALIBRATED
    }

    public TraceabilityFinding {
        Objects.requireNonNull(referenceId, "referenceId");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(message, "message");
    }
}
