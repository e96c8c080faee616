package org.quire.engine.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** Type B evaluations: JCGM 100:2008 4.3 and G.4.2; JCGM 101:2008 Table 1. */
class TypeBEvaluationTest {

    private static Map<String, Double> p(Object... kv) {
        Map<String, Double> m = new LinkedHashMap<>();
        for (int i = 0; i < kv.length; i += 2) {
            m.put((String) kv[i], ((Number) kv[i + 1]).doubleValue());
        }
        return m;
    }

    @Test
    void standardUncertaintiesOfTheShapes() {
        double a = 0.5;
        // JCGM 100:2008 4.3.7: rectangular u = a / sqrt(3)
        assertEquals(a / Math.sqrt(3), TypeB.of("rectangular", p("estimate", 1, "halfWidth", a)).standardUncertainty(), 1e-15);
        // JCGM 100:2008 4.3.9: triangular u = a / sqrt(6)
        assertEquals(a / Math.sqrt(6), TypeB.of("triangular", p("estimate", 1, "halfWidth", a)).standardUncertainty(), 1e-15);
        // JCGM 101:2008 6.4.6: arc sine u = a / sqrt(2)
        assertEquals(a / Math.sqrt(2), TypeB.of("arcsine", p("lower", 0.5, "upper", 1.5)).standardUncertainty(), 1e-15);
        // JCGM 101:2008 6.4.4: trapezoidal u^2 = a^2 (1 + beta^2) / 6
        assertEquals(Math.sqrt(a * a * (1 + 0.25) / 6),
                TypeB.of("trapezoidal", p("estimate", 0, "halfWidth", a, "beta", 0.5)).standardUncertainty(), 1e-15);
        // JCGM 101:2008 6.4.3: curvilinear trapezoid u^2 = a^2/3 + d^2/9
        assertEquals(Math.sqrt(a * a / 3 + 0.01 / 9),
                TypeB.of("curvilinear-trapezoid", p("estimate", 0, "halfWidth", a, "halfWidthUncertainty", 0.1)).standardUncertainty(), 1e-15);
        assertEquals(0, TypeB.of("constant", p("estimate", 8000)).standardUncertainty(), 0);
    }

    @Test
    void normalFromExpandedUncertainty() {
        // JCGM 100:2008 4.3.3 example: U with k = 3
        assertEquals(0.025, TypeB.of("normal", p("estimate", 0, "expandedUncertainty", 0.075, "coverageFactor", 3))
                .standardUncertainty(), 1e-15);
        // JCGM 100:2008 H.1 d1: 0.01 um at 95 % with nu = 5 gives u = 3.9 nm (t_95(5) = 2.57, Table G.2)
        TypeB d1 = TypeB.of("normal", p("estimate", 0, "expandedUncertainty", 0.01, "coverageProbability", 0.95, "dof", 5));
        assertEquals(0.0039, d1.standardUncertainty(), 0.00005);
        assertEquals(5, d1.dof(), 0);
        assertTrue(d1.distribution() instanceof Distribution.StudentT);
    }

    @Test
    void degreesOfFreedomFromTheReliabilityOfU() {
        // JCGM 100:2008 G.4.2 eq. (G.3) and H.1: 10 % -> nu = 50, 25 % -> 8, 50 % -> 2
        assertEquals(50, TypeB.of("rectangular", p("estimate", 0, "halfWidth", 1e-6, "relativeUncertaintyOfU", 0.10)).dof(), 0);
        assertEquals(8, TypeB.of("normal", p("estimate", 0, "standardUncertainty", 1, "relativeUncertaintyOfU", 0.25)).dof(), 0);
        assertEquals(2, TypeB.of("rectangular", p("estimate", 0, "halfWidth", 0.05, "relativeUncertaintyOfU", 0.5)).dof(), 0);
        assertTrue(Double.isInfinite(TypeB.of("rectangular", p("estimate", 0, "halfWidth", 1)).dof()));
    }

    @Test
    void badParametersNameTheParameter() {
        InvalidParameterException neg = assertThrows(InvalidParameterException.class,
                () -> TypeB.of("rectangular", p("estimate", 0, "halfWidth", -1)));
        assertEquals("halfWidth", neg.parameter());
        InvalidParameterException zero = assertThrows(InvalidParameterException.class,
                () -> TypeB.of("normal", p("estimate", 0, "standardUncertainty", 0)));
        assertEquals("standardUncertainty", zero.parameter());
        InvalidParameterException nu = assertThrows(InvalidParameterException.class,
                () -> TypeB.of("normal", p("estimate", 0, "standardUncertainty", 1, "dof", 0)));
        assertEquals("dof", nu.parameter());
        InvalidParameterException nu2 = assertThrows(InvalidParameterException.class,
                () -> TypeB.of("student-t", p("estimate", 0, "scale", 1, "dof", -3)));
        assertEquals("dof", nu2.parameter());
        assertEquals("distribution", assertThrows(InvalidParameterException.class,
                () -> TypeB.of("gaussian", p("estimate", 0))).parameter());
        assertEquals("upper", assertThrows(InvalidParameterException.class,
                () -> TypeB.of("rectangular", p("lower", 2, "upper", 1))).parameter());
        assertEquals("coverageProbability", assertThrows(InvalidParameterException.class,
                () -> TypeB.of("normal", p("estimate", 0, "expandedUncertainty", 1, "coverageProbability", 95))).parameter());
    }

    @Test
    void typeAFromReadings() {
        // JCGM 100:2008 4.2: mean, s (eq. 4), s/sqrt(n) (eq. 5), nu = n - 1; NIST/SEMATECH-style check by hand:
        // readings 1, 2, 3, 4: mean 2.5, s = sqrt(5/3)
        TypeA a = TypeA.ofReadings(1, 2, 3, 4);
        assertEquals(2.5, a.estimate(), 0);
        assertEquals(Math.sqrt(5.0 / 3) / 2, a.standardUncertainty(), 1e-15);
        assertEquals(3, a.dof(), 0);
        TypeA pooled = TypeA.ofMean(0.000215, 5).withPooled(0.000013, 24);
        // JCGM 100:2008 H.1: u(d) = 13 nm / sqrt(5) = 5.8 nm with nu = 24
        assertEquals(5.8e-6, pooled.standardUncertainty(), 0.05e-6);
        assertEquals(24, pooled.dof(), 0);
        assertThrows(IllegalArgumentException.class, () -> InputQuantity.of("x", TypeA.ofReadings(3, 3, 3)));
        assertThrows(IllegalArgumentException.class, () -> InputQuantity.of("x", TypeA.ofReadings(3)));
    }

    @Test
    void nonPositiveSemiDefiniteCorrelationsNameThePairs() {
        InputQuantity a = InputQuantity.of("a", TypeB.of("normal", p("estimate", 0, "standardUncertainty", 1)));
        InputQuantity b = a.withName("b");
        InputQuantity c = a.withName("c");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> CorrelationMatrix.of(
                java.util.List.of(a, b, c), java.util.List.of(Correlation.of("a", "b", 0.9), Correlation.of("a", "c", 0.9),
                        Correlation.of("b", "c", -0.9))));
        assertTrue(e.getMessage().contains("not positive semi-definite"), e.getMessage());
        assertTrue(e.getMessage().contains("r(a, b) = 0.9") && e.getMessage().contains("r(b, c) = -0.9"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Correlation.of("a", "b", 1.2));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> CorrelationMatrix.of(java.util.List.of(a, b),
                java.util.List.of(Correlation.of("a", "bb", 0.5)))).getMessage().contains("did you mean 'b'"));
    }
}
