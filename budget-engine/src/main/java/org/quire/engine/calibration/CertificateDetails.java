package org.quire.engine.calibration;

import java.time.LocalDate;
import java.util.List;

/**
 * What a certificate states besides the figures: the laboratory, the customer, the item calibrated, the date,
 * the environmental conditions, the reference standards used (by their identifiers in the laboratory's register,
 * which resolves them and checks their due dates) and the author (for separation of duties between the one who
 * calibrates and the one who approves; ISO/IEC 17025:2017 7.8.2 lists these items of a report).
 *
 * @param laboratory the laboratory
 * @param customer the customer
 * @param item the item calibrated
 * @param date the date of calibration, or null when not stated
 * @param environment the environmental conditions, in order; unmodifiable
 * @param referenceStandards identifiers of the reference standards used; unmodifiable
 * @param author who performed and entered the calibration
 */
public record CertificateDetails(Party laboratory, Party customer, Item item, LocalDate date,
        List<Condition> environment, List<String> referenceStandards, String author) {

    /**
     * A laboratory or a customer.
     *
     * @param name the name
     * @param address the postal address, lines separated by newlines
     * @param accreditation the accreditation reference (laboratory only; empty for a customer)
     */
    public record Party(String name, String address, String accreditation) {
        public Party {
            name = text(name);
            address = text(address);
            accreditation = text(accreditation);
        }

        public static Party none() {
            return new Party("", "", "");
        }
    }

    /**
     * The item calibrated.
     *
     * @param type the type, e.g. "electromagnetic flow meter"
     * @param size the size, e.g. "DN 80"
     * @param serial the serial number
     */
    public record Item(String type, String size, String serial) {
        public Item {
            type = text(type);
            size = text(size);
            serial = text(serial);
        }
    }

    /**
     * One environmental condition.
     *
     * @param quantity what, e.g. "air temperature"
     * @param value the value as stated, e.g. "21.3 ± 0.5"
     * @param unit its unit
     */
    public record Condition(String quantity, String value, String unit) {
        public Condition {
            if (quantity == null || quantity.isBlank()) {
                throw new IllegalArgumentException(CalibrationMessages.blank("quantity of an environmental condition"));
            }
            quantity = quantity.strip();
            value = text(value);
            unit = text(unit);
        }
    }

    /** Copies the lists. */
    public CertificateDetails {
        laboratory = laboratory == null ? Party.none() : laboratory;
        customer = customer == null ? Party.none() : customer;
        item = item == null ? new Item("", "", "") : item;
        environment = environment == null ? List.of() : List.copyOf(environment);
        referenceStandards = referenceStandards == null ? List.of() : List.copyOf(referenceStandards);
        for (String s : referenceStandards) {
            if (s.isBlank()) {
                throw new IllegalArgumentException(CalibrationMessages.blank("reference standard identifier"));
            }
        }
        author = text(author);
    }

    /** @return details with nothing stated */
    public static CertificateDetails none() {
        return new CertificateDetails(null, null, null, null, List.of(), List.of(), "");
    }

    private static String text(String s) {
        return s == null ? "" : s.strip();
    }
}
