package org.quire.engine.reference;

import java.time.LocalDate;
import java.util.Objects;

/**
 * One reference standard of the laboratory with the calibration that makes its values traceable.
 *
 * <p>References: ISO/IEC 17025:2017 6.4.13 b) to e) (identity of equipment, calibration dates and results, the
 * due date of the next calibration).
 *
 * <p>Immutable and thread-safe.
 */
public final class ReferenceStandard {
    private final String id;
    private final String kind;
    private final String description;
    private final String certificateNumber;
    private final String issuedBy;
    private final LocalDate calibrated;
    private final LocalDate due;

    private ReferenceStandard(String id, String kind, String description, String certificateNumber, String issuedBy,
            LocalDate calibrated, LocalDate due) {
        this.id = id;
        this.kind = kind;
        this.description = description;
        this.certificateNumber = certificateNumber;
        this.issuedBy = issuedBy;
        this.calibrated = calibrated;
        this.due = due;
    }

    /**
     * @param id the laboratory's identifier of the standard, e.g. {@code TV-BAL-02}
     * @param kind what it is, e.g. "balance", "weights", "thermometer", "master meter"
     * @param description type, range and serial number in words
     * @param certificateNumber the number of the calibration certificate in force
     * @param issuedBy the laboratory that issued that certificate
     * @param calibrated the date of that calibration
     * @param due the date the next calibration falls due; the standard may be used up to and including this date
     * @return the standard
     * @throws IllegalArgumentException naming the argument when a text is blank or the due date is not after the
     *     calibration date
     */
    public static ReferenceStandard of(String id, String kind, String description, String certificateNumber,
            String issuedBy, LocalDate calibrated, LocalDate due) {
        require("id", id);
        require("kind", kind);
        require("description", description);
        require("certificateNumber", certificateNumber);
        require("issuedBy", issuedBy);
        Objects.requireNonNull(calibrated, "calibrated");
        Objects.requireNonNull(due, "due");
        if (!due.isAfter(calibrated)) {
            throw new IllegalArgumentException("reference '" + id + "': due date " + due
                    + " must be after its calibration date " + calibrated);
        }
        return new ReferenceStandard(id.strip(), kind.strip(), description.strip(), certificateNumber.strip(),
                issuedBy.strip(), calibrated, due);
    }

    private static void require(String name, String value) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(name + " of a reference standard must not be blank, not '" + value + "'");
        }
    }

    /** @return the laboratory's identifier */
    public String id() {
        return id;
    }

    /** @return what it is (balance, weights, thermometer, master meter ...) */
    public String kind() {
        return kind;
    }

    /** @return type, range and serial number in words */
    public String description() {
        return description;
    }

    /** @return the number of its calibration certificate */
    public String certificateNumber() {
        return certificateNumber;
    }

    /** @return the laboratory that issued the certificate */
    public String issuedBy() {
        return issuedBy;
    }

    /** @return the date of its calibration */
    public LocalDate calibrated() {
        return calibrated;
    }

    /** @return the last day on which it may be used before it is calibrated again */
    public LocalDate due() {
        return due;
    }

    /** @return whether its calibration is valid on {@code date}: calibrated on or before it, due on or after it */
    public boolean validOn(LocalDate date) {
        return !date.isBefore(calibrated) && !date.isAfter(due);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ReferenceStandard r && r.id.equals(id) && r.kind.equals(kind)
                && r.description.equals(description) && r.certificateNumber.equals(certificateNumber)
                && r.issuedBy.equals(issuedBy) && r.calibrated.equals(calibrated) && r.due.equals(due);
    }

    @Override
    public int hashCode() {
        return Objects.hash(id, certificateNumber, calibrated, due);
    }

    @Override
    public String toString() {
        return id + " (" + kind + ", certificate " + certificateNumber + ", due " + due + ")";
    }
}
