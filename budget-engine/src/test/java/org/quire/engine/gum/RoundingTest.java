package org.quire.engine.gum;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Rounding of reported results, JCGM 100:2008 7.2.6 (two significant digits; estimate to the same place). */
class RoundingTest {

    @Test
    void gumSection7Examples() {
        // JCGM 100:2008 7.2.2: m_S = 100.021 47 g with u_c = 0.35 mg
        assertEquals("100.02147 \u00b1 0.00035", Rounding.format(100.021473, 0.000354, 2));
        // JCGM 100:2008 7.2.6: 10.47 mohm rounded up would be 10.5; to the nearest it is 10
        assertEquals("10", Rounding.uncertainty(10.47, 2).toPlainString());
    }

    @Test
    void roundingThatCarriesKeepsTwoDigits() {
        assertEquals("0.10", Rounding.uncertainty(0.0996, 2).toPlainString());
        assertEquals("1200", Rounding.uncertainty(1234, 2).toPlainString());
        assertEquals("50.000838", Rounding.estimate(50.000838, 0.0000925, 2).toPlainString());
    }
}
