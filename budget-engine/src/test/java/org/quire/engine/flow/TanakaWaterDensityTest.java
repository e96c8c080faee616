package org.quire.engine.flow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.quire.engine.model.ModelFunction;

/**
 * Tanaka et al. (2001), Metrologia 38, 301: the 0-40 °C table of air-free SMOW density at 101325 Pa (read), the
 * compressibility correction (coefficients read) and the dissolved-air correction (read in a secondary copy).
 * Tolerance: half a unit in the fourth printed decimal, 0.00005 kg/m^3.
 */
class TanakaWaterDensityTest {

    private static final ModelFunction AIR_FREE = WaterDensity.airFree();
    private static final ModelFunction AIR_SATURATED = WaterDensity.airSaturated();

    @ParameterizedTest(name = "{0} °C: {1} kg/m^3")
    @CsvSource({
        "0, 999.8428", // Tanaka et al. (2001) table
        "4, 999.9749",
        "10, 999.7027",
        "15, 999.1026",
        "20, 998.2067",
        "25, 997.0470",
        "30, 995.6488",
        "40, 992.2152"})
    void reproducesPrintedTable(double t, double printed) {
        assertEquals(printed, AIR_FREE.value(new double[] {t}), 0.5e-4);
    }

    @Test
    void atReferencePressureCompressionChangesNothing() {
        assertEquals(AIR_FREE.value(new double[] {20.0}), AIR_FREE.value(new double[] {20.0, 101325.0}), 0.0);
    }

    @Test
    void compressionAtTwentyDegreesAndOneMegapascalAbsolute() {
        // rho(t) [1 + (k0 + k1 t + k2 t^2)(p - 101325 Pa)] with the coefficients of Tanaka et al. (2001);
        // k(20 °C) = (50.74 - 6.52 + 1.664) e-11 /Pa = 45.884e-11 /Pa, computed by hand
        double expected = 998.2067 * (1 + 45.884e-11 * (1.0e6 - 101325.0));
        assertEquals(expected, AIR_FREE.value(new double[] {20.0, 1.0e6}), 0.5e-4);
        // about +0.41 kg/m^3 per 0.9 MPa: water's compressibility of roughly 4.6e-10 /Pa (common practice)
        assertEquals(0.412, AIR_FREE.value(new double[] {20.0, 1.0e6}) - 998.2067, 0.001);
    }

    @Test
    void airSaturatedIsLowerByDissolvedAirCorrection() {
        // s0 + s1 t = -4.612e-3 + 0.106e-3 * 20 = -2.492e-3 kg/m^3 at 20 °C (Tanaka et al. 2001)
        assertEquals(998.2067 - 2.492e-3, AIR_SATURATED.value(new double[] {20.0}), 0.5e-4);
        assertEquals(-2.492e-3,
                AIR_SATURATED.value(new double[] {20.0}) - AIR_FREE.value(new double[] {20.0}), 1e-12);
        assertEquals(-2.492e-3, AIR_SATURATED.value(new double[] {20.0, 3e5})
                - AIR_FREE.value(new double[] {20.0, 3e5}), 1e-12);
    }

    @Test
    void maximumDensityLiesNearFourDegrees() {
        // the density maximum of water lies at 3.98 °C (Tanaka et al. 2001, a1 = -3.983035 °C)
        double at = 3.983035;
        double rho = AIR_FREE.value(new double[] {at});
        assertEquals(999.97495, rho, 0.5e-5); // equals a5 at t = -a1: the factor (t + a1)^2 vanishes
    }

    @Test
    void domainSentences() {
        assertNull(AIR_FREE.domainProblem(new double[] {0.0}));
        assertNull(AIR_FREE.domainProblem(new double[] {40.0}));
        assertEquals("temperature t = 45 °C is outside 0 °C to 40 °C, the range of validity of the Tanaka et al. "
                + "(2001) water-density formula", AIR_FREE.domainProblem(new double[] {45.0}));
        assertEquals("temperature t = -300 °C is a negative absolute temperature (below -273.15 °C)",
                AIR_FREE.domainProblem(new double[] {-300.0}));
        assertEquals("pressure p = 0 Pa must be positive (an absolute pressure)",
                AIR_FREE.domainProblem(new double[] {20.0, 0.0}));
        assertEquals("pressure p = -101325 Pa must be positive (an absolute pressure)",
                AIR_SATURATED.domainProblem(new double[] {20.0, -101325.0}));
        assertEquals("temperature t = 30 °C is outside 0 °C to 25 °C, the range of validity of the Tanaka et al. "
                + "(2001) dissolved-air correction", AIR_SATURATED.domainProblem(new double[] {30.0}));
    }
}
