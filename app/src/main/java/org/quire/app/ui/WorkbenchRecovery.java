package org.quire.app.ui;

import java.awt.EventQueue;
import java.io.IOException;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.quire.app.ui.common.GuardedWorker;
import org.quire.app.ui.common.WorkbenchPrefs;
import org.quire.app.ui.document.BudgetDocument;
import org.quire.app.ui.document.RecoveryKeeper;
import org.quire.app.ui.notebook.BudgetEditor;
import org.quire.engine.document.RecoverySessions;
import org.quire.engine.document.RecoveryStore;
import org.quire.engine.io.BudgetFormatException;

/**
 * Recovery copies of this workbench: it claims a session folder of its own inside the recovery folder of the
 * preferences (locked while it runs, {@link RecoverySessions}), keeps copies of changed budgets there, and at
 * start-up offers the copies of workbenches that are no longer running (a crash, a power cut), never those of a
 * second workbench running beside it.
 *
 * <p>Not thread-safe: call on the event thread.
 */
final class WorkbenchRecovery {
    private final WorkbenchFrame frame;
    private final WorkbenchPrefs prefs;
    private final RecoverySessions sessions;
    private final RecoverySessions.Session session;
    private final RecoveryKeeper keeper;

    /**
     * This workbench's recovery folder, claimed (created and locked) before the window is built, off the event
     * thread where the start allows it ({@link #claim}); or why it could not be.
     */
    record Claimed(RecoverySessions sessions, RecoverySessions.Session session, IOException failure) {
    }

    /** Claims a recovery folder in the preferences' recovery folder: file work, for the start-up thread. */
    static Claimed claim(WorkbenchPrefs prefs) {
        RecoverySessions sessions = RecoverySessions.in(prefs.recoveryFolder());
        try {
            return new Claimed(sessions, sessions.claim(), null);
        } catch (IOException e) {
            return new Claimed(sessions, null, e);
        }
    }

    WorkbenchRecovery(WorkbenchFrame frame, WorkbenchPrefs prefs, Claimed claimed) {
        this.frame = frame;
        this.prefs = prefs;
        Claimed c = claimed != null ? claimed : claim(prefs);
        sessions = c.sessions();
        RecoverySessions.Session s = c.session();
        RecoveryStore store;
        if (s != null) {
            store = s.store();
        } else {
            store = RecoveryStore.of(sessions.base());
            IOException e = c.failure();
            EventQueue.invokeLater(() -> frame.status("No recovery copies will be kept: " + e.getMessage(), true));
        }
        session = s;
        keeper = new RecoveryKeeper(store, period(), (id, e) -> EventQueue.invokeLater(
                () -> frame.status("Recovery copy not written: " + e.getMessage(), true)));
    }

    private Duration period() {
        int m = prefs.autosaveMinutes();
        return m > 0 ? Duration.ofMinutes(m) : null;
    }

    RecoveryKeeper keeper() {
        return keeper;
    }

    /** @return this workbench's own recovery folder */
    java.nio.file.Path folder() {
        return keeper.store().folder();
    }

    void applyPeriod() {
        keeper.setPeriod(period());
    }

    /**
     * Writes what is pending, stops copying and releases this workbench's folder (kept when copies remain), on
     * the recovery thread: the event thread touches no file.
     *
     * @return done once the last copy is written and the folder released
     */
    java.util.concurrent.CompletableFuture<Void> close() {
        return keeper.close(() -> {
            if (session != null) {
                try {
                    session.close();
                } catch (IOException e) {
                    // the lock goes with the process anyway; nothing the engineer can do about it
                }
            }
        });
    }

    /**
     * Offers the copies left by workbenches no longer running: the folders are listed off the event thread, then
     * a dialog lists each copy with its file and time; the checked ones are opened as changed budgets (and kept
     * by this workbench from now on), the others discarded. Cancel keeps them all for the next start.
     */
    void offer() {
        record Found(List<RecoverySessions.Session> orphans, Map<RecoveryStore.Pending, RecoverySessions.Session> of,
                List<String> unreadable) {
        }
        new GuardedWorker<Found, Void>() {
            @Override
            protected Found doInBackground() throws Exception {
                List<RecoverySessions.Session> orphans = sessions.orphans();
                Map<RecoveryStore.Pending, RecoverySessions.Session> of = new LinkedHashMap<>();
                List<String> unreadable = new ArrayList<>();
                for (RecoverySessions.Session o : orphans) {
                    for (RecoveryStore.Pending p : o.store().pending(unreadable)) {
                        of.put(p, o);
                    }
                }
                return new Found(orphans, of, unreadable);
            }

            @Override
            protected void finished() {
                Found f;
                try {
                    f = get();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    return;
                } catch (java.util.concurrent.ExecutionException e) {
                    frame.status("Cannot read the recovery folder " + sessions.base() + ": "
                            + e.getCause().getMessage(), true);
                    return;
                }
                offer(f.orphans(), f.of(), f.unreadable());
            }
        }.execute();
    }

