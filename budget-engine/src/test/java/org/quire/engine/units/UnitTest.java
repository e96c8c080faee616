package org.quire.engine.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Temperature points versus differences, unit algebra and the addition check.
 *
 * <p>Sources: ISO 80000-5:2019 item 5-2 (t = T - T0, T0 = 273.15 K); NIST SP 811 (2008) 4.2.1.1 (a Celsius
 * temperature interval equals the kelvin interval) and B.9 "Temperature" (T/K = (t/°F + 459.67)/1.8),
 * from memory.
 */
class UnitTest {

    private static final Unit CELSIUS = Units.parse("°C");
    private static final Unit KELVIN = Units.parse("K");
    private static final Unit FAHRENHEIT = Units.parse("°F");

    @Test
    void celsiusPointConvertsToKelvinWithOffset() {
        // ISO 80000-5 item 5-2: 20 °C is 293.15 K
        assertEquals(293.15, CELSIUS.convertPoint(20.0, KELVIN), 1e-12);
        assertEquals(20.0, KELVIN.convertPoint(293.15, CELSIUS), 1e-12);
        assertEquals(293.15, CELSIUS.toSi(20.0), 1e-12);
        assertEquals(-273.15, CELSIUS.fromSi(0.0), 1e-12);
    }

    @Test
    void convertIsPointConversion() {
        assertEquals(CELSIUS.convertPoint(37.0, KELVIN), CELSIUS.convert(37.0, KELVIN));
    }

    @Test
    void celsiusDifferenceAndUncertaintyConvertWithoutOffset() {
        // NIST SP 811 4.2.1.1: an interval of 1 °C equals an interval of 1 K
        assertEquals(0.1, CELSIUS.convertDifference(0.1, KELVIN), 0.0);
        assertEquals(0.1, CELSIUS.convertUncertainty(0.1, KELVIN), 0.0);
        assertEquals(0.1, CELSIUS.toSiDifference(0.1), 0.0);
        assertEquals(0.1, CELSIUS.fromSiDifference(0.1), 0.0);
    }

    @Test
    void fahrenheitPointsMatchDefinition() {
        // NIST SP 811 B.9: T/K = (t/°F + 459.67)/1.8; ice point 32 °F, steam point 212 °F (from memory)
        assertEquals(273.15, FAHRENHEIT.convertPoint(32.0, KELVIN), 1e-12);
        assertEquals(100.0, FAHRENHEIT.convertPoint(212.0, CELSIUS), 1e-12);
        assertEquals(-40.0, CELSIUS.convertPoint(-40.0, FAHRENHEIT), 1e-12);
        assertEquals(68.0, CELSIUS.convertPoint(20.0, FAHRENHEIT), 1e-12);
    }

    @Test
    void fahrenheitDifferenceIsFiveNinthsKelvin() {
        // NIST SP 811 B.9: an interval of 1 °F is 5/9 K (from memory)
        assertEquals(5.0 / 9.0, FAHRENHEIT.convertDifference(1.0, KELVIN), 1e-15);
        assertEquals(0.9, CELSIUS.convertUncertainty(0.5, FAHRENHEIT), 1e-14);
    }

    @Test
    void perDegreeCelsiusIsDifferenceUnitEqualToPerKelvin() {
        Unit perC = Units.parse("/°C");
        assertFalse(perC.isAffine());
        assertEquals(11.5e-6, perC.convertPoint(11.5e-6, Units.parse("1/K")), 0.0);
        assertTrue(perC.isEquivalentTo(Units.parse("K^-1")));
    }

    @Test
    void celsiusSquaredIsDifferenceUnit() {
        Unit c2 = Units.parse("°C^2");
        assertFalse(c2.isAffine());
        assertEquals(4.0, c2.convertPoint(4.0, Units.parse("K^2")), 0.0);
        assertFalse(CELSIUS.multiply(Units.parse("s")).isAffine());
        assertFalse(CELSIUS.pow(2).isAffine());
    }

