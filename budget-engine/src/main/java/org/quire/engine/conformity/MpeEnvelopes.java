package org.quire.engine.conformity;

import java.util.ArrayList;
import java.util.List;

/**
 * Built-in maximum-permissible-error envelopes, each naming its source in {@link MpeEnvelope#source()}.
 * The limits were read in secondary copies of the Recommendations; confirm against the originals before
 * using them for legal verification. Stateless and thread-safe.
 */
public final class MpeEnvelopes {

    /** Lowest water temperature of the rated operating conditions of OIML R 49, °C. */
    public static final double WATER_TEMPERATURE_MIN = 0.1;
    /** Temperature above which the upper-zone MPE of OIML R 49 widens, °C. */
    public static final double WATER_TEMPERATURE_SPLIT = 30.0;

    private static final String R49_SOURCE = "OIML R 49-1:2013 / ISO 4064-1:2014, maximum permissible errors of"
            + " water meters (limits read in a secondary copy; confirm against the Recommendation)";
    private static final String R117_SOURCE = "OIML R 117-1, accuracy classes and maximum permissible errors of"
            + " dynamic measuring systems for liquids other than water, %s (limits read in a secondary copy;"
            + " confirm against the Recommendation)";

    private MpeEnvelopes() {
    }

    /**
     * A water meter's envelope built from its permanent flow rate Q3 and ratio R = Q3/Q1: Q1 = Q3/R,
     * Q2 = 1.6 Q1, Q4 = 1.25 Q3; lower zone Q1 &le; Q &lt; Q2, upper zone Q2 &le; Q &le; Q4 with the 30 °C split.
     *
     * <p>References: OIML R 49-1:2013 and ISO 4064-1:2014, metrological requirements (definitions of Q1 to Q4,
     * Q2/Q1 = 1.6, Q4/Q3 = 1.25) and maximum permissible errors of class 1 and class 2 meters (read in a
     * secondary copy).
     *
     * @param accuracyClass class 1 or class 2
     * @param q3 permanent flow rate, positive, in {@code flowUnit}
     * @param r the ratio Q3/Q1 (R 49 takes it from a preferred series); must exceed 1.6 so that Q2 &lt; Q3
     * @param maxTemperature maximum admissible water temperature of the meter's temperature class (30 for
     *     T30, 50 for T50, ...), at least 30 °C
     * @param flowUnit unit of Q3 and of the zone flows, e.g. "m3/h"
     * @return the envelope
     */
    public static MpeEnvelope waterMeter(WaterMeterClass accuracyClass, double q3, double r, double maxTemperature,
            String flowUnit) {
        if (accuracyClass == null) {
            throw new IllegalArgumentException(ConformityMessages.missing("water-meter accuracy class"));
        }
        if (!Double.isFinite(q3) || !(q3 > 0)) {
            throw new IllegalArgumentException(ConformityMessages.notPositive("Q3", q3));
        }
        if (!Double.isFinite(r) || !(r > 1.6)) {
            throw new IllegalArgumentException(ConformityMessages.fmt(
                    "R = Q3/Q1 must be a finite number greater than 1.6 (so that Q2 < Q3), not %s", r));
        }
        if (!Double.isFinite(maxTemperature) || maxTemperature < WATER_TEMPERATURE_SPLIT) {
            throw new IllegalArgumentException(ConformityMessages.fmt(
                    "maximum admissible temperature must be at least 30 °C (class T30), not %s", maxTemperature));
        }
        double q1 = q3 / r;
        double q2 = 1.6 * q1;
        double q4 = 1.25 * q3;
        MpeZone lower = MpeZone.of("lower zone", q1, q2, List.of(TemperatureBand.of(WATER_TEMPERATURE_MIN,
                maxTemperature, MpeLimits.symmetric(accuracyClass.lowerZone()))));
        List<TemperatureBand> upperBands = new ArrayList<>();
        upperBands.add(TemperatureBand.of(WATER_TEMPERATURE_MIN, WATER_TEMPERATURE_SPLIT,
                MpeLimits.symmetric(accuracyClass.upperZoneUpTo30())));
        if (maxTemperature > WATER_TEMPERATURE_SPLIT) {
            upperBands.add(TemperatureBand.of(WATER_TEMPERATURE_SPLIT, maxTemperature,
                    MpeLimits.symmetric(accuracyClass.upperZoneAbove30())));
        }
        MpeZone upper = MpeZone.of("upper zone", q2, q4, upperBands);
        String name = ConformityMessages.fmt("water meter class %s, Q3 = %s %s, R = %s, T%s",
                accuracyClass.label(), num(q3), flowUnit, num(r), num(maxTemperature));
        return MpeEnvelope.of(name, R49_SOURCE, flowUnit, List.of(lower, upper));
    }

    /**
     * The envelope of a complete measuring system for liquids other than water: one zone from Qmin to Qmax
     * with the system MPE of the class.
     *
     * <p>References: OIML R 117-1, maximum permissible errors, line A (read in a secondary copy).
     */
    public static MpeEnvelope liquidMeasuringSystem(LiquidAccuracyClass accuracyClass, double qMin, double qMax,
            String flowUnit) {
        return liquid(accuracyClass, qMin, qMax, flowUnit, true);
    }

    /**
     * The envelope of the meter of a measuring system for liquids other than water: one zone from Qmin to Qmax
     * with the meter MPE of the class.
     *
     * <p>References: OIML R 117-1, maximum permissible errors, line B (read in a secondary copy).
     */
    public static MpeEnvelope liquidMeter(LiquidAccuracyClass accuracyClass, double qMin, double qMax,
            String flowUnit) {
        return liquid(accuracyClass, qMin, qMax, flowUnit, false);
    }

    private static MpeEnvelope liquid(LiquidAccuracyClass c, double qMin, double qMax, String flowUnit,
            boolean system) {
        if (c == null) {
            throw new IllegalArgumentException(ConformityMessages.missing("accuracy class"));
        }
        double mpe = system ? c.systemMpe() : c.meterMpe();
        String what = system ? "measuring system" : "meter";
        MpeZone zone = MpeZone.of("Qmin to Qmax", qMin, qMax, mpe, mpe);
        String name = ConformityMessages.fmt("liquid %s class %s, Qmin = %s to Qmax = %s %s", what, c.label(),
                num(qMin), num(qMax), flowUnit);
        return MpeEnvelope.of(name, ConformityMessages.fmt(R117_SOURCE,
                system ? "line A (measuring system)" : "line B (meter)"), flowUnit, List.of(zone));
    }

    private static String num(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }
}
