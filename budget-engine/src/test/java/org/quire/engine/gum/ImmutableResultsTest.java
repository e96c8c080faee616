package org.quire.engine.gum;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.OutputQuantity;
import org.quire.engine.budget.TypeB;
import org.quire.engine.model.FunctionLibrary;

/** A result cannot be changed through the arrays it hands out or was built from. */
class ImmutableResultsTest {
    @Test
    void changingTheReturnedMatricesChangesNothing() throws Exception {
        Map<String, Double> n = Map.of("estimate", 2.0, "standardUncertainty", 0.1);
        Budget b = Budget.of("y = a + c\nz = a - c", List.of(new OutputQuantity("y", "1", "sum"),
                new OutputQuantity("z", "1", "difference")),
                List.of(InputQuantity.of("a", TypeB.of("normal", n)), InputQuantity.of("c", TypeB.of("normal", n))));
        GumResult r = GumEvaluator.evaluate(b, FunctionLibrary.standard());
        // JCGM 102:2011 6.2.1.3: cov(y, z) = u(a)^2 - u(c)^2 = 0, r(y, z) = 0 (worked by hand)
        assertEquals(0.0, r.correlation()[0][1], 1e-15);
        r.correlation()[0][1] = 42;
        r.covariance()[0][1] = 42;
        assertEquals(0.0, r.correlation()[0][1], 1e-15);
        assertEquals(0.0, r.correlation(0, 1), 1e-15);
        assertEquals(0.0, r.covariance()[0][1], 1e-15);
        double[][] mine = {{1, 0}, {0, 1}};
        GumResult made = new GumResult(r.outputs(), mine, mine, r.quantities(), r.warnings(), r.settings());
        mine[0][1] = 42;
        assertEquals(0.0, made.covariance(0, 1), 0);
        assertEquals(0.0, made.correlation()[0][1], 0);
    }
}
