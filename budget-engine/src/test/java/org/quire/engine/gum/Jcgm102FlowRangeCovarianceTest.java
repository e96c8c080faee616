package org.quire.engine.gum;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.Correlation;
import org.quire.engine.budget.FlowPoints;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.budget.OutputQuantity;
import org.quire.engine.budget.TypeB;
import org.quire.engine.model.FunctionLibrary;

/**
 * JCGM 102:2011 6.2.1.3: the covariance of the results at several flow points, U_y = C U_x C^T for the stacked
 * point models, where inputs without a column in the table are shared by all points. Checked against limiting
 * cases (no shared input: r = 0; only shared inputs: r = +-1) and a two-point case computed by hand.
 */
class Jcgm102FlowRangeCovarianceTest {
    private static final FunctionLibrary LIB = FunctionLibrary.standard();

    private static InputQuantity normal(String name, double x, double u) {
        return InputQuantity.of(name, TypeB.of("normal", Map.of("estimate", x, "standardUncertainty", u)));
    }

    private static InputQuantity constant(String name, double x) {
        return InputQuantity.of(name, TypeB.of("constant", Map.of("estimate", x)));
    }

    private static Budget budget(String model, List<InputQuantity> inputs) {
        return Budget.of(model, List.of(OutputQuantity.of("y")), inputs);
    }

    private static FlowPoints table(List<String> columns, double[]... rows) {
        List<FlowPoints.Row> r = new java.util.ArrayList<>();
        for (double[] row : rows) {
            r.add(new FlowPoints.Row(row[0], java.util.Arrays.copyOfRange(row, 1, row.length)));
        }
        return FlowPoints.of("m3/h", columns, r);
    }

    @Test
    void twoPointsSharingAFactorAgreeWithTheHandComputation() throws Exception {
        // y = k q; k = 2, u(k) = 0.1 shared; q = 1 and 2 with u(q) = 0.05 at each point (by hand):
        // u^2(y1) = 1 * 0.01 + 4 * 0.0025 = 0.02; u^2(y2) = 4 * 0.01 + 4 * 0.0025 = 0.05;
        // cov(y1, y2) = q1 q2 u^2(k) = 0.02; r = 0.02 / sqrt(0.02 * 0.05) = sqrt(0.4)
        Budget b = budget("y = k * q", List.of(normal("k", 2, 0.1), normal("q", 1, 0.05)));
        FlowRangeResult r = FlowRange.evaluate(b, table(List.of("q"), new double[] {1, 1}, new double[] {2, 2}), LIB);
        assertEquals(2.0, r.points().get(0).estimate(), 1e-15);
        assertEquals(4.0, r.points().get(1).estimate(), 1e-15);
        assertEquals(0.02, r.covariance()[0][0], 1e-15);
        assertEquals(0.05, r.covariance()[1][1], 1e-15);
        assertEquals(0.02, r.covariance()[0][1], 1e-15);
        assertEquals(Math.sqrt(0.4), r.correlation()[0][1], 1e-12);
        assertEquals(r.correlation()[0][1], r.correlation()[1][0], 0.0);
        assertEquals(2 * Math.sqrt(0.05), r.points().get(1).expandedUncertainty(), 1e-3,
                "k = t_95.45(inf) = 2.000 (JCGM 100:2008 Table G.2)");
    }

    @Test
    void theBudgetOfAPointIsTheOneTheRangeEvaluatesThere() throws Exception {
        // y = k q with the second point's q = 2, u(q) = 0.05 and the shared k = 2, u(k) = 0.1 (by hand):
        // y = 4, u^2(y) = q^2 u^2(k) + k^2 u^2(q) = 4 * 0.01 + 4 * 0.0025 = 0.05
        Budget b = budget("y = k * q", List.of(normal("k", 2, 0.1), normal("q", 1, 0.05)))
                .withFlowPoints(table(List.of("q", "u(q)"), new double[] {1, 1, 0.05}, new double[] {2, 2, 0.05}));
        Budget second = FlowRange.atPoint(b, 1);
        assertEquals(null, second.flowPoints(), "the budget of a point is a budget of that point only");
        OutputResult y = GumEvaluator.evaluate(second, LIB).output("y");
        assertEquals(4.0, y.estimate(), 1e-15);
        assertEquals(Math.sqrt(0.05), y.standardUncertainty(), 1e-15);
        assertEquals(FlowRange.evaluate(b, LIB).points().get(1).standardUncertainty(), y.standardUncertainty(), 0.0);
        assertThrows(IllegalArgumentException.class, () -> FlowRange.atPoint(b, 2));
        assertThrows(IllegalArgumentException.class, () -> FlowRange.atPoint(b.withFlowPoints(null), 0));
    }

