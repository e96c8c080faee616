package org.quire.app.ui.common;

import java.util.List;
import javax.swing.SwingWorker;

/**
 * A {@link SwingWorker} whose steps on the event thread cannot hold up other workers. Swing hands the
 * {@code done()} and {@code process()} calls of all workers to the event thread in shared batches; one that throws
 * ends its batch, and the calls after it in the batch are lost, so another window could wait for ever for its
 * result. Here those steps are {@link #finished} and {@link #received}; what they throw goes to the thread's
 * uncaught-exception handler (the workbench shows it as an internal error) and the batch goes on.
 *
 * @param <T> the result of {@link #doInBackground}
 * @param <V> the values published on the way
 */
public abstract class GuardedWorker<T, V> extends SwingWorker<T, V> {

    @Override
    protected final void done() {
        try {
            finished();
        } catch (RuntimeException | Error e) {
            report(e);
        }
    }

    @Override
    protected final void process(List<V> chunks) {
        try {
            received(chunks);
        } catch (RuntimeException | Error e) {
            report(e);
        }
    }

    /** On the event thread, once {@link #doInBackground} has ended (also when cancelled or failed). */
    protected void finished() {
    }

    /** On the event thread, with values {@link #publish}ed since the last call. */
    protected void received(List<V> chunks) {
    }

    private static void report(Throwable e) {
        Thread t = Thread.currentThread();
        t.getUncaughtExceptionHandler().uncaughtException(t, e);
    }
}
