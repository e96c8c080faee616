package org.quire.app.ui.common;

import java.util.function.UnaryOperator;
import org.quire.app.ui.document.BudgetDocument;
import org.quire.engine.budget.Budget;
import org.quire.engine.model.FunctionLibrary;

/**
 * What a notebook section or the inspector needs from the editor it sits in: the document, the engine's
 * function library, a way to make an edit that reports a refused value, and the selection.
 */
public interface EditorContext {
    BudgetDocument document();

    FunctionLibrary library();

    /**
     * Applies an edit; when the engine refuses the new value (IllegalArgumentException) or the budget is a
     * review copy, the message is shown and the budget stays as it was.
     *
     * @return whether the budget changed
     */
    boolean edit(String name, String mergeKey, UnaryOperator<Budget> change);

    /**
     * Applies a change of the whole document (details, status, template changes); a refusal by the engine
     * (IllegalArgumentException or IllegalStateException) is shown and the document stays as it was.
     *
     * @return whether the document changed
     */
    boolean editDocument(String name, String mergeKey,
            UnaryOperator<org.quire.engine.document.BudgetDocument> change);

    /** Shows a short message in the status line (an error when {@code error}). */
    void status(String message, boolean error);

    /** Selects an input for the inspector; null for none. */
    void selectInput(String name);

    /** @return whether nothing may be changed */
    default boolean readOnly() {
        return document().isReadOnly();
    }
}
