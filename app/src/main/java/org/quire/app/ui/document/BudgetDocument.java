package org.quire.app.ui.document;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.UnaryOperator;
import org.quire.engine.budget.Budget;
import org.quire.engine.io.BudgetFormatException;
import org.quire.engine.io.BudgetJson;

/**
 * One open budget: the present immutable {@link Budget}, the file it belongs to, whether it is a read-only
 * review copy, and its {@link EditHistory}. Every change goes through {@link #apply}, which records an undoable
 * {@link BudgetEdit} and tells the listeners; views are adapters over these events.
 *
 * <p>No user-interface imports. Not thread-safe: the workbench uses it on the event thread only; the background
 * evaluation receives the immutable {@link Budget} snapshots.
 */
public final class BudgetDocument {

    /** Hears of changes of the budget and of the document's file or mode. */
    public interface Listener {
        /** The budget changed by an edit, undo or redo; {@code cause} names the edit. */
        void budgetChanged(BudgetDocument doc, Budget before, Budget after, String cause);

        /** The file, the read-only mode or the dirty state changed. */
        default void documentStateChanged(BudgetDocument doc) {
        }
    }

    /** Thrown when an edit is attempted on a review copy. */
    public static final class ReadOnlyException extends IllegalStateException {
        private static final long serialVersionUID = 1L;

        ReadOnlyException() {
            super("this budget is open for review only; nothing in it can be changed");
        }
    }

    private final EditHistory history = new EditHistory();
    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    private Budget budget;
    private Path file;
    private String displayName;
    private boolean readOnly;

    /**
     * @param budget the budget
     * @param file the file it was read from, or null for a new or built-in budget
     * @param displayName the name to show when there is no file
     */
    public BudgetDocument(Budget budget, Path file, String displayName) {
        this.budget = Objects.requireNonNull(budget, "budget");
        this.file = file;
        this.displayName = displayName == null ? "untitled" : displayName;
        history.addListener(h -> fireState());
    }

    /** Opens a budget file. */
    public static BudgetDocument open(Path file) throws IOException, BudgetFormatException {
        return new BudgetDocument(BudgetJson.read(file), file.toAbsolutePath(), null);
    }

    public Budget budget() { return budget; }
    public Path file() { return file; }
    public EditHistory history() { return history; }
    public boolean isReadOnly() { return readOnly; }
    public boolean isDirty() { return history.isDirty(); }

    /** @return the file name, or the display name when the budget has no file yet */
    public String name() {
        return file != null ? String.valueOf(file.getFileName()) : displayName;
    }

    public void setReadOnly(boolean on) {
        if (on != readOnly) {
            readOnly = on;
            fireState();
        }
    }

    public void addListener(Listener l) { listeners.add(l); }
    public void removeListener(Listener l) { listeners.remove(l); }

    /**
     * Applies a change.
     *
     * @param name what the change does, for the Edit menu
     * @param mergeKey key under which quick successive edits (typing in one field) merge; "" for none
     * @param change builds the new budget from the present one; may throw IllegalArgumentException, which is
     *     passed on unchanged and leaves the budget as it was
     * @return whether the budget changed
     * @throws ReadOnlyException on a review copy
     */
    public boolean apply(String name, String mergeKey, UnaryOperator<Budget> change) {
        if (readOnly) {
            throw new ReadOnlyException();
        }
        Budget before = budget;
        Budget after = change.apply(before);
        if (after.equals(before)) {
            return false;
        }
        budget = after;
        history.record(new BudgetEdit(name, before, after, mergeKey, System.currentTimeMillis()));
        fireChanged(before, after, name);
        return true;
    }

    /** Reverts the last edit, if any. */
    public void undo() {
        if (readOnly || !history.canUndo()) {
            return;
        }
        BudgetEdit e = history.popUndo();
        Budget before = budget;
        budget = e.before();
        fireChanged(before, budget, "Undo " + e.name());
    }

    /** Repeats the last edit undone, if any. */
    public void redo() {
        if (readOnly || !history.canRedo()) {
            return;
        }
        BudgetEdit e = history.popRedo();
        Budget before = budget;
        budget = e.after();
        fireChanged(before, budget, "Redo " + e.name());
    }

    /**
     * Writes the budget to {@code target} safely and makes it the document's file.
     *
     * @throws IOException when the file cannot be written; the old file is then left as it was
     */
    public void saveTo(Path target) throws IOException {
        SafeFileWriter.write(target.toAbsolutePath(), BudgetJson.write(budget));
        file = target.toAbsolutePath();
        history.markSaved();
    }

    /**
     * Writes the unsaved budget beside its file as {@code NAME.autosave} (the file itself is left alone and the
     * budget stays marked as changed).
     */
    public void autosave() throws IOException {
        if (file == null) {
            return;
        }
        SafeFileWriter.write(file.resolveSibling(file.getFileName() + ".autosave"), BudgetJson.write(budget));
    }

    private void fireChanged(Budget before, Budget after, String cause) {
        for (Listener l : listeners) {
            l.budgetChanged(this, before, after, cause);
        }
    }

    private void fireState() {
        for (Listener l : listeners) {
            l.documentStateChanged(this);
        }
    }
}
