package org.quire.engine.model;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.quire.engine.flow.FlowFunctions;

/** The reference printed by 'quire help' is generated from the engine's tables and states them correctly. */
class LanguageReferenceTest {

    private static double factor(String table, String symbol) {
        Matcher m = Pattern.compile("(?m)^" + Pattern.quote(symbol) + " +\\S+ +([-0-9.e]+)").matcher(table);
        assertTrue(m.find(), symbol + " is in the table:\n" + table);
        return Double.parseDouble(m.group(1));
    }

    @Test
    void theUnitTableGivesTheExactFactorsOfNistSp811() {
        String t = LanguageReference.units();
        // NIST SP 811 (2008) Appendix B.8: 1 in = 2.54 E-02 m exactly; 1 ft = 3.048 E-01 m exactly
        assertTrue(Math.abs(factor(t, "in") - 0.0254) < 1e-15);
        assertTrue(Math.abs(factor(t, "ft") - 0.3048) < 1e-15);
        // NIST SP 811 (2008) B.8: 1 gal (U.S.) = 3.785 412 E-03 m^3 (231 in^3 exactly)
        assertTrue(Math.abs(factor(t, "US gal") - 3.785411784e-3) < 1e-14);
        // NIST SP 811 (2008) B.8: 1 lb (avoirdupois) = 4.535 924 37 E-01 kg exactly
        assertTrue(Math.abs(factor(t, "lb") - 0.45359237) < 1e-15);
        // NIST SP 811 (2008) B.8: 1 psi = 6.894 757 E+03 Pa
        assertTrue(Math.abs(factor(t, "psi") - 6894.757) < 0.0005);
        // NIST SP 811 (2008) B.8: 1 standard atmosphere = 1.013 25 E+05 Pa exactly
        assertTrue(Math.abs(factor(t, "atm") - 101325) < 1e-9);
        // BIPM SI Brochure (2019) Table 8: 1 bar = 10^5 Pa; Table 8: 1 L = 10^-3 m^3
        assertTrue(Math.abs(factor(t, "bar") - 1e5) < 1e-9);
        assertTrue(Math.abs(factor(t, "L") - 1e-3) < 1e-18);
        // BIPM SI Brochure (2019) 2.3.1: t/°C = T/K - 273.15
        assertTrue(t.contains("(point: + 273.15)"), t);
        assertTrue(t.contains("k 10^3") && t.contains("µ 10^-6"), "the SI prefixes (SI Brochure Table 7)");
    }

    @Test
    void theFunctionListHasEveryFunctionOfTheLibrary() {
        FunctionLibrary lib = FunctionLibrary.standard().with(FlowFunctions.all());
        String t = LanguageReference.functions(lib);
        for (String name : lib.allNames()) {
            assertTrue(t.contains(name.equals("pi") ? "  pi " : "  " + name + "("), name + " in\n" + t);
        }
        for (ModelFunction f : lib.functions()) {
            String first = f.description().split("\\s+")[0];
            assertTrue(t.contains(first), f.name() + ": its description is shown");
        }
    }

    @Test
    void theModelTopicNamesTheOperatorsTheParserReads() {
        String t = LanguageReference.model();
        assertTrue(t.contains("2^3^2 is 2^9"), t);
        assertTrue(t.contains("sqrt exp ln log10"), t);
    }
}
