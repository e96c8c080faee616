package org.quire.app.cli;

import java.io.PrintStream;
import java.util.Set;
import org.quire.app.Engine;
import org.quire.app.compare.BudgetComparison;
import org.quire.app.compare.Comparison;
import org.quire.app.compare.ComparisonText;
import org.quire.engine.budget.Budget;

/** {@code quire diff A B}: what differs from budget A to B; exit 0 when identical, 1 when they differ. */
final class DiffCommand {
    static final String USAGE = "quire diff A B";

    private DiffCommand() {
    }

    static int run(String[] argv, PrintStream out) throws Exception {
        Args a = new Args(argv, 1, Set.of(), Set.of());
        a.expectPositional(2, USAGE);
        String fa = a.positional().get(0);
        String fb = a.positional().get(1);
        Budget ba = Files.loadBudget(fa);
        Budget bb = Files.loadBudget(fb);
        Comparison c = BudgetComparison.compare(ba, bb, Engine.library());
        out.print(ComparisonText.format(c, fa, fb));
        return c.identical() ? 0 : 1;
    }
}
