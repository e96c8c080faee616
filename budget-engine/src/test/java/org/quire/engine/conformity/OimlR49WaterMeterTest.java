package org.quire.engine.conformity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * OIML R 49-1:2013 / ISO 4064-1:2014 water-meter envelopes built from Q3 and R: Q1 = Q3/R, Q2 = 1.6 Q1,
 * Q4 = 1.25 Q3; class 1: ±1 % (upper zone, 0.1 °C to 30 °C), ±2 % (above 30 °C), ±3 % (lower zone); class 2:
 * ±2 %, ±3 %, ±5 %. Values read in a secondary copy (project check values).
 */
class OimlR49WaterMeterTest {

    // Tarrow Vale test meter: Q3 = 2.5 m3/h, R = 160, temperature class T50
    private static final double Q3 = 2.5;
    private static final double Q1 = 2.5 / 160;           // 0.015625 m3/h
    private static final double Q2 = 1.6 * Q1;            // 0.025 m3/h, OIML R 49-1 Q2/Q1 = 1.6
    private static final double Q4 = 1.25 * Q3;           // 3.125 m3/h, OIML R 49-1 Q4/Q3 = 1.25
    private static final MpeEnvelope CLASS_1 =
            MpeEnvelopes.waterMeter(WaterMeterClass.CLASS_1, Q3, 160, 50, "m3/h");
    private static final MpeEnvelope CLASS_2 =
            MpeEnvelopes.waterMeter(WaterMeterClass.CLASS_2, Q3, 160, 50, "m3/h");

    private static String message(Runnable r) {
        return assertThrows(IllegalArgumentException.class, r::run).getMessage();
    }

    @Test
    void zoneFlowsFollowFromQ3AndR() {
        assertEquals(Q1, CLASS_1.flowMin(), 0.0);
        assertEquals(Q2, CLASS_1.zones().get(0).flowTo(), 0.0);
        assertEquals(Q2, CLASS_1.zones().get(1).flowFrom(), 0.0);
        assertEquals(Q4, CLASS_1.flowMax(), 0.0);
        assertEquals(0.025, Q2, 1e-15);
        assertEquals(3.125, Q4, 1e-15);
    }

    @Test
    void classOneLimitsAtQ1Q2Q3Q4() {
        assertEquals(MpeLimits.symmetric(3), CLASS_1.limitsAt(Q1, 20));           // Q1 in the lower zone
        assertEquals(MpeLimits.symmetric(3), CLASS_1.limitsAt(Math.nextDown(Q2), 20)); // just below Q2
        assertEquals(MpeLimits.symmetric(1), CLASS_1.limitsAt(Q2, 20));           // Q2 opens the upper zone
        assertEquals(MpeLimits.symmetric(1), CLASS_1.limitsAt(Q3, 20));
        assertEquals(MpeLimits.symmetric(1), CLASS_1.limitsAt(Q4, 20));           // Q4 included
        assertEquals("upper zone", CLASS_1.zoneAt(Q4).name());
        assertTrue(message(() -> CLASS_1.limitsAt(Math.nextUp(Q4), 20)).contains("outside the envelope"));
        assertTrue(message(() -> CLASS_1.limitsAt(Math.nextDown(Q1), 20)).contains("outside the envelope"));
    }

    @Test
    void upperZoneWidensAbove30Degrees() {
        assertEquals(MpeLimits.symmetric(1), CLASS_1.limitsAt(Q3, 30.0));                 // 30 °C: lower band
        assertEquals(MpeLimits.symmetric(2), CLASS_1.limitsAt(Q3, Math.nextUp(30.0)));    // above 30 °C
        assertEquals(MpeLimits.symmetric(2), CLASS_1.limitsAt(Q3, 50.0));
        assertEquals(MpeLimits.symmetric(1), CLASS_1.limitsAt(Q3, 0.1));
        assertEquals(MpeLimits.symmetric(3), CLASS_1.limitsAt(Q1, 45.0));  // lower zone: same at any temperature
        assertEquals("zone 'upper zone': temperature 55.0 °C lies outside its bands, which cover 0.1 to 50.0 °C",
                message(() -> CLASS_1.limitsAt(Q3, 55.0)));
        assertEquals("zone 'upper zone' has limits that depend on temperature; state the temperature of the"
                + " measurement", message(() -> CLASS_1.limitsAt(Q3)));
    }

    @Test
    void classTwoLimits() {
        assertEquals(MpeLimits.symmetric(5), CLASS_2.limitsAt(Q1, 20));
        assertEquals(MpeLimits.symmetric(2), CLASS_2.limitsAt(Q2, 20));
        assertEquals(MpeLimits.symmetric(3), CLASS_2.limitsAt(Q4, 40));
    }

    @Test
    void temperatureClassT30HasNoBandAbove30() {
        MpeEnvelope t30 = MpeEnvelopes.waterMeter(WaterMeterClass.CLASS_2, 1.6, 100, 30, "m3/h");
        assertEquals(1, t30.zones().get(1).bands().size());
        assertTrue(message(() -> t30.limitsAt(1.6, 31)).contains("outside its bands"));
        assertEquals("water meter class 2, Q3 = 1.6 m3/h, R = 100, T30", t30.name());
    }

    @Test
    void sourceSaysWhereTheLimitsWereRead() {
        assertTrue(CLASS_1.source().startsWith("OIML R 49-1:2013 / ISO 4064-1:2014"));
        assertTrue(CLASS_1.source().contains("secondary copy"));
    }

    @Test
    void badParametersAreNamed() {
        assertTrue(message(() -> MpeEnvelopes.waterMeter(WaterMeterClass.CLASS_1, 0, 160, 50, "m3/h"))
                .startsWith("Q3 must be positive"));
        assertTrue(message(() -> MpeEnvelopes.waterMeter(WaterMeterClass.CLASS_1, 2.5, 1.5, 50, "m3/h"))
                .startsWith("R = Q3/Q1 must be"));
        assertTrue(message(() -> MpeEnvelopes.waterMeter(WaterMeterClass.CLASS_1, 2.5, 160, 25, "m3/h"))
                .startsWith("maximum admissible temperature"));
    }
}
