package org.quire.app.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Typesetting of names and equations: ISO 80000-2 and the SI Brochure (9th ed.) 5.1 and 5.3 (variables italic,
 * numbers, operators and descriptive subscripts upright), JCGM 100:2008 H.1 (the symbols δα and δθ).
 */
class TypesetterTest {

    @Test
    void endGaugeModelReadsAsJcgm100H1WritesIt() {
        // JCGM 100:2008 H.1: l = l_S + d - l_S (δα θ + α_S δθ)
        MathText m = Typesetter.equation("l = l_s + d - l_s * (delta_alpha * theta + alpha_s * delta_theta)");
        assertEquals("l = l_s + d − l_s · (δα · θ + α_s · δθ)", m.plain());
    }

    @Test
    void descriptiveSubscriptsAreUprightAndSingleLetterOnesItalic() {
        MathText m = Typesetter.name("theta_mean");
        assertEquals("θ_{mean}", m.plain());
        assertTrue(m.runs().get(0).italic());
        assertFalse(m.runs().get(1).italic());
        assertEquals(MathText.Shift.SUB, m.runs().get(1).shift());
        assertTrue(Typesetter.name("l_s").runs().get(1).italic());
        assertEquals("m_{Rc,cal}", Typesetter.name("m_Rc_cal").plain());
    }

    @Test
    void powersRootsAndExponentNotation() {
        assertEquals("y = √(a^2 + b^2)", Typesetter.equation("y = sqrt(a^2 + b^2)").plain());
        assertEquals("q = 1.5 × 10^{−3} · |v|", Typesetter.equation("q = 1.5e-3 * abs(v)").plain());
        assertEquals("z = (a + b)^{n − 1}", Typesetter.equation("z = (a + b)^(n - 1)").plain());
        assertEquals("r = a / (b · c)", Typesetter.equation("r = a / (b * c)").plain());
        assertEquals("R = Z · cos(φ)", Typesetter.equation("R = Z * cos(phi)  # resistance").plain());
        assertEquals("A = π · r^2 / 4", Typesetter.equation("A = pi * r^2 / 4").plain());
    }

    @Test
    void textThatDoesNotParseIsShownAsWritten() {
        assertEquals("y = (a +", Typesetter.equation("y = (a +").plain());
    }

    @Test
    void labelsSetSingleLettersItalic() {
        MathText m = Typesetter.label("u(x_i)");
        assertEquals("u(x_i)", m.plain());
        assertTrue(m.runs().get(0).italic());
        assertEquals("ν_{eff}", Typesetter.label("ν_{eff}").plain());
    }
}
