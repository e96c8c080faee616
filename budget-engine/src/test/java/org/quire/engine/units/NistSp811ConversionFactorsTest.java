package org.quire.engine.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Exact conversion factors of NIST SP 811 (2008) Appendix B.8 (factors for units listed alphabetically; exact
 * factors printed in bold). Entries marked "from memory" were recalled, not read; the inch, foot and gallons
 * are also in the project's check values (the inch and foot read in US federal rules).
 *
 * <p>An exact factor must be reproduced to the nearest double: tolerance one ulp of the expected value.
 */
class NistSp811ConversionFactorsTest {

    private static void assertFactor(double expected, String unit) {
        assertEquals(expected, Units.parse(unit).factor(), Math.ulp(expected), unit);
    }

    @Test
    void inchIsExactly0point0254Metre() {
        assertFactor(0.0254, "in"); // NIST SP 811 B.8 "inch (in)": 2.54 E-02 m, exact
    }

    @Test
    void footIsExactly0point3048Metre() {
        assertFactor(0.3048, "ft"); // NIST SP 811 B.8 "foot (ft)": 3.048 E-01 m, exact
    }

    @Test
    void usGallonIs231CubicInches() {
        // NIST SP 811 B.8 "gallon [U.S.] (gal)": 3.785 412 E-03 m^3; 231 in^3 exactly (footnote), check values
        assertFactor(3.785411784e-3, "US gal");
        assertEquals(231.0, Units.parse("US gal").convert(1.0, Units.parse("in^3")), 1e-12);
    }

    @Test
    void imperialGallonIsExactly4point54609Litres() {
        // NIST SP 811 B.8 "gallon [Canadian and U.K. (Imperial)] (gal)": 4.546 09 E-03 m^3, exact
        assertFactor(4.54609e-3, "imp gal");
        assertFactor(4.54609e-3, "UK gal");
    }

    @Test
    void barrelIs42UsGallons() {
        // NIST SP 811 B.8 "barrel [for petroleum, 42 gallons (U.S.)] (bbl)": 1.589 873 E-01 m^3; check values
        assertFactor(0.158987294928, "bbl");
    }

    @Test
    void litreIsExactlyOneCubicDecimetre() {
        assertFactor(1e-3, "L"); // NIST SP 811 B.8 "liter (L)": 1.0 E-03 m^3, exact (from memory)
        assertFactor(1e-3, "dm^3");
    }

    @Test
    void poundIsExactly0point45359237Kilogram() {
        // NIST SP 811 B.8 "pound (avoirdupois) (lb)": 4.535 924 E-01 kg; 0.453 592 37 exactly (from memory)
        assertFactor(0.45359237, "lb");
    }

    @Test
    void poundForceIsPoundTimesStandardGravity() {
        // NIST SP 811 B.8 "pound-force (lbf)": 4.448 222 E+00 N; lb x 9.806 65 m/s^2 exactly (from memory)
        assertFactor(4.4482216152605, "lbf");
    }

    @Test
    void psiIsPoundForcePerSquareInch() {
        // NIST SP 811 B.8 "pound-force per square inch (psi)": 6.894 757 E+03 Pa; 4.4482216152605 / 0.0254^2
        assertFactor(6894.757293168361, "psi");
        assertEquals(6.894757e3, Units.parse("psi").factor(), 0.0005); // printed digits of B.8
    }

    @Test
    void barIsExactly1e5Pascal() {
        assertFactor(1e5, "bar"); // NIST SP 811 B.8 "bar (bar)": 1.0 E+05 Pa, exact (from memory)
        assertFactor(100.0, "mbar");
    }

    @Test
    void standardAtmosphereIsExactly101325Pascal() {
        assertFactor(101325.0, "atm"); // NIST SP 811 B.8 "atmosphere, standard (atm)": 1.013 25 E+05 Pa, exact
    }

    @Test
    void metricTonIsExactly1000Kilogram() {
        assertFactor(1000.0, "t"); // NIST SP 811 B.8 "ton, metric (t)": 1.0 E+03 kg, exact (from memory)
    }

    @Test
    void minuteAndHourAreExact() {
        assertFactor(60.0, "min"); // NIST SP 811 B.8 "minute (min)": 6.0 E+01 s, exact (from memory)
        assertFactor(3600.0, "h"); // NIST SP 811 B.8 "hour (h)": 3.6 E+03 s, exact (from memory)
    }

    @Test
    void usGallonPerMinuteInCubicMetresPerHour() {
        // 3.785411784e-3 m^3 x 60 = 0.22712470704 m^3/h, from the exact gallon (check values)
        assertEquals(0.22712470704, Units.parse("US gal/min").convert(1.0, Units.parse("m^3/h")), 1e-16);
    }

    @Test
    void footPerSecondInMetresPerSecond() {
        assertEquals(0.3048, Units.parse("ft/s").convert(1.0, Units.parse("m/s")), 0.0); // from 1 ft = 0.3048 m
    }
}
