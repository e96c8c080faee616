package org.quire.app.ui.notebook;

import org.quire.engine.budget.Budget;

/** Renaming of inputs, shared by the inputs table and the inspector. */
public final class Renames {
    private Renames() {
    }

    /** @return the budget with input {@code from} named {@code to}, its correlations following */
    public static Budget input(Budget b, String from, String to) {
        return InputsTableModel.rename(b, from, to);
    }
}
