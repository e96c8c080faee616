package org.quire.app.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.quire.app.common.Engine;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.model.ModelCompiler;
import org.quire.engine.model.ModelException;

/**
 * Typesetting of names and equations from the compiled model: ISO 80000-2 and the SI Brochure (9th ed.) 5.1 and
 * 5.3 (variables italic; numbers, operators, function names and descriptive subscripts upright), JCGM 100:2008 H.1
 * (the symbols δα and δθ).
 */
class TypesetterTest {

    private static MathText line(String model, List<String> inputs, String output) throws ModelException {
        CompiledModel m = ModelCompiler.compile(model, inputs, List.of(output), Engine.standard().library());
        return Typesetter.equation(m.lines().get(m.lines().size() - 1));
    }

    @Test
    void endGaugeModelReadsAsJcgm100H1WritesIt() throws ModelException {
        // JCGM 100:2008 H.1: l = l_S + d - l_S (δα θ + α_S δθ)
        MathText m = line("l = l_s + d - l_s * (delta_alpha * theta + alpha_s * delta_theta)",
                List.of("l_s", "d", "delta_alpha", "theta", "alpha_s", "delta_theta"), "l");
        assertEquals("l = l_s + d − l_s · (δα · θ + α_s · δθ)", m.plain());
    }

    @Test
    void aNumberWithItsUnitIsSetAsOneQuantity() throws ModelException {
        // SI Brochure (9th ed.) 5.4.3: a space between the number and the unit; the quantity is bracketed where
        // an operator would otherwise bind only its number
        assertEquals("m = dm / (1000\u2009mg/g)", line("m = dm / 1000 [mg/g]", List.of("dm"), "m").plain());
        assertEquals("m = 1.0 × 10\u207b\u00b3\u2009g/mg · dm", line("m = 1.0e-3 [g/mg] * dm", List.of("dm"), "m").plain());
        MathText t = line("d = t - 20 [°C]", List.of("t"), "d");
        assertEquals("d = t − 20\u2009°C", t.plain());
        assertFalse(t.runs().get(t.runs().size() - 1).italic(), "the unit is upright");
    }

    @Test
    void descriptiveSubscriptsAreUprightAndSingleLetterOnesItalic() {
        MathText m = Typesetter.name("theta_mean");
        assertEquals("theta_mean", m.plain(), "the plain form of a name is the name as written");
        assertTrue(m.runs().get(0).italic());
        assertFalse(m.runs().get(1).italic());
        assertEquals(MathText.Shift.SUB, m.runs().get(1).shift());
        assertEquals("mean", m.runs().get(1).text());
        assertTrue(Typesetter.name("l_s").runs().get(1).italic());
        assertEquals("Rc,cal", Typesetter.name("m_Rc_cal").runs().get(1).text());
    }

    @Test
    void aSmallChangeOfAGreekQuantityKeepsItsLetter() {
        // common practice: drho_w, a correction to a density, reads dρ with subscript w, as dm_evap reads dm
        MathText m = Typesetter.name("drho_w");
        assertEquals("dρ", m.runs().get(0).text());
        assertEquals("w", m.runs().get(1).text());
        assertEquals("drho_w", m.plain());
        assertEquals("dm", Typesetter.name("dm_evap").runs().get(0).text());
        assertEquals("δ", Typesetter.name("delta").runs().get(0).text());
    }

    @Test
    void powersRootsAndExponentNotation() throws ModelException {
        assertEquals("y = √(a² + b²)", line("y = sqrt(a^2 + b^2)", List.of("a", "b"), "y").plain());
        assertEquals("q = 1.5 × 10⁻³ · |v|", line("q = 1.5e-3 * abs(v)", List.of("v"), "q").plain());
        assertEquals("z = (a + b)^(n − 1)", line("z = (a + b)^(n - 1)", List.of("a", "b", "n"), "z").plain());
        assertEquals("r = a / (b · c)", line("r = a / (b * c)", List.of("a", "b", "c"), "r").plain());
        assertEquals("R = Z · cos(φ)", line("R = Z * cos(phi)  # resistance", List.of("Z", "phi"), "R").plain());
        assertEquals("A = π · r² / 4", line("A = pi * r^2 / 4", List.of("r"), "A").plain());
    }

    @Test
    void libraryAndModelFunctionsAreWordsNotSymbolsWithSubscripts() throws ModelException {
        // The issue's complaint: water_density typeset as "water" with the subscript "density".
        MathText m = line("rho_w = water_density(t_w)", List.of("t_w"), "rho_w");
        assertEquals("water_density(", m.runs().get(2).text().substring(3));
        assertFalse(m.runs().stream().anyMatch(r -> r.shift() == MathText.Shift.SUB && r.text().equals("density")));
        CompiledModel own = ModelCompiler.compile("cell_volume(n, k) = n / k\nV = cell_volume(N, K_p)",
                List.of("N", "K_p"), List.of("V"), Engine.standard().library());
        MathText def = Typesetter.equation(own.lines().get(0));
        assertEquals("cell_volume(", def.runs().get(0).text());
        MathText use = Typesetter.equation(own.lines().get(1));
        assertTrue(use.runs().stream().anyMatch(r -> r.text().contains("cell_volume(") && r.shift() == MathText.Shift.BASE
                && !r.italic()));
    }

    @Test
    void labelsSetSingleLettersItalicAndPlainFormsCarryNoBraces() {
        MathText m = Typesetter.label("u(x_i)");
        assertEquals("u(x_i)", m.plain());
        assertTrue(m.runs().get(0).italic());
        assertEquals("ν_eff", Typesetter.label("ν_{eff}").plain());
        assertEquals("u_c²(y)", Typesetter.label("u_c^2(y)").plain());
    }

    @Test
    void unitsInLabelsHaveRealSuperscripts() {
        // SI Brochure, 9th ed., 5.4.6: powers of units as superscripts
        assertEquals("flow (m³/h)", Typesetter.labelWithUnit("flow (m^3/h)").plain());
        assertEquals("kg·m⁻³", Typesetter.unit("kg m^-3").plain());
        assertEquals("m³/h", Typesetter.unit("m3/h").plain());
        assertEquals("°C", Typesetter.unit("degC").plain());
    }
}
