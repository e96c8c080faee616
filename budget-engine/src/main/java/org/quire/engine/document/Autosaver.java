package org.quire.engine.document;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Map;
import java.util.Objects;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.function.BiConsumer;

/**
 * Writes the documents handed to it to a {@link RecoveryStore} at a fixed period, on one daemon thread. The
 * workbench calls {@link #markDirty} after every change (the newest copy replaces an older one not yet
 * written) and {@link #markSaved} once the user has saved or closed the document.
 *
 * <p>Thread-safe. {@link #close()} writes what is still pending and stops the thread.
 */
public final class Autosaver implements AutoCloseable {
    /** The period used when none is given: 60 s. */
    public static final Duration DEFAULT_PERIOD = Duration.ofSeconds(60);

    private record Dirty(BudgetDocument doc, Path originalPath) {
    }

    private final RecoveryStore store;
    private final BiConsumer<String, IOException> onError;
    private final Map<String, Dirty> dirty = new ConcurrentHashMap<>();
    private final ScheduledExecutorService executor;
    private final Duration period;

    private Autosaver(RecoveryStore store, Duration period, BiConsumer<String, IOException> onError) {
        this.store = store;
        this.period = period;
        this.onError = onError;
        this.executor = Executors.newSingleThreadScheduledExecutor(r -> {
            Thread t = new Thread(r, "quire-autosave");
            t.setDaemon(true);
            return t;
        });
        long ms = period.toMillis();
        executor.scheduleWithFixedDelay(this::flush, ms, ms, TimeUnit.MILLISECONDS);
    }

    /**
     * @param store where copies go
     * @param period how often to write, at least 10 ms
     * @param onError told the document id and the error when a copy cannot be written (on the autosave
     *     thread); the document stays pending and is tried again at the next period
     */
    public static Autosaver start(RecoveryStore store, Duration period, BiConsumer<String, IOException> onError) {
        Objects.requireNonNull(store, "store");
        Objects.requireNonNull(onError, "onError");
        if (period == null || period.toMillis() < 10) {
            throw new IllegalArgumentException("autosave period must be at least 10 ms, not " + period);
        }
        return new Autosaver(store, period, onError);
    }

    /** @return an autosaver with the {@link #DEFAULT_PERIOD} */
    public static Autosaver start(RecoveryStore store, BiConsumer<String, IOException> onError) {
        return start(store, DEFAULT_PERIOD, onError);
    }

    public Duration period() {
        return period;
    }

    /** Hands over the newest state of a document with unsaved changes. */
    public void markDirty(String id, BudgetDocument doc, Path originalPath) {
        Objects.requireNonNull(doc, "doc");
        if (executor.isShutdown()) {
            throw new IllegalStateException("the autosaver is closed");
        }
        dirty.put(id, new Dirty(doc, originalPath));
    }

    /** Forgets a document that was saved or closed, and removes its recovery copy. */
    public synchronized void markSaved(String id) throws IOException {
        dirty.remove(id);
        store.discard(id);
    }

    /**
     * Forgets a document that was saved or closed at once, and removes its recovery copy later on the autosave
     * thread, so that the caller (the event thread) touches no file; the copy stays when the document has been
     * handed over again meanwhile (its next write replaces it).
     */
    public void discardLater(String id) {
        dirty.remove(id);
        if (executor.isShutdown()) {
            throw new IllegalStateException("the autosaver is closed");
        }
        executor.execute(() -> {
            synchronized (this) {
                if (dirty.containsKey(id)) {
                    return;
                }
                try {
                    store.discard(id);
                } catch (IOException e) {
                    onError.accept(id, e);
                }
            }
        });
    }

    /** @return the number of documents waiting to be written */
    public int pendingCount() {
        return dirty.size();
    }

    /** Writes every pending document now; returns how many were written. */
    public synchronized int flush() {
        int n = 0;
        for (Map.Entry<String, Dirty> e : dirty.entrySet()) {
            Dirty d = e.getValue();
            try {
                store.autosave(e.getKey(), d.doc(), d.originalPath());
                dirty.remove(e.getKey(), d);
                n++;
            } catch (IOException x) {
                onError.accept(e.getKey(), x);
            } catch (RuntimeException x) {
                onError.accept(e.getKey(), new IOException("autosave of " + e.getKey() + " failed: " + x, x));
            }
        }
        return n;
    }

    /**
     * Stops without writing, for a successor that has been handed the same documents (a new period): the pending
     * documents are forgotten at once, removals already asked for still run, and the autosave thread ends after
     * them. Touches no file on the calling thread. Writing the old states here could bring back the copy of a
     * document saved meanwhile, or overwrite the successor's newer copy.
     */
    public void abandon() {
        dirty.clear();
        executor.shutdown();
    }

    /** Writes what is pending and stops the autosave thread. */
    @Override
    public void close() {
        executor.shutdown();
        try {
            executor.awaitTermination(10, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        flush();
    }
}
