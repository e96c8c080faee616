package org.quire.engine.conformity;

import java.util.Locale;

/** The error messages of the conformity package, kept in one place. */
final class ConformityMessages {
    private ConformityMessages() {
    }

    static String fmt(String pattern, Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }

    static String notFinite(String what, double v) {
        return fmt("%s must be a finite number, not %s", what, v);
    }

    static String negative(String what, double v) {
        return fmt("%s must not be negative, not %s", what, v);
    }

    static String notPositive(String what, double v) {
        return fmt("%s must be positive, not %s", what, v);
    }

    static String blank(String what) {
        return what + " must not be blank";
    }

    static String missing(String what) {
        return what + " is missing";
    }

    static String zone(String zone, String message) {
        return fmt("zone '%s': %s", zone, message);
    }

    static String bothLimitsZero() {
        return "both limits are zero: no error would conform";
    }

    static String flowOrder(double from, double to) {
        return fmt("upper flow %s must be greater than lower flow %s", to, from);
    }

    static String temperatureOrder(double from, double to) {
        return fmt("temperature band: upper temperature %s must be greater than lower temperature %s", to, from);
    }

    static String bandGap(double to, double from) {
        return fmt("gap between temperature bands: one ends at %s °C, the next begins at %s °C", to, from);
    }

    static String bandOverlap(double to, double from) {
        return fmt("temperature bands overlap: one ends at %s °C, the next begins at %s °C", to, from);
    }

    static String zoneGap(String a, double to, String b, double from) {
        return fmt("gap between zone '%s' (ends at flow %s) and zone '%s' (begins at flow %s)", a, to, b, from);
    }

    static String zoneOverlap(String a, double to, String b, double from) {
        return fmt("zone '%s' (begins at flow %s) overlaps zone '%s' (ends at flow %s)", b, from, a, to);
    }

    static String duplicateZone(String name) {
        return fmt("zone name '%s' is used twice", name);
    }

    static String noZones() {
        return "an MPE envelope needs at least one zone";
    }

    static String flowOutside(double q, String unit, double from, double to) {
        return fmt("flow %s %s lies outside the envelope, which covers %s to %s %s", q, unit, from, to, unit);
    }

    static String temperatureOutside(String zone, double t, double from, double to) {
        return fmt("zone '%s': temperature %s °C lies outside its bands, which cover %s to %s °C", zone, t, from, to);
    }

    static String temperatureNeeded(String zone) {
        return fmt("zone '%s' has limits that depend on temperature; state the temperature of the measurement",
                zone);
    }

    static String probability(String what, double p) {
        return fmt("%s must lie strictly between 0.5 and 1, not %s", what, p);
    }
}
