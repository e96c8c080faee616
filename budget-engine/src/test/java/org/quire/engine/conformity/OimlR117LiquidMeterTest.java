package org.quire.engine.conformity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * OIML R 117-1 (and MID MI-005) accuracy classes for liquids other than water: MPE of the measuring system
 * 0.3 / 0.5 / 1.0 / 1.5 / 2.5 % and of the meter 0.2 / 0.3 / 0.6 / 1.0 / 1.5 %. Values read in a secondary copy
 * (project check values).
 */
class OimlR117LiquidMeterTest {

    @Test
    void systemAndMeterLimitsOfEveryClass() {
        double[] system = {0.3, 0.5, 1.0, 1.5, 2.5};   // OIML R 117-1 line A, secondary copy
        double[] meter = {0.2, 0.3, 0.6, 1.0, 1.5};    // OIML R 117-1 line B, secondary copy
        LiquidAccuracyClass[] classes = LiquidAccuracyClass.values();
        assertEquals(5, classes.length);
        for (int i = 0; i < classes.length; i++) {
            MpeEnvelope s = MpeEnvelopes.liquidMeasuringSystem(classes[i], 10, 100, "m3/h");
            MpeEnvelope m = MpeEnvelopes.liquidMeter(classes[i], 10, 100, "m3/h");
            assertEquals(MpeLimits.symmetric(system[i]), s.limitsAt(10));
            assertEquals(MpeLimits.symmetric(system[i]), s.limitsAt(100));
            assertEquals(MpeLimits.symmetric(meter[i]), m.limitsAt(55));
            assertTrue(s.source().startsWith("OIML R 117-1"));
            assertTrue(s.source().contains("secondary copy"));
        }
    }

    @Test
    void classesParseFromTheirLabels() {
        assertEquals(LiquidAccuracyClass.CLASS_1_0, LiquidAccuracyClass.parse("1"));
        assertEquals(LiquidAccuracyClass.CLASS_0_3, LiquidAccuracyClass.parse(" 0.3 "));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> LiquidAccuracyClass.parse("0.2"))
                .getMessage().contains("expected 0.3, 0.5, 1.0, 1.5 or 2.5"));
    }

    @Test
    void flowRangeIsChecked() {
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> MpeEnvelopes.liquidMeter(LiquidAccuracyClass.CLASS_0_5, 100, 10, "m3/h"))
                .getMessage().contains("upper flow 10.0 must be greater than lower flow 100.0"));
        assertEquals("liquid meter class 0.5, Qmin = 10 to Qmax = 100 m3/h",
                MpeEnvelopes.liquidMeter(LiquidAccuracyClass.CLASS_0_5, 10, 100, "m3/h").name());
    }
}
