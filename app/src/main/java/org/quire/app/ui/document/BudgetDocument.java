package org.quire.app.ui.document;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.util.List;
import java.util.Objects;
import java.util.UUID;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.UnaryOperator;
import org.quire.engine.budget.Budget;
import org.quire.engine.document.DocumentStore;
import org.quire.engine.io.BudgetFormatException;

/**
 * One open budget in the workbench: the engine's document ({@link org.quire.engine.document.BudgetDocument},
 * called the <em>content</em> here: the budget with laboratory, device under test, author, revision, status
 * and history), the file it belongs to, whether it is a read-only review copy, and its {@link EditHistory}.
 * Every change goes through {@link #apply} or {@link #applyToDocument}, which records an undoable
 * {@link BudgetEdit} and tells the listeners; views are adapters over these events. The review cycle (an edit
 * of an approved document opens a new draft revision) is the engine's; this class only names who edits.
 *
 * <p>Files are read with {@link DocumentStore#open} (format version 1 files are migrated) and written with
 * {@link DocumentStore#save} (atomic, the previous version kept as {@code NAME.bak}).
 *
 * <p>No user-interface imports. Not thread-safe: the workbench uses it on the event thread only; the background
 * evaluation and the autosaver receive the immutable snapshots.
 */
public final class BudgetDocument {

    /** Hears of changes of the budget and of the document's file or mode. */
    public interface Listener {
        /** The budget changed by an edit, undo or redo; {@code cause} names the edit. */
        void budgetChanged(BudgetDocument doc, Budget before, Budget after, String cause);

        /** The file, the read-only mode, the dirty state or the document's details, status or history changed. */
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
    private final String recoveryId = UUID.randomUUID().toString();
    private final Clock clock;
    private org.quire.engine.document.BudgetDocument content;
    private Path file;
    private String displayName;
    private String user;
    private boolean readOnly;
    private String recoveredId;

    /**
     * @param content the engine's document
     * @param file the file it was read from, or null for a new or built-in budget
     * @param displayName the name to show when there is no file
     * @param user who edits: named in the history when an edit moves the document back to draft
     */
    public BudgetDocument(org.quire.engine.document.BudgetDocument content, Path file, String displayName,
            String user) {
        this(content, file, displayName, user, Clock.systemUTC());
    }

    /** As the four-argument constructor, with the clock that dates the edits. */
    public BudgetDocument(org.quire.engine.document.BudgetDocument content, Path file, String displayName,
            String user, Clock clock) {
        this.content = Objects.requireNonNull(content, "content");
        this.file = file == null ? null : file.toAbsolutePath();
        this.displayName = displayName == null ? "untitled" : displayName;
        this.user = checkUser(user);
        this.clock = Objects.requireNonNull(clock, "clock");
        history.addListener(h -> fireState());
    }

    /** @return a new draft document (revision 1) around {@code budget}, written by {@code user} */
    public static BudgetDocument ofBudget(Budget budget, String displayName, String user) {
        return new BudgetDocument(org.quire.engine.document.BudgetDocument.newDraft(budget, user, Instant.now()),
                null, displayName, user);
    }

    /** Opens a budget file (format version 1 or 2). */
    public static BudgetDocument open(Path file, String user) throws IOException, BudgetFormatException {
        return new BudgetDocument(DocumentStore.open(file), file.toAbsolutePath(), null, user);
    }

    private static String checkUser(String user) {
        if (user == null || user.isBlank()) {
            throw new IllegalArgumentException("the user's name must not be blank; it is recorded in the history");
        }
        return user.strip();
    }

    public Budget budget() { return content.budget(); }
    /** @return the engine's document as it stands now */
    public org.quire.engine.document.BudgetDocument content() { return content; }
    public Path file() { return file; }
    public EditHistory history() { return history; }
    public boolean isReadOnly() { return readOnly; }
    public boolean isDirty() { return history.isDirty(); }
    /** @return who edits this document */
    public String user() { return user; }
    /** @return the identifier of this document's copy in the recovery folder */
    public String recoveryId() { return recoveredId != null ? recoveredId : recoveryId; }
    /** @return the present time of the document's clock */
    public Instant now() { return clock.instant(); }

    /** @param name who edits from now on */
    public void setUser(String name) { user = checkUser(name); }

