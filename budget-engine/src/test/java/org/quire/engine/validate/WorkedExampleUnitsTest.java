package org.quire.engine.validate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.quire.engine.budget.Budget;
import org.quire.engine.budget.OutputQuantity;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.BudgetJson;
import org.quire.engine.io.JsonCursor;
import org.quire.engine.model.CompiledModel;
import org.quire.engine.model.ModelCompiler;
import org.quire.engine.model.ModelException;
import org.quire.engine.model.ModelProblem;
import org.quire.engine.model.ModelUnits;
import org.quire.engine.units.Units;

/**
 * Every worked example's budget that states units passes the dimension check without a unit warning: the
 * published models (JCGM 100:2008 H.1, H.2, H.3; JCGM 101:2008 9.3) and the Tarrow Vale examples are
 * dimensionally consistent. So that a pass means something, each case also shows that the check is live for that
 * budget: declaring its first output in a unit of another dimension is refused. Only budgets are run (the other
 * files of the folder hold published tables, not models), and the budgets that state no unit at all are exactly the
 * abstract additive models of JCGM 101:2008 9.2, whose quantities have no unit in the publication (from memory).
 */
class WorkedExampleUnitsTest {
    private static final List<String> WITHOUT_UNITS = List.of("jcgm101-9.2.2-additive-normal.json",
            "jcgm101-9.2.3-additive-rectangular.json", "jcgm101-9.2.4-additive-dominant.json");

    private static Budget budgetOrNull(Path file) {
        try {
            JsonCursor root = JsonCursor.root(BudgetJson.parseObject(BudgetJson.readText(file)));
            return BudgetJson.FORMAT.equals(root.string("format", "")) ? BudgetJson.read(root) : null;
        } catch (IOException | BudgetFormatException e) {
            throw new AssertionError(file + ": " + e.getMessage(), e);
        }
    }

    /** @return the worked examples that are budgets stating units */
    static Stream<Path> budgetsWithUnits() throws IOException {
        return WorkedExamplesTest.examples().filter(f -> {
            Budget b = budgetOrNull(f);
            return b != null && !b.units().isEmpty();
        });
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("budgetsWithUnits")
    void theBudgetsUnitsAreConsistentAndChecked(Path file) throws ModelException {
        Budget b = budgetOrNull(file);
        CompiledModel m = b.compile(WorkedExamplesTest.TestLibrary.get());
        List<ModelProblem> w = m.warnings();
        assertTrue(w.stream().noneMatch(p -> p.message().contains("unit") || p.message().contains("side")),
                () -> file + ": " + w);

        OutputQuantity first = b.outputs().get(0);
        String other = Units.parse(first.unit()).sameDimension(Units.parse("mol")) ? "cd" : "mol";
        ModelUnits wrong = b.units().withOutput(first.name(), other, "");
        ModelException e = assertThrows(ModelException.class, () -> ModelCompiler.compile(b.model(), b.inputNames(),
                b.outputNames(), WorkedExamplesTest.TestLibrary.get(), wrong), file + ": the check did not run");
        assertTrue(e.problems().stream().anyMatch(p -> p.isError() && p.message().startsWith("output "
                + first.name() + ": left side " + other + ", right side ")), () -> file + ": " + e.problems());
    }

    @Test
    void theBudgetsWithoutUnitsAreTheAbstractModelsOfJcgm101Clause92() throws IOException {
        List<String> without = new ArrayList<>();
        int budgets = 0;
        for (Path f : WorkedExamplesTest.examples().toList()) {
            Budget b = budgetOrNull(f);
            if (b != null) {
                budgets++;
                if (b.units().isEmpty()) {
                    without.add(f.getFileName().toString());
                }
            }
        }
        assertEquals(WITHOUT_UNITS, without);
        assertFalse(budgetsWithUnits().toList().isEmpty());
        assertEquals(budgets - WITHOUT_UNITS.size(), budgetsWithUnits().count());
    }
}
