package org.quire.engine.gum;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * One rule for showing degrees of freedom, in a display form and a plain form that differ only in the symbols
 * for infinite and not defined. Values: JCGM 100:2008 H.1 (nu_eff = 16.7, truncated to 16 for k), an exactly
 * known input (infinite degrees of freedom, JCGM 100:2008 G.4.1), and an undefined value.
 */
class DegreesOfFreedomFormatTest {
    @Test
    void displayAndPlainFormsFollowOneRule() {
        assertEquals("16.7", Figures.dof(16.7));
        assertEquals("16.7", Figures.dofPlain(16.7));
        assertEquals("16", Figures.dof(16));
        assertEquals("16", Figures.dofPlain(16));
        assertEquals("∞", Figures.dof(Double.POSITIVE_INFINITY));
        assertEquals("inf", Figures.dofPlain(Double.POSITIVE_INFINITY));
        assertEquals("–", Figures.dof(Double.NaN));
        assertEquals("-", Figures.dofPlain(Double.NaN));
    }
}
