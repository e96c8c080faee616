package org.quire.engine.montecarlo;

/**
 * Receives the progress of a Monte Carlo run and may ask it to stop.
 *
 * <p>Both methods are called on the thread that called {@link MonteCarlo#run}, never on a worker thread, so an
 * implementation needs no synchronisation with the run (a workbench passes the values on to its own event
 * thread). They are called every few tens of milliseconds and must return quickly.
 */
public interface ProgressListener {
    /** A listener that ignores progress and never cancels. */
    ProgressListener NONE = new ProgressListener() {
        @Override
        public void progress(long trialsDone, long trialsPlanned) {
        }

        @Override
        public boolean cancelRequested() {
            return false;
        }
    };

    /**
     * @param trialsDone trials evaluated so far
     * @param trialsPlanned trials planned so far; in the adaptive procedure this grows run by run, so the
     *     fraction {@code trialsDone / trialsPlanned} is that of the runs started so far
     */
    void progress(long trialsDone, long trialsPlanned);

    /**
     * @return true to stop the run: it then throws {@link MonteCarloCancelledException} promptly, after its
     *     worker threads have ended
     */
    boolean cancelRequested();
}