    @Test
    void asDifferenceDropsTheOffsetKeepingTheSymbol() {
        Unit d = CELSIUS.asDifference();
        assertEquals("°C", d.symbol());
        assertEquals(20.0, d.convertPoint(20.0, KELVIN), 0.0);
        assertSame(KELVIN, KELVIN.asDifference());
    }

    @Test
    void volumeFlowConvertsByFactors() {
        // NIST SP 811: 1 L/s = 3.6 m^3/h (exact)
        assertEquals(3.6, Units.parse("L/s").convert(1.0, Units.parse("m^3/h")), 1e-15);
        assertEquals(3.6, Units.parse("L/s").conversionFactor(Units.parse("m^3/h")), 1e-15);
    }

    @Test
    void conversionBetweenDimensionsIsRefused() {
        UnitException e = assertThrows(UnitException.class,
                () -> Units.parse("m^3/h").convert(1.0, Units.parse("kg/s")));
        assertEquals("cannot convert m^3/h (m^3/s) to kg/s: they measure different dimensions", e.getMessage());
    }

    @Test
    void productQuotientAndPowerCombineFactorsAndDimensions() {
        Unit tesla = Units.parse("T");
        Unit metre = Units.parse("m");
        Unit perSecond = Units.parse("m/s");
        // Faraday's law: T · m · m/s = V (SI Brochure Table 4)
        Unit u = tesla.multiply(metre).multiply(perSecond);
        assertTrue(u.sameDimension(Units.parse("V")));
        assertEquals(1.0, u.factor(), 0.0);
        Unit area = Units.parse("mm").pow(2);
        assertEquals(1e-6, area.factor(), 1e-21);
        assertEquals("mm^2", area.symbol());
        assertEquals(Dimension.LENGTH.pow(2), area.dimension());
        Unit q = Units.parse("L").divide(Units.parse("min"));
        assertEquals(1e-3 / 60, q.factor(), 1e-20);
        assertEquals("L/min", q.symbol());
    }

    @Test
    void aUnitDividedByOneOrByItselfIsWrittenSimply() {
        // a unit divided by itself is the unit one (SI Brochure, 9th edition, 2.3.3; from memory)
        Unit one = Units.parse("m^3/h").divide(Units.parse("m^3/h"));
        assertEquals("1", one.symbol());
        assertTrue(one.isDimensionless());
        assertEquals(1.0, one.factor(), 0.0);
        assertEquals("%", Units.parse("%").divide(Units.parse("1")).symbol());
        assertEquals("m^3/h", Units.parse("m^3/h").divide(Units.parse("1")).symbol());
        // not the same unit: written as a quotient
        assertEquals("(m^3/h)/(L/min)", Units.parse("m^3/h").divide(Units.parse("L/min")).symbol());
    }

    @Test
    void composedSymbolsReadBack() {
        Unit a = Units.parse("m^3/h").multiply(Units.parse("kg/m^3"));
        assertEquals("(m^3/h)·(kg/m^3)", a.symbol());
        assertTrue(Units.parse(a.symbol()).isEquivalentTo(a));
        Unit b = Units.parse("W").divide(Units.parse("m K"));
        assertEquals("W/(m K)", b.symbol());
        assertTrue(Units.parse(b.symbol()).isEquivalentTo(b));
        Unit c = Units.parse("m^3").pow(2);
        assertEquals("(m^3)^2", c.symbol());
        assertTrue(Units.parse(c.symbol()).isEquivalentTo(c));
    }

    @Test
    void squareRootOfSquareMetreIsMetre() {
        Unit m = Units.parse("m^2").sqrt();
        assertTrue(m.isEquivalentTo(Units.parse("m")));
        Unit mm = Units.parse("mm^2").pow(1, 2);
        assertEquals(1e-3, mm.factor(), 1e-18);
    }

