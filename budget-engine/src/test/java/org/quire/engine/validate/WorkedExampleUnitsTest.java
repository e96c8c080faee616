package org.quire.engine.validate;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.quire.engine.budget.Budget;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.io.JsonCursor;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.model.ModelException;
import org.quire.engine.model.ModelProblem;

/**
 * Every worked example's budget passes the dimension check with the units its file states, without a unit
 * warning: the published models (JCGM 100:2008 H.1, H.2; JCGM 101:2008 9.2, 9.3) are dimensionally consistent.
 */
class WorkedExampleUnitsTest {

    static Stream<Path> examples() throws IOException {
        return WorkedExamplesTest.examples();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("examples")
    void theBudgetsUnitsAreConsistent(Path file) throws IOException, BudgetFormatException, ModelException {
        JsonCursor root = JsonCursor.root(BudgetJson.parseObject(BudgetJson.readText(file)));
        if (!BudgetJson.FORMAT.equals(root.string("format", ""))) {
            return;
        }
        Budget b = BudgetJson.read(root);
        CompiledModel m = b.compile(WorkedExamplesTest.TestLibrary.get());
        List<ModelProblem> w = m.warnings();
        assertTrue(w.stream().noneMatch(p -> p.message().contains("unit") || p.message().contains("side")),
                () -> file + ": " + w);
    }
}
