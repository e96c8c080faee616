package org.quire.engine.flow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;
import org.quire.engine.model.ModelFunction;

/**
 * Air buoyancy and conventional mass: OIML D 28:2004 (definition of conventional mass, from memory) and the
 * mass-calibration model of JCGM 101:2008 9.3 (memory + recomputed in the project's check values).
 */
class OimlBuoyancyTest {

    private static final ModelFunction BUOYANCY = new BuoyancyFactor();
    private static final ModelFunction CONVENTIONAL = new ConventionalMass();

    @Test
    void steelWeightHasConventionalMassEqualToMass() {
        // OIML D 28: a body of density 8000 kg/m^3 has conventional mass equal to its mass
        assertEquals(1.0, CONVENTIONAL.value(new double[] {1.0, 8000.0}), 1e-16);
    }

    @Test
    void conventionalMassOfWaterFollowsDefinition() {
        // OIML D 28: m_c = m (1 - 1.2/rho) / (1 - 1.2/8000); 1 kg of water at 998.2067 kg/m^3 (Tanaka, 20 °C)
        double expected = (1 - 1.2 / 998.2067) / (1 - 1.2 / 8000);
        assertEquals(expected, CONVENTIONAL.value(new double[] {1.0, 998.2067}), 1e-15);
        // common practice: water weighs about 0.1 % less in air than its mass
        assertEquals(0.99895, expected, 0.00001);
    }

    @Test
    void twoArgumentFactorIsTheFamiliarBuoyancyCorrection() {
        // OIML R 111-1 / ISO 4787: (1 - rho_a/8000) / (1 - rho_a/rho_w)
        double expected = (1 - 1.199314 / 8000) / (1 - 1.199314 / 998.2067);
        assertEquals(expected, BUOYANCY.value(new double[] {1.199314, 998.2067}), 1e-15);
        assertEquals(1.00105, expected, 0.00001); // about +0.105 % for water at 20 °C (common practice)
    }

    @Test
    void referenceWeightsOfConventionalDensityReduceToTwoArgumentForm() {
        assertEquals(BUOYANCY.value(new double[] {1.15, 998.0}), BUOYANCY.value(new double[] {1.15, 998.0, 8000.0}),
                1e-15);
    }

    @Test
    void bodiesThatBalanceInConventionalAirHaveEqualConventionalMass() {
        // OIML D 28: the defining property of conventional mass; at rho_a = 1.2 kg/m^3 the indication I (in
        // conventional mass of weights of density rho_ref) equals the conventional mass of the weighed body
        double indication = 0.5;
        for (double rhoW : new double[] {998.0, 2700.0, 7000.0, 8000.0, 16000.0}) {
            for (double rhoRef : new double[] {7800.0, 8000.0, 8400.0}) {
                double mass = indication * BUOYANCY.value(new double[] {1.2, rhoW, rhoRef});
                assertEquals(indication, CONVENTIONAL.value(new double[] {mass, rhoW}), 1e-15);
            }
        }
    }

    @Test
    void agreesWithFirstOrderModelOfJcgm101MassCalibration() {
        // JCGM 101:2008 9.3: delta_m = (m_Rc + delta_m_Rc)[1 + (rho_a - rho_a0)(1/rho_W - 1/rho_R)] - m_nom, in mg;
        // the exact relation m_Wc = conventional_mass(I x buoyancy_factor(rho_a, rho_W, rho_R), rho_W) differs
        // from it by second-order terms, below (0.1 x 1.2 / 7000^2) x 1e5 mg = 2.5e-4 mg at the edges of the
        // example's rectangular distributions
        double reading = 100000.000 + 1.234;
        double[][] cases = {{1.2, 8000, 8000}, {1.3, 7000, 8000}, {1.1, 9000, 7950}, {1.3, 9000, 8050},
            {1.1, 7000, 8050}};
        for (double[] c : cases) {
            double first = reading * (1 + (c[0] - 1.2) * (1 / c[1] - 1 / c[2])) - 100000.0;
            double exact = CONVENTIONAL.value(new double[] {
                reading * BUOYANCY.value(new double[] {c[0], c[1], c[2]}), c[1]}) - 100000.0;
            assertEquals(first, exact, 2.5e-4, "rho_a " + c[0] + ", rho_W " + c[1] + ", rho_R " + c[2]);
        }
        // at the estimates (rho_a = 1.2, rho_W = rho_R = 8000) the result is 1.2340 mg exactly (JCGM 101 9.3)
        assertEquals(1.2340, CONVENTIONAL.value(new double[] {
            reading * BUOYANCY.value(new double[] {1.2, 8000.0, 8000.0}), 8000.0}) - 100000.0, 0.5e-4);
    }

    @Test
    void domainSentences() {
        assertNull(BUOYANCY.domainProblem(new double[] {1.2, 998.0}));
        assertEquals("air density rho_a = -1.2 kg/m^3 must not be negative",
                BUOYANCY.domainProblem(new double[] {-1.2, 998.0}));
        assertEquals("density of the weighed body rho_w = 0 kg/m^3 must be positive",
                BUOYANCY.domainProblem(new double[] {1.2, 0.0}));
        assertEquals("air density rho_a = 1200 kg/m^3 must be less than the density of the weighed body "
                + "rho_w = 998 kg/m^3", BUOYANCY.domainProblem(new double[] {1200.0, 998.0}));
        assertEquals("density of the reference weights rho_ref = 1 kg/m^3 must exceed the reference air density "
                + "of conventional mass 1.2 kg/m^3", BUOYANCY.domainProblem(new double[] {1.2, 998.0, 1.0}));
        assertEquals("density of the body rho = 0.5 kg/m^3 must exceed the reference air density of conventional "
                + "mass 1.2 kg/m^3", CONVENTIONAL.domainProblem(new double[] {1.0, 0.5}));
    }
}
