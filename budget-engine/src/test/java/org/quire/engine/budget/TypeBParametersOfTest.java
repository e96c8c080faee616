package org.quire.engine.budget;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The parameters a form offers for each distribution are those {@link TypeB#of} accepts: a complete set for each
 * distribution evaluates, and every parameter outside the list is refused.
 */
class TypeBParametersOfTest {

    /** One complete, valid set of parameters per distribution (JCGM 100:2008 4.3.7; JCGM 101:2008 6.4). */
    private static Map<String, Double> complete(String d) {
        Map<String, Double> p = new LinkedHashMap<>();
        p.put("estimate", 1.0);
        switch (d) {
            case "normal": p.put("standardUncertainty", 0.1); break;
            case "trapezoidal": p.put("halfWidth", 0.1); p.put("beta", 0.5); break;
            case "curvilinear-trapezoid": p.put("halfWidth", 0.1); p.put("halfWidthUncertainty", 0.01); break;
            case "student-t": p.put("scale", 0.1); p.put("dof", 5.0); break;
            case "exponential": case "constant": break;
            default: p.put("halfWidth", 0.1);
        }
        return p;
    }

    @Test
    void everyParameterOutsideTheListIsRefusedByTheFactory() {
        for (String d : TypeB.DISTRIBUTIONS) {
            List<String> own = TypeB.parametersOf(d);
            assertTrue(own.containsAll(complete(d).keySet()), d + ": the complete set is offered");
            assertDoesNotThrow(() -> TypeB.of(d, complete(d)), d);
            for (String other : TypeB.parameterNames()) {
                if (own.contains(other)) {
                    continue;
                }
                Map<String, Double> p = complete(d);
                p.put(other, 0.5);
                assertThrows(InvalidParameterException.class, () -> TypeB.of(d, p), d + " with " + other);
            }
        }
    }

    @Test
    void screenNamesAreNotFileKeys() {
        assertEquals("U-shaped", TypeB.screenName("arcsine"));
        assertEquals("Half-width a", TypeB.parameterScreenName("halfWidth"));
        for (String p : TypeB.parameterNames()) {
            assertTrue(!TypeB.parameterScreenName(p).equals(p), p);
        }
        assertThrows(InvalidParameterException.class, () -> TypeB.parametersOf("uniform"));
    }
}
