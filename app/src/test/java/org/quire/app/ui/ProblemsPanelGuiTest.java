package org.quire.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import javax.swing.JTable;
import org.junit.jupiter.api.Test;
import org.quire.app.ui.document.Problem;
import org.quire.app.ui.notebook.BudgetEditor;

/**
 * A refused entry shows in the status line and in the problems list, and both clear once the field is fixed;
 * with nothing to list, the problems pane shrinks to its title line.
 */
class ProblemsPanelGuiTest extends GuiTestSupport {

    private int problemsHeight() throws Exception {
        return onEdt(() -> frame.problemsPanel().getHeight());
    }

    @Test
    void aRefusedEntryIsListedUntilFixedAndTheEmptyListTakesOneLine() throws Exception {
        BudgetEditor ed = openDemo();
        onEdt(() -> { frame.validate(); return null; });
        waitFor("the problems pane shrunk to its title", () -> frame.panes().problemsCollapsed());
        int titleLine = onEdt(() -> frame.problemsPanel().collapsedHeight());
        int collapsed = problemsHeight();
        assertTrue(collapsed <= titleLine + 2, "the empty pane is " + collapsed + " px, its title line " + titleLine);
        assertEquals(" Problems: none", onEdt(() -> frame.problemsPanel().titleText()));

        JTable inputs = onEdt(ed::inputsTable);
        Object before = onEdt(() -> inputs.getValueAt(0, 3));
        onEdt(() -> { inputs.setValueAt("12,5,3", 0, 3); return null; });
        String refused = onEdt(frame::statusText);
        assertTrue(!refused.isBlank(), "the status line says why");
        List<Problem> listed = onEdt(frame::shownProblems);
        assertEquals(1, listed.size(), listed.toString());
        assertEquals(Problem.Area.ENTRY, listed.get(0).area());
        assertEquals(refused, listed.get(0).message());
        assertEquals(" Problems: 1 error", onEdt(() -> frame.problemsPanel().titleText()));
        onEdt(() -> { frame.validate(); return null; });
        assertTrue(problemsHeight() > collapsed + 40, "the pane opens to show the list: " + problemsHeight() + " px");

        onEdt(() -> { inputs.setValueAt(String.valueOf(before), 0, 3); return null; });
        assertEquals(" ", onEdt(frame::statusText), "the error leaves the status line once the field is fixed");
        waitForCurrentResult(ed);
        assertTrue(onEdt(frame::shownProblems).isEmpty(), "and the problems list");
        onEdt(() -> { frame.validate(); return null; });
        assertTrue(onEdt(() -> frame.panes().problemsCollapsed()));
    }

    @Test
    void countsArePlural() {
        assertEquals("none", ProblemsPanel.summary(0, 0));
        assertEquals("1 error", ProblemsPanel.summary(1, 0));
        assertEquals("2 errors, 1 warning", ProblemsPanel.summary(2, 1));
        assertEquals("3 warnings", ProblemsPanel.summary(0, 3));
    }
}
