package org.quire.engine.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The measurement-model language: syntax, precedence, names, definitions and their errors. */
class ModelLanguageTest {

    private static double eval(String model, List<String> inputs, double... x) throws ModelException {
        return ModelCompiler.compile(model, inputs, List.of("y"), FunctionLibrary.standard()).evaluate(x)[0];
    }

    private static ModelException fails(String model, List<String> inputs) {
        return assertThrows(ModelException.class,
                () -> ModelCompiler.compile(model, inputs, List.of("y"), FunctionLibrary.standard()));
    }

    @Test
    void precedenceFollowsOrdinaryMathematics() throws ModelException {
        // common practice: ^ binds tighter than unary minus and is right-associative
        assertEquals(-4, eval("y = -2^2", List.of()), 0);
        assertEquals(512, eval("y = 2^3^2", List.of()), 0);
        assertEquals(0.5, eval("y = 2^-1", List.of()), 0);
        assertEquals(7, eval("y = 1 + 2 * 3", List.of()), 0);
        assertEquals(2, eval("y = 8 / 2 / 2", List.of()), 0);
        assertEquals(9, eval("y = (1 + 2) * 3", List.of()), 0);
        assertEquals(1.5e-3 * 2, eval("y = 1.5e-3 * 2", List.of()), 0);
        assertEquals(6, eval("y = 2 × 3", List.of()), 0);
    }

    @Test
    void standardFunctionsAndPi() throws ModelException {
        assertEquals(3, eval("y = sqrt(9)", List.of()), 0);
        assertEquals(Math.E, eval("y = exp(1)", List.of()), 1e-15);
        assertEquals(1, eval("y = ln(exp(1))", List.of()), 1e-15);
        assertEquals(2, eval("y = log10(100)", List.of()), 0);
        assertEquals(3, eval("y = abs(-3)", List.of()), 0);
        assertEquals(0, eval("y = sin(pi)", List.of()), 1e-15);
        assertEquals(-1, eval("y = cos(pi)", List.of()), 0);
        assertEquals(1, eval("y = tan(pi / 4)", List.of()), 1e-15);
        assertEquals(Math.PI / 2, eval("y = asin(1)", List.of()), 0);
        assertEquals(0, eval("y = acos(1)", List.of()), 0);
        assertEquals(Math.PI / 4, eval("y = atan(1)", List.of()), 0);
        assertEquals(1, eval("y = min(3, 1, 2)", List.of()), 0);
        assertEquals(3, eval("y = max(3, 1, 2)", List.of()), 0);
    }

    @Test
    void equationsMayComeInAnyOrderAndUseEachOther() throws ModelException {
        String model = "y = 2 * b + a\n# a comment\nb = a ^ 2   # trailing comment\n";
        assertEquals(2 * 9 + 3, eval(model, List.of("a"), 3), 0);
    }

    @Test
    void functionsOfTheModelsOwnAreInlined() throws ModelException {
        String model = "sq(t) = t * t\nhyp(a, b) = sqrt(sq(a) + sq(b))\ny = hyp(x1, x2)";
        assertEquals(5, eval(model, List.of("x1", "x2"), 3, 4), 1e-15);
    }

    @Test
    void lineContinuesAfterAnOperatorOrInsideParentheses() throws ModelException {
        assertEquals(6, eval("y = 1 +\n 2 +\n 3", List.of()), 0);
        assertEquals(6, eval("y = (1\n + 2\n + 3)", List.of()), 0);
    }

    @Test
    void syntaxErrorsNameLineAndColumn() {
        ModelException e = fails("y = 1 + 2\n\nz = (2 * 3", List.of());
        ModelProblem p = e.problems().get(0);
        assertEquals(3, p.line());
        assertTrue(p.message().contains("')'"), p.message());
        ModelException e2 = fails("y = 2 $ 3", List.of());
        assertEquals(1, e2.problems().get(0).line());
        assertEquals(7, e2.problems().get(0).column());
        ModelException e3 = fails("y = 2x", List.of("x"));
        assertTrue(e3.problems().get(0).message().contains("2 * x"), e3.getMessage());
        ModelException e4 = fails("y = ", List.of());
        assertTrue(e4.problems().get(0).message().contains("empty"), e4.getMessage());
    }

    @Test
    void unknownNameSuggestsTheNearestKnownName() {
        ModelException e = fails("y = rho_wat * 2", List.of("rho_water", "t_c"));
        ModelProblem p = e.problems().get(0);
        assertEquals(1, p.line());
        assertEquals(5, p.column());
        assertTrue(p.message().contains("unknown name 'rho_wat'"), p.message());
        assertTrue(p.message().contains("did you mean 'rho_water'"), p.message());
        ModelException f = fails("y = sqr(2)", List.of());
        assertTrue(f.problems().get(0).message().contains("did you mean 'sqrt'"), f.getMessage());
    }

