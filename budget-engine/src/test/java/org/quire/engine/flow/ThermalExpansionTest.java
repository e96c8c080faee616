package org.quire.engine.flow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;
import org.quire.engine.model.ModelFunction;

/**
 * Thermal expansion factors. JCGM 100:2008 H.1 (memory + recomputed): the end gauge's expansion term with
 * alpha_s = 11.5e-6 /°C; ISO 1:2016: reference temperature 20 °C.
 */
class ThermalExpansionTest {

    private static final ModelFunction LINEAR = ThermalExpansion.linear();
    private static final ModelFunction AREA = ThermalExpansion.area();
    private static final ModelFunction VOLUME = ThermalExpansion.volume();

    @Test
    void endGaugeExpansionOfJcgm100H1() {
        // JCGM 100:2008 H.1: l_s alpha_s theta with l_s = 50.000623 mm, alpha_s = 11.5e-6 /°C, theta = -0.1 °C:
        // 50.000623 mm x 11.5e-6 x (-0.1) = -57.5 nm; the factor is 1 - 1.15e-6
        double factor = LINEAR.value(new double[] {11.5e-6, 19.9});
        assertEquals(-57.5e-6, 50.000623 * (factor - 1.0), 0.05e-6);
    }

    @Test
    void referenceTemperatureDefaultsToTwentyDegrees() {
        // ISO 1:2016
        assertEquals(LINEAR.value(new double[] {16e-6, 35.0, 20.0}), LINEAR.value(new double[] {16e-6, 35.0}), 0.0);
    }

    @Test
    void areaAndVolumeArePowersOfLinear() {
        // stainless steel alpha about 16e-6 /°C (common practice), bore at 35 °C against 20 °C
        double l = 1 + 16e-6 * 15;
        assertEquals(l, LINEAR.value(new double[] {16e-6, 35.0}), 1e-15);
        assertEquals(l * l, AREA.value(new double[] {16e-6, 35.0}), 1e-15);
        assertEquals(l * l * l, VOLUME.value(new double[] {16e-6, 35.0, 20.0}), 1e-15);
        assertEquals(1.00048, AREA.value(new double[] {16e-6, 35.0}), 0.5e-5); // about 2 alpha dt
    }

    @Test
    void domainSentences() {
        assertNull(AREA.domainProblem(new double[] {16e-6, 35.0}));
        assertEquals("temperature t = -300 °C is a negative absolute temperature (below -273.15 °C)",
                AREA.domainProblem(new double[] {16e-6, -300.0}));
        assertEquals("reference temperature t_ref = -274 °C is a negative absolute temperature (below -273.15 °C)",
                AREA.domainProblem(new double[] {16e-6, 20.0, -274.0}));
        assertEquals("the linear expansion factor 1 + alpha (t - t_ref) = -1 is not positive; alpha or the "
                + "temperatures are far out of range", LINEAR.domainProblem(new double[] {0.1, 0.0}));
    }
}
