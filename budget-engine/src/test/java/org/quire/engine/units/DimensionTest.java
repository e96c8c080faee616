package org.quire.engine.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Dimensional algebra; BIPM SI Brochure (2019) 2.3.3 and Table 4 (derived units in base units). */
class DimensionTest {

    private static final Dimension L = Dimension.LENGTH;
    private static final Dimension M = Dimension.MASS;
    private static final Dimension T = Dimension.TIME;

    @Test
    void volumeFlowIsWrittenInSiBaseUnits() {
        assertEquals("m^3/s", L.pow(3).divide(T).toString());
    }

    @Test
    void densityIsWrittenInSiBaseUnits() {
        assertEquals("kg/m^3", M.divide(L.pow(3)).toString());
    }

    @Test
    void voltHasDimensionM2KgPerS3A() {
        // SI Brochure (2019) Table 4: V = kg m^2 s^-3 A^-1
        Dimension volt = M.multiply(L.pow(2)).divide(T.pow(3)).divide(Dimension.ELECTRIC_CURRENT);
        assertEquals(Dimension.of(2, 1, -3, -1, 0, 0, 0), volt);
        assertEquals("m^2·kg/(s^3·A)", volt.toString());
    }

    @Test
    void frequencyIsOnePerSecond() {
        assertEquals("1/s", Dimension.NONE.divide(T).toString());
    }

    @Test
    void dimensionlessIsWrittenOne() {
        assertEquals("1", L.divide(L).toString());
        assertTrue(L.divide(L).isDimensionless());
        assertFalse(L.isDimensionless());
    }

    @Test
    void squareRootOfAreaIsLength() {
        assertEquals(L, L.pow(2).pow(1, 2));
        assertEquals(L.pow(3), L.pow(2).pow(3, 2));
    }

    @Test
    void negativeDenominatorIsNormalised() {
        assertEquals(L.pow(-1), L.pow(2).pow(1, -2));
    }

    @Test
    void squareRootOfLengthIsRefusedWithExplanation() {
        UnitException e = assertThrows(UnitException.class, () -> L.pow(1, 2));
        assertEquals("cannot raise m to the power 1/2: the exponent of m would be 1/2, not a whole number",
                e.getMessage());
    }

    @Test
    void zeroDenominatorIsRefused() {
        assertThrows(UnitException.class, () -> L.pow(1, 0));
    }

    @Test
    void exponentsAreReadBack() {
        Dimension d = Dimension.of(1, 2, 3, 4, 5, 6, 7);
        int i = 1;
        for (Dimension.Base b : Dimension.Base.values()) {
            assertEquals(i++, d.exponent(b));
        }
        assertEquals("m·kg^2·s^3·A^4·K^5·mol^6·cd^7", d.toString());
    }

    @Test
    void equalityFollowsExponents() {
        assertEquals(M.divide(L.pow(3)), Dimension.of(-3, 1, 0, 0, 0, 0, 0));
        assertEquals(M.divide(L.pow(3)).hashCode(), Dimension.of(-3, 1, 0, 0, 0, 0, 0).hashCode());
        assertNotEquals(L, T);
    }
}
