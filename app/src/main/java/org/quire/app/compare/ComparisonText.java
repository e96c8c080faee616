package org.quire.app.compare;

import java.util.List;
import java.util.Locale;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.gum.Figures;

/** A {@link Comparison} as plain text for the command line. Stateless and thread-safe. */
public final class ComparisonText {
    private ComparisonText() {
    }

    /** @param nameA how to call A (its file name) @param nameB how to call B */
    public static String format(Comparison c, String nameA, String nameB) {
        StringBuilder s = new StringBuilder();
        s.append("A: ").append(nameA).append(c.titleA().isEmpty() ? "" : "  (" + c.titleA() + ")").append('\n');
        s.append("B: ").append(nameB).append(c.titleB().isEmpty() ? "" : "  (" + c.titleB() + ")").append('\n');
        if (c.identical()) {
            s.append("\nThe budgets have the same content.\n");
        }
        fields(s, "Budget", c.budgetChanges());
        if (!c.inputsAdded().isEmpty()) {
            s.append("\nInputs added in B (").append(c.inputsAdded().size()).append("):\n");
            for (InputQuantity q : c.inputsAdded()) {
                s.append("  + ").append(describe(q)).append('\n');
            }
        }
        if (!c.inputsRemoved().isEmpty()) {
            s.append("\nInputs removed from A (").append(c.inputsRemoved().size()).append("):\n");
            for (InputQuantity q : c.inputsRemoved()) {
                s.append("  - ").append(describe(q)).append('\n');
            }
        }
        changes(s, "Inputs changed", c.inputsChanged());
        if (!c.outputsAdded().isEmpty()) {
            s.append("\nOutputs added in B: ").append(String.join(", ", c.outputsAdded())).append('\n');
        }
        if (!c.outputsRemoved().isEmpty()) {
            s.append("\nOutputs removed from A: ").append(String.join(", ", c.outputsRemoved())).append('\n');
        }
        changes(s, "Outputs changed", c.outputsChanged());
        if (c.modelChanged()) {
            s.append("\nModel (- only in A, + only in B):\n");
            for (LineEdit e : c.model()) {
                char mark = e.kind() == LineEdit.Kind.KEPT ? ' ' : e.kind() == LineEdit.Kind.ADDED ? '+' : '-';
                s.append("  ").append(mark).append(' ').append(e.text()).append('\n');
            }
        }
        fields(s, "Correlations changed", c.correlations());
        fields(s, "Settings changed", c.settings());
        fields(s, "Other fields changed", c.otherFields());
        s.append("\nEffect on the expanded uncertainty U:\n");
        if (!c.problemA().isEmpty()) {
            s.append("  A could not be evaluated: ").append(c.problemA()).append('\n');
        }
        if (!c.problemB().isEmpty()) {
            s.append("  B could not be evaluated: ").append(c.problemB()).append('\n');
        }
        s.append(String.format(Locale.ROOT, "  %-12s %-16s %-16s %-10s %-16s %-16s%n", "output", "U_A", "U_B", "change",
                "y_A", "y_B"));
        for (OutputEffect e : c.effects()) {
            String unit = e.unit().isEmpty() ? "" : " " + org.quire.engine.units.Units.display(e.unit());
            double pct = e.changePercent();
            s.append(String.format(Locale.ROOT, "  %-12s %-16s %-16s %-10s %-16s %-16s%n", e.name(),
                    Figures.sig(e.expandedA(), 4) + unit, Figures.sig(e.expandedB(), 4) + unit,
                    Double.isNaN(pct) ? "–" : String.format(Locale.ROOT, "%+.2f %%", pct),
                    Figures.compact(e.estimateA(), 10), Figures.compact(e.estimateB(), 10)));
        }
        return s.toString();
    }

    static String describe(InputQuantity q) {
        var e = q.evaluation();
        return q.name() + (q.unit().isEmpty() ? "" : " [" + org.quire.engine.units.Units.display(q.unit()) + "]") + ": x = " + Figures.estimate(e.estimate())
                + ", u = " + Figures.sig(e.standardUncertainty(), 4) + ", Type " + e.type() + ", " + e.distribution().shape()
                + (q.description().isEmpty() ? "" : " (" + q.description() + ")");
    }

    private static void fields(StringBuilder s, String heading, List<FieldChange> f) {
        if (f.isEmpty()) {
            return;
        }
        s.append('\n').append(heading).append(":\n");
        for (FieldChange c : f) {
            s.append("  ").append(c.field()).append(": ").append(show(c.before())).append(" -> ").append(show(c.after()))
                    .append('\n');
        }
    }

    private static void changes(StringBuilder s, String heading, List<QuantityChange> list) {
        if (list.isEmpty()) {
            return;
        }
        s.append('\n').append(heading).append(" (").append(list.size()).append("):\n");
        for (QuantityChange q : list) {
            s.append("  ~ ").append(q.name()).append('\n');
            for (FieldChange c : q.changes()) {
                s.append("      ").append(c.field()).append(": ").append(show(c.before())).append(" -> ")
                        .append(show(c.after())).append('\n');
            }
        }
    }

    private static String show(String v) {
        return v.isEmpty() ? "(none)" : v.contains("\n") ? "\"" + v.replace("\n", "\\n") + "\"" : v;
    }
}
