package org.quire.engine.flow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.quire.engine.model.ModelFunction;
import org.quire.engine.units.Unit;
import org.quire.engine.units.Units;

/**
 * Electromagnetic-meter and pulse relations: Faraday's law e = B D v (SI Brochure 2019 Table 4, 1 T = 1 V s/m^2),
 * continuity q = (pi D^2 / 4) v, and the unit bookkeeping of their declared units.
 */
class MeterRelationsTest {

    private static final ModelFunction VOLTAGE = FlowFunctions.named("induced_voltage").orElseThrow();
    private static final ModelFunction FLOW = FlowFunctions.named("pipe_flow").orElseThrow();
    private static final ModelFunction VELOCITY = FlowFunctions.named("velocity_from_flow").orElseThrow();
    private static final ModelFunction PULSES = FlowFunctions.named("pulse_volume").orElseThrow();

    @Test
    void oneTeslaOneMetreOneMetrePerSecondGivesOneVolt() {
        // SI Brochure (2019) Table 4: T = Wb/m^2 = V s/m^2, so T x m x m/s = V
        assertEquals(1.0, VOLTAGE.value(new double[] {1.0, 1.0, 1.0, 1.0}), 0.0);
        assertEquals(3.0e-4, VOLTAGE.value(new double[] {1.0, 3.0e-3, 0.1, 1.0}), 1e-18);
    }

    @Test
    void electrodeSignalPerFootPerSecondIsOfTradeOrder() {
        // common practice: about 100 µV per ft/s; 0.3048 m/s in a 100 mm bore with B = 3.3 mT gives ~100 µV
        double v = Units.parse("ft/s").convert(1.0, Units.parse("m/s"));
        double e = VOLTAGE.value(new double[] {1.0, 3.3e-3, 0.1, v});
        assertEquals(100.0, Units.parse("V").convert(e, Units.parse("µV")), 1.0);
    }

    @Test
    void pipeFlowFromGeometry() {
        // DN 100 bore at 1 m/s: pi (0.1 m)^2 / 4 x 1 m/s = 7.853982e-3 m^3/s = 28.27433 m^3/h
        double q = FLOW.value(new double[] {0.1, 1.0});
        assertEquals(7.853982e-3, q, 0.5e-9);
        assertEquals(28.27433, Units.parse("m^3/s").convert(q, Units.parse("m^3/h")), 0.5e-5);
    }

    @Test
    void oneLitrePerSecondIsThreePointSixCubicMetresPerHour() {
        // check values: 1 L/s = 3.6 m^3/h; velocity for 1 L/s in a 50 mm bore, then back
        double q = Units.parse("L/s").convert(1.0, Units.parse("m^3/s"));
        double v = VELOCITY.value(new double[] {q, 0.05});
        assertEquals(4e-3 / (Math.PI * 0.0025), v, 1e-15);
        double back = FLOW.value(new double[] {0.05, v});
        assertEquals(3.6, Units.parse("m^3/s").convert(back, Units.parse("m^3/h")), 1e-14);
    }

    @Test
    void pulseVolumeIsPulsesOverKFactor() {
        // 12500 pulses at 250 pulses per litre = 50 L (invented Tarrow Vale turbine meter)
        assertEquals(50.0, PULSES.value(new double[] {12500.0, 250.0}), 0.0);
    }

    @Test
    void declaredUnitsAreDimensionallyConsistent() {
        // the result unit equals the formula applied to the argument units
        List<Unit> ev = units(VOLTAGE);
        assertTrue(ev.get(0).multiply(ev.get(1)).multiply(ev.get(2)).multiply(ev.get(3))
                .isEquivalentTo(Units.parse(VOLTAGE.resultUnit())));
        List<Unit> fl = units(FLOW);
        assertTrue(fl.get(0).pow(2).multiply(fl.get(1)).isEquivalentTo(Units.parse(FLOW.resultUnit())));
        List<Unit> ve = units(VELOCITY);
        assertTrue(ve.get(0).divide(ve.get(1).pow(2)).isEquivalentTo(Units.parse(VELOCITY.resultUnit())));
        List<Unit> pu = units(PULSES);
        assertTrue(pu.get(0).divide(pu.get(1)).isEquivalentTo(Units.parse(PULSES.resultUnit())));
    }

    private static List<Unit> units(ModelFunction f) {
        return f.argumentUnits().stream().map(Units::parse).toList();
    }

    @Test
    void domainSentences() {
        assertNull(VOLTAGE.domainProblem(new double[] {1.0, 1e-3, 0.1, -2.0}));
        assertEquals("electrode spacing d = 0 m must be positive",
                VOLTAGE.domainProblem(new double[] {1.0, 1e-3, 0.0, 1.0}));
        assertEquals("bore diameter d = -0.1 m must be positive", FLOW.domainProblem(new double[] {-0.1, 1.0}));
        assertEquals("bore diameter d = 0 m must be positive", VELOCITY.domainProblem(new double[] {1e-3, 0.0}));
        assertEquals("pulse count pulses = -3 must not be negative",
                PULSES.domainProblem(new double[] {-3.0, 250.0}));
        assertEquals("K-factor k_factor = 0 1/L must be positive", PULSES.domainProblem(new double[] {3.0, 0.0}));
    }
}
