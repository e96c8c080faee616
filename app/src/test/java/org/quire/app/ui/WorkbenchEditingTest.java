package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import javax.swing.JTable;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.document.Problem;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.budget.Budget;
import org.quire.engine.gum.GumResult;

/** Editing the demo budget in the workbench: results follow, problems are listed, undo and redo. */
class WorkbenchEditingTest extends GuiTestSupport {

    private static int row(JTable t, String input) {
        for (int r = 0; r < t.getRowCount(); r++) {
            if (t.getModel().getValueAt(r, 0).equals(input)) {
                return r;
            }
        }
        throw new AssertionError("no input " + input + " in the table");
    }

    @Test
    void demoOpensWithResultsForBothOutputsAndNoErrors() throws Exception {
        BudgetEditor ed = openDemo();
        GumResult r = ed.latest().result();
        assertNotNull(r, "the demo budget evaluates");
        assertEquals(List.of("E", "q"), r.outputs().stream().map(o -> o.name()).toList());
        assertFalse(ed.latest().hasErrors());
        assertTrue(onEdt(() -> ed.resultSummary("E")).contains("E = ("), "the result line of E is shown");
    }

    @Test
    void editingAnEstimateInTheTableRecalculatesTheResults() throws Exception {
        BudgetEditor ed = openDemo();
        double before = ed.latest().result().output("E").estimate();
        String shownBefore = onEdt(() -> ed.resultSummary("E"));
        onEdt(() -> {
            JTable t = ed.inputsTable();
            t.setValueAt("1003.35", row(t, "V_ind"), 3);
            return null;
        });
        waitForCurrentResult(ed);
        GumResult r = ed.latest().result();
        double after = r.output("E").estimate();
        // E = 100 (V_m - V_ref) / V_ref with V_m = (V_ind + d_res_m)(1 + d_inst + d_elec) and every d at 0:
        // one litre more indicated raises E by 100 / V_ref percent (the model's own algebra).
        double vRef = r.quantities().get("V_ref");
        assertEquals(100 / vRef, after - before, 1e-9);
        assertNotEquals(shownBefore, onEdt(() -> ed.resultSummary("E")), "the result line shows the new figures");
    }

    @Test
    void aBadExpressionIsListedWithItsPlaceAndMarked() throws Exception {
        BudgetEditor ed = openDemo();
        onEdt(() -> {
            String model = ed.modelEditor().getText().replace("E = 100 * (V_m - V_ref) / V_ref",
                    "E = 100 * (V_m - V_ref) / V_reff");
            ed.modelEditor().setText(model);
            return null;
        });
        waitFor("the problem listed", () -> frame.shownProblems().stream().anyMatch(p -> p.message().contains("V_reff")));
        Problem p = onEdt(() -> frame.shownProblems().stream().filter(x -> x.message().contains("V_reff"))
                .findFirst().orElseThrow());
        assertEquals(Problem.Severity.ERROR, p.severity());
        assertEquals(Problem.Area.MODEL, p.area());
        assertEquals(11, p.line(), "the E equation is line 11 of the demo model");
        assertTrue(onEdt(() -> ed.modelEditor().getHighlighter().getHighlights().length) > 0, "the error is marked");
    }

    @Test
    void undoAndRedoRestoreTheBudgetAndTheDirtyMarker() throws Exception {
        BudgetEditor ed = openDemo();
        Budget original = ed.document().budget();
        onEdt(() -> {
            JTable t = ed.inputsTable();
            t.setValueAt("20.9", row(t, "T_tank"), 3);
            return null;
        });
        Budget edited = ed.document().budget();
        assertNotEquals(original, edited);
        assertTrue(onEdt(() -> tabTitle()).startsWith("\u2022"), "changed budget is marked in the tab");
        assertEquals(20.9, edited.input("T_tank").evaluation().estimate());
        onEdt(() -> { ed.document().undo(); return null; });
        assertEquals(original, ed.document().budget());
        assertFalse(onEdt(() -> tabTitle()).startsWith("\u2022"), "back at the opened state: not marked");
        onEdt(() -> { ed.document().redo(); return null; });
        assertEquals(edited, ed.document().budget());
        waitForCurrentResult(ed);
    }

    private String tabTitle() {
        javax.swing.JTabbedPane tabs = (javax.swing.JTabbedPane) find(frame.getContentPane(), "tabs");
        return tabs.getTitleAt(tabs.getSelectedIndex());
    }

    static java.awt.Component find(java.awt.Container c, String name) {
        for (java.awt.Component k : c.getComponents()) {
            if (name.equals(k.getName())) {
                return k;
            }
            if (k instanceof java.awt.Container) {
                java.awt.Component f = find((java.awt.Container) k, name);
                if (f != null) {
                    return f;
                }
            }
        }
        return null;
    }
}