    @Test
    void duplicateDefinitionsAndCyclesAreReportedWhereTheyAre() {
        ModelException dup = fails("y = 1\ny = 2", List.of());
        assertEquals(2, dup.problems().get(0).line());
        assertTrue(dup.problems().get(0).message().contains("already defined on line 1"));
        ModelException cyc = fails("y = a + 1\na = b * 2\nb = a", List.of());
        assertTrue(cyc.problems().stream().anyMatch(p -> p.message().contains("circular definition")
                && p.message().contains("a -> b -> a")), cyc.getMessage());
        ModelException self = fails("y = y + 1", List.of());
        assertTrue(self.getMessage().contains("y -> y"), self.getMessage());
        ModelException input = fails("y = x\nx = 2", List.of("x"));
        assertTrue(input.getMessage().contains("input quantity"), input.getMessage());
        ModelException rec = fails("f(a) = f(a) + 1\ny = f(2)", List.of());
        assertTrue(rec.getMessage().contains("calls itself"), rec.getMessage());
    }

    @Test
    void wrongArgumentCountsAndMissingOutputs() {
        assertTrue(fails("y = sqrt(1, 2)", List.of()).getMessage().contains("takes 1 argument"));
        assertTrue(fails("y = max(1)", List.of()).getMessage().contains("2 or more"));
        ModelException out = assertThrows(ModelException.class, () -> ModelCompiler.compile("z = 1", List.of(),
                List.of("y"), FunctionLibrary.standard()));
        assertTrue(out.getMessage().contains("output 'y' is not defined"), out.getMessage());
    }

    @Test
    void domainErrorsAtTheEstimatesNameTheOperation() throws ModelException {
        CompiledModel m = ModelCompiler.compile("y = a / (b - 2)", List.of("a", "b"), List.of("y"),
                FunctionLibrary.standard());
        ModelException e = assertThrows(ModelException.class, () -> m.evaluate(new double[] {1, 2}));
        assertTrue(e.getMessage().contains("division by zero"), e.getMessage());
        assertTrue(e.getMessage().contains("b - 2"), e.getMessage());
        assertEquals(1, e.problems().get(0).line());
        CompiledModel s = ModelCompiler.compile("y = sqrt(a)", List.of("a"), List.of("y"), FunctionLibrary.standard());
        assertTrue(assertThrows(ModelException.class, () -> s.evaluate(new double[] {-1})).getMessage()
                .contains("square root of a negative number"));
        CompiledModel l = ModelCompiler.compile("y = ln(a)", List.of("a"), List.of("y"), FunctionLibrary.standard());
        assertThrows(ModelException.class, () -> l.evaluate(new double[] {0}));
    }

    @Test
    void unusedInputsAreWarnedAbout() throws ModelException {
        CompiledModel m = ModelCompiler.compile("y = a", List.of("a", "b"), List.of("y"), FunctionLibrary.standard());
        assertEquals(1, m.warnings().size());
        assertTrue(m.warnings().get(0).message().contains("'b'"));
    }

    @Test
    void blockEvaluationAgreesWithScalarEvaluation() throws ModelException {
        CompiledModel m = ModelCompiler.compile("f(t) = 1 + t^2\ny = a * f(b) / sqrt(c) - 3 * a^-1 + max(a, b)",
                List.of("a", "b", "c"), List.of("y"), FunctionLibrary.standard());
        int n = 37;
        double[][] in = new double[3][n];
        double[][] out = new double[1][n];
        for (int t = 0; t < n; t++) {
            in[0][t] = 1 + 0.1 * t;
            in[1][t] = -2 + 0.2 * t;
            in[2][t] = 0.5 + t;
        }
        BlockEvaluator.Session s = m.newSession(64);
        s.evaluate(in, n, out);
        for (int t = 0; t < n; t++) {
            assertEquals(m.evaluate(new double[] {in[0][t], in[1][t], in[2][t]})[0], out[0][t], 1e-12);
        }
    }

    @Test
    void aModelOfVeryManyOperationsWorksThroughABlockInPiecesWithTheSameValues() throws ModelException {
        // A function that calls another twice at every level doubles the written-out model at each level; 15
        // levels give about 65 000 operations, whose full-length scratch arrays (8192 trials) would need 4 GB.
        StringBuilder text = new StringBuilder("g0(x) = x + 1\n");
        for (int k = 1; k <= 15; k++) {
            text.append("g").append(k).append("(x) = (g").append(k - 1).append("(x) + g").append(k - 1)
                    .append("(x)) / 2\n");
        }
        text.append("y = g15(a) * b");
        CompiledModel m = ModelCompiler.compile(text.toString(), List.of("a", "b"), List.of("y"),
                FunctionLibrary.standard());
        int block = 8192;
        assertTrue(CompiledModel.innerBlock(1 << 16, block) < block, "the session must work in pieces");
        int n = 5000;
        double[][] in = new double[2][n];
        double[][] out = new double[1][n];
        for (int t = 0; t < n; t++) {
            in[0][t] = 0.001 * t;
            in[1][t] = 2 - 0.0001 * t;
        }
        m.newSession(block).evaluate(in, n, out);
        for (int t = 0; t < n; t += 7) {
            // (x + 1) averaged with itself at every level stays x + 1
            assertEquals((in[0][t] + 1) * in[1][t], out[0][t], 1e-12, "trial " + t);
        }
    }
}
