package org.quire.engine.conformity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * ISO/IEC 17025:2017 7.8.6: a statement of conformity names the decision rule; the assessment of a set of
 * measured errors against an envelope gives per-point and overall decisions and the certificate sentence.
 * Demo meter: Tarrow Vale Flow Laboratory, water meter TV-WM-31, class 2, Q3 = 2.5 m3/h, R = 160, T50.
 */
class Iso17025ConformityStatementTest {

    private static final MpeEnvelope ENVELOPE =
            MpeEnvelopes.waterMeter(WaterMeterClass.CLASS_2, 2.5, 160, 50, "m3/h");

    private static List<MeasuredError> points() {
        return List.of(
                MeasuredError.of(2.5 / 160, 3.1, 0.4, 2.0).withTemperature(20),  // Q1, lower zone ±5 %
                MeasuredError.of(0.025, 1.2, 0.15, 2.0).withTemperature(20),      // Q2, upper zone ±2 %
                MeasuredError.of(2.5, -0.4, 0.1, 2.0).withTemperature(20),        // Q3
                MeasuredError.of(3.125, 2.6, 0.12, 2.1).withTemperature(40));     // Q4 at 40 °C, ±3 %
    }

    @Test
    void everyPointConformsUnderGuardedAcceptance() {
        ConformityAssessment a = ConformityAssessment.of(ENVELOPE, DecisionRule.guardedAcceptance(), points());
        assertEquals(Decision.CONFORMS, a.overall());
        List<PointDecision> d = a.decisions();
        assertEquals("lower zone", d.get(0).zone());
        assertEquals(5.0, d.get(0).upperTolerance());
        assertEquals("upper zone", d.get(1).zone());
        assertEquals(2.0, d.get(1).upperTolerance());
        assertEquals(3.0, d.get(3).upperTolerance());
        assertEquals(3.0 - 2.1 * 0.12, d.get(3).acceptanceUpper(), 1e-12);
        // the statement uses the smallest coverage factor (largest risk) and names the envelope
        String s = a.statement();
        assertTrue(s.contains("k = 2.") || s.contains("k = 2 "), s);
        assertTrue(s.endsWith("Maximum permissible errors: water meter class 2, Q3 = 2.5 m3/h, R = 160, T50."), s);
    }

    @Test
    void aPointInTheGuardBandFailsTheSetUnderGuardedAcceptanceOnly() {
        List<MeasuredError> pts = new java.util.ArrayList<>(points());
        pts.set(1, MeasuredError.of(0.025, 1.8, 0.15, 2.0).withTemperature(20));  // within ±2 %, in guard band
        assertEquals(Decision.DOES_NOT_CONFORM,
                ConformityAssessment.of(ENVELOPE, DecisionRule.guardedAcceptance(), pts).overall());
        assertEquals(Decision.CONFORMS,
                ConformityAssessment.of(ENVELOPE, DecisionRule.simpleAcceptance(), pts).overall());
        assertEquals(Decision.UNDECIDED,
                ConformityAssessment.of(ENVELOPE, DecisionRule.guardedNonBinary(1), pts).overall());
    }

    @Test
    void pointsOutsideTheEnvelopeOrWithoutTemperatureAreNamed() {
        List<MeasuredError> outside = List.of(MeasuredError.of(4.0, 0.1, 0.1, 2.0).withTemperature(20));
        String m = assertThrows(IllegalArgumentException.class,
                () -> ConformityAssessment.of(ENVELOPE, DecisionRule.simpleAcceptance(), outside)).getMessage();
        assertTrue(m.startsWith("point 1: flow 4.0 m3/h lies outside the envelope"), m);
        List<MeasuredError> noTemp = List.of(points().get(0), MeasuredError.of(2.5, 0.1, 0.1, 2.0));
        String t = assertThrows(IllegalArgumentException.class,
                () -> ConformityAssessment.of(ENVELOPE, DecisionRule.simpleAcceptance(), noTemp)).getMessage();
        assertTrue(t.startsWith("point 2: zone 'upper zone' has limits that depend on temperature"), t);
    }
}
