package org.quire.app.ui;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import javax.swing.JOptionPane;
import javax.swing.SwingWorker;
import org.quire.app.ui.common.GuardedWorker;
import org.quire.app.ui.common.WorkbenchPrefs;
import org.quire.app.ui.document.BudgetDocument;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.budget.TypeA;
import org.quire.engine.csv.CsvException;
import org.quire.engine.csv.CsvOptions;
import org.quire.engine.csv.CsvReadings;
import org.quire.engine.document.DocumentStore;
import org.quire.engine.io.BudgetFormatException;

/**
 * The workbench's file operations: open, save, close with the save prompt, quit, and files dropped on the
 * window. Every file is read and written off the event thread; the status bar shows the work with a progress bar
 * (and Cancel while a file is read); the results come back on the event thread as completed futures.
 *
 * <p>Not thread-safe: call on the event thread.
 */
final class WorkbenchFiles {
    /** Reads a budget file; replaceable in tests (a slow disk). Called off the event thread. */
    interface Reader {
        BudgetDocument read(Path file, String user) throws IOException, BudgetFormatException;
    }

    /** The answers of a prompt about unsaved changes, in the order shown. */
    static final String[] SAVE_CHOICES = {"Save", "Don't save", "Cancel"};

    private final WorkbenchFrame frame;
    private final WorkbenchPrefs prefs;
    private final StatusBar status;
    private final Deque<SwingWorker<?, ?>> running = new ArrayDeque<>();
    private final java.util.Map<SwingWorker<?, ?>, Boolean> cancellableTasks = new java.util.HashMap<>();
    private Reader reader = BudgetDocument::open;

    WorkbenchFiles(WorkbenchFrame frame, WorkbenchPrefs prefs, StatusBar status) {
        this.frame = frame;
        this.prefs = prefs;
        this.status = status;
    }

    void setReader(Reader r) {
        reader = r;
    }

    /** What a background file task does off the event thread. */
    private interface Work<T> {
        T run() throws Exception;
    }

    /**
     * Runs {@code work} off the event thread with the status bar's progress (and Cancel when {@code cancellable});
     * the future completes on the event thread with its value, exceptionally with the work's exception, or with a
     * {@link CancellationException} when cancelled.
     */
    private <T> CompletableFuture<T> inBackground(String what, boolean cancellable, Work<T> work) {
        CompletableFuture<T> out = new CompletableFuture<>();
        SwingWorker<T, Void> w = new GuardedWorker<>() {
            @Override
            protected T doInBackground() throws Exception {
                return work.run();
            }

            @Override
            protected void finished() {
                running.remove(this);
                cancellableTasks.remove(this);
                showTask();
                try {
                    out.complete(get());
                } catch (CancellationException e) {
                    out.completeExceptionally(e);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    out.completeExceptionally(e);
                } catch (ExecutionException e) {
                    out.completeExceptionally(e.getCause());
                }
            }
        };
        running.push(w);
        cancellableTasks.put(w, cancellable);
        status(what + "\u2026", false);
        showTask();
        w.execute();
        return out;
    }

    /** @return {@code f}, reporting a fault of the workbench itself (not a refused file) as an internal error */
    private static <T> CompletableFuture<T> reported(CompletableFuture<T> f) {
        return f.whenComplete((v, e) -> {
            if (e != null) {
                Workbench.uncaught(Thread.currentThread(), e);
            }
        });
    }

    private void showTask() {
        SwingWorker<?, ?> top = running.peek();
        if (top == null) {
            status.endTask();
        } else {
            status.startTask(Boolean.TRUE.equals(cancellableTasks.get(top)) ? () -> top.cancel(true) : null);
        }
    }

    /** Stops the reads still running (the window closes); writes run to their end. */
    void cancelAll() {
        for (SwingWorker<?, ?> w : new ArrayList<>(running)) {
            if (Boolean.TRUE.equals(cancellableTasks.get(w))) {
                w.cancel(true);
            }
        }
    }

    /** @return whether a file is being read or written */
    boolean busy() {
        return !running.isEmpty();
    }

    private void status(String message, boolean error) {
        frame.status(message, error);
    }

    // ----- open -----------------------------------------------------------------------------------------------

    /**
     * Opens a budget file off the event thread (or selects its tab when it is open already); an unreadable file
     * is reported in a message that says where and why.
     *
     * @param readOnly whether to open it as a review copy
     * @return the editor, empty when the file could not be read or the engineer cancelled
     */
    CompletableFuture<Optional<BudgetEditor>> open(Path file, boolean readOnly) {
        for (BudgetEditor e : frame.editors()) {
            if (file.toAbsolutePath().equals(e.document().file())) {
                frame.select(e);
                return CompletableFuture.completedFuture(Optional.of(e));
            }
        }
        String user = prefs.userName();
        Reader r = reader;
        return reported(inBackground("Opening " + file.getFileName(), true, () -> r.read(file, user)).handle((doc, err) -> {
            if (err instanceof CancellationException) {
                status("Opening " + file.getFileName() + " cancelled", false);
                return Optional.<BudgetEditor>empty();
            }
            if (err != null) {
                if (!(err instanceof IOException || err instanceof BudgetFormatException)) {
                    Workbench.uncaught(Thread.currentThread(), err);
                    return Optional.<BudgetEditor>empty();
                }
                frame.showError("Cannot open the budget", file + ":\n" + err.getMessage());
                return Optional.<BudgetEditor>empty();
            }
            doc.setReadOnly(readOnly);
            prefs.addRecent(file.toAbsolutePath());
            frame.actions().updateRecent();
            BudgetEditor ed = frame.open(doc);
            status("Opened " + file, false);
            if (doc.content().migratedFrom() == 1) {
                status(file.getFileName() + " is a format version 1 file; it will be saved as version 2", false);
            }
            return Optional.of(ed);
        }));
    }