    @Test
    void squareRootOfMetreIsError() {
        UnitException e = assertThrows(UnitException.class, () -> Units.parse("m").sqrt());
        assertTrue(e.getMessage().contains("the exponent of m would be 1/2"), e.getMessage());
    }

    @Test
    void rationalPowerKeepsFactor() {
        Unit u = Units.parse("mm^6").pow(2, 3);
        assertEquals(Dimension.LENGTH.pow(4), u.dimension());
        assertEquals(1e-12, u.factor(), 1e-26);
        assertEquals("(mm^6)^(2/3)", u.symbol());
        assertTrue(Units.parse("Hz^2").pow(-4, -8).isEquivalentTo(Units.parse("Hz")));
    }

    @Test
    void sameDimensionComparesWhatIsMeasured() {
        assertTrue(Units.parse("m^3/h").sameDimension(Units.parse("US gal/min")));
        assertFalse(Units.parse("m^3/h").sameDimension(Units.parse("kg/s")));
        assertTrue(CELSIUS.sameDimension(KELVIN));
    }

    @Test
    void additionOfDifferentDimensionsShowsBothSides() {
        String problem = Units.additionProblem(Units.parse("m^3/h"), Units.parse("kg/s"));
        assertEquals("cannot add or subtract quantities of different dimensions: left side m^3/h (m^3/s), "
                + "right side kg/s", problem);
        UnitException e = assertThrows(UnitException.class,
                () -> Units.requireAddable(Units.parse("m^3/h"), Units.parse("kg/s")));
        assertEquals(problem, e.getMessage());
    }

    @Test
    void additionOfSameDimensionIsAllowed() {
        assertNull(Units.additionProblem(Units.parse("m^3/h"), Units.parse("L/min")));
        assertNull(Units.additionProblem(CELSIUS, KELVIN));
        Units.requireAddable(Units.parse("kPa"), Units.parse("psi"));
    }

    @Test
    void dimensionlessCheckNamesContext() {
        assertNull(Units.dimensionlessProblem("the argument of exp", Units.parse("%")));
        assertEquals("the argument of exp must be dimensionless, not mV (m^2·kg/(s^3·A))",
                Units.dimensionlessProblem("the argument of exp", Units.parse("mV")));
    }

    @Test
    void factoryRejectsBadArguments() {
        assertThrows(IllegalArgumentException.class, () -> Unit.of("x", Dimension.NONE, 0.0));
        assertThrows(IllegalArgumentException.class, () -> Unit.of("x", Dimension.NONE, Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> Unit.of(" ", Dimension.NONE, 1.0));
        assertThrows(IllegalArgumentException.class, () -> Unit.ofAffine("x", Dimension.NONE, 1.0, Double.NaN));
    }

    @Test
    void aUnitOverTheSameUnitWrittenAnotherWayIsOne() {
        // a quotient of like quantities is a number (ISO 80000-1 6.5.4, from memory): the unit one, not "(m3/h)/(m^3/h)"
        assertEquals(Unit.ONE, Units.parse("m3/h").divide(Units.parse("m^3/h")));
        // factors reached along different paths: 1 L = 1 dm^3 (NIST SP 811 B.8), 1 mL = 1 cm^3
        assertEquals(Unit.ONE, Units.parse("L/min").divide(Units.parse("dm^3/min")));
        assertEquals(Unit.ONE, Units.parse("mL/s").divide(Units.parse("cm^3/s")));
        assertEquals(Unit.ONE, Units.parse("g/cm^3").divide(Units.parse("kg/L")));
        // dimensionless units keep their names: a sensitivity per radian stays "1/rad" (common practice)
        assertEquals("1/rad", Unit.ONE.divide(Units.parse("rad")).toString());
        // L/min over m^3/h is not one: 1 L/min = 0.06 m^3/h (NIST SP 811 B.8: 1 L = 10^-3 m^3)
        Unit ratio = Units.parse("L/min").divide(Units.parse("m^3/h"));
        assertEquals(0.06, ratio.convert(1.0, Unit.ONE), 1e-15);
    }
}
