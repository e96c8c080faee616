package org.quire.app.ui.document;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;

/**
 * The undo and redo stacks of one budget, as {@link BudgetEdit} command objects, with the position at which the
 * budget was last saved (for the dirty marker). Listeners hear of every change of the stacks; the Edit menu
 * and the tab title listen.
 *
 * <p>No user-interface imports. Not thread-safe: use from one thread (the event thread in the workbench).
 */
public final class EditHistory {
    /** Typing that continues the same field within this time becomes one undo step. */
    public static final long MERGE_WINDOW_MILLIS = 1500;
    private static final int LIMIT = 500;

    /** Hears of changes of the stacks or the saved position. */
    public interface Listener {
        void historyChanged(EditHistory history);
    }

    private final Deque<BudgetEdit> undo = new ArrayDeque<>();
    private final Deque<BudgetEdit> redo = new ArrayDeque<>();
    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    /** Number of edits on the undo stack when last saved; -1 when the saved state is unreachable. */
    private int savedDepth;
    private boolean merging = true;

    public void addListener(Listener l) { listeners.add(l); }
    public void removeListener(Listener l) { listeners.remove(l); }

    /** Records an edit already applied; clears the redo stack. */
    void record(BudgetEdit edit) {
        BudgetEdit last = undo.peek();
        if (merging && last != null && last.absorbs(edit, MERGE_WINDOW_MILLIS) && savedDepth != undo.size()) {
            undo.pop();
            undo.push(last.merge(edit));
        } else {
            undo.push(edit);
            if (undo.size() > LIMIT) {
                undo.removeLast();
                savedDepth = savedDepth > 0 ? savedDepth - 1 : -1;
            }
        }
        merging = true;
        if (savedDepth > undo.size() - 1 && !redo.isEmpty()) {
            savedDepth = -1;
        }
        redo.clear();
        fire();
    }

    /** Ends the current merge: the next edit starts a new undo step even with the same key. */
    public void breakMerge() {
        merging = false;
    }

    public boolean canUndo() { return !undo.isEmpty(); }
    public boolean canRedo() { return !redo.isEmpty(); }

    /** @return the name of the edit Undo would revert, or "" */
    public String undoName() { return undo.isEmpty() ? "" : undo.peek().name(); }

    /** @return the name of the edit Redo would repeat, or "" */
    public String redoName() { return redo.isEmpty() ? "" : redo.peek().name(); }

    /** @return the edit undone, so the caller can restore its {@code before} */
    BudgetEdit popUndo() {
        BudgetEdit e = undo.pop();
        redo.push(e);
        merging = false;
        fire();
        return e;
    }

    /** @return the edit redone, so the caller can restore its {@code after} */
    BudgetEdit popRedo() {
        BudgetEdit e = redo.pop();
        undo.push(e);
        merging = false;
        fire();
        return e;
    }

    /** Forgets every edit (the document was replaced from outside, e.g. by a recorded review decision). */
    public void clear() {
        undo.clear();
        redo.clear();
        savedDepth = 0;
        merging = false;
        fire();
    }

    /** Marks the present state as differing from any saved file (a recovered copy, for instance). */
    public void markUnsaved() {
        savedDepth = -1;
        merging = false;
        fire();
    }

    /** Marks the present state as saved. */
    public void markSaved() {
        savedDepth = undo.size();
        merging = false;
        fire();
    }

    /** @return whether the budget differs from the state last saved (or was never saved and was edited) */
    public boolean isDirty() {
        return savedDepth != undo.size();
    }

    private void fire() {
        for (Listener l : listeners) {
            l.historyChanged(this);
        }
    }
}
