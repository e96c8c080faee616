package org.quire.engine.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * A mistake is reported where it was made, once: a '(' left open is reported at the end of its own line (not at
 * the next equation, which is read as written), and the uses of a quantity whose line cannot be read bring no
 * further "unknown name" or "not defined" messages, nor suggestions.
 */
class ModelErrorPlacementTest {

    private static List<ModelProblem> errors(String model, List<String> inputs, List<String> outputs) {
        ModelException e = assertThrows(ModelException.class,
                () -> ModelCompiler.compile(model, inputs, outputs, FunctionLibrary.standard()));
        return e.problems().stream().filter(ModelProblem::isError).toList();
    }

    @Test
    void aMissingClosingParenthesisIsReportedAtTheEndOfItsLine() {
        String line1 = "theta = (theta_mean + theta_cyclic";
        List<ModelProblem> p = errors(line1 + "\nd = d_mean + d_random\nl = l_s + d - l_s * (a * theta + b)",
                List.of("theta_mean", "theta_cyclic", "d_mean", "d_random", "l_s", "a", "b"), List.of("l"));
        assertEquals(1, p.size(), "one mistake, one message: " + p);
        assertEquals(1, p.get(0).line(), p.toString());
        assertEquals(line1.length() + 1, p.get(0).column(), "just after the last character of the line: " + p);
        assertEquals("expected ')' to close the '(' at column 9, found end of line", p.get(0).message());
    }

    @Test
    void aCommentLineBetweenDoesNotMoveTheReport() {
        String line1 = "m = (a + b";
        List<ModelProblem> p = errors(line1 + "\n# the next quantity\n\ny = 2 * m", List.of("a", "b"), List.of("y"));
        assertEquals(1, p.size(), p.toString());
        assertEquals(1, p.get(0).line(), p.toString());
        assertEquals(line1.length() + 1, p.get(0).column(), p.toString());
    }

    @Test
    void theLastLineLeftOpenIsReportedAtItsEnd() {
        List<ModelProblem> p = errors("y = 2 * (x + 1", List.of("x"), List.of("y"));
        assertEquals(1, p.size(), p.toString());
        assertEquals(1, p.get(0).line());
        assertEquals(15, p.get(0).column(), p.toString());
    }

    @Test
    void aLineContinuedInsideParenthesesStillReads() throws ModelException {
        // the next line does not start an equation ("name ="), so it continues the open '('
        CompiledModel m = ModelCompiler.compile("y = 2 * (x +\n  1)", List.of("x"), List.of("y"),
                FunctionLibrary.standard());
        assertEquals(8, m.evaluate(new double[] {3})[0], 0);
    }

    @Test
    void anUnreadableFunctionLineBringsNoMessagesWhereItIsCalled() {
        List<ModelProblem> p = errors("f(a) = 2 * (a\ny = f(x) + 1", List.of("x"), List.of("y"));
        assertEquals(1, p.size(), p.toString());
        assertEquals(1, p.get(0).line());
        assertTrue(p.stream().noneMatch(q -> q.message().contains("did you mean")), p.toString());
    }

    @Test
    void anUnknownNameIsStillReportedWhenNoLineIsBroken() {
        List<ModelProblem> p = errors("y = x_1 + 1", List.of("x1"), List.of("y"));
        assertEquals(1, p.size(), p.toString());
        assertTrue(p.get(0).message().startsWith("unknown name 'x_1'"), p.get(0).message());
    }
}
