package org.quire.app.ui.common;

import javax.swing.JComponent;
import org.quire.app.ui.document.Recalculation;
import org.quire.engine.budget.Budget;

/** One part of a budget notebook: a view over the budget and the engine's latest answer. */
public interface Section {
    /** @return the heading, also used in the outline */
    String title();

    /** @return the section's content */
    JComponent body();

    /** The budget changed (edit, undo, redo, opening). Called on the event thread. */
    void budgetChanged(Budget budget);

    /** The document's details, status or history changed (also after every budget change). */
    default void documentChanged(org.quire.engine.document.BudgetDocument content) {
    }

    /** The engine answered for the present budget. Called on the event thread. */
    default void recalculated(Recalculation r) {
    }

    /** The document switched between editable and review copy. */
    default void readOnlyChanged(boolean readOnly) {
    }
}