    /**
     * Shows the dialog, then reads the copies to restore, removes the others and releases the stopped
     * workbenches' folders off the event thread; the restored budgets open on it.
     */
    private void offer(List<RecoverySessions.Session> orphans, Map<RecoveryStore.Pending, RecoverySessions.Session> of,
            List<String> unreadable) {
        if (!unreadable.isEmpty()) {
            frame.status("Unreadable recovery copies in " + sessions.base() + ": " + String.join("; ", unreadable),
                    true);
        }
        List<RecoveryStore.Pending> restore = new ArrayList<>();
        List<RecoveryStore.Pending> discard = new ArrayList<>();
        if (!of.isEmpty()) {
            List<RecoveryStore.Pending> pending = new ArrayList<>(of.keySet());
            pending.sort(java.util.Comparator.comparing(RecoveryStore.Pending::saved).reversed());
            RecoveryDialog dlg = new RecoveryDialog(frame, pending);
            dlg.setVisible(true);
            if (!dlg.cancelled()) {
                for (RecoveryStore.Pending p : pending) {
                    (dlg.restore().contains(p) ? restore : discard).add(p);
                }
            }
        }
        record Restored(RecoveryStore.Pending copy, org.quire.engine.document.BudgetDocument content, String error) {
        }
        new GuardedWorker<List<Restored>, Void>() {
            private final List<String> problems = new ArrayList<>();

            @Override
            protected List<Restored> doInBackground() {
                List<Restored> out = new ArrayList<>();
                for (RecoveryStore.Pending p : restore) {
                    out.add(read(p));
                }
                for (RecoveryStore.Pending p : discard) {
                    try {
                        of.get(p).store().discard(p.id());
                    } catch (IOException e) {
                        problems.add("Cannot discard the recovery copy " + p.file() + ": " + e.getMessage());
                    }
                }
                for (RecoverySessions.Session o : orphans) {
                    try {
                        o.close();
                    } catch (IOException e) {
                        problems.add("Cannot release the recovery folder " + o.folder() + ": " + e.getMessage());
                    }
                }
                return out;
            }

            private Restored read(RecoveryStore.Pending p) {
                try {
                    org.quire.engine.document.BudgetDocument content = p.load();
                    if (session != null && !p.file().getParent().equals(session.folder())) {
                        session.adopt(p.file());
                    }
                    return new Restored(p, content, null);
                } catch (IOException | BudgetFormatException e) {
                    return new Restored(p, null, e.getMessage());
                }
            }

            @Override
            protected void finished() {
                List<Restored> read;
                try {
                    read = get();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    return;
                } catch (java.util.concurrent.ExecutionException e) {
                    frame.status("Cannot restore the recovery copies: " + e.getCause().getMessage(), true);
                    return;
                }
                for (Restored r : read) {
                    if (r.content() == null) {
                        frame.showError("Cannot restore the recovery copy", r.copy().file() + ":\n" + r.error());
                    } else {
                        open(r.copy(), r.content());
                    }
                }
                for (String p : problems) {
                    frame.status(p, true);
                }
            }
        }.execute();
    }

    /** Opens a recovery copy read off the event thread as a changed budget belonging to its original file. */
    private BudgetEditor open(RecoveryStore.Pending p, org.quire.engine.document.BudgetDocument content) {
        BudgetDocument doc = new BudgetDocument(content, p.originalPath(), "recovered " + content.title(),
                prefs.userName());
        doc.markRecovered(p.id());
        BudgetEditor ed = frame.open(doc);
        frame.status("Restored the copy of " + doc.name() + " kept at " + p.saved() + "; save it to keep it", false);
        return ed;
    }
}