    /**
     * Marks this document as restored from the recovery copy {@code id}: it keeps that id (so later autosaves
     * replace the copy) and counts as changed.
     */
    public void markRecovered(String id) {
        recoveredId = id;
        history.markUnsaved();
    }

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
     * Applies a change of the budget.
     *
     * @param name what the change does, for the Edit menu
     * @param mergeKey key under which quick successive edits (typing in one field) merge; "" for none
     * @param change builds the new budget from the present one; may throw IllegalArgumentException, which is
     *     passed on unchanged and leaves the budget as it was
     * @return whether the budget changed
     * @throws ReadOnlyException on a review copy
     * @throws IllegalStateException when the document is withdrawn (the engine refuses every change)
     */
    public boolean apply(String name, String mergeKey, UnaryOperator<Budget> change) {
        return applyToDocument(name, mergeKey, d -> {
            Budget after = change.apply(d.budget());
            return after.equals(d.budget()) ? d : d.withBudget(after, user, now());
        });
    }

    /**
     * Applies a change of the whole document (details, status, template changes taken over).
     *
     * @param change builds the new document from the present one; may throw IllegalArgumentException or
     *     IllegalStateException, passed on unchanged, leaving the document as it was
     * @return whether the document changed
     * @throws ReadOnlyException on a review copy
     */
    public boolean applyToDocument(String name, String mergeKey,
            UnaryOperator<org.quire.engine.document.BudgetDocument> change) {
        if (readOnly) {
            throw new ReadOnlyException();
        }
        org.quire.engine.document.BudgetDocument before = content;
        org.quire.engine.document.BudgetDocument after = change.apply(before);
        if (after.equals(before)) {
            return false;
        }
        content = after;
        history.record(new BudgetEdit(name, before, after, mergeKey, clock.millis()));
        fireChanged(before, after, name);
        return true;
    }

    /**
     * Replaces the content from outside the edit history (a review decision recorded and saved to
     * {@code savedTo}); allowed on a review copy. The edit history is cleared and the document counts as saved.
     */
    public void replaceSaved(org.quire.engine.document.BudgetDocument saved, Path savedTo, String cause) {
        org.quire.engine.document.BudgetDocument before = content;
        content = Objects.requireNonNull(saved, "saved");
        file = savedTo.toAbsolutePath();
        history.clear();
        fireChanged(before, saved, cause);
    }

    /** Reverts the last edit, if any. */
    public void undo() {
        if (readOnly || !history.canUndo()) {
            return;
        }
        BudgetEdit e = history.popUndo();
        org.quire.engine.document.BudgetDocument before = content;
        content = e.before();
        fireChanged(before, content, "Undo " + e.name());
    }

    /** Repeats the last edit undone, if any. */
    public void redo() {
        if (readOnly || !history.canRedo()) {
            return;
        }
        BudgetEdit e = history.popRedo();
        org.quire.engine.document.BudgetDocument before = content;
        content = e.after();
        fireChanged(before, content, "Redo " + e.name());
    }

    /**
     * Writes the document to {@code target} with {@link DocumentStore#save} (atomically, the previous version
     * kept as {@code NAME.bak}) and makes it the document's file.
     *
     * @throws IOException when the file cannot be written; the old file, the document's file and its dirty
     *     state are then left as they were
     */
    public void saveTo(Path target) throws IOException {
        DocumentStore.save(content, target.toAbsolutePath());
        file = target.toAbsolutePath();
        history.markSaved();
    }

    /**
     * Records that {@code saved} (a content this document had) was written to {@code target} by
     * {@link DocumentStore#save} off the event thread, and makes it the document's file. When the content changed
     * while the file was written, the document stays marked as changed.
     */
    public void markSaved(org.quire.engine.document.BudgetDocument saved, Path target) {
        file = target.toAbsolutePath();
        if (content == saved) {
            history.markSaved();
        } else {
            history.markUnsaved();
        }
    }

    private void fireChanged(org.quire.engine.document.BudgetDocument before,
            org.quire.engine.document.BudgetDocument after, String cause) {
        for (Listener l : listeners) {
            if (!before.budget().equals(after.budget())) {
                l.budgetChanged(this, before.budget(), after.budget(), cause);
            }
        }
        fireState();
    }

    private void fireState() {
        for (Listener l : listeners) {
            l.documentStateChanged(this);
        }
    }
}
