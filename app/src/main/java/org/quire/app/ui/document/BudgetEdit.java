package org.quire.app.ui.document;

import java.util.Objects;
import org.quire.engine.budget.Budget;

/**
 * One undoable change to a budget: a named command holding the budget before and after. Because {@link Budget}
 * is immutable, undo and redo are just a swap of snapshots.
 *
 * @param name what the change did, for the Edit menu ("Change estimate of T_tank")
 * @param before the budget before the change
 * @param after the budget after the change
 * @param mergeKey edits with the same non-empty key that follow each other quickly merge into one (typing)
 * @param timeMillis when the change was made
 */
public record BudgetEdit(String name, Budget before, Budget after, String mergeKey, long timeMillis) {
    public BudgetEdit {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(before, "before");
        Objects.requireNonNull(after, "after");
        mergeKey = mergeKey == null ? "" : mergeKey;
    }

    /** @return whether {@code next} continues this edit (same key, within {@code windowMillis}) */
    boolean absorbs(BudgetEdit next, long windowMillis) {
        return !mergeKey.isEmpty() && mergeKey.equals(next.mergeKey)
                && next.timeMillis - timeMillis <= windowMillis && next.before.equals(after);
    }

    BudgetEdit merge(BudgetEdit next) {
        return new BudgetEdit(name, before, next.after, mergeKey, next.timeMillis);
    }
}
