package org.quire.engine.reference;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * The register of a laboratory's reference standards, and the check of the references a calibration uses on its
 * date. A calibration may use a reference only while that reference's own calibration is valid: from its
 * calibration date up to and including its due date (ISO/IEC 17025:2017 6.4.13 and 6.5; common practice that the
 * due date is the last day of use).
 *
 * <p>Immutable and thread-safe.
 */
public final class ReferenceRegister {
    private final String laboratory;
    private final Map<String, ReferenceStandard> references;

    private ReferenceRegister(String laboratory, Map<String, ReferenceStandard> references) {
        this.laboratory = laboratory;
        this.references = references;
    }

    /**
     * @param laboratory the laboratory whose register this is
     * @param references its reference standards; ids must be unique
     * @return the register
     * @throws IllegalArgumentException naming the id when two references share one
     */
    public static ReferenceRegister of(String laboratory, List<ReferenceStandard> references) {
        if (laboratory == null || laboratory.isBlank()) {
            throw new IllegalArgumentException("laboratory of a reference register must not be blank, not '"
                    + laboratory + "'");
        }
        Map<String, ReferenceStandard> m = new LinkedHashMap<>();
        for (ReferenceStandard r : references) {
            Objects.requireNonNull(r, "reference");
            if (m.put(r.id(), r) != null) {
                throw new IllegalArgumentException("reference id '" + r.id() + "' appears twice in the register");
            }
        }
        return new ReferenceRegister(laboratory.strip(), Collections.unmodifiableMap(m));
    }

    /** @return the laboratory */
    public String laboratory() {
        return laboratory;
    }

    /** @return the references in register order */
    public List<ReferenceStandard> references() {
        return List.copyOf(references.values());
    }

    /** @return the reference of this id, or null */
    public ReferenceStandard find(String id) {
        return references.get(id);
    }

    /**
     * Checks the references a calibration uses against the register on the calibration date.
     *
     * @param ids the ids of the references used
     * @param date the date of the calibration
     * @return one finding per reference that is unknown, expired or not yet calibrated on {@code date}; empty when
     *     every reference was valid
     */
    public List<TraceabilityFinding> check(List<String> ids, LocalDate date) {
        Objects.requireNonNull(date, "date");
        List<TraceabilityFinding> out = new ArrayList<>();
        for (String id : ids) {
            ReferenceStandard r = references.get(id);
            if (r == null) {
                out.add(new TraceabilityFinding(id, TraceabilityFinding.Kind.UNKNOWN, "reference '" + id
                        + "' is not in the reference register of " + laboratory + "; its traceability cannot be stated"));
            } else if (date.isAfter(r.due())) {
                out.add(new TraceabilityFinding(id, TraceabilityFinding.Kind.EXPIRED, "reference '" + id + "' ("
                        + r.description() + ", certificate " + r.certificateNumber() + ") was due for calibration on "
                        + r.due() + "; the calibration on " + date + " used it " + (date.toEpochDay() - r.due().toEpochDay())
                        + " day(s) after its due date"));
            } else if (date.isBefore(r.calibrated())) {
                out.add(new TraceabilityFinding(id, TraceabilityFinding.Kind.NOT_YET_CALIBRATED, "reference '" + id
                        + "' (certificate " + r.certificateNumber() + ") was calibrated on " + r.calibrated()
                        + ", after the calibration on " + date + " that uses it; the register holds no certificate "
                        + "valid on " + date));
            }
        }
        return List.copyOf(out);
    }

    /** @return the references of these ids that the register holds, in the order given */
    public List<ReferenceStandard> resolveKnown(List<String> ids) {
        List<ReferenceStandard> out = new ArrayList<>();
        for (String id : ids) {
            ReferenceStandard r = references.get(id);
            if (r != null) {
                out.add(r);
            }
        }
        return out;
    }

    /**
     * @param ids the ids of the references used, each in the register
     * @return the references of these ids, in the order given
     * @throws IllegalArgumentException naming the first id the register does not hold
     */
    public List<ReferenceStandard> resolve(List<String> ids) {
        List<ReferenceStandard> out = new ArrayList<>();
        for (String id : ids) {
            ReferenceStandard r = references.get(id);
            if (r == null) {
                throw new IllegalArgumentException("reference '" + id + "' is not in the reference register of "
                        + laboratory);
            }
            out.add(r);
        }
        return out;
    }
}
