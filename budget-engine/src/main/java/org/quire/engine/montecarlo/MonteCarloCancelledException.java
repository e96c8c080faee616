package org.quire.engine.montecarlo;

import java.util.concurrent.CancellationException;

/** Thrown by {@link MonteCarlo#run} when its {@link ProgressListener} asked it to stop, or its thread was interrupted. */
public final class MonteCarloCancelledException extends CancellationException {
    private final long trialsDone;

    MonteCarloCancelledException(long trialsDone, long trialsPlanned) {
        super(Messages.cancelled(trialsDone, trialsPlanned));
        this.trialsDone = trialsDone;
    }

    /** @return the trials evaluated before the run stopped */
    public long trialsDone() {
        return trialsDone;
    }
}
