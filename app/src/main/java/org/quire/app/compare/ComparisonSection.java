package org.quire.app.compare;

import java.util.ArrayList;
import java.util.List;
import org.quire.app.report.MathText;
import org.quire.app.report.ReportSection;
import org.quire.app.report.Table;
import org.quire.app.report.Table.Align;
import org.quire.app.report.Table.Cell;
import org.quire.app.report.Table.Column;
import org.quire.app.report.Typesetter;
import org.quire.engine.budget.InputQuantity;
import org.quire.engine.gum.Figures;

/** A {@link Comparison} as a report section: what changed and the effect on U. Stateless and thread-safe. */
public final class ComparisonSection {
    private ComparisonSection() {
    }

    /**
     * @param c the comparison
     * @param nameA what to call the earlier budget, e.g. "revision 2"
     * @param nameB what to call this budget
     */
    public static ReportSection of(Comparison c, String nameA, String nameB) {
        List<String> paragraphs = new ArrayList<>();
        paragraphs.add(c.identical() ? "The content of " + nameB + " is the same as that of " + nameA + "."
                : "Changes from " + nameA + " to " + nameB + ".");
        if (c.modelChanged()) {
            StringBuilder m = new StringBuilder("Model lines changed: ");
            boolean first = true;
            for (LineEdit e : c.model()) {
                if (e.kind() != LineEdit.Kind.KEPT) {
                    m.append(first ? "" : "; ").append(e.kind() == LineEdit.Kind.ADDED ? "added " : "removed ")
                            .append(e.text().strip());
                    first = false;
                }
            }
            paragraphs.add(m + ".");
        }
        List<Table> tables = new ArrayList<>();
        List<List<Cell>> rows = new ArrayList<>();
        for (InputQuantity q : c.inputsAdded()) {
            rows.add(List.of(Cell.math(Typesetter.name(q.name())), Cell.text("added"), Cell.text(""),
                    Cell.text(ComparisonText.describe(q))));
        }
        for (InputQuantity q : c.inputsRemoved()) {
            rows.add(List.of(Cell.math(Typesetter.name(q.name())), Cell.text("removed"), Cell.text(ComparisonText.describe(q)),
                    Cell.text("")));
        }
        for (QuantityChange q : c.inputsChanged()) {
            for (FieldChange f : q.changes()) {
                rows.add(List.of(Cell.math(Typesetter.name(q.name())), Cell.text(f.field()), Cell.text(f.before()),
                        Cell.text(f.after())));
            }
        }
        for (FieldChange f : c.settings()) {
            rows.add(List.of(Cell.text("settings"), Cell.text(f.field()), Cell.text(f.before()), Cell.text(f.after())));
        }
        for (FieldChange f : c.correlations()) {
            rows.add(List.of(Cell.text("correlation"), Cell.text(f.field()), Cell.text(f.before()), Cell.text(f.after())));
        }
        for (FieldChange f : c.budgetChanges()) {
            rows.add(List.of(Cell.text("budget"), Cell.text(f.field()), Cell.text(f.before()), Cell.text(f.after())));
        }
        tables.add(new Table("changes", "Changes from " + nameA + " to " + nameB, List.of(
                Column.of("Item", "item", Align.LEFT, 1f), Column.of("Field", "field", Align.LEFT, 1.3f),
                Column.of(nameA, "before", Align.LEFT, 3f), Column.of(nameB, "after", Align.LEFT, 3f)), rows));
        List<List<Cell>> eff = new ArrayList<>();
        for (OutputEffect e : c.effects()) {
            double pct = e.changePercent();
            eff.add(List.of(Cell.math(Typesetter.name(e.name())), Cell.number(Figures.sig(e.expandedA(), 4), e.expandedA()),
                    Cell.number(Figures.sig(e.expandedB(), 4), e.expandedB()),
                    Cell.number(Double.isNaN(pct) ? "–" : String.format(java.util.Locale.ROOT, "%+.2f", pct), pct),
                    Cell.text(org.quire.engine.units.Units.display(e.unit()))));
        }
        tables.add(new Table("change-effect", "Effect on the expanded uncertainty", List.of(
                Column.of("Y", "output", Align.LEFT, 1f),
                new Column(MathText.of(List.of(new MathText.Run("U", true, MathText.Shift.BASE),
                        new MathText.Run("A", false, MathText.Shift.SUB))), "expanded_a", Align.RIGHT, 1.3f),
                new Column(MathText.of(List.of(new MathText.Run("U", true, MathText.Shift.BASE),
                        new MathText.Run("B", false, MathText.Shift.SUB))), "expanded_b", Align.RIGHT, 1.3f),
                Column.of("change (%)", "change_percent", Align.RIGHT, 1f),
                Column.of("Unit", "unit", Align.LEFT, 0.8f)), eff));
        return new ReportSection("comparison", "Changes from " + nameA, paragraphs, tables, List.of());
    }
}
