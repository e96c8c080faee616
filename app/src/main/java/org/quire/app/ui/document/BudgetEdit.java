package org.quire.app.ui.document;

import java.util.Objects;
import org.quire.engine.document.BudgetDocument;

/**
 * One undoable change to a budget document: a named command holding the engine's document before and after.
 * Because the engine's {@link BudgetDocument} is immutable, undo and redo are just a swap of snapshots; the
 * snapshot carries the status, revision and history too, so undoing the first edit of an approved document
 * brings the approved revision back.
 *
 * @param name what the change did, for the Edit menu ("Change estimate of T_tank")
 * @param before the document before the change
 * @param after the document after the change
 * @param mergeKey edits with the same non-empty key that follow each other quickly merge into one (typing)
 * @param timeMillis when the change was made
 */
public record BudgetEdit(String name, BudgetDocument before, BudgetDocument after, String mergeKey,
        long timeMillis) {
    public BudgetEdit {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(before, "before");
        Objects.requireNonNull(after, "after");
        mergeKey = mergeKey == null ? "" : mergeKey;
    }

    /** @return whether {@code next} continues this edit (same key, within {@code windowMillis}) */
    boolean absorbs(BudgetEdit next, long windowMillis) {
        return !mergeKey.isEmpty() && mergeKey.equals(next.mergeKey)
                && next.timeMillis - timeMillis <= windowMillis && next.before.equals(after)
                && next.after.status() == after.status() && next.after.revision() == after.revision();
    }

    BudgetEdit merge(BudgetEdit next) {
        return new BudgetEdit(name, before, next.after, mergeKey, next.timeMillis);
    }
}