    /** A file dropped on the window: a CSV file gives readings to the selected Type A input, others open. */
    void dropped(Path file) {
        if (file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".csv")) {
            importReadings(file);
        } else {
            open(file, false);
        }
    }

    /**
     * Takes the readings in a CSV file (read off the event thread) as the Type A evaluation of the input selected
     * in the active budget (an undoable edit).
     *
     * @return whether the readings were taken
     */
    CompletableFuture<Boolean> importReadings(Path file) {
        Optional<BudgetEditor> ed = frame.activeEditor();
        String name = ed.map(BudgetEditor::selectedInput).orElse(null);
        if (ed.isEmpty() || name == null) {
            frame.showError("Cannot import readings", "Select the input the readings in " + file.getFileName()
                    + " belong to, then drop the file again.");
            return CompletableFuture.completedFuture(false);
        }
        return reported(inBackground("Reading " + file.getFileName(), true,
                () -> TypeA.ofReadings(CsvReadings.read(file, CsvOptions.defaults()))).handle((a, err) -> {
                    if (err instanceof CancellationException) {
                        status("Reading " + file.getFileName() + " cancelled", false);
                        return false;
                    }
                    if (err != null) {
                        frame.showError("Cannot import readings", err instanceof CsvException ? err.getMessage()
                                : file + ":\n" + err.getMessage());
                        return false;
                    }
                    status("Read " + a.readings().length + " readings from " + file.getFileName(), false);
                    return ed.get().edit("Import readings into " + name, "", b -> b.withInput(name,
                            b.input(name).withEvaluation(a)));
                }));
    }

    // ----- save and close -------------------------------------------------------------------------------------

    /** Saves a budget, asking for a file when it has none or when {@code askForFile}; @return whether it was saved */
    CompletableFuture<Boolean> save(BudgetEditor ed, boolean askForFile) {
        Path target = ed.document().file();
        if (askForFile || target == null) {
            target = FileChooser.saveTarget(frame, ed.document().name());
            if (target == null) {
                return CompletableFuture.completedFuture(false);
            }
        }
        return saveTo(ed, target);
    }

    /**
     * Saves a budget to {@code target} off the event thread ({@link DocumentStore#save}: atomic, the previous
     * version kept); a failure (read-only folder, full disk, a file in the way) is shown in a message and the
     * document stays open, changed, with its file as it was. An edit made while the file is written keeps the
     * budget marked as changed.
     *
     * @return whether it was saved
     */
    CompletableFuture<Boolean> saveTo(BudgetEditor ed, Path target) {
        BudgetDocument doc = ed.document();
        org.quire.engine.document.BudgetDocument content = doc.content();
        Path to = target.toAbsolutePath();
        return reported(inBackground("Saving " + to.getFileName(), false, () -> {
            DocumentStore.save(content, to);
            return to;
        }).handle((saved, err) -> {
            if (err != null) {
                frame.showError("The budget was not saved", err.getMessage() + "\n\nThe budget is still open with "
                        + "its changes; save it somewhere else with Save as.");
                return false;
            }
            doc.markSaved(content, to);
            prefs.addRecent(to);
            frame.actions().updateRecent();
            status("Saved " + to, false);
            frame.documentSaved(ed);
            return true;
        }));
    }

    /** @return 0 to save, 1 not to save, 2 to cancel (also when the prompt is closed) */
    private int askToSave(BudgetEditor ed, String title) {
        frame.select(ed);
        int a = JOptionPane.showOptionDialog(frame, "Save the changes to " + ed.document().name() + "?", title,
                JOptionPane.YES_NO_CANCEL_OPTION, JOptionPane.WARNING_MESSAGE, null, SAVE_CHOICES, SAVE_CHOICES[0]);
        return a < 0 ? 2 : a;
    }

    private static boolean hasUnsavedChanges(BudgetEditor e) {
        return e.document().isDirty() && !e.document().isReadOnly();
    }

    /** Closes an editor, offering to save changes first; @return whether it closed */
    CompletableFuture<Boolean> close(BudgetEditor ed) {
        if (!hasUnsavedChanges(ed)) {
            frame.forceClose(ed);
            return CompletableFuture.completedFuture(true);
        }
        int a = askToSave(ed, "Close budget");
        if (a == 2) {
            return CompletableFuture.completedFuture(false);
        }
        CompletableFuture<Boolean> saved = a == 0 ? save(ed, false) : CompletableFuture.completedFuture(true);
        return saved.thenApply(ok -> {
            if (ok) {
                frame.forceClose(ed);
            }
            return ok;
        });
    }

    /**
     * Quits: asks about every changed budget first (Save, Don't save, Cancel) and closes none when the engineer
     * cancels or a save fails; then closes them all.
     */
    void quit() {
        List<BudgetEditor> toSave = new ArrayList<>();
        for (BudgetEditor e : frame.editors()) {
            if (hasUnsavedChanges(e)) {
                int a = askToSave(e, "Quit Quire");
                if (a == 2) {
                    return;
                }
                if (a == 0) {
                    toSave.add(e);
                }
            }
        }
        saveAll(toSave, 0).thenAccept(ok -> {
            if (ok) {
                frame.closeAllAndDispose();
            }
        });
    }

    private CompletableFuture<Boolean> saveAll(List<BudgetEditor> eds, int from) {
        if (from == eds.size()) {
            return CompletableFuture.completedFuture(true);
        }
        return save(eds.get(from), false).thenCompose(ok -> ok ? saveAll(eds, from + 1)
                : CompletableFuture.completedFuture(false));
    }
}
