package org.quire.app.ui.document;

import java.io.IOException;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.function.BiConsumer;
import org.quire.engine.document.Autosaver;
import org.quire.engine.document.RecoveryStore;

/**
 * Keeps a copy of every open document with unsaved changes in the recovery folder, through the engine's
 * {@link Autosaver}: a document that becomes changed is handed to the autosaver (which writes it at its period),
 * a document saved, reverted to its saved state or closed without saving has its copy removed. At start-up the
 * workbench lists {@link #pending} copies and offers them back.
 *
 * <p>No user-interface imports. Not thread-safe: call it on the event thread. It touches no file on the calling
 * thread: the autosaver writes and removes copies on its own thread, and what is left (removing a copy while
 * copying is off, the last writes when the workbench closes) runs on a recovery thread of
 * its own, which keeps the application alive until it is done; failures reach {@code onError} there.
 */
public final class RecoveryKeeper implements AutoCloseable {
    private final RecoveryStore store;
    private final BiConsumer<String, IOException> onError;
    private final Map<BudgetDocument, Boolean> tracked = new LinkedHashMap<>();
    private Autosaver autosaver;
    /** Set by {@link #close(Runnable)}: later calls do nothing (a save that ends late keeps its copy, to be offered). */
    private boolean closed;
    /** File work that is not the autosaver's: one thread, in order, ending when idle. */
    private final ThreadPoolExecutor io = new ThreadPoolExecutor(1, 1, 1, TimeUnit.SECONDS,
            new LinkedBlockingQueue<>(), r -> new Thread(r, "quire-recovery"));

    /**
     * @param store the recovery folder
     * @param period how often changed documents are copied; null for never (copies are then only removed)
     * @param onError told the document's recovery id and the error when a copy cannot be written or removed
     */
    public RecoveryKeeper(RecoveryStore store, Duration period, BiConsumer<String, IOException> onError) {
        this.store = store;
        this.onError = onError;
        io.allowCoreThreadTimeOut(true);
        setPeriod(period);
    }

    public RecoveryStore store() {
        return store;
    }

    /** Changes the period (null: stop copying); documents already changed are handed to the new autosaver. */
    public void setPeriod(Duration period) {
        if (closed) {
            return;
        }
        if (autosaver != null) {
            // the new one (or, with no period, nobody) takes over the changed documents: the old one writes
            // nothing more, so it cannot bring back the copy of a budget saved meanwhile
            autosaver.abandon();
            autosaver = null;
        }
        if (period != null) {
            autosaver = Autosaver.start(store, period, onError);
            for (BudgetDocument d : tracked.keySet()) {
                if (tracked.get(d)) {
                    autosaver.markDirty(d.recoveryId(), d.content(), d.file());
                }
            }
        }
    }

    /** @return whether changed documents are being copied */
    public boolean isActive() {
        return autosaver != null;
    }

    /** Starts following a document's changes. */
    public void track(BudgetDocument doc) {
        tracked.put(doc, false);
        doc.addListener(new BudgetDocument.Listener() {
            @Override
            public void budgetChanged(BudgetDocument d, org.quire.engine.budget.Budget before,
                    org.quire.engine.budget.Budget after, String cause) {
            }

            @Override
            public void documentStateChanged(BudgetDocument d) {
                update(d);
            }
        });
        update(doc);
    }

    private void update(BudgetDocument d) {
        Boolean was = tracked.get(d);
        if (was == null) {
            return;
        }
        boolean changed = d.isDirty() && !d.isReadOnly();
        tracked.put(d, changed);
        if (changed) {
            if (autosaver != null) {
                autosaver.markDirty(d.recoveryId(), d.content(), d.file());
            }
        } else if (was) {
            discard(d.recoveryId());
        }
    }

    /** Stops following a document closed by the user and removes its copy (its changes were saved or dropped). */
    public void forget(BudgetDocument doc) {
        if (tracked.remove(doc) != null) {
            discard(doc.recoveryId());
        }
    }

    private void discard(String id) {
        if (closed) {
            return;
        }
        if (autosaver != null) {
            autosaver.discardLater(id);
            return;
        }
        io.execute(() -> {
            try {
                store.discard(id);
            } catch (IOException e) {
                onError.accept(id, e);
            }
        });
    }

    /** Writes every pending copy now, on the recovery thread; @return how many were written, once done */
    public CompletableFuture<Integer> flush() {
        Autosaver a = autosaver;
        return a == null || closed ? CompletableFuture.completedFuture(0) : CompletableFuture.supplyAsync(a::flush, io);
    }

    /**
     * Writes what is pending and stops, on the recovery thread, then runs {@code after} there (e.g. releasing
     * the folder, which must come after the last copy).
     *
     * @return done once all is written and {@code after} has run
     */
    public CompletableFuture<Void> close(Runnable after) {
        if (closed) {
            return CompletableFuture.completedFuture(null);
        }
        closed = true;
        Autosaver a = autosaver;
        autosaver = null;
        CompletableFuture<Void> done = CompletableFuture.runAsync(() -> {
            try {
                if (a != null) {
                    a.close();
                }
            } finally {
                after.run(); // the folder is released even when the last writes failed
            }
        }, io);
        io.shutdown();
        return done;
    }

    /**
     * @param unreadable receives a line for each copy that cannot be read
     * @return the copies in the recovery folder, newest first
     */
    public List<RecoveryStore.Pending> pending(List<String> unreadable) throws IOException {
        List<RecoveryStore.Pending> out = new ArrayList<>();
        for (RecoveryStore.Pending p : store.pending(unreadable)) {
            boolean open = tracked.keySet().stream().anyMatch(d -> d.recoveryId().equals(p.id()));
            if (!open) {
                out.add(p);
            }
        }
        return out;
    }

    /** Writes what is pending and stops the autosaver, on the recovery thread. */
    @Override
    public void close() {
        close(() -> { });
    }
}
