package org.quire.engine.conformity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The checking factories of MPE envelopes: gaps, overlaps and bad limits are reported naming the zone. */
class MpeEnvelopeTest {

    private static String message(Runnable r) {
        return assertThrows(IllegalArgumentException.class, r::run).getMessage();
    }

    /** A Tarrow Vale Flow Laboratory house specification (invented): wider limits at low flow. */
    private static MpeEnvelope house() {
        return MpeEnvelope.of("Tarrow Vale house class A", "laboratory specification TV-S-12", "L/s",
                List.of(MpeZone.of("low flow", 1, 5, 1.0, 1.0), MpeZone.of("main range", 5, 50, 0.5, 0.3)));
    }

    @Test
    void gapBetweenZonesIsNamed() {
        assertEquals("gap between zone 'low' (ends at flow 5.0) and zone 'high' (begins at flow 6.0)",
                message(() -> MpeEnvelope.of("e", "s", "L/s",
                        List.of(MpeZone.of("low", 1, 5, 1, 1), MpeZone.of("high", 6, 50, 0.5, 0.5)))));
    }

    @Test
    void overlapOfZonesIsNamed() {
        assertEquals("zone 'high' (begins at flow 4.0) overlaps zone 'low' (ends at flow 5.0)",
                message(() -> MpeEnvelope.of("e", "s", "L/s",
                        List.of(MpeZone.of("low", 1, 5, 1, 1), MpeZone.of("high", 4, 50, 0.5, 0.5)))));
    }

    @Test
    void negativeOrZeroLimitsAreNamedWithTheirZone() {
        assertEquals("zone 'low': lower limit must not be negative, not -1.0",
                message(() -> MpeZone.of("low", 1, 5, -1, 1)));
        assertEquals("zone 'low': both limits are zero: no error would conform",
                message(() -> MpeZone.of("low", 1, 5, 0, 0)));
        assertEquals("zone 'low': upper limit must be a finite number, not NaN",
                message(() -> MpeZone.of("low", 1, 5, 1, Double.NaN)));
    }

    @Test
    void zoneFlowsAreChecked() {
        assertEquals("zone 'z': upper flow 2.0 must be greater than lower flow 3.0",
                message(() -> MpeZone.of("z", 3, 2, 1, 1)));
        assertEquals("zone 'z': lower flow must not be negative, not -1.0", message(() -> MpeZone.of("z", -1, 2, 1, 1)));
        assertEquals("zone name 'z' is used twice", message(() -> MpeEnvelope.of("e", "s", "L/s",
                List.of(MpeZone.of("z", 1, 2, 1, 1), MpeZone.of("z", 2, 3, 1, 1)))));
        assertEquals("an MPE envelope needs at least one zone", message(() -> MpeEnvelope.of("e", "s", "L/s", List.of())));
    }

    @Test
    void temperatureBandsMustJoin() {
        MpeLimits one = MpeLimits.symmetric(1);
        assertEquals("zone 'upper': gap between temperature bands: one ends at 30.0 °C, the next begins at 35.0 °C",
                message(() -> MpeZone.of("upper", 1, 2,
                        List.of(TemperatureBand.of(0.1, 30, one), TemperatureBand.of(35, 50, one)))));
        assertEquals("zone 'upper': temperature bands overlap: one ends at 30.0 °C, the next begins at 25.0 °C",
                message(() -> MpeZone.of("upper", 1, 2,
                        List.of(TemperatureBand.of(0.1, 30, one), TemperatureBand.of(25, 50, one)))));
    }

    @Test
    void asymmetricLimitsAndZoneLookup() {
        MpeEnvelope e = house();
        assertEquals(MpeLimits.symmetric(1.0), e.limitsAt(1.0));
        assertEquals(MpeLimits.symmetric(1.0), e.limitsAt(4.999));
        MpeLimits main = e.limitsAt(5.0);
        assertEquals(-0.5, main.lowerTolerance());
        assertEquals(0.3, main.upperTolerance());
        assertEquals("-0.5 % / +0.3 %", main.label());
        assertEquals("main range", e.zoneAt(50.0).name());  // the last zone includes its upper end
        assertEquals("flow 50.5 L/s lies outside the envelope, which covers 1.0 to 50.0 L/s",
                message(() -> e.zoneAt(50.5)));
        assertEquals("flow 0.5 L/s lies outside the envelope, which covers 1.0 to 50.0 L/s",
                message(() -> e.zoneAt(0.5)));
        assertFalse(e.zones().get(0).dependsOnTemperature());
        assertEquals(MpeLimits.symmetric(1.0), e.limitsAt(2.0, Double.NaN));  // no temperature needed
        assertTrue(e.source().contains("TV-S-12"));
    }
}