    @Test
    void theListenerHearsOfEachPointAndCanStopTheEvaluation() throws Exception {
        Budget b = budget("y = k * q", List.of(normal("k", 2, 0.1), normal("q", 1, 0.05)))
                .withFlowPoints(table(List.of("q"), new double[] {1, 1}, new double[] {2, 2}, new double[] {3, 3}));
        List<String> heard = new java.util.ArrayList<>();
        FlowRangeResult r = FlowRange.evaluate(b, LIB, new FlowRange.Listener() {
            @Override
            public void pointDone(int done, int of) {
                heard.add(done + "/" + of);
            }

            @Override
            public boolean cancelled() {
                return false;
            }
        });
        assertEquals(List.of("1/3", "2/3", "3/3"), heard);
        assertEquals(FlowRange.evaluate(b, LIB).points(), r.points(), "the listener changes no figure");
        java.util.concurrent.CancellationException e = assertThrows(java.util.concurrent.CancellationException.class,
                () -> FlowRange.evaluate(b, LIB, new FlowRange.Listener() {
                    private int done;

                    @Override
                    public void pointDone(int d, int of) {
                        done = d;
                    }

                    @Override
                    public boolean cancelled() {
                        return done == 2;
                    }
                }));
        assertTrue(e.getMessage().contains("after 2 of 3 points"), e.getMessage());
    }

    @Test
    void withNoSharedInputThePointResultsAreUncorrelated() throws Exception {
        Budget b = budget("y = k * q", List.of(normal("k", 2, 0.1), normal("q", 1, 0.05)));
        FlowRangeResult r = FlowRange.evaluate(b, table(List.of("k", "q"), new double[] {1, 2, 1},
                new double[] {2, 2, 2}, new double[] {3, 2, 3}), LIB);
        for (int p = 0; p < 3; p++) {
            for (int q = 0; q < 3; q++) {
                assertEquals(p == q ? 1.0 : 0.0, r.correlation()[p][q], 0.0);
            }
        }
    }

    @Test
    void withOnlySharedUncertainInputsTheCorrelationIsPlusOrMinusOne() throws Exception {
        // y = k (q - 1.5): the sensitivity to k is -0.5 at q = 1 and +0.5 at q = 2 (q exact at each point)
        Budget b = budget("y = k * (q - 1.5)", List.of(normal("k", 2, 0.1), constant("q", 1)));
        FlowRangeResult r = FlowRange.evaluate(b, table(List.of("q"), new double[] {1, 1}, new double[] {2, 2},
                new double[] {3, 3}), LIB);
        assertEquals(-1.0, r.correlation()[0][1], 1e-12);
        assertEquals(1.0, r.correlation()[1][2], 1e-12);
        assertEquals(-1.0, r.correlation()[0][2], 1e-12);
    }

    @Test
    void aUColumnMakesTheUncertaintyVaryFromPointToPoint() throws Exception {
        Budget b = budget("y = k * q", List.of(normal("k", 2, 0.1), normal("q", 1, 0.05)));
        FlowRangeResult r = FlowRange.evaluate(b, table(List.of("q", "u(q)"), new double[] {1, 1, 0.05},
                new double[] {2, 2, 0.2}), LIB);
        assertEquals(4 * 0.01 + 4 * 0.04, r.covariance()[1][1], 1e-15);
    }

    @Test
    void badTablesAreRefusedWithTheirColumnOrPoint() {
        Budget b = budget("y = k * q", List.of(normal("k", 2, 0.1), normal("q", 1, 0.05)))
                .withCorrelations(List.of(Correlation.of("k", "q", 0.3)));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> FlowRange.evaluate(b,
                table(List.of("q"), new double[] {1, 1}, new double[] {2, 2}), LIB));
        assertTrue(e.getMessage().contains("'k' and 'q'"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> FlowRange.evaluate(b,
                table(List.of("qq"), new double[] {1, 1}, new double[] {2, 2}), LIB));
        assertTrue(e.getMessage().contains("column 'qq'"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> table(List.of("q", "u(q)"), new double[] {1, 1, 0.1},
                new double[] {2, 2, -0.1}));
        assertTrue(e.getMessage().contains("flow point 2, column 'u(q)'"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> table(List.of("q"), new double[] {1, 1}));
        assertTrue(e.getMessage().contains("at least 2 flow points"), e.getMessage());
    }
}
