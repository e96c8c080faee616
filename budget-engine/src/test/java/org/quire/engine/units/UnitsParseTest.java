package org.quire.engine.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Reading unit expressions. Factors follow from the SI Brochure (2019) Tables 4, 7 and 8 (derived units,
 * prefixes, non-SI units accepted for use with the SI) and the exact definitions of NIST SP 811 Appendix B.8;
 * every expected factor is written from those definitions, not from the code.
 */
class UnitsParseTest {

    private static final Dimension L = Dimension.LENGTH;
    private static final Dimension M = Dimension.MASS;
    private static final Dimension T = Dimension.TIME;
    private static final Dimension I = Dimension.ELECTRIC_CURRENT;
    private static final Dimension K = Dimension.TEMPERATURE;
    private static final Dimension ONE = Dimension.NONE;
    private static final Dimension PRESSURE = M.divide(L).divide(T.pow(2));
    private static final Dimension VOLT = M.multiply(L.pow(2)).divide(T.pow(3)).divide(I);

    static Stream<Arguments> units() {
        double gal = 231 * 0.0254 * 0.0254 * 0.0254;
        double psi = 0.45359237 * 9.80665 / (0.0254 * 0.0254);
        return Stream.of(
                Arguments.of("m^3/h", L.pow(3).divide(T), 1.0 / 3600),
                Arguments.of("kg/m^3", M.divide(L.pow(3)), 1.0),
                Arguments.of("kg m^-3", M.divide(L.pow(3)), 1.0),
                Arguments.of("kg·m⁻³", M.divide(L.pow(3)), 1.0),
                Arguments.of("kg*m^-3", M.divide(L.pow(3)), 1.0),
                Arguments.of("m³/h", L.pow(3).divide(T), 1.0 / 3600),
                Arguments.of("m3/h", L.pow(3).divide(T), 1.0 / 3600),
                Arguments.of("L/min", L.pow(3).divide(T), 1e-3 / 60),
                Arguments.of("US gal/min", L.pow(3).divide(T), gal / 60),
                Arguments.of("ft/s", L.divide(T), 0.3048),
                Arguments.of("t/h", M.divide(T), 1000.0 / 3600),
                Arguments.of("µV", VOLT, 1e-6),
                Arguments.of("μV", VOLT, 1e-6),
                Arguments.of("uV", VOLT, 1e-6),
                Arguments.of("mV", VOLT, 1e-3),
                Arguments.of("V", VOLT, 1.0),
                Arguments.of("K", K, 1.0),
                Arguments.of("%", ONE, 0.01),
                Arguments.of("ppm", ONE, 1e-6),
                Arguments.of("1", ONE, 1.0),
                Arguments.of("/°C", ONE.divide(K), 1.0),
                Arguments.of("1/K", ONE.divide(K), 1.0),
                Arguments.of("Pa", PRESSURE, 1.0),
                Arguments.of("kPa", PRESSURE, 1e3),
                Arguments.of("hPa", PRESSURE, 1e2),
                Arguments.of("MPa", PRESSURE, 1e6),
                Arguments.of("mbar", PRESSURE, 1e2),
                Arguments.of("bar", PRESSURE, 1e5),
                Arguments.of("psi", PRESSURE, psi),
                Arguments.of("mm", L, 1e-3),
                Arguments.of("cm", L, 1e-2),
                Arguments.of("in", L, 0.0254),
                Arguments.of("ft", L, 0.3048),
                Arguments.of("min", T, 60.0),
                Arguments.of("h", T, 3600.0),
                Arguments.of("s", T, 1.0),
                Arguments.of("ms", T, 1e-3),
                Arguments.of("kg", M, 1.0),
                Arguments.of("g", M, 1e-3),
                Arguments.of("mg", M, 1e-6),
                Arguments.of("t", M, 1e3),
                Arguments.of("L", L.pow(3), 1e-3),
                Arguments.of("mL", L.pow(3), 1e-6),
                Arguments.of("T", M.divide(T.pow(2)).divide(I), 1.0),
                Arguments.of("mT", M.divide(T.pow(2)).divide(I), 1e-3),
                Arguments.of("A", I, 1.0),
                Arguments.of("Hz", ONE.divide(T), 1.0),
                Arguments.of("rad", ONE, 1.0),
                Arguments.of("N", M.multiply(L).divide(T.pow(2)), 1.0),
                Arguments.of("J", M.multiply(L.pow(2)).divide(T.pow(2)), 1.0),
                Arguments.of("W", M.multiply(L.pow(2)).divide(T.pow(3)), 1.0),
                Arguments.of("mol", Dimension.AMOUNT_OF_SUBSTANCE, 1.0),
                Arguments.of("Ω", VOLT.divide(I), 1.0),
                Arguments.of("nm", L, 1e-9),
                Arguments.of("pF", Dimension.of(-2, -1, 4, 2, 0, 0, 0), 1e-12),
                Arguments.of("GW", M.multiply(L.pow(2)).divide(T.pow(3)), 1e9),
                Arguments.of("dm^3", L.pow(3), 1e-3),
                Arguments.of("W/(m·K)", M.multiply(L).divide(T.pow(3)).divide(K), 1.0),
                Arguments.of("kg / m^3", M.divide(L.pow(3)), 1.0),
                Arguments.of("m^(6/2)/s", L.pow(3).divide(T), 1.0),
                Arguments.of("(mm^4)^(1/2)", L.pow(2), 1e-6));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("units")
    void readsUnit(String text, Dimension dimension, double factor) {
        Unit u = Units.parse(text);
        assertEquals(dimension, u.dimension(), text);
        assertEquals(factor, u.factor(), 4 * Math.ulp(factor), text);
        assertFalse(u.isAffine(), text);
        assertEquals(text.trim(), u.symbol());
    }

    @Test
    void celsiusAndFahrenheitReadAsAffineScales() {
        for (String s : new String[] {"°C", "degC"}) {
            Unit u = Units.parse(s);
            assertEquals(K, u.dimension());
            assertEquals(1.0, u.factor(), 0.0);
            assertEquals(273.15, u.offset(), 0.0);
            assertEquals(s, u.symbol());
        }
        for (String s : new String[] {"°F", "degF"}) {
            Unit u = Units.parse(s);
            assertEquals(5.0 / 9.0, u.factor(), 1e-16);
            assertEquals(459.67, u.offset(), 0.0);
        }
    }

    @Test
    void squareRootOfHertzHasNoWholeDimension() {
        UnitFormatException e = bad("Hz^(1/2)");
        assertTrue(e.getMessage().contains("the exponent of s would be -1/2, not a whole number"), e.getMessage());
    }

    // ---- errors --------------------------------------------------------------------------------------------

    private static UnitFormatException bad(String text) {
        return assertThrows(UnitFormatException.class, () -> Units.parse(text));
    }

    @Test
    void unknownUnitSuggestsNearest() {
        UnitFormatException e = bad("kgg");
        assertEquals("cannot read unit \"kgg\": unknown unit \"kgg\" (did you mean \"kg\"?) at character 1 ('k')",
                e.getMessage());
        assertEquals(0, e.position());
    }

    @Test
    void wrongCaseSuggestsCorrectSymbol() {
        assertTrue(bad("KPa").getMessage().contains("did you mean \"kPa\"?"), bad("KPa").getMessage());
        assertTrue(bad("pa").getMessage().contains("did you mean \"Pa\"?"));
    }

    @Test
    void commonAbbreviationsSuggestTheSymbol() {
        assertTrue(bad("m^3/hr").getMessage().contains("unknown unit \"hr\" (did you mean \"h\"?) at character 5"),
                bad("m^3/hr").getMessage());
        assertTrue(bad("gpm").getMessage().contains("did you mean \"US gal/min\"?"));
        assertTrue(bad("sec").getMessage().contains("did you mean \"s\"?"));
    }

    @Test
    void unknownUnitFarFromAllHasNoSuggestion() {
        assertEquals("cannot read unit \"kg/zzzzz\": unknown unit \"zzzzz\" at character 4 ('z')",
                bad("kg/zzzzz").getMessage());
    }

    @Test
    void bareGallonIsAmbiguous() {
        UnitFormatException e = bad("gal/min");
        assertTrue(e.getMessage().contains("write \"US gal\" (3.785411784 L) or \"imp gal\" (4.54609 L)"),
                e.getMessage());
    }

    @Test
    void missingExponentAfterCaret() {
        UnitFormatException e = bad("m^");
        assertEquals("cannot read unit \"m^\": expected an exponent (a whole number such as 2 or -3) after '^' "
                + "at the end (character 3)", e.getMessage());
        assertEquals(2, e.position());
    }

    @Test
    void doubleSolidus() {
        UnitFormatException e = bad("kg//s");
        assertEquals("cannot read unit \"kg//s\": expected a unit after '/' at character 4 ('/')", e.getMessage());
        assertEquals(3, e.position());
    }

    @Test
    void caretWithoutUnit() {
        UnitFormatException e = bad("^x");
        assertEquals("cannot read unit \"^x\": expected a unit at character 1 ('^')", e.getMessage());
        assertEquals("a unit", e.expected());
    }

    @Test
    void letterAsExponent() {
        assertEquals("cannot read unit \"m^x\": expected an exponent (a whole number such as 2 or -3) after '^' "
                + "at character 3 ('x')", bad("m^x").getMessage());
    }

    @Test
    void secondSolidusIsAmbiguous() {
        assertTrue(bad("kg/m/s").getMessage().contains("a second '/' is ambiguous; write kg/(m·s)"));
    }

    @Test
    void productAfterSolidusNeedsParentheses() {
        UnitFormatException e = bad("W/m·K");
        assertTrue(e.getMessage().contains("only one unit may follow '/'; put a product in parentheses"),
                e.getMessage());
        assertEquals(3, e.position());
        assertTrue(bad("W/m K").getMessage().contains("only one unit may follow '/'"));
    }

    @Test
    void unclosedParenthesis() {
        assertEquals("cannot read unit \"W/(m·K\": expected ')' to close the '(' at character 3 at the end "
                + "(character 7)", bad("W/(m·K").getMessage());
        assertTrue(bad("m)").getMessage().contains("unmatched ')' at character 2"));
    }

    @Test
    void numbersOtherThanOneAreNotUnits() {
        assertTrue(bad("1000 L").getMessage().contains("the number 1000 is not a unit"));
    }

    @Test
    void blankIsRefused() {
        assertTrue(bad("  ").getMessage().contains("a unit must not be blank; write 1"));
        assertThrows(UnitFormatException.class, () -> Units.parse(null));
    }

    @Test
    void prefixOnNonPrefixableUnitIsRefused() {
        assertTrue(bad("kpsi").getMessage().contains("the unit \"psi\" does not take the SI prefix \"k\""),
                bad("kpsi").getMessage());
        assertTrue(bad("m°C").getMessage().contains("at character 2"), bad("m°C").getMessage());
    }

    @Test
    void fractionalRootWithoutWholeExponentIsRefusedWithPosition() {
        UnitFormatException e = bad("m^(1/2)");
        assertTrue(e.getMessage().contains("the exponent of m would be 1/2"), e.getMessage());
        assertEquals(1, e.position());
    }

    @Test
    void dotIsNotAMultiplicationSign() {
        assertTrue(bad("kg.m").getMessage().contains("expected '·', '/', '^' or the end at character 3 ('.')"),
                bad("kg.m").getMessage());
    }
}
